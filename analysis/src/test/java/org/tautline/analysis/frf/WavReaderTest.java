package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;

/**
 * Reading WAV files; expected sample values follow from the scaling rule sample / 2^(bits-1) and
 * from IEEE 754 widening, worked by hand for each case.
 */
class WavReaderTest {
    @TempDir
    Path dir;

    static WavReader open(byte[] bytes) throws IOException {
        return WavReader.open(new ByteArrayInputStream(bytes), "rec.wav");
    }

    static double[][] readAll(byte[] bytes, int block) throws IOException {
        try (WavReader reader = open(bytes)) {
            return Sources.readAll(reader, block);
        }
    }

    static String error(byte[] bytes) {
        return assertThrows(AnalysisException.class, () -> readAll(bytes, 4096)).getMessage();
    }

    @Test
    void scales16BitPcmByTwoToTheFifteen() throws IOException {
        byte[] bytes = WavBytes.pcm(16, 1).samples(0x4000, -0x8000, 0x7fff, 1, -1, 0).build();
        try (WavReader reader = open(bytes)) {
            assertEquals(48000.0, reader.sampleRateHz());
            assertEquals(List.of("ch0"), reader.channelNames());
            assertEquals(6, reader.frameCount());
            assertEquals("rec.wav, byte 44", reader.position());
            assertArrayEquals(new double[] {0.5, -1.0, 32767.0 / 32768, 0x1p-15, -0x1p-15, 0.0},
                    Sources.readAll(reader, 4096)[0], 0);
            assertEquals("rec.wav, byte 56", reader.position());
            assertEquals(-1, reader.read(new double[1][4], 4), "stays at the end");
        }
    }

    @Test
    void scales24And32BitPcm() throws IOException {
        byte[] pcm24 = WavBytes.pcm(24, 1).samples(-(1L << 23), 0x400000, 0x7fffff, -1).build();
        assertArrayEquals(new double[] {-1.0, 0.5, 1 - 0x1p-23, -0x1p-23}, readAll(pcm24, 4096)[0], 0);
        byte[] pcm32 = WavBytes.pcm(32, 1).samples(Integer.MIN_VALUE, 0x40000000, Integer.MAX_VALUE, -1).build();
        assertArrayEquals(new double[] {-1.0, 0.5, 1 - 0x1p-31, -0x1p-31}, readAll(pcm32, 4096)[0], 0);
    }

    @Test
    void readsIeeeFloats() throws IOException {
        byte[] f32 = WavBytes.ieeeFloat(32, 1).floatSamples(0.1, -1.5, 3.0e-39).build();
        assertArrayEquals(new double[] {(double) 0.1f, -1.5, (double) 3.0e-39f}, readAll(f32, 4096)[0], 0);
        byte[] f64 = WavBytes.ieeeFloat(64, 1).floatSamples(0.1, -1.5, Double.MIN_VALUE).build();
        assertArrayEquals(new double[] {0.1, -1.5, Double.MIN_VALUE}, readAll(f64, 4096)[0], 0);
    }

    @Test
    void readsExtensibleThreeChannelFilesAndDeinterleaves() throws IOException {
        byte[] pcm = WavBytes.pcm(24, 3).extensible(1, 24).samples(0x400000, -(1L << 23), 1, 0x200000, 0, -1).build();
        double[][] samples = readAll(pcm, 4096);
        assertArrayEquals(new double[] {0.5, 0.25}, samples[0], 0);
        assertArrayEquals(new double[] {-1.0, 0.0}, samples[1], 0);
        assertArrayEquals(new double[] {0x1p-23, -0x1p-23}, samples[2], 0);
        byte[] floats = WavBytes.ieeeFloat(32, 3).extensible(3, 32).floatSamples(1, 2, 3, -4, -5, -6).build();
        assertArrayEquals(new double[][] {{1, -4}, {2, -5}, {3, -6}}, readAll(floats, 1));
        // 24 valid bits left-justified in a 32-bit container: scaled by the container, 2^31.
        byte[] container = WavBytes.pcm(32, 1).extensible(1, 24).samples(0x40000000L, 0x00000100L).build();
        assertArrayEquals(new double[] {0.5, 0x1p-23}, readAll(container, 4096)[0], 0);
    }

    @Test
    void skipsUnknownChunksHonouringThePadByteOfOddSizes() throws IOException {
        byte[] bytes = WavBytes.pcm(16, 1).chunkBeforeFmt("JUNK", new byte[] {1, 2, 3})
                .chunk("LIST", "INFOx".getBytes(java.nio.charset.StandardCharsets.US_ASCII))
                .samples(0x4000, -0x4000).build();
        try (WavReader reader = open(bytes)) {
            // 12 RIFF + (8 + 3 + 1) JUNK + (8 + 16) fmt + (8 + 5 + 1) LIST + 8 data header = 70.
            assertEquals("rec.wav, byte 70", reader.position());
            assertArrayEquals(new double[] {0.5, -0.5}, Sources.readAll(reader, 3)[0], 0);
        }
    }

