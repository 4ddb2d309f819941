package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

class CircleFitTest {
    private static final double FN = 100;
    private static final double ZETA = 0.02;

    /** Lines uniform in ln f with ratio q, f_n on line `centre` (offset 0) or midway (offset 0.5). */
    private static double[] logLines(double q, int count, double offset) {
        double[] f = new double[count];
        int centre = count / 2;
        for (int i = 0; i < count; i++) {
            f[i] = FN * Math.pow(q, i - centre + offset);
        }
        return f;
    }

    private static Frf withOffset(Frf receptance, Complex mobilityOffset) {
        Frf y = receptance.toQuantity(FrfQuantity.MOBILITY);
        double[] re = y.realParts();
        double[] im = y.imaginaryParts();
        for (int i = 0; i < re.length; i++) {
            re[i] += mobilityOffset.getReal();
            im[i] += mobilityOffset.getImaginary();
        }
        return Frf.of(y.frequenciesHz(), re, im, FrfQuantity.MOBILITY);
    }

    @Test
    void exactCircleOfAViscousModeOnLogUniformLines() {
        // Analytic reference (Kennedy & Pancu 1947; Ewins 2000, sec. 4.3, from memory): the viscous mobility
        // j w A/D is a circle of diameter |A|/(2 zeta w_n) whose resonance radius points along arg A; with a
        // constant offset the centre moves by that offset. f_r and zeta are exact on lines uniform in ln f with
        // f_n on a line or midway (the angular rate is even in ln(f/f_n)).
        Complex a = LsfdTestData.ComplexPolar.of(5.0, 0.3);
        Complex offset = new Complex(2e-4, -1e-4);
        double wn = 2 * Math.PI * FN;
        for (double shift : new double[] {0, 0.5}) {
            double q = 1.004;
            double[] f = logLines(q, 41, shift);
            Frf h = withOffset(ModalSynthesis.receptance(List.of(new Mode(FN, ZETA, a)), f), offset);
            CircleFit fit = CircleFit.of(h, 0, 1e9);
            double diameter = a.norm() / (2 * ZETA * wn);
            Complex centre = offset.add(a.divide(a.norm()).multiply(diameter / 2));
            String label = shift == 0 ? "f_n on a line" : "f_n midway between lines";
            assertTrue(LsfdTestData.relative(fit.centre(), centre) < 1e-9, "centre = offset + A/(4 zeta w_n), " + label);
            assertEquals(diameter / 2, fit.radius(), 1e-9 * diameter, "radius = |A|/(4 zeta w_n), " + label);
            assertEquals(FN, fit.naturalFrequencyHz(), 1e-6 * FN, "f_r, " + label);
            assertEquals(ZETA, fit.dampingRatio(), 1e-6 * ZETA, "zeta from the viscous pair formula, " + label);
            assertTrue(LsfdTestData.relative(fit.modalConstant(), a) < 1e-6, "A = 4 zeta w_r r e^{j phi}, " + label);
            assertEquals(41, fit.linesUsed(), "lines");
            assertTrue(fit.pairsUsed() >= 3, "pairs within 90 degrees of resonance, got " + fit.pairsUsed());
        }
    }

    @Test
    void ewinsLossFactorOfOneSymmetricPair() {
        // With only the nearest symmetric pair w_n/q and w_n q, Ewins' eta formula on the viscous circle gives
        // eta = zeta (q + 1/q) exactly (derived from tan(t/2) = |w_n^2 - w^2|/(2 zeta w_n w)): eta/2 ~ zeta
        // for light damping and close points.
        double q = 1.015;
        double[] f = logLines(q, 7, 0);
        Frf h = ModalSynthesis.receptance(List.of(new Mode(FN, ZETA, Complex.ONE)), f);
        CircleFit fit = CircleFit.of(h, 0, 1e9);
        assertEquals(1, fit.pairsUsed(), "only the nearest pair lies within 90 degrees at q = 1.015, zeta 0.02");
        assertEquals(ZETA * (q + 1 / q), fit.lossFactor(), 1e-9 * ZETA, "eta = zeta (q + 1/q)");
        assertEquals(ZETA, fit.dampingRatio(), 1e-9 * ZETA, "viscous pair formula is exact");
    }

    @Test
    void uniformLinesOffResonanceGiveCloseButNotExactValues() {
        // Same analytic circle; here f_n falls between uniform lines, so f_r is an interpolation.
        double[] f = LsfdTestData.lines(95.0137, 105.0137, 101);
        Frf h = ModalSynthesis.receptance(List.of(new Mode(FN, ZETA, new Complex(5.0))), f);
        CircleFit fit = CircleFit.of(h, 97, 103);
        assertEquals(FN, fit.naturalFrequencyHz(), 1e-3 * 0.1, "f_r within 1/1000 of the 0.1 Hz line spacing");
        assertEquals(ZETA, fit.dampingRatio(), 1e-2 * ZETA, "zeta within 1 %");
        assertEquals(5.0, fit.modalConstant().norm(), 0.02 * 5.0, "|A| within 2 %");
    }

    @Test
    void rejectsBandsThatCannotHoldACircle() {
        double[] f = LsfdTestData.lines(95, 105, 101);
        Frf h = ModalSynthesis.receptance(List.of(new Mode(FN, ZETA, new Complex(5.0))), f);
        assertEquals("a circle fit needs at least 5 lines around the peak, got 3 in 99.95..100.25 Hz",
                assertThrows(AnalysisException.class, () -> CircleFit.of(h, 99.95, 100.25)).getMessage());
        assertEquals("the maximum angular spacing lies at the edge of the band 100.5..104.0 Hz; centre the band on the peak",
                assertThrows(AnalysisException.class, () -> CircleFit.of(h, 100.45, 104)).getMessage());
        Frf line = Frf.of(new double[] {1, 2, 3, 4, 5}, new double[] {1, 2, 3, 4, 5}, new double[] {1, 2, 3, 4, 5},
                FrfQuantity.MOBILITY);
        assertEquals("a circle fit needs points that span a circle, but the 5 points lie on a line",
                assertThrows(AnalysisException.class, () -> CircleFit.of(line, 0, 10)).getMessage());
    }
}
