package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/** The whole modal fit: LSCF, stabilisation, mode choice, LSFD and refinement together. */
class ModalEstimatorTest {

    private static void assertExact(List<Mode> truth, ModalEstimate estimate, double tolerance) {
        assertEquals(truth.size(), estimate.modes().size(), "modes found: " + estimate.plainModes());
        for (int i = 0; i < truth.size(); i++) {
            Mode t = truth.get(i);
            Mode e = estimate.modes().get(i).mode();
            String what = "mode " + i + " at " + t.frequencyHz() + " Hz (noise-free synthesis of the modal sum, Ewins 2000)";
            assertEquals(0, e.frequencyHz() / t.frequencyHz() - 1, tolerance, what + ": frequency");
            assertEquals(0, e.dampingRatio() / t.dampingRatio() - 1, tolerance, what + ": damping");
            assertEquals(0, e.modalConstant().subtract(t.modalConstant()).norm() / t.modalConstant().norm(), tolerance,
                    what + ": modal constant");
        }
    }

    @Test
    void fitsOneModeExactly() {
        List<Mode> truth = LscfTestData.oneMode();
        Frf frf = ModalSynthesis.receptance(truth, LscfTestData.uniformLines(60, 140, 400));
        assertExact(truth, ModalEstimator.defaults().estimate(frf), 1e-6);
    }

    @Test
    void fitsThreeModesExactlyOnSteppedSineLines() {
        List<Mode> truth = LscfTestData.threeModes();
        Frf frf = ModalSynthesis.receptance(truth, LscfTestData.logLines(80, 500, 1200));
        assertExact(truth, ModalEstimator.defaults().estimate(frf), 1e-6);
    }

    @Test
    void fitsEightModesWithAPairOneHalfPowerBandwidthApartExactly() {
        List<Mode> truth = LscfTestData.eightModes();
        Frf frf = ModalSynthesis.receptance(truth, LscfTestData.uniformLines(80, 950, 4000));
        ModalEstimate estimate = ModalEstimator.defaults().withComplexModes(true).estimate(frf);
        assertExact(truth, estimate, 1e-6);
        assertTrue(estimate.quality().orElseThrow().normalisedResidual() < 1e-6);
    }

    @Test
    void findsNoModeInPureNoise() {
        for (long seed = 1; seed <= 5; seed++) {
            Frf noise = LscfTestData.pureNoise(LscfTestData.uniformLines(50, 500, 2000), seed);
            ModalEstimate estimate = ModalEstimator.defaults().estimate(noise);
            assertEquals(List.of(), estimate.modes(), "seed " + seed + ": no mode in complex white noise");
            assertTrue(estimate.quality().isEmpty());
        }
    }

    @Test
    void reportsStandardErrorsFromTheFrfsVariance() {
        List<Mode> truth = LscfTestData.stiffStringModes();
        Frf clean = ModalSynthesis.receptance(truth, LscfTestData.logLines(120, 1100, 3000));
        Frf noisy = LscfTestData.withRelativeNoise(clean, 3e-3, 11L);
        double[] variance = new double[noisy.size()];
        for (int i = 0; i < variance.length; i++) {
            variance[i] = Math.pow(3e-3 * clean.magnitude(i), 2);
        }
        ModalEstimate estimate = ModalEstimator.defaults().estimate(noisy.withVariance(variance));
        assertEquals(truth.size(), estimate.modes().size(), "all stiff-string modes, the doublet included");
        for (int i = 0; i < truth.size(); i++) {
            FittedMode m = estimate.modes().get(i);
            double z = (m.mode().frequencyHz() - truth.get(i).frequencyHz()) / m.frequencyStdHz();
            assertTrue(Math.abs(z) < 5, "mode " + i + ": frequency error " + z + " standard errors");
            assertTrue(m.frequencyStdHz() > 0 && m.dampingRatioStd() > 0);
        }
    }

    @Test
    void saysSoWhenTooFewLinesRemainInTheBand() {
        Frf frf = ModalSynthesis.receptance(LscfTestData.oneMode(), LscfTestData.uniformLines(60, 140, 400));
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> ModalEstimator.defaults().withBand(100, 101).estimate(frf));
        assertEquals("a modal fit needs at least 12 frequency lines in the band 100.0 .. 101.0 Hz, got 5", e.getMessage());
    }

    @Test
    void aZeroResponseIsRefusedWithAMessage() {
        double[] f = LscfTestData.uniformLines(10, 100, 50);
        Frf zero = Frf.of(f, new double[50], new double[50], FrfQuantity.RECEPTANCE);
        AnalysisException e = assertThrows(AnalysisException.class, () -> ModalEstimator.defaults().estimate(zero));
        assertTrue(e.getMessage().contains("zero"), e.getMessage());
    }
}