    @Test
    void deliversTheSameSamplesForAnyReadBlockSize() throws IOException {
        Random random = new Random(5150L);
        int frames = 10_007;
        long[] values = new long[3 * frames];
        double[][] expected = new double[3][frames];
        for (int i = 0; i < values.length; i++) {
            values[i] = random.nextInt(65536) - 32768;
            expected[i % 3][i / 3] = values[i] / 32768.0;
        }
        Path file = dir.resolve("rec.wav");
        Files.write(file, WavBytes.pcm(16, 3).samples(values).build());
        for (int block : new int[] {1, 3, 4096, 70_000}) {
            try (WavReader reader = WavReader.open(file)) {
                assertEquals(frames, reader.frameCount());
                double[][] got = Sources.readAll(reader, block);
                for (int c = 0; c < 3; c++) {
                    assertArrayEquals(expected[c], got[c], 0, "channel " + c + ", block " + block);
                }
            }
        }
    }

    @Test
    void deliversTheWholeFramesOfATruncatedDataChunkThenThrows() throws IOException {
        byte[] whole = WavBytes.pcm(16, 1).samples(1, 2, 3, 4, 5, 6, 7, 8).build();
        byte[] cut = Arrays.copyOf(whole, 44 + 11);
        String expected = "rec.wav, byte 55: data chunk ends after 11 of 16 declared bytes; 5 whole frames were read"
                + " of 8 declared; expected the declared data";
        for (int block : new int[] {1, 2, 4096}) {
            try (WavReader reader = open(cut)) {
                double[][] buffer = new double[1][block];
                double[] got = new double[8];
                int total = 0;
                AnalysisException failure = null;
                for (int call = 0; call < 20 && failure == null; call++) {
                    try {
                        int n = reader.read(buffer, block);
                        System.arraycopy(buffer[0], 0, got, total, n);
                        total += n;
                    } catch (AnalysisException e) {
                        failure = e;
                    }
                }
                assertEquals(5, total, "whole frames delivered before the error, block " + block);
                assertArrayEquals(new double[] {1, 2, 3, 4, 5}, Arrays.stream(Arrays.copyOf(got, 5))
                        .map(v -> v * 32768).toArray(), 0);
                assertEquals(expected, failure == null ? null : failure.getMessage());
                AnalysisException first = failure;
                assertSame(first, assertThrows(AnalysisException.class, () -> reader.read(buffer, block)),
                        "later reads repeat the failure");
            }
        }
    }

    @Test
    void deliversFramesBeforeANonFiniteFloatSampleThenThrows() throws IOException {
        byte[] bytes = WavBytes.ieeeFloat(32, 2).floatSamples(1, 2, 3, 4, 5, Double.NaN, 7, 8).build();
        try (WavReader reader = open(bytes)) {
            double[][] buffer = new double[2][16];
            assertEquals(2, reader.read(buffer, 16));
            assertArrayEquals(new double[] {1, 3}, Arrays.copyOf(buffer[0], 2), 0);
            // frame 2, channel 1: byte 44 + 2 * 8 + 4.
            assertEquals("rec.wav, byte 64: sample of channel ch1 in frame 2 is NaN; expected finite samples",
                    assertThrows(AnalysisException.class, () -> reader.read(buffer, 16)).getMessage());
        }
    }

    @Test
    void rejectsFilesThatAreNotRiffWave() {
        assertEquals("rec.wav, byte 0: file is empty; expected a RIFF/WAVE file", error(new byte[0]));
        assertEquals("rec.wav, byte 5: file ends after 5 bytes; expected a 12-byte RIFF/WAVE header",
                error(new byte[] {'R', 'I', 'F', 'F', 0}));
        byte[] riffx = WavBytes.pcm(16, 1).build();
        riffx[3] = 'X';
        assertEquals("rec.wav, byte 0: not a RIFF/WAVE file: it starts with 'RIFX', expected 'RIFF'", error(riffx));
        byte[] binary = WavBytes.pcm(16, 1).build();
        binary[0] = 0;
        assertEquals("rec.wav, byte 0: not a RIFF/WAVE file: it starts with 0x46464900, expected 'RIFF'", error(binary));
        byte[] avi = WavBytes.pcm(16, 1).build();
        System.arraycopy("AVI ".getBytes(java.nio.charset.StandardCharsets.US_ASCII), 0, avi, 8, 4);
        assertEquals("rec.wav, byte 8: not a RIFF/WAVE file: the RIFF form type is 'AVI ', expected 'WAVE'", error(avi));
    }

