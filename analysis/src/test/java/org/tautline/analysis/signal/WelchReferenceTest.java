package org.tautline.analysis.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Welch spectra against a direct computation written out here from the definitions: segments, detrending and windows
 * (Welch, IEEE Trans. AU-15:70, 1967, from memory), a plain O(N^2) DFT, and the one-sided scaling of Heinzel,
 * Ruediger and Schilling 2002.
 */
class WelchReferenceTest {
    private static final double FS = 2000;

    /** The three channels: noise, a filtered copy with a ramp, and a sine with an offset. */
    private static double[][] signals(int frames, long seed) {
        Random random = new Random(seed);
        double[][] x = new double[3][frames];
        double previous = 0;
        for (int i = 0; i < frames; i++) {
            double e = random.nextGaussian();
            x[0][i] = e;
            x[1][i] = 0.7 * e - 0.4 * previous + 0.3 * random.nextGaussian() + 1e-3 * i + 2.0;
            x[2][i] = Math.sin(2 * Math.PI * 97.3 * i / FS) + 0.5 + 0.1 * random.nextGaussian();
            previous = e;
        }
        return x;
    }

    /** A plain O(N^2) DFT, X[k] = sum x[n] exp(-j 2 pi k n / N), k = 0..N/2, from the definition. */
    private static Complex[] directDft(double[] x) {
        int n = x.length;
        double[] cos = new double[n];
        double[] sin = new double[n];
        for (int i = 0; i < n; i++) {
            cos[i] = Math.cos(2 * Math.PI * i / n);
            sin[i] = Math.sin(2 * Math.PI * i / n);
        }
        Complex[] out = new Complex[n / 2 + 1];
        for (int k = 0; k <= n / 2; k++) {
            double re = 0;
            double im = 0;
            for (int i = 0; i < n; i++) {
                // the angle 2 pi k i / N, reduced mod N so it stays exact
                int m = (int) ((long) k * i % n);
                re += x[i] * cos[m];
                im -= x[i] * sin[m];
            }
            out[k] = new Complex(re, im);
        }
        return out;
    }

    /** Reference Welch cross spectrum G_ab = c conj(X_a) X_b averaged, written from the definitions. */
    private static Complex[] reference(double[] a, double[] b, WelchSettings s) {
        int n = s.segmentLength();
        double[] w = new double[n];
        int period = s.periodic() ? n : n - 1;
        double[] coefficients = s.window().coefficients();
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < coefficients.length; k++) {
                w[i] += (k % 2 == 0 ? 1 : -1) * coefficients[k] * Math.cos(2 * Math.PI * k * i / period);
            }
        }
        double s1 = 0;
        double s2 = 0;
        for (double v : w) {
            s1 += v;
            s2 += v * v;
        }
        int hop = n - (int) Math.round(s.overlap() * n);
        Complex[] sum = new Complex[n / 2 + 1];
        java.util.Arrays.fill(sum, Complex.ZERO);
        int segments = 0;
        for (int start = 0; start + n <= a.length; start += hop, segments++) {
            Complex[] xa = directDft(window(detrend(a, start, n, s.detrend()), w));
            Complex[] xb = directDft(window(detrend(b, start, n, s.detrend()), w));
            for (int k = 0; k < sum.length; k++) {
                sum[k] = sum[k].add(xa[k].conjugate().multiply(xb[k]));
            }
        }
        double c = s.scaling() == SpectrumScaling.DENSITY ? 2 / (FS * s2) : 2 / (s1 * s1);
        for (int k = 0; k < sum.length; k++) {
            boolean edge = k == 0 || 2 * k == n;
            sum[k] = sum[k].multiply((edge ? c / 2 : c) / segments);
        }
        return sum;
    }

    /** Least-squares line by the normal equations in t = 0..n-1 (or the mean), removed. */
    private static double[] detrend(double[] x, int start, int n, Detrend d) {
        double[] y = new double[n];
        double st = 0;
        double sy = 0;
        double stt = 0;
        double sty = 0;
        for (int i = 0; i < n; i++) {
            double v = x[start + i];
            st += i;
            sy += v;
            stt += (double) i * i;
            sty += i * v;
        }
        double slope = d == Detrend.LINEAR ? (n * sty - st * sy) / (n * stt - st * st) : 0;
        double intercept = d == Detrend.NONE ? 0 : (sy - slope * st) / n;
        for (int i = 0; i < n; i++) {
            y[i] = x[start + i] - intercept - slope * i;
        }
        return y;
    }

    private static double[] window(double[] x, double[] w) {
        for (int i = 0; i < x.length; i++) {
            x[i] *= w[i];
        }
        return x;
    }

    private static void assertMatchesReference(WelchSettings s, int frames) throws IOException {
        double[][] x = signals(frames, 1967L + s.segmentLength());
        CrossSpectra est = new WelchEstimator(s).estimate(ArraySampleSource.of("reference", FS, x), 0, 1, 2);
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                Complex[] ref = reference(x[a], x[b], s);
                double[] re = est.crossReal(a, b);
                double[] im = est.crossImag(a, b);
                double err = 0;
                double norm = 0;
                for (int k = 0; k < ref.length; k++) {
                    err = Math.max(err, Math.hypot(re[k] - ref[k].getReal(), im[k] - ref[k].getImaginary()));
                    norm = Math.max(norm, ref[k].norm());
                }
                assertTrue(err <= 1e-10 * norm, "G_" + a + b + " for " + s + " differs from a direct DFT reference (Welch 1967)"
                        + " by " + err + " (largest value " + norm + ")");
            }
        }
        assertEquals(expectedSegments(frames, s), est.averageCount(), "segment count for " + s);
    }

    private static int expectedSegments(int frames, WelchSettings s) {
        int hop = s.segmentLength() - (int) Math.round(s.overlap() * s.segmentLength());
        return (frames - s.segmentLength()) / hop + 1;
    }

    @Test
    void evenNonPowerOfTwoSegmentsMatchADirectDft() throws IOException {
        // 1000 = 2^3 5^3: JTransforms' mixed-radix plan, even layout with a Nyquist line
        WelchSettings s = new WelchSettings(1000, 0.5, WindowType.HANN, true, Detrend.LINEAR, SpectrumScaling.DENSITY);
        assertMatchesReference(s, 6321);
    }

    @Test
    void oddSegmentsMatchADirectDft() throws IOException {
        // an odd length has no Nyquist line and a different packed layout; symmetric window, 30 % overlap
        WelchSettings s = new WelchSettings(999, 0.3, WindowType.BLACKMAN_HARRIS_4, false, Detrend.MEAN,
                SpectrumScaling.SPECTRUM);
        assertMatchesReference(s, 5000);
    }

    @Test
    void segmentsWithALargePrimeFactorMatchADirectDft() throws IOException {
        // 2 * 211: JTransforms switches to Bluestein's algorithm for a prime factor of 211 or more
        WelchSettings s = new WelchSettings(422, 0.75, WindowType.FLAT_TOP_HFT95, true, Detrend.LINEAR,
                SpectrumScaling.DENSITY);
        assertMatchesReference(s, 3000);
    }

    @Test
    void powerOfTwoSegmentsMatchADirectDft() throws IOException {
        WelchSettings s = new WelchSettings(1024, 0.5, WindowType.HAMMING, true, Detrend.LINEAR, SpectrumScaling.DENSITY);
        assertMatchesReference(s, 20000);
        WelchSettings none = new WelchSettings(256, 0.0, WindowType.RECTANGULAR, true, Detrend.NONE, SpectrumScaling.SPECTRUM);
        assertMatchesReference(none, 3000);
    }
}
