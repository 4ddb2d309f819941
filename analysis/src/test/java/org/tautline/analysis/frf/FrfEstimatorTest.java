package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.signal.ArraySampleSource;
import org.tautline.analysis.signal.CrossSpectra;
import org.tautline.analysis.signal.WelchEstimator;
import org.tautline.analysis.signal.WelchSettings;

/** H1, H2 and coherence on a known two-tap system y[n] = f[n] + 0.5 f[n-1] with noise added where stated. */
class FrfEstimatorTest {
    private static final double FS = 1000;
    private static final int N = 256;

    /** The true FRF of the two-tap system at line k of N, with X[k] = sum x[n] exp(-j 2 pi k n / N). */
    static Complex trueH(double frequencyHz) {
        double w = 2 * Math.PI * frequencyHz / FS;
        return new Complex(1 + 0.5 * Math.cos(w), -0.5 * Math.sin(w));
    }

    /** Force as measured, response as measured: the true force is white with unit variance. */
    static double[][] record(int frames, double forceNoise, double responseNoise, Random random) {
        double[][] x = new double[2][frames];
        double previous = 0;
        for (int i = 0; i < frames; i++) {
            double f = random.nextGaussian();
            x[0][i] = f + forceNoise * random.nextGaussian();
            x[1][i] = f + 0.5 * previous + responseNoise * random.nextGaussian();
            previous = f;
        }
        return x;
    }

    static CrossSpectra spectra(double[][] x, WelchSettings settings) throws IOException {
        return new WelchEstimator(settings).estimate(ArraySampleSource.of("two-tap", FS, x), 0, 1);
    }

    @Test
    void coherenceIsExactlyOneWithOneAverage() throws IOException {
        // Bendat & Piersol, Random Data, 4th ed. 2010 (from memory) and checks.md: one average gives coherence 1
        double[][] x = record(N, 0.3, 0.7, new Random(1L));
        double[] g2 = FrfEstimator.coherence(spectra(x, WelchSettings.of(N)), 0, 1);
        assertEquals(N / 2, g2.length, "lines 1..N/2");
        for (int k = 0; k < g2.length; k++) {
            assertEquals(1.0, g2[k], 1e-12, "coherence at FRF line " + k + " with one average (Bendat & Piersol)");
        }
    }

    @Test
    void outputNoiseCoherenceApproachesSignalOverSignalPlusNoise() throws IOException {
        // Bendat & Piersol 2010 (from memory), Harris & Piersol ch. 21: output noise n gives coherence Gvv/(Gvv+Gnn);
        // the estimate scatters with the normalised error sqrt(2)(1-g2)/(|g| sqrt(n_d)) (Bendat & Piersol)
        double noise = 1.0;
        CrossSpectra s = spectra(record(N * 400, 0, noise, new Random(2L)), WelchSettings.of(N).withOverlap(0));
        double[] g2 = FrfEstimator.coherence(s, 0, 1);
        double[] f = s.frequenciesHz();
        double sumZ = 0;
        double sumZ2 = 0;
        int lines = g2.length - 1;
        for (int k = 1; k <= lines; k++) {
            double gvv = trueH(f[k]).norm() * trueH(f[k]).norm();
            double expected = gvv / (gvv + noise * noise);
            double sd = expected * FrfRandomError.coherenceRelativeStd(expected, s.averageCount());
            double z = (g2[k - 1] - expected) / sd;
            sumZ += z;
            sumZ2 += z * z;
        }
        double meanZ = sumZ / lines;
        double rmsZ = Math.sqrt(sumZ2 / lines);
        assertEquals(0.0, meanZ, 4 / Math.sqrt(lines / 1.5), "mean standardised coherence error over " + lines
                + " lines: coherence -> Gvv/(Gvv+Gnn) (Bendat & Piersol)");
        assertEquals(1.0, rmsZ, 0.15, "scatter of the coherence estimate vs sqrt(2)(1-g2)/(|g| sqrt(n_d)) (Bendat & Piersol)");
    }

    /** Mean over lines 1..N/2-1 of |H_est| / |H_true|. */
    private static double meanMagnitudeRatio(Frf h) {
        double sum = 0;
        int lines = h.size() - 1;
        for (int k = 0; k < lines; k++) {
            sum += h.magnitude(k) / trueH(h.frequencyHz(k)).norm();
        }
        return sum / lines;
    }

