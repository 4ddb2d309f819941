package org.tautline.driver.sweep;

import java.util.List;
import java.util.Optional;

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

    /**
     * An adaptive plan with the tests' usual settings.
     *
     * @param startHz band start, Hz
     * @param stopHz band end, Hz
     * @param mode force or drive levels
     * @param level the one level
     * @param limits the limits
     * @param coarseSteps coarse steps per pass
     * @param initialDriveV first drive under force control, V
     * @param rampS ramp time, s
     * @return the plan: targets 2e-5 in f and 2 % in damping, 600 s budget, settle detection to 1 %, 64 cycles
     */
    static SweepPlan adaptive(double startHz, double stopHz, LevelMode mode, double level, SafetyLimits limits,
                              int coarseSteps, double initialDriveV, double rampS) {
        return new SweepPlan(startHz, stopHz, coarseSteps, SettleRule.detected(0.01), 64, mode, List.of(level), limits,
                SweepDirection.UP, Optional.of(new Refinement(2e-5, 0.02, 600.0)), 0.002, 0.01, initialDriveV, 20.0,
                rampS, 1);
    }
}
