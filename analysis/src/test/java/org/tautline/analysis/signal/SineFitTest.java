package org.tautline.analysis.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class SineFitTest {
    private static final double FS = 10_000;
    private static final double F = 123.4;

    @Test
    void threeParameterFitReachesTheCramerRaoBound() {
        // Kay, Fundamentals of Statistical Signal Processing: Estimation Theory, 1993 (from memory):
        // known frequency, white Gaussian noise of variance s^2: var(A) >= 2 s^2/N, var(phase) >= 2 s^2/(N A^2).
        int n = 1000;
        double amplitude = 0.8;
        double phase = 0.6;
        double s = 0.2;
        int trials = 500;
        Random random = new Random(1057L);
        double sumA = 0;
        double sumA2 = 0;
        double sumP = 0;
        double sumP2 = 0;
        double sumReportedA = 0;
        double sumReportedP = 0;
        double[] y = new double[n];
        for (int t = 0; t < trials; t++) {
            for (int i = 0; i < n; i++) {
                y[i] = amplitude * Math.cos(2 * Math.PI * F * i / FS + phase) + 0.1 + s * random.nextGaussian();
            }
            SinePhasor fit = SineFit.threeParameter(y, FS, F);
            double ea = fit.amplitude() - amplitude;
            double ep = fit.phaseRad() - phase;
            sumA += ea;
            sumA2 += ea * ea;
            sumP += ep;
            sumP2 += ep * ep;
            sumReportedA += fit.amplitudeStd();
            sumReportedP += fit.phaseStdRad();
        }
        double stdA = Math.sqrt((sumA2 - sumA * sumA / trials) / (trials - 1));
        double stdP = Math.sqrt((sumP2 - sumP * sumP / trials) / (trials - 1));
        double crbA = Math.sqrt(2 * s * s / n);
        double crbP = Math.sqrt(2 * s * s / (n * amplitude * amplitude));
        assertEquals(crbA, stdA, 0.1 * crbA, "amplitude std within 10 % of the Cramer-Rao bound (Kay 1993, from memory)");
        assertEquals(crbP, stdP, 0.1 * crbP, "phase std within 10 % of the Cramer-Rao bound (Kay 1993, from memory)");
        assertEquals(stdA, sumReportedA / trials, 0.1 * stdA, "reported amplitude standard error matches the scatter");
        assertEquals(stdP, sumReportedP / trials, 0.1 * stdP, "reported phase standard error matches the scatter");
    }

    @Test
    void recoversANoiseFreeSignalWithHarmonicsExactly() {
        // IEEE Std 1057 model y = A cos wt + B sin wt + C, extended by harmonic columns: exact on noise-free data.
        int n = 2048;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double wt = 2 * Math.PI * F * i / FS;
            y[i] = 0.7 * Math.cos(wt + 0.3) + 0.05 + 0.02 * Math.cos(2 * wt + 1.0) + 0.01 * Math.cos(3 * wt - 0.5);
        }
        SinePhasor fit = SineFit.fit(y, FS, F, 3);
        assertEquals(0.7, fit.amplitude(), 1e-12, "amplitude");
        assertEquals(0.3, fit.phaseRad(), 1e-12, "phase, atan2(-B, A) convention of IEEE Std 1057");
        assertEquals(0.05, fit.offset(), 1e-12, "offset");
        assertEquals(0.02, fit.harmonicAmplitudes()[0], 1e-12, "second harmonic");
        assertEquals(0.01, fit.harmonicAmplitudes()[1], 1e-12, "third harmonic");
        assertEquals(Math.hypot(0.02, 0.01) / 0.7, fit.totalHarmonicDistortion(), 1e-12, "THD definition");
        assertEquals(0, fit.residualRms(), 1e-12, "nothing left over");
    }

    @Test
    void rejectsBadInput() {
        double[] y = new double[100];
        assertEquals("sample rate must be positive and finite, got 0.0 Hz",
                assertThrows(AnalysisException.class, () -> SineFit.threeParameter(y, 0, 10)).getMessage());
        assertEquals("sine-fit frequency must lie between 0 and half the sample rate (500.0 Hz), got 500.0 Hz",
                assertThrows(AnalysisException.class, () -> SineFit.threeParameter(y, 1000, 500)).getMessage());
        assertEquals("harmonic order must be 1 or more, got 0",
                assertThrows(AnalysisException.class, () -> SineFit.fit(y, 1000, 10, 0)).getMessage());
        assertEquals("sine fit needs at least 4 samples, got 3",
                assertThrows(AnalysisException.class, () -> SineFit.threeParameter(new double[3], 1000, 10)).getMessage());
        double[] bad = new double[100];
        bad[17] = Double.NaN;
        assertEquals("sample 17 is not finite: NaN",
                assertThrows(AnalysisException.class, () -> SineFit.threeParameter(bad, 1000, 10)).getMessage());
    }
}