    @Test
    void forceNoiseBiasesH1LowAndLeavesH2Unbiased() throws IOException {
        // Bendat & Piersol 2010 (from memory): input noise m gives H1 = H Gff/(Gff+Gmm), H2 = H
        double forceNoise = 0.5;
        CrossSpectra s = spectra(record(N * 300, forceNoise, 0, new Random(3L)), WelchSettings.of(N));
        double h1 = meanMagnitudeRatio(FrfEstimator.h1(s, 0, 1, FrfQuantity.RECEPTANCE));
        double h2 = meanMagnitudeRatio(FrfEstimator.h2(s, 0, 1, FrfQuantity.RECEPTANCE));
        assertEquals(1 / (1 + forceNoise * forceNoise), h1, 0.01, "H1 biased low by Gff/(Gff+Gmm) (Bendat & Piersol)");
        assertEquals(1.0, h2, 0.01, "H2 unbiased with force noise only (Bendat & Piersol)");
    }

    @Test
    void responseNoiseLeavesH1UnbiasedAndBiasesH2High() throws IOException {
        // Bendat & Piersol 2010 (from memory), checks.md: output noise leaves H1 unbiased; H2 = H / coherence
        double noise = 0.6;
        CrossSpectra s = spectra(record(N * 300, 0, noise, new Random(4L)), WelchSettings.of(N));
        Frf h1 = FrfEstimator.h1(s, 0, 1, FrfQuantity.RECEPTANCE);
        Frf h2 = FrfEstimator.h2(s, 0, 1, FrfQuantity.RECEPTANCE);
        assertEquals(1.0, meanMagnitudeRatio(h1), 0.01, "H1 unbiased with response noise only (Bendat & Piersol)");
        double predicted = 0;
        int lines = h2.size() - 1;
        for (int k = 0; k < lines; k++) {
            double gvv = Math.pow(trueH(h2.frequencyHz(k)).norm(), 2);
            predicted += 1 + noise * noise / gvv;
        }
        predicted /= lines;
        assertTrue(predicted > 1.2, "the case is one where the bias shows: predicted mean ratio " + predicted);
        assertEquals(predicted, meanMagnitudeRatio(h2), 0.01 * predicted, "H2 biased high by 1 + Gnn/Gvv (Bendat & Piersol)");
    }

    @Test
    void dropsDcAndCarriesCoherenceAndVariance() throws IOException {
        CrossSpectra s = spectra(record(N * 10, 0, 0.3, new Random(5L)), WelchSettings.of(N));
        Frf h1 = FrfEstimator.h1(s, 0, 1, FrfQuantity.MOBILITY);
        assertEquals(N / 2, h1.size(), "lines k = 1..N/2");
        assertEquals(FS / N, h1.frequencyHz(0), 1e-12, "first line is fs/N");
        assertEquals(FS / 2, h1.frequencyHz(N / 2 - 1), 1e-12, "last line is fs/2");
        assertEquals(FrfQuantity.MOBILITY, h1.quantity());
        double[] g2 = h1.coherence().orElseThrow();
        double[] variance = h1.variance().orElseThrow();
        double n = s.effectiveAverageCount();
        for (int k = 0; k < h1.size(); k++) {
            double m2 = h1.magnitude(k) * h1.magnitude(k);
            assertEquals(m2 * (1 - g2[k]) / (g2[k] * n), variance[k], 1e-12 * m2, "variance at line " + k);
        }
    }

    @Test
    void rejectsTheSameChannelTwiceAndADeadResponse() throws IOException {
        CrossSpectra s = spectra(record(N * 4, 0, 0.3, new Random(6L)), WelchSettings.of(N));
        AnalysisException same = assertThrows(AnalysisException.class, () -> FrfEstimator.h1(s, 1, 1, FrfQuantity.RECEPTANCE));
        assertEquals("force and response must be different channels, both are position 1 of [ch0, ch1]", same.getMessage());
        AnalysisException outside = assertThrows(AnalysisException.class, () -> FrfEstimator.h2(s, 0, 2, FrfQuantity.RECEPTANCE));
        assertEquals("channel position 2 is not in the estimate: expected 0..1 for the channels [ch0, ch1]", outside.getMessage());
        double[][] dead = record(N * 4, 0, 0, new Random(7L));
        dead[1] = new double[dead[0].length];
        CrossSpectra silent = spectra(dead, WelchSettings.of(N));
        AnalysisException e = assertThrows(AnalysisException.class, () -> FrfEstimator.h2(silent, 0, 1, FrfQuantity.RECEPTANCE));
        assertEquals("H2 is undefined at line 1 (" + FS / N + " Hz) of channels [ch0, ch1]: the cross spectrum is zero;"
                + " expected signal on both channels at every line up to fs/2", e.getMessage());
    }
}
