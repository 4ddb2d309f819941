package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

class LsfdTest {
    private static final double[] LINES = LsfdTestData.lines(20, 300, 1401);

    @Test
    void recoversModalConstantsAndResidualTermsOfOneThreeAndEightModes() {
        // Reference: noise-free receptance from the modal sum (Ewins 2000, ch. 2, from memory) with the true poles;
        // the LSFD system is then consistent, so the least-squares solution is the truth.
        LsfdOptions options = LsfdOptions.defaults().withUpperResidual(true).withLowerResidual(true);
        for (boolean complex : new boolean[] {false, true}) {
            for (int count : new int[] {1, 3, 8}) {
                List<Mode> truth = LsfdTestData.modes(count, complex);
                Frf h = LsfdTestData.receptance(truth, LsfdTestData.RESIDUALS, LINES);
                LsfdResult fit = Lsfd.fit(h, LsfdTestData.poles(truth), options.withRealModes(!complex));
                String label = count + (complex ? " complex" : " real") + " modes";
                assertTrue(LsfdTestData.relativeModalConstantError(fit.modes(), truth) < 1e-6,
                        "modal constants of " + label + " from synthesised data");
                assertTrue(LsfdTestData.relative(fit.residualTerms().upper(), LsfdTestData.RESIDUALS.upper()) < 1e-6,
                        "upper residual of " + label);
                assertTrue(LsfdTestData.relative(fit.residualTerms().lower(), LsfdTestData.RESIDUALS.lower()) < 1e-6,
                        "lower residual of " + label);
                for (int i = 0; i < count; i++) {
                    assertEquals(truth.get(i).frequencyHz(), fit.modes().get(i).frequencyHz(), 1e-9,
                            "frequency kept from the pole");
                    assertEquals(truth.get(i).dampingRatio(), fit.modes().get(i).dampingRatio(), 1e-12,
                            "damping kept from the pole");
                }
                assertEquals(LINES.length, fit.linesUsed(), "every line is in the default band");
            }
        }
    }

    @Test
    void realModesGiveRealModalConstantsAndMobilityInputGivesTheSameAnswer() {
        List<Mode> truth = LsfdTestData.modes(3, false);
        Frf h = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        LsfdOptions options = LsfdOptions.defaults().withRealModes(true);
        LsfdResult fromReceptance = Lsfd.fit(h, LsfdTestData.poles(truth), options);
        LsfdResult fromMobility = Lsfd.fit(h.toQuantity(FrfQuantity.MOBILITY), LsfdTestData.poles(truth), options);
        for (int i = 0; i < 3; i++) {
            assertEquals(0.0, fromReceptance.modes().get(i).modalConstant().getImaginary(), 0.0, "real mode");
            // Mobility = j w receptance (Ewins 2000, ch. 2): converted back, the same constants result.
            assertEquals(truth.get(i).modalConstant().getReal(), fromMobility.modes().get(i).modalConstant().getReal(),
                    1e-6 * Math.abs(truth.get(i).modalConstant().getReal()), "modal constant from mobility input");
        }
        assertEquals(ResidualTerms.NONE, fromReceptance.residualTerms(), "no residual terms asked for");
    }

    @Test
    void residuesAreTheModalConstantsOverTwoJTimesTheDampedFrequency() {
        // Ewins 2000, ch. 2 (from memory): R = A/(2 j w_d) for a viscous mode.
        List<Mode> truth = LsfdTestData.modes(3, true);
        List<Pole> poles = LsfdTestData.poles(truth);
        Frf h = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        Complex[] residues = Lsfd.residues(h, poles, LsfdOptions.defaults());
        for (int i = 0; i < 3; i++) {
            Complex expected = truth.get(i).modalConstant().divide(new Complex(0, 2 * poles.get(i).imag()));
            assertTrue(LsfdTestData.relative(residues[i], expected) < 1e-6, "residue " + i + " = A/(2 j w_d)");
        }
    }

    @Test
    void bandAndWeightsSelectTheLinesThatCount() {
        List<Mode> truth = LsfdTestData.modes(1, false);
        Frf clean = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        double[] re = clean.realParts();
        int spoiled = 100;
        re[spoiled] += 1.0;
        Frf h = Frf.of(LINES, re, clean.imaginaryParts(), FrfQuantity.RECEPTANCE);
        double[] weights = new double[LINES.length];
        java.util.Arrays.fill(weights, 1);
        weights[spoiled] = 0;
        LsfdResult weighted = Lsfd.fit(h, LsfdTestData.poles(truth), LsfdOptions.defaults().withWeights(weights));
        assertTrue(LsfdTestData.relativeModalConstantError(weighted.modes(), truth) < 1e-9,
                "a zero weight removes the spoiled line entirely");
        LsfdResult banded = Lsfd.fit(h, LsfdTestData.poles(truth), LsfdOptions.defaults().withBandHz(70, 90));
        assertTrue(LsfdTestData.relativeModalConstantError(banded.modes(), truth) < 1e-9,
                "a band that leaves out the spoiled line (" + LINES[spoiled] + " Hz)");
        assertEquals(101, banded.linesUsed(), "lines 70..90 Hz at 0.2 Hz spacing");
        LsfdResult spoilt = Lsfd.fit(h, LsfdTestData.poles(truth), LsfdOptions.defaults());
        assertTrue(LsfdTestData.relativeModalConstantError(spoilt.modes(), truth) > 1e-3,
                "with uniform weights the spoiled line does pull the fit");
    }

