package org.tautline.app.bench;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Frequency lines of a modal benchmark case, with a sentence saying what they are.
 *
 * <p>Uniform lines are what an FFT-based measurement gives. Stepped-sine lines are a coarse log-spaced sweep with
 * extra steps at a fixed fraction of the half-power bandwidth around each expected peak, which is how a stepped
 * sine that refines around resonances resolves lightly damped modes (common practice).
 *
 * @param frequencyHz the lines, strictly increasing, Hz
 * @param uniform true for equally spaced lines
 * @param description what the lines are, in words (count, spacing)
 */
record ModalCaseGrid(double[] frequencyHz, boolean uniform, String description) {
    /** Lines closer than this fraction of the finer neighbouring spacing are merged when grids are combined. */
    private static final double MERGE_FRACTION = 0.25;

    ModalCaseGrid {
        frequencyHz = frequencyHz.clone();
    }

    @Override
    public double[] frequencyHz() {
        return frequencyHz.clone();
    }

    /** @return the number of lines */
    int size() {
        return frequencyHz.length;
    }

    /**
     * Equally spaced lines.
     *
     * @param lowHz first line, Hz
     * @param highHz last line, Hz
     * @param count number of lines, at least 2
     * @return the grid
     */
    static ModalCaseGrid uniform(double lowHz, double highHz, int count) {
        double[] f = new double[count];
        for (int i = 0; i < count; i++) {
            f[i] = lowHz + (highHz - lowHz) * i / (count - 1);
        }
        return new ModalCaseGrid(f, true, String.format(Locale.ROOT, "uniform, %d lines %.4g Hz apart over %.4g-%.4g Hz",
                count, (highHz - lowHz) / (count - 1), lowHz, highHz));
    }

    /**
     * Log-spaced lines alone: a stepped sine at a constant fraction of an octave.
     *
     * @param lowHz first line, Hz
     * @param highHz last line, Hz
     * @param count number of lines, at least 2
     * @return the grid
     */
    static ModalCaseGrid logSpaced(double lowHz, double highHz, int count) {
        double[] f = logLines(lowHz, highHz, count);
        return new ModalCaseGrid(f, false, String.format(Locale.ROOT,
                "stepped sine, %d log-spaced lines over %.4g-%.4g Hz (%.3g %% apart)", count, lowHz, highHz,
                100 * (f[1] / f[0] - 1)));
    }

    /**
     * A coarse log-spaced sweep with dense steps around each expected peak.
     *
     * @param lowHz first line, Hz
     * @param highHz last line, Hz
     * @param coarseCount lines of the coarse sweep
     * @param peaksHz for each peak region its lowest and highest mode frequency, Hz (one pair per region)
     * @param bandwidthsHz the half-power bandwidth 2 zeta f that sets the step in each region, Hz
     * @param halfWidthBandwidths how far beyond each region the dense steps reach, in its bandwidths
     * @param linesPerBandwidth dense steps per half-power bandwidth
     * @return the grid
     */
    static ModalCaseGrid steppedAroundPeaks(double lowHz, double highHz, int coarseCount, List<double[]> peaksHz,
                                            double[] bandwidthsHz, double halfWidthBandwidths, int linesPerBandwidth) {
        double[] coarse = logLines(lowHz, highHz, coarseCount);
        double[] all = coarse;
        for (int r = 0; r < peaksHz.size(); r++) {
            double step = bandwidthsHz[r] / linesPerBandwidth;
            double from = Math.max(lowHz, peaksHz.get(r)[0] - halfWidthBandwidths * bandwidthsHz[r]);
            double to = Math.min(highHz, peaksHz.get(r)[1] + halfWidthBandwidths * bandwidthsHz[r]);
            int n = (int) Math.floor((to - from) / step) + 1;
            double[] dense = new double[n];
            for (int i = 0; i < n; i++) {
                dense[i] = from + i * step;
            }
            all = merge(all, dense);
        }
        return new ModalCaseGrid(all, false, String.format(Locale.ROOT,
                "stepped sine, %d lines: %d log-spaced over %.4g-%.4g Hz plus steps of 1/%d half-power bandwidth within"
                        + " %.0f bandwidths of each of %d peaks", all.length, coarseCount, lowHz, highHz,
                linesPerBandwidth, halfWidthBandwidths, peaksHz.size()));
    }

    /**
     * The spacing of the lines around a frequency, Hz.
     *
     * @param frequencyHzAt where, Hz
     * @return the spacing of the two lines around it
     */
    double spacingAtHz(double frequencyHzAt) {
        int i = Arrays.binarySearch(frequencyHz, frequencyHzAt);
        int k = i >= 0 ? Math.max(1, i) : Math.max(1, Math.min(frequencyHz.length - 1, -i - 1));
        return frequencyHz[k] - frequencyHz[k - 1];
    }

    private static double[] logLines(double lowHz, double highHz, int count) {
        double[] f = new double[count];
        for (int i = 0; i < count; i++) {
            f[i] = lowHz * Math.exp(Math.log(highHz / lowHz) * i / (count - 1));
        }
        return f;
    }

    /** Both sets of lines, sorted, with any line of {@code a} dropped that sits too close to one of {@code b}. */
    private static double[] merge(double[] a, double[] b) {
        double step = b.length > 1 ? b[1] - b[0] : Double.POSITIVE_INFINITY;
        double[] out = new double[a.length + b.length];
        int n = 0;
        for (double x : a) {
            boolean inside = b.length > 0 && x > b[0] - MERGE_FRACTION * step && x < b[b.length - 1] + MERGE_FRACTION * step;
            if (!inside) {
                out[n++] = x;
            }
        }
        for (double x : b) {
            out[n++] = x;
        }
        double[] merged = Arrays.copyOf(out, n);
        Arrays.sort(merged);
        return merged;
    }
}
