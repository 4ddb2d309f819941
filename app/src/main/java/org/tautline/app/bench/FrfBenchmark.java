package org.tautline.app.bench;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfEstimator;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.frf.WavReader;
import org.tautline.analysis.signal.CrossSpectra;
import org.tautline.analysis.signal.Detrend;
import org.tautline.analysis.signal.WelchEstimator;
import org.tautline.analysis.signal.WelchSettings;
import org.tautline.analysis.signal.WindowType;

/**
 * Times H1 and coherence from a two-channel WAV file: reading, Welch spectra, the FRF.
 *
 * <p>Figures only; nothing here passes or fails on time.
 */
public final class FrfBenchmark {

    /**
     * What one run measured.
     *
     * @param frames samples per channel
     * @param segmentLength Welch segment length
     * @param fileBytes size of the WAV file
     * @param wallS wall time from opening the file to the finished FRF, s
     * @param samplesPerS channel samples processed per second (2 frames per frame of two channels)
     * @param bytesPerS file bytes processed per second
     * @param peakHeapBytes the sum of each heap pool's peak use during the run: an upper bound, garbage included
     * @param retainedHeapBytes heap in use after a collection at the end of the run, before the result is dropped
     * @param averages segments averaged
     * @param meanCoherence mean coherence over the lines, a check that the data were read
     */
    public record Figures(long frames, int segmentLength, long fileBytes, double wallS, double samplesPerS,
                          double bytesPerS, long peakHeapBytes, long retainedHeapBytes, int averages,
                          double meanCoherence) {
    }

    private FrfBenchmark() {
    }

    /**
     * Writes the recording (untimed) when it is missing, then times one estimate.
     *
     * @param file the WAV file to use; written when absent
     * @param frames samples per channel to write
     * @param segmentLength Welch segment length
     * @return the figures
     * @throws IOException when the file cannot be written or read
     */
    public static Figures run(Path file, long frames, int segmentLength) throws IOException {
        if (!Files.exists(file)) {
            BenchmarkRecording.write(file, frames, 20000.0, 42L);
        }
        WelchSettings settings = WelchSettings.of(segmentLength).withOverlap(0.5).withWindow(WindowType.HANN, true)
                .withDetrend(Detrend.MEAN);
        System.gc();
        resetPeaks();
        long start = System.nanoTime();
        CrossSpectra spectra;
        long read;
        try (WavReader reader = WavReader.open(file)) {
            read = reader.frameCount();
            spectra = new WelchEstimator(settings).estimate(reader, 0, 1);
        }
        Frf frf = FrfEstimator.h1(spectra, 0, 1, FrfQuantity.RECEPTANCE);
        double wallS = (System.nanoTime() - start) * 1e-9;
        long peak = peakHeap();
        System.gc();
        long retained = usedHeap();
        double[] coherence = frf.coherence().orElseThrow();
        double sum = 0;
        for (double g2 : coherence) {
            sum += g2;
        }
        long bytes = Files.size(file);
        return new Figures(read, segmentLength, bytes, wallS, 2.0 * read / wallS, bytes / wallS, peak, retained,
                spectra.averageCount(), sum / coherence.length);
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                pool.resetPeakUsage();
            }
        }
    }

    private static long peakHeap() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                sum += pool.getPeakUsage().getUsed();
            }
        }
        return sum;
    }

    private static long usedHeap() {
        return ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
    }
}
