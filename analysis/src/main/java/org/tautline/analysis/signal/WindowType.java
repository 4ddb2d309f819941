package org.tautline.analysis.signal;

/**
 * Data windows of the generalised-cosine family, w[n] = sum_k (-1)^k a_k cos(2 pi k n / M).
 *
 * <p>M = N for the periodic (DFT-even) form used in spectral analysis and M = N - 1 for the
 * symmetric form, n = 0..N-1 (see {@link Window#of(WindowType, int, boolean)}). Coefficients and
 * their figures of merit: F. J. Harris, "On the use of windows for harmonic analysis with the
 * discrete Fourier transform", Proc. IEEE 66(1):51-83, 1978; G. Heinzel, A. Ruediger and
 * R. Schilling, "Spectrum and spectral density estimation by the Discrete Fourier transform (DFT),
 * including a comprehensive list of window functions and some new flat-top windows", Max Planck
 * Institute for Gravitational Physics, 2002. The figures ({@link Window#enbwBins()} and so on) are
 * computed from the samples, never tabulated.
 */
public enum WindowType {
    /** Rectangular (no window): w[n] = 1. */
    RECTANGULAR(1.0),
    /** Hann: w[n] = 0.5 - 0.5 cos(z), z = 2 pi n / M (Harris 1978). */
    HANN(0.5, 0.5),
    /** Hamming: w[n] = 0.54 - 0.46 cos(z) (Harris 1978 uses 25/46 and 21/46; 0.54/0.46 is common practice). */
    HAMMING(0.54, 0.46),
    /** Blackman-Harris 3-term, -67 dB design: w[n] = 0.42323 - 0.49755 cos(z) + 0.07922 cos(2z) (Harris 1978). */
    BLACKMAN_HARRIS_3(0.42323, 0.49755, 0.07922),
    /**
     * Blackman-Harris 4-term, -92 dB: w[n] = 0.35875 - 0.48829 cos(z) + 0.14128 cos(2z) - 0.01168 cos(3z)
     * (Harris 1978).
     */
    BLACKMAN_HARRIS_4(0.35875, 0.48829, 0.14128, 0.01168),
    /**
     * Flat-top HFT95: w[n] = 1 - 1.9383379 cos(z) + 1.3045202 cos(2z) - 0.4028270 cos(3z) + 0.0350665 cos(4z)
     * (Heinzel, Ruediger and Schilling 2002), kept with their normalisation a_0 = 1, so the peak is
     * about 4.68 and the coherent gain 1.
     */
    FLAT_TOP_HFT95(1.0, 1.9383379, 1.3045202, 0.4028270, 0.0350665);

    private final double[] coefficients;

    WindowType(double... coefficients) {
        this.coefficients = coefficients;
    }

    /** @return a copy of the cosine coefficients a_0, a_1, ... (applied with alternating signs) */
    public double[] coefficients() {
        return coefficients.clone();
    }

    /**
     * The window value at one sample.
     *
     * @param n sample index
     * @param m the period M (N periodic, N - 1 symmetric)
     * @return w[n]
     */
    double value(int n, int m) {
        double z = 2.0 * Math.PI * n / m;
        double sum = 0;
        double sign = 1;
        for (int k = 0; k < coefficients.length; k++) {
            sum += sign * coefficients[k] * Math.cos(k * z);
            sign = -sign;
        }
        return sum;
    }
}
