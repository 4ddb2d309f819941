package org.tautline.analysis.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class WelchStreamingTest {
    private static final double FS = 5000;

    /** Hands out at most {@code limit} frames per read, to imitate readers with small blocks. */
    private static final class LimitedSource implements SampleSource {
        private final SampleSource inner;
        private final int limit;

        LimitedSource(SampleSource inner, int limit) {
            this.inner = inner;
            this.limit = limit;
        }

        @Override
        public double sampleRateHz() {
            return inner.sampleRateHz();
        }

        @Override
        public List<String> channelNames() {
            return inner.channelNames();
        }

        @Override
        public long frameCount() {
            return inner.frameCount();
        }

        @Override
        public int read(double[][] buffer, int maxFrames) throws IOException {
            return inner.read(buffer, Math.min(limit, maxFrames));
        }

        @Override
        public String position() {
            return inner.position();
        }

        @Override
        public void close() throws IOException {
            inner.close();
        }
    }

    /** Makes frames on the fly (white noise and a filtered copy) without storing them. */
    private static final class GeneratedSource implements SampleSource {
        private final long frames;
        private long next;
        private long state = 0x9E3779B97F4A7C15L;
        private double previous;

        GeneratedSource(long frames) {
            this.frames = frames;
        }

        @Override
        public double sampleRateHz() {
            return FS;
        }

        @Override
        public List<String> channelNames() {
            return List.of("force", "response", "unused");
        }

        @Override
        public long frameCount() {
            return frames;
        }

        @Override
        public int read(double[][] buffer, int maxFrames) {
            if (next >= frames) {
                return -1;
            }
            int n = (int) Math.min(maxFrames, frames - next);
            for (int i = 0; i < n; i++) {
                state ^= state << 13;
                state ^= state >>> 7;
                state ^= state << 17;
                double u = (state >>> 11) * 0x1.0p-53 - 0.5;
                buffer[0][i] = u;
                buffer[1][i] = 0.6 * u + 0.3 * previous;
                buffer[2][i] = 0;
                previous = u;
            }
            next += n;
            return n;
        }

        @Override
        public String position() {
            return "generated, frame " + next;
        }

        @Override
        public void close() {
            // nothing to release
        }
    }

    private static double[][] noise(int frames) {
        Random random = new Random(20240611L);
        double[][] x = new double[3][frames];
        for (int i = 0; i < frames; i++) {
            x[0][i] = random.nextGaussian();
            x[1][i] = x[0][i] * 0.5 + random.nextGaussian();
            x[2][i] = Math.sin(0.01 * i) + 0.2 * random.nextGaussian();
        }
        return x;
    }

    @Test
    void givesTheSameSpectraForEveryReadBlockSize() throws IOException {
        double[][] x = noise(50_000);
        for (WelchSettings s : new WelchSettings[] {WelchSettings.of(4096).withDetrend(Detrend.LINEAR),
            WelchSettings.of(1000).withOverlap(0.6), WelchSettings.of(999).withOverlap(0)}) {
            WelchEstimator estimator = new WelchEstimator(s);
            CrossSpectra whole = estimator.estimate(ArraySampleSource.of("rec", FS, x), 0, 2, 1);
            for (int limit : new int[] {1, 7, 4096, x[0].length}) {
                CrossSpectra blocks = estimator.estimate(new LimitedSource(ArraySampleSource.of("rec", FS, x), limit), 0, 2, 1);
                assertEquals(whole.averageCount(), blocks.averageCount(), "segments with reads of " + limit + " frames");
                for (int a = 0; a < 3; a++) {
                    for (int b = 0; b < 3; b++) {
                        assertArrayEquals(whole.crossReal(a, b), blocks.crossReal(a, b), 0.0,
                                "Re G_" + a + b + " identical with reads of " + limit + " frames, " + s);
                        assertArrayEquals(whole.crossImag(a, b), blocks.crossImag(a, b), 0.0,
                                "Im G_" + a + b + " identical with reads of " + limit + " frames, " + s);
                    }
                }
            }
        }
    }

    @Test
    void allocationDoesNotGrowWithRecordLength() throws IOException {
        // 2^24 frames of 3 channels would take 384 MiB if held; the estimate must allocate the same as for 2^16 frames
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        WelchEstimator estimator = new WelchEstimator(WelchSettings.of(4096));
        estimator.estimate(new GeneratedSource(1 << 16), 0, 1);
        long start = threads.getCurrentThreadAllocatedBytes();
        CrossSpectra small = estimator.estimate(new GeneratedSource(1 << 16), 0, 1);
        long smallBytes = threads.getCurrentThreadAllocatedBytes() - start;
        start = threads.getCurrentThreadAllocatedBytes();
        CrossSpectra large = estimator.estimate(new GeneratedSource(1L << 24), 0, 1);
        long largeBytes = threads.getCurrentThreadAllocatedBytes() - start;
        assertEquals(8191, large.averageCount(), "segments of 4096 at 50 % overlap in 2^24 frames");
        assertEquals(31, small.averageCount(), "segments of 4096 at 50 % overlap in 2^16 frames");
        assertTrue(largeBytes - smallBytes < 64 * 1024, "an estimate over 2^24 frames allocated " + largeBytes
                + " bytes against " + smallBytes + " over 2^16 frames: memory must not grow with record length");
        assertTrue(largeBytes < 2_000_000, "an estimate with 4096-frame segments should need well under 2 MB, took "
                + largeBytes + " bytes");
    }

    @Test
    void cancelsBetweenSegmentsWithAMessage() {
        double[][] x = noise(64 * 20);
        WelchEstimator estimator = new WelchEstimator(WelchSettings.of(64));
        int[] asked = {0};
        AnalysisException e = assertThrows(AnalysisException.class, () -> estimator.estimate(ArraySampleSource.of("rec", FS, x),
                new int[] {0, 1}, null, () -> ++asked[0] > 3));
        assertEquals("cancelled: Welch estimate stopped at rec, frame 192 after 3 segments", e.getMessage());
        assertEquals(4, asked[0], "cancel is asked once per segment");
    }

    @Test
    void reportsFramesConsumedAgainstTheFrameCount() throws IOException {
        double[][] x = noise(1000);
        List<long[]> calls = new ArrayList<>();
        CrossSpectra s = new WelchEstimator(WelchSettings.of(100)).estimate(ArraySampleSource.of("rec", FS, x), new int[] {1},
                (done, total) -> calls.add(new long[] {done, total}), null);
        assertEquals(19, s.averageCount(), "segments of 100 at 50 % overlap in 1000 frames");
        assertEquals(20, calls.size(), "one report per segment and one at the end");
        for (int i = 1; i < calls.size(); i++) {
            assertTrue(calls.get(i)[0] >= calls.get(i - 1)[0], "progress never goes back");
            assertEquals(1000, calls.get(i)[1], "total is the source's frame count");
        }
        assertArrayEquals(new long[] {100, 1000}, calls.get(0), "first report after the first segment");
        assertArrayEquals(new long[] {1000, 1000}, calls.get(calls.size() - 1), "last report: all frames read");
        assertEquals(1000, s.framesUsed(), "19 segments of 100 every 50 frames cover 1000 frames");
    }
}
