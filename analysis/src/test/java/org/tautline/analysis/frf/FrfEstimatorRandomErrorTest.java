package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.signal.CrossSpectra;
import org.tautline.analysis.signal.WelchSettings;

/** The Bendat & Piersol random-error formulas against a seeded Monte Carlo of the two-tap system. */
class FrfEstimatorRandomErrorTest {
    private static final int N = 64;
    private static final int TRIALS = 400;

    /** Ratios of empirical to predicted errors, averaged over lines: magnitude, phase, E|dH|^2, coherence. */
    private static double[] empiricalOverPredicted(WelchSettings settings, int segments, double noise, long seed)
            throws IOException {
        Random random = new Random(seed);
        int frames = N + (segments - 1) * settings.hopFrames();
        int lines = N / 2 - 1;
        Complex[][] h = new Complex[TRIALS][];
        double[][] g2 = new double[TRIALS][];
        double[][] reported = new double[TRIALS][];
        double averages = 0;
        double[] f = null;
        for (int t = 0; t < TRIALS; t++) {
            CrossSpectra s = FrfEstimatorTest.spectra(FrfEstimatorTest.record(frames, 0, noise, random), settings);
            Frf h1 = FrfEstimator.h1(s, 0, 1, FrfQuantity.RECEPTANCE);
            h[t] = new Complex[lines];
            for (int k = 0; k < lines; k++) {
                h[t][k] = h1.value(k);
            }
            g2[t] = h1.coherence().orElseThrow();
            reported[t] = h1.variance().orElseThrow();
            averages = s.effectiveAverageCount();
            f = h1.frequenciesHz();
        }
        double[] ratio = new double[4];
        for (int k = 0; k < lines; k++) {
            Complex truth = FrfEstimatorTest.trueH(f[k]);
            double gvv = truth.norm() * truth.norm();
            double trueG2 = gvv / (gvv + noise * noise);
            Complex mean = Complex.ZERO;
            double meanG2 = 0;
            double meanReported = 0;
            for (int t = 0; t < TRIALS; t++) {
                mean = mean.add(h[t][k]);
                meanG2 += g2[t][k];
                meanReported += reported[t][k];
            }
            mean = mean.divide(TRIALS);
            meanG2 /= TRIALS;
            meanReported /= TRIALS;
            double mag = 0;
            double phase = 0;
            double complex = 0;
            double coherence = 0;
            for (int t = 0; t < TRIALS; t++) {
                double dm = h[t][k].norm() / mean.norm() - 1;
                double dp = h[t][k].divide(mean).getArgument();
                mag += dm * dm;
                phase += dp * dp;
                complex += Math.pow(h[t][k].subtract(mean).norm(), 2);
                coherence += Math.pow(g2[t][k] - meanG2, 2);
            }
            double predictedMag = FrfRandomError.magnitudeRelativeStd(trueG2, averages);
            ratio[0] += Math.sqrt(mag / (TRIALS - 1)) / predictedMag;
            ratio[1] += Math.sqrt(phase / (TRIALS - 1)) / FrfRandomError.phaseStdRad(trueG2, averages);
            ratio[2] += (complex / (TRIALS - 1)) / meanReported;
            ratio[3] += Math.sqrt(coherence / (TRIALS - 1)) / (trueG2 * FrfRandomError.coherenceRelativeStd(trueG2, averages));
        }
        for (int i = 0; i < ratio.length; i++) {
            ratio[i] /= lines;
        }
        return ratio;
    }

    private static void assertWithin15Percent(double[] ratio, String what) {
        String source = " (Bendat & Piersol, Random Data, 4th ed. 2010, from memory; checks.md)";
        assertEquals(1.0, ratio[0], 0.15, what + ": std of |H1|/|H| vs sqrt(1-g2)/(|g| sqrt(2 n_d))" + source);
        assertEquals(1.0, ratio[1], 0.15, what + ": phase std vs sqrt(1-g2)/(|g| sqrt(2 n_d))" + source);
        assertEquals(1.0, ratio[2], 0.15, what + ": E|H1 - mean|^2 vs the reported variance |H|^2 (1-g2)/(g2 n_d)" + source);
        assertEquals(1.0, ratio[3], 0.15, what + ": std of the coherence vs sqrt(2)(1-g2)|g|/sqrt(n_d)" + source);
    }

    @Test
    void errorsMatchMonteCarloWithIndependentSegments() throws IOException {
        assertWithin15Percent(empiricalOverPredicted(WelchSettings.of(N).withOverlap(0), 40, 0.8, 9L), "40 segments, no overlap");
    }

    @Test
    void errorsMatchMonteCarloWithHalfOverlapUsingTheEquivalentCount() throws IOException {
        // with 50 % Hann overlap the equivalent count of Welch 1967 (from memory) stands in for n_d
        assertWithin15Percent(empiricalOverPredicted(WelchSettings.of(N), 79, 0.8, 10L), "79 segments, 50 % overlap");
    }
}
