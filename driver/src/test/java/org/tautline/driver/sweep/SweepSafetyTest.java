package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tautline.driver.RigException;
import org.tautline.driver.sim.SimulatedRig;

/**
 * Safety limits, cancel and the way the drive is brought down, on the simulated wire around its first mode (226 Hz).
 *
 * <p>What is checked is the engine's own contract, against the rig's recorded commands and blocks: a
 * limit trips on the first block that reaches it (no block is read after it), the drive then ramps to
 * zero over the plan's ramp time before the output is switched off (never a step to zero, which would
 * ring the specimen: common practice), and the journal holds exactly the steps the result holds.
 */
class SweepSafetyTest {
    private static final double RAMP_S = 0.1;

    private static SweepPlan plan(SafetyLimits limits) {
        return SweepFixtures.adaptive(200, 260, LevelMode.DRIVE, 1.0, limits, 9, 1.0, RAMP_S);
    }

    /** A uniform plan over the same band: 30 steps, a fixed dwell of 40 cycles. */
    private static SweepPlan uniformPlan(SafetyLimits limits) {
        return SweepPlan.uniform(200, 260, 30, 40, 0.0, 32, 1.0, RAMP_S, 1, limits);
    }

    @ParameterizedTest(name = "{0}, {1} plan")
    @CsvSource({
            "force, adaptive, 10, 0.1, 9e-4, 9e-4",
            "response, adaptive, 10, 4, 4.5e-5, 9e-4",
            "specimen displacement, adaptive, 10, 4, 9e-4, 4.5e-5",
            "force, uniform, 10, 0.1, 9e-4, 9e-4",
            "response, uniform, 10, 4, 4.5e-5, 9e-4",
            "specimen displacement, uniform, 10, 4, 9e-4, 4.5e-5"})
    void eachMeasuredLimitTripsWithinOneBlockAndRampsDown(String what, String kind, double driveV, double forceN,
                                                           double response, double displacementM) {
        RecordingRig rig = new RecordingRig(new SimulatedRig(SweepFixtures.singlePolarisationWire()));
        RecordingJournal journal = new RecordingJournal();
        SafetyLimits limits = new SafetyLimits(driveV, forceN, response, displacementM);
        SweepPlan plan = kind.equals("uniform") ? uniformPlan(limits) : plan(limits);
        SweepResult result = new SweepEngine(rig).run(plan, SweepEventListener.NONE, SweepControl.none(), journal);

        assertEquals(SweepStatus.LIMIT, result.status(), result.reason());
        assertTrue(result.reason().startsWith("safety limit reached: " + what), result.reason());
        rig.assertTrippedOnTheLastBlock(what, limits);
        rig.assertRampedDownThenOff(RAMP_S);
        assertEquals(List.of(SweepStatus.LIMIT), journal.endings);
        assertEquals(result.reason(), journal.reasons.get(0), "the journal records why");
        assertEquals(result.passes().get(0).points().size(), journal.steps.size());
    }

    @Test
    void aStopThatArrivesDuringAStepsLastReadDiscardsThatStep() {
        // The uniform plan reads each step's 40-cycle dwell in one block and its integration in a second: a stop that
        // arrives while the fifth step's integration block is read (read 10) must not let that block be fitted, for
        // an emergency stop may have switched the output off part way through it.
        RecordingRig rig = new RecordingRig(new SimulatedRig(SweepFixtures.singlePolarisationWire()));
        rig.readsBeforeCancel = 10;
        RecordingJournal journal = new RecordingJournal();
        SweepResult result = new SweepEngine(rig).run(uniformPlan(SweepFixtures.wideLimits()), SweepEventListener.NONE,
                rig.control, journal);
        assertEquals(SweepStatus.CANCELLED, result.status());
        assertEquals(10, rig.blockPeaks.size(), "two reads per step, the stop on the fifth step's second");
        assertEquals(4, journal.steps.size(), "the step whose last block was read during the stop is not recorded");
        assertEquals(4, result.points().size());
    }

    @Test
    void aCancelMidStepLeavesTheOutputOffAndTheJournalConsistent() {
        RecordingRig rig = new RecordingRig(new SimulatedRig(SweepFixtures.singlePolarisationWire()));
        rig.readsBeforeCancel = 30;
        RecordingJournal journal = new RecordingJournal();
        SweepResult result = new SweepEngine(rig).run(plan(SweepFixtures.wideLimits()), SweepEventListener.NONE,
                rig.control, journal);

        assertEquals(SweepStatus.CANCELLED, result.status());
        assertFalse(rig.exciter().isOutputEnabled(), "output off after a cancel");
        rig.assertRampedDownThenOff(RAMP_S);
        List<SweepPoint> points = result.passes().get(0).points();
        assertTrue(points.size() > 0 && points.size() < 30, "stopped part way: " + points.size() + " steps");
        assertEquals(points.size(), journal.steps.size(), "every completed step is journaled, the step in progress not");
        for (int i = 0; i < journal.steps.size(); i++) {
            assertEquals(i, journal.steps.get(i).index());
            assertEquals(points.get(i), journal.steps.get(i).point());
        }
        assertEquals(List.of(SweepStatus.CANCELLED), journal.endings, "one ending, recorded once");
    }

    @Test
    void aLinkFaultMidStepSwitchesOffAtOnceAndIsJournaled() {
        RecordingRig rig = new RecordingRig(new SimulatedRig(SweepFixtures.singlePolarisationWire()));
        rig.readsBeforeLinkFault = 25;
        RecordingJournal journal = new RecordingJournal();
        SweepResult result = new SweepEngine(rig).run(plan(SweepFixtures.wideLimits()), SweepEventListener.NONE,
                SweepControl.none(), journal);

        assertEquals(SweepStatus.FAULT, result.status());
        assertEquals("link lost: the rig stopped answering", result.reason());
        assertFalse(rig.exciter().isOutputEnabled(), "output off after a fault");
        List<RecordingRig.Command> c = rig.commands;
        assertEquals("off", c.get(c.size() - 1).kind(), "the output is switched off");
        assertFalse(c.get(c.size() - 2).kind().equals("ramp") && c.get(c.size() - 2).amplitudeV() == 0.0,
                "at once: the link may be what failed, so no ramp is commanded over it");
        assertEquals(List.of(SweepStatus.FAULT), journal.endings);
        assertEquals(result.passes().get(0).points().size(), journal.steps.size());
    }

    @Test
    void aDriveLevelAboveTheDriveLimitIsRefusedBeforeAnyExcitation() {
        RigException e = assertThrows(RigException.class, () -> SweepFixtures.adaptive(200, 260, LevelMode.DRIVE, 3.0,
                new SafetyLimits(2.0, 4, 9e-4, 9e-4), 9, 1.0, RAMP_S));
        assertEquals("sweep plan: drive level 3.0 V is above limits.driveV 2.0 V", e.getMessage());
    }
}
