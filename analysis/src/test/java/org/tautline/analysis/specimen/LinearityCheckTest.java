package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

class LinearityCheckTest {
    // Steel music wire d 1 mm, L 1 m, T0 500 N: EA = E pi d^2/4 = 157 kN.
    private static final Specimen WIRE = Specimen.roundWire("l1", Material.MUSIC_WIRE, 1e-3, 1.0, EndCondition.PINNED,
            0.29, 0.13, 500);
    private final LinearityCheck check = new LinearityCheck();

    private static List<LevelledMode> run(double amplitudeM, double extraShift) {
        List<LevelledMode> modes = new ArrayList<>();
        for (int n = 1; n <= 4; n++) {
            double f = SyntheticModes.pinnedHz(WIRE, n) * (1 + extraShift)
                    * LinearityCheck.backboneRatio(n, 1, WIRE.axialStiffnessN(), 500, amplitudeM);
            modes.add(new LevelledMode(n, new FittedMode(new Mode(f, 1e-3, new Complex(1, 0)), 1e-5 * f, 1e-4,
                    new Complex(0.01, 0.01)), amplitudeM));
        }
        return modes;
    }

    @Test
    void backboneAgreesWithDirectIntegrationOfTheOneModeKirchhoffCarrierEquation() {
        // Kirchhoff-Carrier (checks.md [seen]) reduced to one mode: a'' + w0^2 a + (EA k^4/(4 mu)) a^3 = 0.
        // Integrated here by classical RK4; the half period is the first return of a' to zero.
        double mu = WIRE.linearDensityKgPerM();
        double ea = WIRE.axialStiffnessN();
        double k = Math.PI;
        double w0 = k * Math.sqrt(500 / mu);
        double eps = ea * Math.pow(k, 4) / (4 * mu);
        double amplitude = 1.9e-3;
        double dt = Math.PI / w0 / 200000;
        double a = amplitude;
        double v = 0;
        double t = 0;
        while (true) {
            double[] s = rk4(a, v, dt, w0, eps);
            if (s[1] > 0 && t > dt) {
                double crossing = t + dt * (-v) / (s[1] - v);
                double measured = Math.PI / crossing / w0;
                double predicted = LinearityCheck.backboneRatio(1, 1, ea, 500, amplitude);
                assertEquals(predicted - 1, measured - 1, 2e-3 * (predicted - 1),
                        "backbone w/w0 - 1 = (3/32)(EA/T0)(k a)^2 (checks.md) vs RK4 of the one-mode equation");
                return;
            }
            a = s[0];
            v = s[1];
            t += dt;
        }
    }

    private static double[] rk4(double a, double v, double dt, double w0, double eps) {
        double k1a = v;
        double k1v = -w0 * w0 * a - eps * a * a * a;
        double a2 = a + dt / 2 * k1a;
        double v2 = v + dt / 2 * k1v;
        double k2a = v2;
        double k2v = -w0 * w0 * a2 - eps * a2 * a2 * a2;
        double a3 = a + dt / 2 * k2a;
        double v3 = v + dt / 2 * k2v;
        double k3a = v3;
        double k3v = -w0 * w0 * a3 - eps * a3 * a3 * a3;
        double a4 = a + dt * k3a;
        double v4 = v + dt * k3v;
        double k4a = v4;
        double k4v = -w0 * w0 * a4 - eps * a4 * a4 * a4;
        return new double[] {a + dt / 6 * (k1a + 2 * k2a + 2 * k3a + k4a), v + dt / 6 * (k1v + 2 * k2v + 2 * k3v + k4v)};
    }

    @Test
    void aLargeAmplitudeRunIsFlaggedAndMatchesTheBackbone() {
        LinearityResult r = check.compare(WIRE, 500, run(1e-4, 0), run(2e-3, 0));
        assertFalse(r.linear(), r.findings().toString());
        for (HarmonicShift s : r.shifts()) {
            assertTrue(s.significant(), "harmonic " + s.harmonic() + " shift " + s.relativeShift());
            assertEquals(s.predictedRelativeShift(), s.relativeShift(), 1e-9, "shift equals the backbone prediction");
        }
        assertEquals("not linear at the test level", r.findings().get(0));
    }

    @Test
    void smallAmplitudesAreLinear() {
        LinearityResult r = check.compare(WIRE, 500, run(1e-6, 0), run(1e-5, 0));
        assertTrue(r.linear(), r.findings().toString());
        assertEquals("linear at the test level: no harmonic shifted by more than 0.001 (relative) and 3 standard errors",
                r.findings().get(0));
    }

    @Test
    void anUpAndDownSweepDisagreementIsFlaggedWithoutBackbone() {
        LinearityResult r = check.compare(WIRE, 500, run(1e-5, 0), run(1e-5, 0.004));
        assertFalse(r.linear());
        HarmonicShift first = r.shifts().get(0);
        assertEquals(0.004, first.relativeShift(), 1e-9);
        assertEquals(0.0, first.predictedRelativeShift(), 1e-15, "equal amplitudes: the backbone predicts no shift");
        Specimen noEa = new Specimen("l2", 1, WIRE.linearDensityKgPerM(), 0, WIRE.bendingStiffnessNm2(), 0,
                EndCondition.PINNED, 0.29, 0.13, 500, 0, 0, 0, Optional.empty());
        LinearityResult unknown = check.compare(noEa, 500, run(1e-5, 0), run(1e-5, 0.004));
        assertTrue(Double.isNaN(unknown.shifts().get(0).predictedRelativeShift()));
        assertTrue(unknown.findings().get(1).endsWith("axial stiffness EA not stated, so the Kirchhoff-Carrier backbone"
                + " gives no prediction"), unknown.findings().toString());
    }

    @Test
    void rejectsADuplicateHarmonic() {
        List<LevelledMode> twice = new ArrayList<>(run(1e-5, 0));
        twice.add(twice.get(0));
        assertEquals("the first run has harmonic 1 twice; give one mode per harmonic",
                assertThrows(AnalysisException.class, () -> check.compare(WIRE, 500, twice, run(1e-5, 0))).getMessage());
    }
}
