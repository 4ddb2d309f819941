package org.tautline.analysis.signal;

import java.util.List;

/**
 * Sums |X_a|^2 and conj(X_a) X_b over Welch segments from packed real-FFT output, then scales the averages.
 *
 * <p>Mutable working state of one estimate; allocates only when created.
 */
final class WelchAccumulator {
    private final int n;
    private final int lines;
    private final int channels;
    private final double[][] auto;
    private final double[][] crossRe;
    private final double[][] crossIm;
    private int segments;

    WelchAccumulator(int segmentLength, int channels) {
        this.n = segmentLength;
        this.lines = WelchSpectrumLines.count(segmentLength);
        this.channels = channels;
        int pairs = channels * (channels - 1) / 2;
        this.auto = new double[channels][lines];
        this.crossRe = new double[pairs][lines];
        this.crossIm = new double[pairs][lines];
    }

    /** @return segments added so far */
    int segments() {
        return segments;
    }

    /** Adds one segment: spectra[c] holds the packed transform of channel c. */
    void add(double[][] spectra) {
        // interior lines 1..last-1 sit at a[2k], a[2k+1]; the last line is Nyquist (even n) or (n-1)/2 (odd n)
        int last = lines - 1;
        boolean even = (n & 1) == 0;
        for (int a = 0; a < channels; a++) {
            double[] x = spectra[a];
            double[] g = auto[a];
            g[0] += x[0] * x[0];
            for (int k = 1; k < last; k++) {
                double re = x[2 * k];
                double im = x[2 * k + 1];
                g[k] += re * re + im * im;
            }
            if (last > 0) {
                double re = even ? x[1] : x[n - 1];
                double im = even ? 0 : x[1];
                g[last] += re * re + im * im;
            }
        }
        int p = 0;
        for (int a = 0; a < channels; a++) {
            double[] x = spectra[a];
            for (int b = a + 1; b < channels; b++, p++) {
                double[] y = spectra[b];
                double[] gr = crossRe[p];
                double[] gi = crossIm[p];
                gr[0] += x[0] * y[0];
                for (int k = 1; k < last; k++) {
                    double xr = x[2 * k];
                    double xi = x[2 * k + 1];
                    double yr = y[2 * k];
                    double yi = y[2 * k + 1];
                    gr[k] += xr * yr + xi * yi;
                    gi[k] += xr * yi - xi * yr;
                }
                if (last > 0) {
                    double xr = even ? x[1] : x[n - 1];
                    double xi = even ? 0 : x[1];
                    double yr = even ? y[1] : y[n - 1];
                    double yi = even ? 0 : y[1];
                    gr[last] += xr * yr + xi * yi;
                    gi[last] += xr * yi - xi * yr;
                }
            }
        }
        segments++;
    }

    /** Scales the sums into averaged one-sided spectra and hands them over; the accumulator is spent after this. */
    CrossSpectra finish(WelchSettings settings, Window window, double sampleRateHz, List<String> names, long framesUsed) {
        double interior = settings.scaling().oneSidedFactor(sampleRateHz, window) / segments;
        double[] factor = new double[lines];
        java.util.Arrays.fill(factor, interior);
        factor[0] = 0.5 * interior;
        if ((n & 1) == 0) {
            factor[lines - 1] = 0.5 * interior;
        }
        for (double[][] group : new double[][][] {auto, crossRe, crossIm}) {
            for (double[] g : group) {
                for (int k = 0; k < lines; k++) {
                    g[k] *= factor[k];
                }
            }
        }
        return new CrossSpectra(settings, sampleRateHz, names, segments, framesUsed, auto, crossRe, crossIm);
    }
}
