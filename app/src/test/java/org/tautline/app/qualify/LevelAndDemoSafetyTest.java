package org.tautline.app.qualify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sweep.RecordingRig;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepStatus;

/**
 * The demo's sweep and the level check stop at a safety limit within one block, ramp down and switch off.
 *
 * <p>The level check drives three times harder than the main sweep across the fundamental, so it is the one pass a
 * limit the main sweep stays under can stop: the demo wire moves about 41 micrometres per volt at its fundamental,
 * so a 90 micrometre limit passes the 1 V steps and trips at 3 V.
 */
class LevelAndDemoSafetyTest {
    /** 40 steps across the fundamental with a short dwell: enough for a fit of harmonic 1, quick to simulate. */
    private static SweepPlan plan(SafetyLimits limits) {
        return SweepPlan.uniform(215, 240, 40, 60, 0.0, 40, 1.0, 0.05, 1, limits);
    }

    @Test
    void theDemoSweepStopsAtTheLimitAndNothingIsQualified() {
        SafetyLimits tight = new SafetyLimits(5.0, 2.0, 1e-3, 2e-5);
        try (SimulatedRig sim = new SimulatedRig(DemoScenario.simulation()); RecordingRig rig = new RecordingRig(sim)) {
            SweepStoppedException e = assertThrows(SweepStoppedException.class, () -> DemoRun.run(rig, sim.truth(),
                    DemoScenario.specimen(), plan(tight), DemoScenario.specification(), SweepEventListener.NONE,
                    SweepControl.none()));
            assertEquals(SweepStatus.LIMIT, e.sweep().status());
            assertTrue(e.getMessage().startsWith("the sweep stopped at a safety limit before its end after "),
                    e.getMessage());
            rig.assertTrippedOnTheLastBlock("specimen displacement", tight);
            rig.assertRampedDownThenOff(0.05);
        }
    }

    @Test
    void theLevelCheckStopsAtTheLimitItsHigherLevelReaches() {
        SafetyLimits limits = new SafetyLimits(5.0, 2.0, 1e-3, 9e-5);
        try (SimulatedRig sim = new SimulatedRig(DemoScenario.simulation());
             RecordingRig rig = new RecordingRig(sim)) {
            QualificationResult main = DemoRun.run(rig, sim.truth(), DemoScenario.specimen(), plan(limits),
                    DemoScenario.specification(), SweepEventListener.NONE, SweepControl.none()).result();
            assertTrue(main.sweep().orElseThrow().completed(), "the main sweep at 1 V stays under the limit");
            assertTrue(main.linearity().isEmpty(), "the level check did not finish, so no shift is reported");
            double lastDriveV = rig.commands.stream().filter(c -> c.kind().equals("sine")).reduce((a, b) -> b)
                    .orElseThrow().amplitudeV();
            assertEquals(3.0, lastDriveV, 1e-9, "the limit tripped in the level check's 3 V pass");
            rig.assertTrippedOnTheLastBlock("specimen displacement", limits);
            rig.assertRampedDownThenOff(0.05);
            List<Double> levels = LevelCheck.plan(plan(limits), 226, 10).levels();
            assertEquals(List.of(1.0, 3.0), levels, "the second pass drives three times harder");
        }
    }

    @Test
    void aForceControlledPlanHasNoLevelCheckOfTwoDriveLevels() {
        SweepPlan main = plan(new SafetyLimits(5.0, 10.0, 0.01, 0.01));
        SweepPlan force = new SweepPlan(main.startHz(), main.stopHz(), main.coarseStepCount(), main.settle(),
                main.integrationCycles(), org.tautline.driver.sweep.LevelMode.FORCE, List.of(0.5), main.limits(),
                main.direction(), main.refinement(), main.initialDampingRatio(), main.levelTolerance(),
                main.initialDriveV(), main.driveRateVPerS(), main.rampS(), main.harmonicOrder());
        org.tautline.driver.RigException e = assertThrows(org.tautline.driver.RigException.class,
                () -> LevelCheck.plan(force, 226, 10));
        assertTrue(e.getMessage().contains("force-controlled"), e.getMessage());
    }
}
