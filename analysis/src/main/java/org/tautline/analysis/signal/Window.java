package org.tautline.analysis.signal;

import org.jtransforms.fft.DoubleFFT_1D;
import org.tautline.analysis.AnalysisException;

/**
 * An immutable data window of a given type and length, with its figures of merit computed from the samples.
 *
 * <p>Definitions follow F. J. Harris, Proc. IEEE 66(1):51-83, 1978 and G. Heinzel, A. Ruediger and
 * R. Schilling, "Spectrum and spectral density estimation by the Discrete Fourier transform (DFT)",
 * 2002: with S1 = sum w and S2 = sum w^2, the coherent gain is S1/N and the equivalent noise
 * bandwidth N S2/S1^2 bins. The DTFT used for scalloping and sidelobes is
 * W(b) = sum_n w[n] exp(-j 2 pi b n / N), b in bins.
 */
public final class Window {
    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    private final WindowType type;
    private final boolean periodic;
    private final double[] values;

    private Window(WindowType type, boolean periodic, double[] values) {
        this.type = type;
        this.periodic = periodic;
        this.values = values;
    }

    /**
     * Builds a window.
     *
     * @param type the window family
     * @param length number of samples N, 2 or more
     * @param periodic true for the periodic (DFT-even) form, period M = N, used for spectral
     *                 analysis; false for the symmetric form, M = N - 1, w[n] = w[N-1-n]
     * @return the window
     * @throws AnalysisException if the type is missing or the length is below 2
     */
    public static Window of(WindowType type, int length, boolean periodic) {
        if (type == null) {
            throw new AnalysisException("window type is missing: expected one of "
                    + java.util.Arrays.toString(WindowType.values()));
        }
        if (length < 2) {
            throw new AnalysisException("window length must be at least 2 samples, got " + length);
        }
        int m = periodic ? length : length - 1;
        double[] w = new double[length];
        for (int n = 0; n < length; n++) {
            w[n] = type.value(n, m);
        }
        return new Window(type, periodic, w);
    }

    /** @return the window family */
    public WindowType type() {
        return type;
    }

    /** @return true for the periodic (DFT-even) form, false for the symmetric form */
    public boolean periodic() {
        return periodic;
    }

    /** @return the number of samples N */
    public int length() {
        return values.length;
    }

    /** @return a copy of the samples w[0..N) */
    public double[] values() {
        return values.clone();
    }

    /** The samples themselves, for the estimator in this package; never handed out. */
    double[] samples() {
        return values;
    }

    /** @return S1 = sum w */
    public double sum() {
        double s = 0;
        for (double v : values) {
            s += v;
        }
        return s;
    }

    /** @return S2 = sum w^2 */
    public double sumOfSquares() {
        double s = 0;
        for (double v : values) {
            s += v * v;
        }
        return s;
    }

    /** @return the coherent gain S1 / N (Harris 1978) */
    public double coherentGain() {
        return sum() / values.length;
    }

    /** @return the equivalent noise bandwidth N S2 / S1^2, in bins (Harris 1978) */
    public double enbwBins() {
        double s1 = sum();
        return values.length * sumOfSquares() / (s1 * s1);
    }

    /**
     * The magnitude of the window's DTFT at an offset in bins.
     *
     * @param bins offset from zero frequency, in bins of fs/N
     * @return |W(bins)|
     */
    public double dtftMagnitude(double bins) {
        double step = 2.0 * Math.PI * bins / values.length;
        double re = 0;
        double im = 0;
        for (int n = 0; n < values.length; n++) {
            double a = step * n;
            re += values[n] * Math.cos(a);
            im -= values[n] * Math.sin(a);
        }
        return Math.hypot(re, im);
    }

    /** @return the scalloping loss, dB (positive): -20 log10(|W(0.5 bin)| / |W(0)|) (Harris 1978) */
    public double scallopLossDb() {
        return -20.0 * Math.log10(dtftMagnitude(0.5) / dtftMagnitude(0));
    }

    /**
     * The level of the highest sidelobe relative to the main-lobe peak, found by searching the DTFT.
     *
     * <p>The DTFT is sampled every 1/16 bin by a zero-padded FFT (every 1/4 to 1/16 bin above N = 2^18, so the
     * padded transform has at most max(2^22, 4 N) points), the main lobe is taken to end at the first local minimum of |W| below half the peak, and the
     * three largest local maxima beyond it are refined by golden-section search on the exact DTFT.
     * The search covers 0 to fs/2.
     *
     * @return the highest sidelobe, dB (negative), or negative infinity when |W| has no sidelobe
     */
    public double highestSidelobeDb() {
        int n = values.length;
        int pad = Math.max(4, Math.min(16, (1 << 22) / n));
        int total = n * pad;
        double[] a = new double[total];
        System.arraycopy(values, 0, a, 0, n);
        new DoubleFFT_1D(total).realForward(a);
        int lines = total / 2 + 1;
        double[] mag = new double[lines];
        mag[0] = Math.abs(a[0]);
        for (int k = 1; k < lines; k++) {
            mag[k] = WelchSpectrumLines.magnitude(a, total, k);
        }
        double peak = mag[0];
        int start = -1;
        for (int k = 1; k < lines - 1; k++) {
            if (mag[k] < 0.5 * peak && mag[k] <= mag[k - 1] && mag[k] <= mag[k + 1]) {
                start = k;
                break;
            }
        }
        if (start < 0) {
            return Double.NEGATIVE_INFINITY;
        }
        int[] best = {-1, -1, -1};
        for (int k = start + 1; k < lines; k++) {
            boolean isMax = mag[k] >= mag[k - 1] && (k == lines - 1 || mag[k] >= mag[k + 1]);
            if (isMax) {
                insertCandidate(best, mag, k);
            }
        }
        double highest = 0;
        for (int k : best) {
            if (k >= 0) {
                double lo = (k - 1.0) / pad;
                double hi = Math.min(k + 1.0, lines - 1.0) / pad;
                highest = Math.max(highest, Math.max(mag[k], refineMaximum(lo, hi)));
            }
        }
        if (highest == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        return 20.0 * Math.log10(highest / dtftMagnitude(0));
    }

    private static void insertCandidate(int[] best, double[] mag, int k) {
        for (int i = 0; i < best.length; i++) {
            if (best[i] < 0 || mag[k] > mag[best[i]]) {
                System.arraycopy(best, i, best, i + 1, best.length - i - 1);
                best[i] = k;
                return;
            }
        }
    }

    private double refineMaximum(double lo, double hi) {
        double x1 = hi - GOLDEN * (hi - lo);
        double x2 = lo + GOLDEN * (hi - lo);
        double f1 = dtftMagnitude(x1);
        double f2 = dtftMagnitude(x2);
        for (int i = 0; i < 60 && hi - lo > 1e-9; i++) {
            if (f1 < f2) {
                lo = x1;
                x1 = x2;
                f1 = f2;
                x2 = lo + GOLDEN * (hi - lo);
                f2 = dtftMagnitude(x2);
            } else {
                hi = x2;
                x2 = x1;
                f2 = f1;
                x1 = hi - GOLDEN * (hi - lo);
                f1 = dtftMagnitude(x1);
            }
        }
        return Math.max(f1, f2);
    }

    @Override
    public String toString() {
        return "Window[" + type + ", N=" + values.length + (periodic ? ", periodic]" : ", symmetric]");
    }
}
