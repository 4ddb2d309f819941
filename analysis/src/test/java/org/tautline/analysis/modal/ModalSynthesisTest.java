package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

class ModalSynthesisTest {

    @Test
    void singleModeMatchesAHandComputedValue() {
        // Hand computation of A/(w_n^2 - w^2 + 2 j zeta w_n w) (Ewins 2000, ch. 2, from memory) with
        // f_n = 1/(2 pi) Hz so w_n = 1 rad/s, zeta = 0.05, A = 2 - j, at w = 2 rad/s:
        // denominator = 1 - 4 + 2 j 0.05 * 2 = -3 + 0.2 j; (2 - j)/(-3 + 0.2 j) = (2 - j)(-3 - 0.2 j)/9.04
        // = (-6 - 0.2 + j (3 - 0.4))/9.04 = (-6.2 + 2.6 j)/9.04.
        Mode mode = new Mode(1 / (2 * Math.PI), 0.05, new Complex(2, -1));
        Frf h = ModalSynthesis.receptance(List.of(mode), new double[] {2 / (2 * Math.PI)});
        assertEquals(-6.2 / 9.04, h.value(0).getReal(), 1e-15, "hand-computed real part");
        assertEquals(2.6 / 9.04, h.value(0).getImaginary(), 1e-15, "hand-computed imaginary part");
        // Mobility = j w receptance (Ewins 2000, ch. 2): j 2 (-6.2 + 2.6 j)/9.04 = (-5.2 - 12.4 j)/9.04.
        Frf y = ModalSynthesis.synthesize(List.of(mode), new double[] {2 / (2 * Math.PI)}, FrfQuantity.MOBILITY);
        assertEquals(-5.2 / 9.04, y.value(0).getReal(), 1e-14, "hand-computed mobility real part");
        assertEquals(-12.4 / 9.04, y.value(0).getImaginary(), 1e-14, "hand-computed mobility imaginary part");
    }

    @Test
    void twoModesAddAndAPerfectModelHasZeroResidual() {
        Mode a = new Mode(100, 0.01, new Complex(300, 0));
        Mode b = new Mode(200, 0.02, new Complex(-150, 20));
        double[] f = {50, 100, 150, 200, 250};
        Frf both = ModalSynthesis.receptance(List.of(a, b), f);
        for (int i = 0; i < f.length; i++) {
            Complex expected = a.receptanceAt(f[i]).add(b.receptanceAt(f[i]));
            assertEquals(0, both.value(i).subtract(expected).norm(), 1e-15 * expected.norm(), "modal sum at " + f[i]);
        }
        assertEquals(0, ModalSynthesis.normalisedResidual(both, List.of(a, b)), 1e-15, "exact model");
        // Leaving out mode b: residual = ||H_b|| / ||H_a + H_b||, computed directly.
        Frf onlyB = ModalSynthesis.receptance(List.of(b), f);
        double num = 0;
        double den = 0;
        for (int i = 0; i < f.length; i++) {
            num += Math.pow(onlyB.magnitude(i), 2);
            den += Math.pow(both.magnitude(i), 2);
        }
        assertEquals(Math.sqrt(num / den), ModalSynthesis.normalisedResidual(both, List.of(a)), 1e-12,
                "normalised residual definition ||H_meas - H_synth|| / ||H_meas||");
    }

    @Test
    void rejectsAnEmptyModelAndAZeroMeasurement() {
        assertEquals("modal synthesis needs at least one mode, got none", assertThrows(AnalysisException.class,
                () -> ModalSynthesis.receptance(List.of(), new double[] {1})).getMessage());
        Frf zero = Frf.of(new double[] {1, 2}, new double[2], new double[2], FrfQuantity.RECEPTANCE);
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> ModalSynthesis.normalisedResidual(zero, List.of(new Mode(1, 0.01, Complex.ONE))));
        assertEquals("a fit-quality figure needs a measured FRF that is not zero at every line, got "
                + "Frf[RECEPTANCE, 2 lines, 1.0..2.0 Hz]", e.getMessage());
    }
}
