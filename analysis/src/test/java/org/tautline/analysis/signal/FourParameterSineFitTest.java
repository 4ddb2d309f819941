package org.tautline.analysis.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class FourParameterSineFitTest {
    private static final double FS = 8000;

    private static double[] sine(int n, double f, double amplitude, double phase, double offset) {
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = amplitude * Math.cos(2 * Math.PI * f * i / FS + phase) + offset;
        }
        return y;
    }

    @Test
    void recoversTheFrequencyOfANoiseFreeSineFromAStartAFifthOfABinOff() {
        // IEEE Std 1057 four-parameter fit: exact for a noise-free sine once converged.
        int n = 4000;
        double f = 437.123456;
        double[] y = sine(n, f, 1.7, -0.4, 0.05);
        double bin = FS / n;
        FourParameterSineFit fit = FourParameterSineFit.fit(y, FS, f + 0.2 * bin);
        assertEquals(f, fit.phasor().frequencyHz(), 1e-9 * f, "IEEE 1057 four-parameter fit, noise-free");
        assertEquals(1.7, fit.phasor().amplitude(), 1e-9);
        assertEquals(-0.4, fit.phasor().phaseRad(), 1e-9);
        assertEquals(0.05, fit.phasor().offset(), 1e-9);
        assertTrue(fit.iterations() <= 10, "iterations " + fit.iterations());
    }

    @Test
    void frequencyScatterMeetsTheCramerRaoBound() {
        // Kay, Fundamentals of Statistical Signal Processing: Estimation Theory, 1993, eq. 3.41 (from memory):
        // var(f) >= 12 / ((2 pi)^2 eta N (N^2 - 1)) cycles^2/sample^2 with eta = A^2 / (2 s^2).
        int n = 500;
        double f = 611.0;
        double amplitude = 1.0;
        double s = 0.3;
        Random random = new Random(1241L);
        int trials = 400;
        double sum = 0;
        double sum2 = 0;
        double reported = 0;
        for (int t = 0; t < trials; t++) {
            double[] y = sine(n, f, amplitude, random.nextDouble() * 2 * Math.PI, 0);
            for (int i = 0; i < n; i++) {
                y[i] += s * random.nextGaussian();
            }
            FourParameterSineFit fit = FourParameterSineFit.fit(y, FS, f + 0.5);
            double e = fit.phasor().frequencyHz() - f;
            sum += e;
            sum2 += e * e;
            reported += fit.frequencyStdHz() * fit.frequencyStdHz();
        }
        double observedVar = sum2 / trials - (sum / trials) * (sum / trials);
        double eta = amplitude * amplitude / (2 * s * s);
        double crb = FS * FS * 12 / (Math.pow(2 * Math.PI, 2) * eta * n * ((double) n * n - 1));
        assertEquals(1.0, observedVar / crb, 0.15, "observed frequency variance / Cramer-Rao bound (Kay 1993)");
        assertEquals(1.0, reported / trials / observedVar, 0.15, "reported standard error matches the scatter");
    }

    @Test
    void saysSoWhenThereIsNoSineToFollow() {
        double[] flat = new double[1000];
        AnalysisException e = assertThrows(AnalysisException.class, () -> FourParameterSineFit.fit(flat, FS, 100));
        assertTrue(e.getMessage().startsWith("four-parameter sine fit "), e.getMessage());
    }

    @Test
    void multiChannelFitsEqualSingleChannelFits() {
        double[] a = sine(3000, 250, 1.0, 0.3, 0.1);
        double[] b = sine(3000, 250, 0.02, -2.0, 0.0);
        Random random = new Random(7L);
        for (int i = 0; i < a.length; i++) {
            a[i] += 0.01 * random.nextGaussian();
            b[i] += 0.01 * random.nextGaussian();
        }
        SinePhasor[] both = SineFit.fitChannels(new double[][] {a, b}, FS, 250, 3);
        SinePhasor onlyB = SineFit.fit(b, FS, 250, 3);
        assertEquals(onlyB.amplitude(), both[1].amplitude(), 1e-15);
        assertEquals(onlyB.phaseRad(), both[1].phaseRad(), 1e-12);
        assertEquals(onlyB.amplitudeStd(), both[1].amplitudeStd(), 1e-15);
        assertEquals(SineFit.fit(a, FS, 250, 3).residualRms(), both[0].residualRms(), 1e-15);
    }

    @Test
    void multiChannelFitsNeedChannelsOfOneLength() {
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> SineFit.fitChannels(new double[][] {new double[10], new double[9]}, FS, 100, 1));
        assertEquals("sine fit channels must be of one length: channel 0 has 10 samples, channel 1 has 9", e.getMessage());
    }

    @Test
    void wholeCycleSpansAreTheLongestThatFit() {
        assertEquals(8000, SineFit.wholeCycleSamples(8000, FS, 100)); // 100 whole cycles exactly
        assertEquals(7994, SineFit.wholeCycleSamples(8000, FS, 433.3)); // 433 cycles = 7994.46 samples
        assertEquals(10, SineFit.wholeCycleSamples(10, FS, 100)); // less than one cycle: all of it
    }
}
