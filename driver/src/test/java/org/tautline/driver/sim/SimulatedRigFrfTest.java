package org.tautline.driver.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;

class SimulatedRigFrfTest {

    @Test
    void steadyStateFrfMatchesModalSumAwayFromResonances() {
        SimulatedRig rig = new SimulatedRig(SimulationConfigs.demoWire().idealised());
        // Frequencies at least 8 % from every natural frequency and clear of antiresonances of this FRF.
        for (double f : new double[] {150, 300, 400, 550, 800, 1000, 1250, 1500}) {
            Complex measured = FrfProbe.measure(rig, f, 1.0, 2.0, 50).frf();
            Complex expected = rig.truth().receptanceAt(f);
            double error = measured.subtract(expected).norm() / expected.norm();
            // Source: modal expansion of a point-forced string (checks.md "Point force"; L. Meirovitch,
            // Elements of Vibration Analysis, 2nd ed. 1986, from memory).
            assertTrue(error < 0.005, "FRF at " + f + " Hz should match the modal sum (Meirovitch 1986, from"
                    + " memory) within 0.5 %, complex relative error was " + error);
        }
    }

    @Test
    void forceDropsAtSpecimenResonance() {
        SimulatedRig rig = new SimulatedRig(SimulationConfigs.demoWire().idealised());
        double f1 = rig.truth().modes().get(0).mode().frequencyHz();
        double below = FrfProbe.measure(rig, 0.92 * f1, 1.0, 2.0, 50).force.amplitude();
        double at = FrfProbe.measure(rig, f1, 1.0, 2.0, 50).force.amplitude();
        double above = FrfProbe.measure(rig, 1.08 * f1, 1.0, 2.0, 50).force.amplitude();
        // Common practice (ISO 7626-2 warns of force drop-out at resonance, from memory).
        assertTrue(at < 0.2 * Math.min(below, above), "force at the resonance " + f1 + " Hz (" + at
                + " N) should drop well below the force 8 % either side (" + below + ", " + above
                + " N), as ISO 7626-2 warns (from memory)");
    }

    @Test
    void midspanForcingRemovesEvenModes() {
        SimulationConfig midspan = SimulationConfigs.demoWireDrivenAtMidspan().idealised();
        SimulatedRig rig = new SimulatedRig(midspan);
        SimulationTruth truth = rig.truth();
        double largest = truth.modes().stream().mapToDouble(m -> m.mode().modalConstant().norm()).max().orElseThrow();
        for (TrueMode m : truth.modes()) {
            if (m.harmonic() % 2 == 0) {
                // Source: sin(n pi / 2) = 0 for even n, checks.md "Point force" (node at the forcing point).
                assertEquals(0.0, m.mode().modalConstant().norm() / largest, 1e-12,
                        "even harmonic " + m.harmonic() + " has a node at midspan (checks.md, Point force)");
            }
        }
        double f2 = truth.modes().get(2).mode().frequencyHz();
        Complex measured = FrfProbe.measure(rig, f2, 1.0, 2.0, 50).frf();
        Complex oddOnly = Complex.ZERO;
        for (TrueMode m : truth.modes()) {
            if (m.harmonic() % 2 == 1) {
                oddOnly = oddOnly.add(m.mode().receptanceAt(f2));
            }
        }
        double error = measured.subtract(oddOnly).norm() / oddOnly.norm();
        assertTrue(error < 0.005, "at the even mode's frequency " + f2 + " Hz the midspan-forced FRF should be the"
                + " odd-mode sum (checks.md, Point force), error " + error);
        SimulatedRig offCentre = new SimulatedRig(SimulationConfigs.demoWire().idealised());
        double resonant = FrfProbe.measure(offCentre, f2, 1.0, 2.0, 50).frf().norm();
        assertTrue(measured.norm() < 0.1 * resonant, "forced off the node, harmonic 2 resonates (|H| " + resonant
                + " m/N); forced at midspan it must not (|H| " + measured.norm() + " m/N)");
    }
}
