package org.tautline.driver.sweep;

import java.util.List;

import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;

/** Plans and rigs the adaptive-sweep tests share. */
final class SweepFixtures {
    private SweepFixtures() {
    }

    /** The demo wire with its two polarisations at one frequency and 8 harmonics (a faster simulation). */
    static SimulationConfig singlePolarisationWire() {
        SimulationConfig demo = SimulationConfigs.demoWire();
        SimulatedSpecimen s = demo.specimen();
        return demo.withSpecimen(new SimulatedSpecimen(s.lengthM(), s.linearDensityKgPerM(), s.tensionN(),
                s.bendingStiffnessNm2(), s.ends(), 8, s.damping(), 0.0, s.polarisationAngleRad(),
                s.geometricNonlinearity(), s.axialStiffnessN()));
    }

    static SafetyLimits wideLimits() {
        return new SafetyLimits(10.0, 4.0, 9e-4, 9e-4);
    }

    static AdaptiveSweepPlan plan(double startHz, double stopHz, LevelMode mode, double level, SafetyLimits limits) {
        return new AdaptiveSweepPlan(startHz, stopHz, mode, List.of(level), 2e-5, 0.02, limits, SweepDirection.UP,
                600.0, 25, 0.002, 0.01, 64, 0.0, 0.01, 1.0, 20.0, 0.1, 1);
    }
}
