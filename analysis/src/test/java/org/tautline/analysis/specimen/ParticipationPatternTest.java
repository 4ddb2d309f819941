package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

class ParticipationPatternTest {
    private static final Specimen STATED = Specimen.roundWire("p1", Material.MUSIC_WIRE, 1e-3, 1.0, EndCondition.PINNED,
            0.27, 0.11, 500);
    private final ParticipationPattern pattern = new ParticipationPattern();

    /** Modes of the specimen driven at the true positions, with a calibration scale and 1 % noise on A. */
    private static List<FittedMode> measured(Specimen truth, int harmonics, double scale, long seed) {
        Random random = new Random(seed);
        List<FittedMode> modes = new ArrayList<>();
        double unit = 2 / (truth.linearDensityKgPerM() * truth.lengthM());
        for (int n = 1; n <= harmonics; n++) {
            // Point-force modal constant (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L), checks.md [seen].
            double a = scale * ParticipationPattern.expectedModalConstant(truth, n);
            double std = 0.01 * unit;
            modes.add(new FittedMode(new Mode(SyntheticModes.pinnedHz(truth, n), 1e-3,
                    new Complex(a + std * random.nextGaussian(), 0)), 1e-3, 1e-4, new Complex(std, std)));
        }
        return modes;
    }

    private static HarmonicAssignment numbered(List<FittedMode> modes) {
        List<AssignedMode> assigned = new ArrayList<>();
        for (int i = 0; i < modes.size(); i++) {
            assigned.add(new AssignedMode(i, modes.get(i).mode().frequencyHz(), i + 1, 0));
        }
        return new HarmonicAssignment(assigned, List.of(), List.of(), 142, 1e-4);
    }

    @Test
    void midspanForcingGivesZeroExpectedConstantsForEvenHarmonics() {
        // checks.md point force: sin(n pi/2) = 0 for even n; L/3 removes n = 3, 6.
        Specimen mid = STATED.withPositions(0.5, 0.11);
        Specimen third = STATED.withPositions(1.0 / 3.0, 0.11);
        double unit = 2 / (STATED.linearDensityKgPerM() * STATED.lengthM());
        for (int n = 1; n <= 8; n++) {
            double midA = ParticipationPattern.expectedModalConstant(mid, n);
            double thirdA = ParticipationPattern.expectedModalConstant(third, n);
            assertEquals(n % 2 == 0, Math.abs(midA) < 1e-12 * unit, "midspan forcing, n = " + n);
            assertEquals(n % 3 == 0, Math.abs(thirdA) < 1e-12 * unit, "L/3 forcing, n = " + n);
        }
    }

    @Test
    void locatesTheForcingPointWithinOnePercentOfTheSpan() {
        List<FittedMode> modes = measured(STATED, 10, -0.8, 21);
        PatternFit fit = pattern.fit(STATED, numbered(modes), modes);
        assertEquals(0.27, fit.forcingPositionM(), 0.01, "x_f from the modal constants within 1 % of L");
        assertEquals(0.11, fit.sensorPositionM(), 0.01, "x_s from the modal constants within 1 % of L");
        assertFalse(fit.forcingMismatch(), fit.findings().toString());
        assertEquals(-0.8, fit.fittedScale(), 0.02, "common calibration scale including its sign");
        assertEquals(-0.8, fit.statedScale(), 0.02, "scale at the stated setup");
        assertEquals(STATED.linearDensityKgPerM() / 0.8, fit.effectiveLinearDensityKgPerM(), 0.03 / 0.8 * STATED.linearDensityKgPerM(),
                "mu from A_n = 2/(mu L) sin sin");
        assertTrue(fit.findings().contains("the modal constants carry an overall negative sign: check the sensor polarity"));
    }

    @Test
    void flagsAStingerFivePercentOfTheSpanOffItsStatedPlace() {
        Specimen truth = STATED.withPositions(0.32, 0.11);
        List<FittedMode> modes = measured(truth, 10, 1.0, 22);
        PatternFit fit = pattern.fit(STATED, numbered(modes), modes);
        assertTrue(fit.forcingMismatch(), "x_f 0.05 L off is flagged");
        assertFalse(fit.sensorMismatch(), "the sensor is where stated");
        assertEquals(0.32, fit.forcingPositionM(), 0.01, "the pattern finds the true x_f");
        assertTrue(fit.statedReducedChiSquare() > 10 * fit.fittedReducedChiSquare(),
                "stated setup misfits: " + fit.statedReducedChiSquare() + " vs " + fit.fittedReducedChiSquare());
        assertEquals("forcing point: the modal constants put the shaker at " + String.format(java.util.Locale.ROOT, "%.4f",
                fit.forcingPositionM()) + " m, the setup states 0.2700 m (tolerance 0.0100 m)", fit.findings().get(0));
    }

    @Test
    void doubletPolarisationsAreSummedAndTheSensorAngleScales() {
        // Polarisations at psi contribute cos(psi)cos(psi - theta) + sin(psi)sin(psi - theta) = cos(theta).
        Specimen tilted = STATED.withSensorAngleRad(Math.PI / 3);
        double psi = 0.4;
        double theta = Math.PI / 3;
        List<FittedMode> modes = new ArrayList<>();
        List<AssignedMode> assigned = new ArrayList<>();
        for (int n = 1; n <= 6; n++) {
            double a = ParticipationPattern.expectedModalConstant(STATED, n);
            double f = SyntheticModes.pinnedHz(STATED, n);
            modes.add(new FittedMode(new Mode(f, 1e-3, new Complex(a * Math.cos(psi) * Math.cos(psi - theta), 0)),
                    1e-3, 1e-4, new Complex(1e-3, 1e-3)));
            modes.add(new FittedMode(new Mode(f * 1.001, 1e-3, new Complex(a * Math.sin(psi) * Math.sin(psi - theta), 0)),
                    1e-3, 1e-4, new Complex(1e-3, 1e-3)));
            assigned.add(new AssignedMode(2 * n - 2, f, n, 1));
            assigned.add(new AssignedMode(2 * n - 1, f * 1.001, n, 2));
        }
        PatternFit fit = pattern.fit(tilted, new HarmonicAssignment(assigned, List.of(), List.of(), 142, 0), modes);
        assertEquals(1.0, fit.statedScale(), 1e-6, "sum of the polarisations equals cos(theta) times the pattern");
        for (ParticipationEntry e : fit.entries()) {
            assertEquals(e.expectedModalConstant(), e.measuredModalConstant(), 1e-9, "harmonic " + e.harmonic());
        }
    }

    @Test
    void rejectsTooFewHarmonics() {
        List<FittedMode> modes = measured(STATED, 2, 1, 23);
        assertEquals("the participation pattern needs at least 3 numbered harmonics to fit a scale and two positions, got 2",
                assertThrows(AnalysisException.class, () -> pattern.fit(STATED, numbered(modes), modes)).getMessage());
    }
}