    @Test
    void closeModesAreSeparatedAndCoincidentPolesAreRefused() {
        List<Mode> truth = LsfdTestData.modes(8, true);
        List<Pole> poles = LsfdTestData.poles(truth);
        Frf h = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        LsfdResult fit = Lsfd.fit(h, poles, LsfdOptions.defaults());
        assertTrue(fit.conditionNumber() > 1 && fit.conditionNumber() < 1e6, "close pair is well conditioned");
        List<Pole> twice = List.of(poles.get(0), poles.get(0));
        AnalysisException e = assertThrows(AnalysisException.class, () -> Lsfd.fit(h, twice, LsfdOptions.defaults()));
        assertTrue(e.getMessage().startsWith("LSFD cannot separate the unknowns: the scaled least-squares system has "
                + "condition number "), e.getMessage());
        assertTrue(e.getMessage().endsWith(" (limit 1.0E12) for 2 poles on 1401 lines; merge poles that are too close, "
                + "or drop residual terms the band cannot tell from a mode"), e.getMessage());
    }

    @Test
    void rejectsInputsThatCannotSupportAFit() {
        List<Mode> truth = LsfdTestData.modes(3, false);
        List<Pole> poles = LsfdTestData.poles(truth);
        Frf h = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        LsfdOptions all = LsfdOptions.defaults().withUpperResidual(true).withLowerResidual(true);
        assertEquals("LSFD has 10 real unknowns but only 4 lines (8 real values); widen the band, drop residual terms "
                        + "or fit fewer modes",
                assertThrows(AnalysisException.class, () -> Lsfd.fit(h, poles, all.withBandHz(40, 40.7))).getMessage());
        Frf flat = Frf.of(new double[] {1, 2, 3, 4}, new double[] {2, 2, 2, 2}, new double[4], FrfQuantity.RECEPTANCE);
        assertEquals("LSFD cannot fit a flat response: |H| stays within 1.0E-6 of its peak 2.0 across all 4 lines, "
                + "so there is no resonance to fit",
                assertThrows(AnalysisException.class, () -> Lsfd.fit(flat, poles.subList(0, 1), LsfdOptions.defaults()))
                        .getMessage());
        Frf zero = Frf.of(new double[] {1, 2, 3, 4}, new double[4], new double[4], FrfQuantity.RECEPTANCE);
        assertEquals("LSFD cannot fit a response that is zero at every one of its 4 lines",
                assertThrows(AnalysisException.class, () -> Lsfd.fit(zero, poles.subList(0, 1), LsfdOptions.defaults()))
                        .getMessage());
        assertEquals("LSFD needs at least one pole, got none",
                assertThrows(AnalysisException.class, () -> Lsfd.fit(h, List.of(), LsfdOptions.defaults())).getMessage());
        assertEquals("LSFD pole 0 is unstable (Re(lambda) = 3.0 rad/s > 0, damping ratio -0.6); "
                        + "drop it before fitting",
                assertThrows(AnalysisException.class,
                        () -> Lsfd.fit(h, List.of(new Pole(3, 4)), LsfdOptions.defaults())).getMessage());
        assertEquals("LSFD weights must have one value per FRF line (1401), got 2",
                assertThrows(AnalysisException.class,
                        () -> Lsfd.fit(h, poles, LsfdOptions.defaults().withWeights(new double[2]))).getMessage());
        assertEquals("LSFD band 500.0..600.0 Hz holds no line of Frf[RECEPTANCE, 1401 lines, 20.0..300.0 Hz]",
                assertThrows(AnalysisException.class,
                        () -> Lsfd.fit(h, poles, LsfdOptions.defaults().withBandHz(500, 600))).getMessage());
        assertEquals("a fitting band needs 0 <= fromHz < toHz, got 5.0..5.0 Hz",
                assertThrows(AnalysisException.class, () -> LsfdOptions.defaults().withBandHz(5, 5)).getMessage());
        Frf badVariance = h.withVariance(new double[LINES.length]);
        assertEquals("LSFD weights lines by 1/variance, but the variance at line 0 (20.0 Hz) is 0.0; give explicit "
                        + "weights instead",
                assertThrows(AnalysisException.class, () -> Lsfd.fit(badVariance, poles, LsfdOptions.defaults()))
                        .getMessage());
        assertArrayEquals(new double[] {1, 2}, LsfdOptions.defaults().withWeights(new double[] {1, 2}).weights(), 0.0,
                "weights are kept");
    }
}
