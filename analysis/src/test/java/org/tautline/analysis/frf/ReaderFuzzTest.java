package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.signal.SampleSource;

/**
 * Feeds each reader 10,000 seeded mutations of valid files: nothing but {@link AnalysisException}
 * may escape, every message must name the place, and every read must end (a source is read at most as many times as
 * its input has bytes; no clock is involved).
 */
class ReaderFuzzTest {
    private static final int MUTATIONS = 10_000;
    private static final Pattern CSV_PLACE = Pattern.compile("^(frf|rec)\\.csv, line \\d+( \\(end of file\\))?: .+");
    private static final Pattern WAV_PLACE = Pattern.compile("^rec\\.wav, byte \\d+: .+");
    private static final List<String> CSV_TOKENS = List.of(",", "\n", "\r\n", "\r", "#", "# quantity: ", ":", "-", ".",
            "e", "E+", "1e999", "NaN", "Infinity", "0", "-1", "\u00ef\u00bb\u00bf", "\u00ff", "\u00c3\u00a9", " ", "\t",
            "\"", "0x1p3", "time_s,", "coherence,", "variance", "quality", "1d", "\n\n");
    private static final List<String> WAV_TOKENS = List.of("RIFF", "WAVE", "fmt ", "data", "LIST", "\u0000\u0000",
            "\u00ff\u00ff", "\u00fe\u00ff", "\u0001\u0000", "\u0003\u0000", "\u0000\u0000\u0000\u0000",
            "\u00ff\u00ff\u00ff\u00ff", "\u0001\u0000\u0000\u0000", "\u0011\u0000\u0000\u0000", "\u0000\u0000\u00c0\u007f",
            "\u0000\u0000\u0080\u007f");

    private interface Reading {
        void read(byte[] bytes) throws IOException;
    }

    private static void fuzz(long seed, List<byte[]> valid, List<String> tokens, Pattern place, Reading reading) {
        for (byte[] file : valid) {
            try {
                reading.read(file);
            } catch (IOException | RuntimeException e) {
                throw new AssertionError("a valid file must read without error", e);
            }
        }
        Mutator mutator = new Mutator(seed, tokens);
        int failures = 0;
        for (int i = 0; i < MUTATIONS; i++) {
            byte[] bytes = mutator.mutate(valid.get(i % valid.size()));
            try {
                reading.read(bytes);
            } catch (AnalysisException e) {
                failures++;
                if (e.getMessage() == null || !place.matcher(e.getMessage()).matches()) {
                    fail("mutation " + i + ": message does not name the place: " + e.getMessage() + "; input "
                            + Base64.getEncoder().encodeToString(bytes));
                }
            } catch (IOException | RuntimeException | Error e) {
                throw new AssertionError("mutation " + i + " let " + e + " escape; input "
                        + Base64.getEncoder().encodeToString(bytes), e);
            }
        }
        assertTrue(failures > MUTATIONS / 2, "most mutations must be refused, got " + failures);
    }

    /** Reads a source to its end in blocks, refusing to loop more often than the input has bytes. */
    private static void drain(SampleSource source, int inputBytes) throws IOException {
        int channels = source.channelCount();
        int block = Math.max(1, Math.min(257, 65536 / channels));
        double[][] buffer = new double[channels][block];
        long frames = 0;
        for (int reads = 0; reads <= inputBytes + 2; reads++) {
            int n = source.read(buffer, block);
            if (n == -1) {
                if (source.frameCount() >= 0) {
                    assertEquals(source.frameCount(), frames, "frames read against frames declared");
                }
                return;
            }
            if (n < 1 || n > block) {
                fail("read returned " + n + " for a block of " + block);
            }
            frames += n;
        }
        fail("reading did not end after " + (inputBytes + 2) + " reads of a " + inputBytes + "-byte input");
    }

    @Test
    void frfCsvReaderRefusesMutatedFilesWithPlacedMessagesOnly() {
        Random random = new Random(11L);
        List<byte[]> valid = new ArrayList<>();
        for (int columns = 0; columns < 8; columns += 3) {
            int n = 12;
            double[] f = new double[n];
            double[] re = new double[n];
            double[] im = new double[n];
            double[] extra = new double[n];
            for (int i = 0; i < n; i++) {
                f[i] = 50 + 7.5 * i;
                re[i] = random.nextGaussian() * 1e-5;
                im[i] = random.nextGaussian() * 1e-6;
                extra[i] = random.nextDouble();
            }
            Frf frf = Frf.of(f, re, im, FrfQuantity.values()[columns % 3]);
            frf = (columns & 1) != 0 ? frf.withCoherence(extra) : frf;
            frf = (columns & 2) != 0 ? frf.withQuality(extra) : frf;
            frf = (columns & 4) != 0 ? frf.withVariance(extra) : frf;
            Map<String, String> metadata = new LinkedHashMap<>();
            metadata.put("specimen", "belt 4");
            valid.add(FrfCsvWriter.format(frf, metadata).getBytes(StandardCharsets.UTF_8));
        }
        fuzz(20240601L, valid, CSV_TOKENS, CSV_PLACE,
                bytes -> FrfCsvReader.read(new ByteArrayInputStream(bytes), "frf.csv"));
    }

    @Test
    void timeSeriesCsvReaderRefusesMutatedFilesWithPlacedMessagesOnly() {
        Random random = new Random(12L);
        StringBuilder timed = new StringBuilder("# rig: bench\ntime_s,force,accel,gap\n");
        StringBuilder rated = new StringBuilder("# sample_rate_hz: 20000\nforce,accel\n");
        for (int i = 0; i < 30; i++) {
            timed.append(i / 1024.0).append(',').append(random.nextGaussian()).append(',')
                    .append(random.nextGaussian() * 1e-3).append(",").append(i).append('\n');
            rated.append(random.nextGaussian()).append(',').append(random.nextGaussian()).append("\r\n");
        }
        List<byte[]> valid = List.of(timed.toString().getBytes(StandardCharsets.UTF_8),
                rated.toString().getBytes(StandardCharsets.UTF_8));
        fuzz(20240602L, valid, CSV_TOKENS, CSV_PLACE, bytes -> {
            try (TimeSeriesCsvReader reader = TimeSeriesCsvReader.open(new ByteArrayInputStream(bytes), "rec.csv")) {
                drain(reader, bytes.length);
            }
        });
    }

    @Test
    void wavReaderRefusesMutatedFilesWithPlacedMessagesOnly() {
        Random random = new Random(13L);
        long[] ints = new long[48];
        double[] floats = new double[48];
        for (int i = 0; i < ints.length; i++) {
            ints[i] = random.nextInt(1 << 16) - (1 << 15);
            floats[i] = random.nextGaussian();
        }
        List<byte[]> valid = List.of(
                WavBytes.pcm(16, 2).chunk("LIST", new byte[] {'I', 'N', 'F', 'O', 'x'}).samples(ints).build(),
                WavBytes.pcm(24, 3).extensible(1, 24).samples(ints).build(),
                WavBytes.ieeeFloat(32, 1).samples().floatSamples(floats).build(),
                WavBytes.ieeeFloat(64, 4).extensible(3, 64).floatSamples(floats).build(),
                WavBytes.pcm(32, 1).chunkBeforeFmt("JUNK", new byte[3]).samples(ints).build());
        fuzz(20240603L, valid, WAV_TOKENS, WAV_PLACE, bytes -> {
            try (WavReader reader = WavReader.open(new ByteArrayInputStream(bytes), "rec.wav")) {
                drain(reader, bytes.length);
            }
        });
    }
}
