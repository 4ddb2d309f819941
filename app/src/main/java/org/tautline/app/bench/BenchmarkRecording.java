package org.tautline.app.bench;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;

/**
 * Writes the benchmark's recording: a two-channel IEEE-float WAV of a force and a response.
 *
 * <p>The force is white Gaussian noise; the response is the force through a single lightly damped
 * resonance (a bilinear-transform biquad) plus a little independent noise, so H1 and coherence
 * have something to find. Samples are generated and written in blocks, never held whole.
 */
final class BenchmarkRecording {
    private static final int BLOCK_FRAMES = 65536;

    private BenchmarkRecording() {
    }

    /**
     * Writes the file.
     *
     * @param file where to write
     * @param frames samples per channel
     * @param sampleRateHz sample rate, Hz
     * @param seed random seed
     * @throws IOException when the file cannot be written
     */
    static void write(Path file, long frames, double sampleRateHz, long seed) throws IOException {
        int channels = 2;
        int bytesPerSample = 4;
        long dataBytes = frames * channels * bytesPerSample;
        if (dataBytes + 36 > 0xFFFFFFFFL) {
            throw new IOException("a WAV file holds at most 4 GiB of samples; " + frames + " frames is too many");
        }
        SplittableRandom random = new SplittableRandom(seed);
        Resonance resonance = new Resonance(sampleRateHz / 10, 0.02, sampleRateHz);
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 20)) {
            out.write(header(channels, sampleRateHz, bytesPerSample, dataBytes));
            ByteBuffer block = ByteBuffer.allocate(BLOCK_FRAMES * channels * bytesPerSample).order(ByteOrder.LITTLE_ENDIAN);
            long written = 0;
            while (written < frames) {
                int n = (int) Math.min(BLOCK_FRAMES, frames - written);
                block.clear();
                for (int i = 0; i < n; i++) {
                    double force = 0.1 * random.nextGaussian();
                    double response = resonance.next(force) + 1e-4 * random.nextGaussian();
                    block.putFloat((float) force);
                    block.putFloat((float) response);
                }
                out.write(block.array(), 0, block.position());
                written += n;
            }
        }
    }

    private static byte[] header(int channels, double sampleRateHz, int bytesPerSample, long dataBytes) {
        ByteBuffer h = ByteBuffer.allocate(44).order(ByteOrder.LITTLE_ENDIAN);
        h.put("RIFF".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        h.putInt((int) (36 + dataBytes));
        h.put("WAVEfmt ".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        h.putInt(16);
        h.putShort((short) 3); // IEEE float
        h.putShort((short) channels);
        h.putInt((int) Math.round(sampleRateHz));
        h.putInt((int) Math.round(sampleRateHz) * channels * bytesPerSample);
        h.putShort((short) (channels * bytesPerSample));
        h.putShort((short) (8 * bytesPerSample));
        h.put("data".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        h.putInt((int) dataBytes);
        return h.array();
    }

    /** A resonance as a digital biquad from the bilinear transform of 1/(s^2 + 2 zeta w s + w^2). */
    private static final class Resonance {
        private final double b0;
        private final double b1;
        private final double b2;
        private final double a1;
        private final double a2;
        private double x1;
        private double x2;
        private double y1;
        private double y2;

        Resonance(double frequencyHz, double dampingRatio, double sampleRateHz) {
            double w = 2 * Math.PI * frequencyHz;
            double k = 2 * sampleRateHz;
            double a0 = k * k + 2 * dampingRatio * w * k + w * w;
            b0 = w * w / a0;
            b1 = 2 * b0;
            b2 = b0;
            a1 = (2 * w * w - 2 * k * k) / a0;
            a2 = (k * k - 2 * dampingRatio * w * k + w * w) / a0;
        }

        double next(double x) {
            double y = b0 * x + b1 * x1 + b2 * x2 - a1 * y1 - a2 * y2;
            x2 = x1;
            x1 = x;
            y2 = y1;
            y1 = y;
            return y;
        }
    }
}
