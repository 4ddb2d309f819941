package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class CramerRaoBoundTest {

    @Test
    void isolatedModeBoundMatchesTheHalfPowerApproximation() {
        // checks.md [derived; Monte Carlo agreed within 5 %], after Pintelon & Schoukens 2012 (from memory):
        // std(zeta)/zeta ~ 2/sqrt(pi N_hp SNR), std(f)/f ~ zeta 2/sqrt(pi N_hp SNR),
        // N_hp = lines in the half-power band, SNR = |H_peak|^2/s_n^2.
        double[][] cases = {{0.01, 16, 1e4}, {0.005, 40, 1e3}, {0.002, 10, 1e5}};
        for (double[] c : cases) {
            double zeta = c[0];
            double fn = 100;
            double spacingHz = 2 * zeta * fn / c[1];
            int count = (int) Math.round(40 * zeta * fn / spacingHz) + 1;
            double[] f = LsfdTestData.lines(fn * (1 - 20 * zeta), fn * (1 + 20 * zeta), count);
            Mode mode = new Mode(fn, zeta, new Complex(3.0, -1.0));
            double peak = mode.receptanceAt(fn).norm();
            double s2 = peak * peak / c[2];
            double[] variance = new double[count];
            Arrays.fill(variance, s2);
            FittedMode bound = CramerRaoBound.of(List.of(mode), f, variance, false).get(0);
            int nHp = 0;
            for (double x : f) {
                if (x >= fn * (1 - zeta) && x <= fn * (1 + zeta)) {
                    nHp++;
                }
            }
            double approx = 2 / Math.sqrt(Math.PI * nHp * c[2]);
            String label = "zeta " + zeta + ", N_hp " + nHp + ", SNR " + c[2];
            System.out.printf("bound/approximation, %s: zeta %.4f, f %.4f%n", label,
                    bound.dampingRatioStd() / zeta / approx, bound.frequencyStdHz() / fn / (zeta * approx));
            assertEquals(1.0, bound.dampingRatioStd() / zeta / approx, 0.10, "std(zeta)/zeta against checks.md, " + label);
            assertEquals(1.0, bound.frequencyStdHz() / fn / (zeta * approx), 0.10, "std(f)/f against checks.md, " + label);
        }
    }

    @Test
    void boundScalesWithTheNoiseStandardDeviation() {
        // Kay 1993 (from memory): the bound is the inverse Fisher information, which scales as 1/s_n^2 for a linearised model.
        Mode mode = new Mode(80, 0.01, new Complex(2.0));
        double[] f = LsfdTestData.lines(70, 90, 201);
        double[] low = new double[f.length];
        double[] high = new double[f.length];
        Arrays.fill(low, 1e-12);
        Arrays.fill(high, 4e-12);
        FittedMode a = CramerRaoBound.of(List.of(mode), f, low, true).get(0);
        FittedMode b = CramerRaoBound.of(List.of(mode), f, high, true).get(0);
        assertEquals(2.0, b.frequencyStdHz() / a.frequencyStdHz(), 1e-9, "four times the variance doubles the std of f");
        assertEquals(2.0, b.dampingRatioStd() / a.dampingRatioStd(), 1e-9, "and of zeta");
        assertEquals(0.0, a.modalConstantStd().getImaginary(), 0.0, "a real mode has no imaginary part to bound");
    }

    @Test
    void rejectsBadInputs() {
        Mode mode = new Mode(80, 0.01, new Complex(2.0));
        assertEquals("the Cramer-Rao bound needs one noise variance per frequency line, got 2 lines and 1 variances",
                assertThrows(AnalysisException.class,
                        () -> CramerRaoBound.of(List.of(mode), new double[] {1, 2}, new double[] {1}, false)).getMessage());
        assertEquals("the Cramer-Rao bound needs a positive finite noise variance at every line; line 1 (2.0 Hz) has 0.0",
                assertThrows(AnalysisException.class,
                        () -> CramerRaoBound.of(List.of(mode), new double[] {1, 2}, new double[] {1, 0}, false)).getMessage());
        assertEquals("the Cramer-Rao bound has 4 real unknowns but only 1 lines (2 real values) in the band",
                assertThrows(AnalysisException.class,
                        () -> CramerRaoBound.of(List.of(mode), new double[] {80}, new double[] {1}, false)).getMessage());
        assertEquals("the Cramer-Rao bound needs positive damping; mode at 80.0 Hz has 0.0",
                assertThrows(AnalysisException.class, () -> CramerRaoBound.of(List.of(new Mode(80, 0, Complex.ONE)),
                        new double[] {79, 80, 81}, new double[] {1, 1, 1}, false)).getMessage());
        assertTrue(CramerRaoBound.of(List.of(mode), new double[] {79, 80, 81}, new double[] {1, 1, 1}, true).get(0)
                .frequencyStdHz() > 0, "three lines bound three unknowns");
    }
}
