package org.tautline.analysis.signal;

/**
 * Reads lines out of the packed half-spectrum that JTransforms' {@code DoubleFFT_1D.realForward} leaves in place.
 *
 * <p>Layout (JTransforms 3.1 Javadoc): a[2k] = Re X[k] for 0 <= k < (n+1)/2 and a[2k+1] = Im X[k]
 * for 0 < k < (n-1)/2 with, for even n, a[1] = Re X[n/2] and, for odd n, a[1] = Im X[(n-1)/2].
 * X[k] = sum_n x[n] exp(-j 2 pi k n / N).
 */
final class WelchSpectrumLines {
    private WelchSpectrumLines() {
    }

    /** @return the number of one-sided lines k = 0..N/2 for a transform of length n */
    static int count(int n) {
        return n / 2 + 1;
    }

    static double re(double[] a, int n, int k) {
        if (k == 0) {
            return a[0];
        }
        if ((n & 1) == 0 && 2 * k == n) {
            return a[1];
        }
        return a[2 * k];
    }

    static double im(double[] a, int n, int k) {
        if (k == 0 || 2 * k == n) {
            return 0;
        }
        if ((n & 1) == 1 && 2 * k == n - 1) {
            return a[1];
        }
        return a[2 * k + 1];
    }

    static double magnitude(double[] a, int n, int k) {
        return Math.hypot(re(a, n, k), im(a, n, k));
    }
}
