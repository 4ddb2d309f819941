package org.tautline.analysis.frf;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.ArrayList;
import java.util.List;

/**
 * Builds WAV files byte by byte for tests, following the RIFF layout of "Multimedia Programming
 * Interface and Data Specifications 1.0" (IBM and Microsoft, 1991, from memory) and the
 * WAVEFORMATEXTENSIBLE layout of Microsoft's documentation (from memory).
 */
final class WavBytes {
    static final byte[] PCM_GUID_TAIL = {0x00, 0x00, 0x10, 0x00, (byte) 0x80, 0x00, 0x00, (byte) 0xAA, 0x00, 0x38,
        (byte) 0x9B, 0x71};

    private int formatCode = 1;
    private int channels = 1;
    private long sampleRate = 48000;
    private int bits = 16;
    private int blockAlign = -1;
    private boolean extensible;
    private int subformatCode = 1;
    private int validBits = -1;
    private final List<byte[]> chunksBeforeFmt = new ArrayList<>();
    private final List<byte[]> chunksBeforeData = new ArrayList<>();
    private byte[] samples = new byte[0];
    private long declaredDataBytes = -1;

    static WavBytes pcm(int bits, int channels) {
        WavBytes w = new WavBytes();
        w.bits = bits;
        w.channels = channels;
        return w;
    }

    static WavBytes ieeeFloat(int bits, int channels) {
        WavBytes w = pcm(bits, channels);
        w.formatCode = 3;
        return w;
    }

    WavBytes extensible(int subformat, int valid) {
        extensible = true;
        subformatCode = subformat;
        validBits = valid;
        return this;
    }

    WavBytes formatCode(int code) {
        formatCode = code;
        return this;
    }

    WavBytes sampleRate(long hz) {
        sampleRate = hz;
        return this;
    }

    WavBytes blockAlign(int bytes) {
        blockAlign = bytes;
        return this;
    }

    WavBytes declaredDataBytes(long bytes) {
        declaredDataBytes = bytes;
        return this;
    }

    /** Adds a chunk (with its pad byte when odd) between the fmt and the data chunk. */
    WavBytes chunk(String id, byte[] body) {
        chunksBeforeData.add(chunkBytes(id, body));
        return this;
    }

    /** Adds a chunk before the fmt chunk. */
    WavBytes chunkBeforeFmt(String id, byte[] body) {
        chunksBeforeFmt.add(chunkBytes(id, body));
        return this;
    }

    /** Sets the interleaved samples as little-endian integers of the format's width. */
    WavBytes samples(long... values) {
        int width = bits / 8;
        ByteBuffer b = ByteBuffer.allocate(values.length * width).order(ByteOrder.LITTLE_ENDIAN);
        for (long v : values) {
            for (int i = 0; i < width; i++) {
                b.put((byte) (v >> (8 * i)));
            }
        }
        samples = b.array();
        return this;
    }

    /** Sets the interleaved samples as IEEE floats of the format's width. */
    WavBytes floatSamples(double... values) {
        ByteBuffer b = ByteBuffer.allocate(values.length * bits / 8).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : values) {
            if (bits == 32) {
                b.putFloat((float) v);
            } else {
                b.putDouble(v);
            }
        }
        samples = b.array();
        return this;
    }

    byte[] fmtBody() {
        int align = blockAlign >= 0 ? blockAlign : channels * bits / 8;
        ByteBuffer b = ByteBuffer.allocate(extensible ? 40 : 16).order(ByteOrder.LITTLE_ENDIAN);
        b.putShort((short) (extensible ? 0xFFFE : formatCode)).putShort((short) channels).putInt((int) sampleRate)
                .putInt((int) (sampleRate * align)).putShort((short) align).putShort((short) bits);
        if (extensible) {
            b.putShort((short) 22).putShort((short) (validBits >= 0 ? validBits : bits)).putInt(0)
                    .putInt(subformatCode).put(PCM_GUID_TAIL);
        }
        return b.array();
    }

    byte[] build() {
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        body.writeBytes("WAVE".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        chunksBeforeFmt.forEach(body::writeBytes);
        body.writeBytes(chunkBytes("fmt ", fmtBody()));
        chunksBeforeData.forEach(body::writeBytes);
        body.writeBytes(header("data", declaredDataBytes >= 0 ? declaredDataBytes : samples.length));
        body.writeBytes(samples);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes(header("RIFF", body.size()));
        out.writeBytes(body.toByteArray());
        return out.toByteArray();
    }

    static byte[] chunkBytes(String id, byte[] body) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes(header(id, body.length));
        out.writeBytes(body);
        if (body.length % 2 == 1) {
            out.write(0);
        }
        return out.toByteArray();
    }

    static byte[] header(String id, long size) {
        ByteBuffer b = ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN);
        b.put(id.getBytes(java.nio.charset.StandardCharsets.US_ASCII)).putInt((int) size);
        return b.array();
    }
}
