package org.tautline.analysis.signal;

/**
 * What is removed from each Welch segment before windowing.
 *
 * <p>P. D. Welch, "The use of fast Fourier transform for the estimation of power spectra: a method
 * based on time averaging over short, modified periodograms", IEEE Trans. Audio Electroacoust.
 * AU-15(2):70-73, 1967 (from memory) leaves the choice open; removing the mean or a line per
 * segment is common practice and keeps DC leakage out of the low lines.
 */
public enum Detrend {
    /** Nothing is removed. */
    NONE,
    /** The segment mean is removed. */
    MEAN,
    /** The least-squares straight line a + b t through the segment is removed. */
    LINEAR;

    /**
     * The offset and slope to remove: x'[i] = x[i] - offset - slope (i - (n-1)/2).
     *
     * @param x segment samples
     * @param n segment length
     * @param out out[0] = offset, out[1] = slope per sample
     */
    void fit(double[] x, int n, double[] out) {
        if (this == NONE) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        double mid = 0.5 * (n - 1);
        double sum = 0;
        double sumT = 0;
        for (int i = 0; i < n; i++) {
            sum += x[i];
            sumT += (i - mid) * x[i];
        }
        out[0] = sum / n;
        // sum over i of (i - mid)^2 = n (n^2 - 1) / 12
        out[1] = this == LINEAR ? sumT / (n * ((double) n * n - 1) / 12.0) : 0;
    }
}
