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

class FitQualityTest {
    private static final Mode MODE = new Mode(80, 0.01, new Complex(2.0));
    private static final double[] LINES = LsfdTestData.lines(60, 100, 401);

    private static Frf scaled(Complex factor) {
        Frf h = ModalSynthesis.receptance(List.of(MODE), LINES);
        double[] re = new double[LINES.length];
        double[] im = new double[LINES.length];
        for (int i = 0; i < LINES.length; i++) {
            Complex v = h.value(i).multiply(factor);
            re[i] = v.getReal();
            im[i] = v.getImaginary();
        }
        return Frf.of(LINES, re, im, FrfQuantity.RECEPTANCE);
    }

    @Test
    void handCheckedScalings() {
        // By hand: H = c H_m gives ||H - H_m||/||H|| = |c - 1|/|c| and correlation |c|^2/|c|^2 = 1.
        FitQuality twice = FitQuality.of(scaled(new Complex(2)), List.of(MODE), ResidualTerms.NONE, 3);
        assertEquals(0.5, twice.normalisedResidual(), 1e-12, "H = 2 H_m: residual 1/2");
        assertEquals(1.0, twice.correlation(), 1e-12, "proportional: correlation 1");
        FitQuality turned = FitQuality.of(scaled(new Complex(1, 1)), List.of(MODE), ResidualTerms.NONE, 3);
        assertEquals(1 / Math.sqrt(2), turned.normalisedResidual(), 1e-12, "H = (1 + j) H_m: residual |j|/|1 + j|");
        assertEquals(1.0, turned.correlation(), 1e-12, "a complex scale keeps correlation 1");
        FitQuality exact = FitQuality.of(scaled(Complex.ONE), List.of(MODE), ResidualTerms.NONE, 3);
        assertEquals(0.0, exact.normalisedResidual(), 1e-12, "the model itself");
        // Same model through the existing ModalSynthesis figure (receptance in, receptance compared).
        assertEquals(ModalSynthesis.normalisedResidual(scaled(new Complex(2)), List.of(MODE)), twice.normalisedResidual(),
                1e-12, "agrees with ModalSynthesis.normalisedResidual on a receptance");
    }

    @Test
    void bandsAroundEachModeAndAWrongSecondMode() {
        // Measured: two modes; model: only the first. In the second mode's band the model misses most of H.
        Mode second = new Mode(90, 0.01, new Complex(-1.5));
        Frf h = ModalSynthesis.receptance(List.of(MODE, second), LINES);
        Mode misplaced = new Mode(95, 0.01, second.modalConstant());
        FitQuality q = FitQuality.of(h, List.of(MODE, misplaced), ResidualTerms.NONE, 3);
        FitQuality.ModeBand first = q.bands().get(0);
        assertEquals(80 - 3 * 2 * 0.01 * 80, first.fromHz(), 1e-12, "band edge f_n - 3 (2 zeta f_n)");
        assertEquals(80 + 3 * 2 * 0.01 * 80, first.toHz(), 1e-12, "band edge f_n + 3 (2 zeta f_n)");
        assertEquals(97, first.lines(), "lines 75.2..84.8 Hz at 0.1 Hz");
        FitQuality.ModeBand wrong = q.bands().get(1);
        assertTrue(wrong.normalisedResidual() > 0.9, "the misplaced mode leaves its band unexplained, got "
                + wrong.normalisedResidual());
        assertTrue(first.normalisedResidual() < wrong.normalisedResidual(), "first band fits better");
        assertTrue(wrong.correlation() < 0.5 && wrong.correlation() < first.correlation(),
                "a mode 5 Hz off correlates poorly in its band, got " + wrong.correlation() + " against "
                + first.correlation());
        FitQuality outside = FitQuality.of(h, List.of(new Mode(500, 0.01, Complex.ONE)), ResidualTerms.NONE, 3);
        assertEquals(0, outside.bands().get(0).lines(), "no line near 500 Hz");
        assertTrue(Double.isNaN(outside.bands().get(0).normalisedResidual()), "no figure without lines");
    }

    @Test
    void correlationOfAlternatingSignsByHand() {
        // Measured lines are the model with every other line negated: by hand the correlation is
        // |sum (-1)^k |H_k|^2|^2 / (sum |H_k|^2)^2, and the residual sqrt(4 sum_odd |H_k|^2 / sum |H_k|^2).
        Frf model = ModalSynthesis.receptance(List.of(MODE), LINES);
        double[] re = model.realParts();
        double[] im = model.imaginaryParts();
        double signed = 0;
        double total = 0;
        double odd = 0;
        for (int k = 0; k < LINES.length; k++) {
            double p = re[k] * re[k] + im[k] * im[k];
            total += p;
            if (k % 2 == 1) {
                re[k] = -re[k];
                im[k] = -im[k];
                signed -= p;
                odd += p;
            } else {
                signed += p;
            }
        }
        Frf h = Frf.of(LINES, re, im, FrfQuantity.RECEPTANCE);
        FitQuality q = FitQuality.of(h, List.of(MODE), ResidualTerms.NONE, 3);
        assertEquals(signed * signed / (total * total), q.correlation(), 1e-12, "hand formula for the correlation");
        assertEquals(Math.sqrt(4 * odd / total), q.normalisedResidual(), 1e-12, "hand formula for the residual");
    }

    @Test
    void rejectsBadInputs() {
        Frf h = scaled(Complex.ONE);
        assertEquals("fit quality needs at least one mode, got none",
                assertThrows(AnalysisException.class, () -> FitQuality.of(h, List.of(), ResidualTerms.NONE, 3)).getMessage());
        assertEquals("fit quality band half-width must be a positive number of half-power bandwidths, got 0.0",
                assertThrows(AnalysisException.class, () -> FitQuality.of(h, List.of(MODE), ResidualTerms.NONE, 0))
                        .getMessage());
        assertEquals("fit quality needs residual terms; use ResidualTerms.NONE for none",
                assertThrows(AnalysisException.class, () -> FitQuality.of(h, List.of(MODE), null, 3)).getMessage());
        Frf zero = Frf.of(new double[] {1, 2}, new double[2], new double[2], FrfQuantity.RECEPTANCE);
        assertEquals("fit quality needs a measured FRF that is not zero at every line, got Frf[RECEPTANCE, 2 lines, 1.0..2.0 Hz]",
                assertThrows(AnalysisException.class, () -> FitQuality.of(zero, List.of(MODE), ResidualTerms.NONE, 3))
                        .getMessage());
    }
}