    @Test
    void rejectsUnsupportedFormatsNamingWhatIsSupported() {
        assertEquals("rec.wav, byte 20: format code 2 is not supported; expected 1 (PCM integers of 16, 24 or 32 bits),"
                + " 3 (IEEE floats of 32 or 64 bits) or 65534 (extensible, with a PCM or IEEE float subformat)",
                error(WavBytes.pcm(16, 1).formatCode(2).build()));
        assertEquals("rec.wav, byte 34: PCM samples of 8 bits are not supported; expected 16, 24 or 32 bits",
                error(WavBytes.pcm(8, 1).build()));
        assertEquals("rec.wav, byte 34: IEEE float samples of 16 bits are not supported; expected 32 or 64 bits",
                error(WavBytes.ieeeFloat(16, 1).build()));
        assertEquals("rec.wav, byte 44: extensible subformat {00000002-0000-0010-8000-00aa00389b71} is not supported;"
                + " expected PCM {00000001-0000-0010-8000-00aa00389b71} or IEEE float"
                + " {00000003-0000-0010-8000-00aa00389b71}", error(WavBytes.pcm(16, 1).extensible(2, 16).build()));
        assertEquals("rec.wav, byte 38: valid bits per sample 20 exceed the 16-bit container; expected at most 16",
                error(WavBytes.pcm(16, 1).extensible(1, 20).build()));
        assertEquals("rec.wav, byte 12: extensible fmt chunk holds 16 bytes; expected at least 40",
                error(WavBytes.pcm(16, 1).formatCode(0xFFFE).build()));
    }

    @Test
    void rejectsImpossibleFmtFields() {
        assertEquals("rec.wav, byte 32: block align 5 does not match 2 channels of 16 bits; expected 4",
                error(WavBytes.pcm(16, 2).blockAlign(5).build()));
        assertEquals("rec.wav, byte 22: channel count is 0; expected 1 or more", error(WavBytes.pcm(16, 0).build()));
        assertEquals("rec.wav, byte 24: sample rate is 0 Hz; expected a sample rate above 0 Hz",
                error(WavBytes.pcm(16, 1).sampleRate(0).build()));
        byte[] shortFmt = concat(riff(), WavBytes.chunkBytes("fmt ", new byte[14]));
        assertEquals("rec.wav, byte 12: fmt chunk holds 14 bytes; expected at least 16", error(shortFmt));
        byte[] fmt = WavBytes.chunkBytes("fmt ", WavBytes.pcm(16, 1).fmtBody());
        assertEquals("rec.wav, byte 36: second fmt chunk; expected one", error(concat(riff(), fmt, fmt)));
    }

    @Test
    void rejectsAMissingOrLateFmtChunkAndMissingData() {
        byte[] fmt = WavBytes.chunkBytes("fmt ", WavBytes.pcm(16, 1).fmtBody());
        byte[] data = WavBytes.chunkBytes("data", new byte[4]);
        assertEquals("rec.wav, byte 12: data chunk comes before the fmt chunk; expected the fmt chunk first"
                + " (a fmt chunk after the data is not read)", error(concat(riff(), data, fmt)));
        assertEquals("rec.wav, byte 22: file ends without a fmt chunk; expected a fmt chunk and then a data chunk",
                error(concat(riff(), WavBytes.chunkBytes("LIST", new byte[1]))));
        assertEquals("rec.wav, byte 36: file ends without a data chunk; expected a data chunk after the fmt chunk",
                error(concat(riff(), fmt)));
    }

    @Test
    void rejectsTruncatedChunksAndRaggedData() {
        byte[] fmt = WavBytes.chunkBytes("fmt ", WavBytes.pcm(16, 2).fmtBody());
        byte[] list = WavBytes.header("LIST", 100);
        assertEquals("rec.wav, byte 54: file ends inside chunk 'LIST' that starts at byte 36 and declares 100 bytes;"
                + " expected the whole chunk (and a pad byte after an odd size)",
                error(concat(riff(), fmt, list, new byte[10])));
        byte[] odd = WavBytes.header("LIST", 3);
        assertEquals("rec.wav, byte 47: file ends inside chunk 'LIST' that starts at byte 36 and declares 3 bytes;"
                + " expected the whole chunk (and a pad byte after an odd size)", error(concat(riff(), fmt, odd, new byte[3])));
        assertEquals("rec.wav, byte 39: file ends inside a chunk header (3 of 8 bytes); expected a chunk id and size",
                error(concat(riff(), fmt, new byte[] {'d', 'a', 't'})));
        assertEquals("rec.wav, byte 40: data chunk declares 6 bytes, not a whole number of 4-byte frames",
                error(WavBytes.pcm(16, 2).samples(1, 2, 3).build()));
    }

    private static byte[] riff() {
        return new byte[] {'R', 'I', 'F', 'F', 0, 0, 0, 0, 'W', 'A', 'V', 'E'};
    }

    private static byte[] concat(byte[]... parts) {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        for (byte[] part : parts) {
            out.writeBytes(part);
        }
        return out.toByteArray();
    }
}
