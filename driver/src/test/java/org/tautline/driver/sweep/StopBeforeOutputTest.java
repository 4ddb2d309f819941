package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.tautline.driver.sim.SimulatedRig;

/**
 * A stop asked for while the output is off is honoured before the output goes on: nothing is excited, not even the
 * ramp up to the first step's drive (a stop that came between two sweeps on one rig, or between two passes).
 */
class StopBeforeOutputTest {
    private static final double RAMP_S = 0.05;

    /** Two drive levels, five steps each: two passes, each switching the output on and off. */
    private static SweepPlan twoLevels() {
        return new SweepPlan(200, 260, 5, SettleRule.fixed(40, 0.0), 20, LevelMode.DRIVE, List.of(1.0, 2.0),
                SweepFixtures.wideLimits(), SweepDirection.UP, Optional.empty(), SweepPlan.DEFAULT_INITIAL_DAMPING, 0.01,
                1.0, SweepPlan.DEFAULT_DRIVE_RATE_V_PER_S, RAMP_S, 1);
    }

    @Test
    void aStopAskedForBeforeTheSweepExcitesNothing() {
        RecordingRig rig = new RecordingRig(new SimulatedRig(SweepFixtures.singlePolarisationWire()));
        rig.control.requestStop("stopped before the start");
        RecordingJournal journal = new RecordingJournal();
        SweepResult result = new SweepEngine(rig).run(twoLevels(), SweepEventListener.NONE, rig.control, journal);

        assertEquals(SweepStatus.CANCELLED, result.status());
        assertEquals("stopped before the start before the output was switched on at 200.00 Hz", result.reason());
        assertTrue(result.steps().isEmpty());
        assertTrue(rig.blockPeaks.isEmpty(), "no block was read");
        assertFalse(rig.commands.stream().anyMatch(c -> c.kind().equals("on")), "the output never went on: "
                + rig.commands);
        assertFalse(rig.commands.stream().anyMatch(c -> c.kind().equals("ramp") && c.amplitudeV() > 0),
                "no drive was ramped up: " + rig.commands);
        assertFalse(rig.exciter().isOutputEnabled());
        assertEquals(List.of(SweepStatus.CANCELLED), journal.endings);
    }

    @Test
    void aStopAskedForAtTheEndOfAPassKeepsTheNextPassOff() {
        RecordingRig rig = new RecordingRig(new SimulatedRig(SweepFixtures.singlePolarisationWire()));
        SweepResult result = new SweepEngine(rig).run(twoLevels(), e -> {
            if (e.completed() && e.pass() == 0 && e.stepNumber() == 5) {
                rig.control.requestStop("stopped after the first level");
            }
        }, rig.control, new RecordingJournal());

        assertEquals(SweepStatus.CANCELLED, result.status());
        assertEquals(5, result.steps().size(), "the first pass is whole");
        assertEquals(1, rig.commands.stream().filter(c -> c.kind().equals("on")).count(),
                "only the first pass switched the output on: " + rig.commands);
        assertEquals(10, rig.blockPeaks.size(), "two reads per step of the first pass, none after");
        assertFalse(rig.exciter().isOutputEnabled());
    }

    @Test
    void aStopThatComesAsTheOutputGoesOnSwitchesItOffBeforeAnyDrive() {
        // The stop lands between the engine's check and the switching on: the output is on at zero amplitude.
        RecordingRig rig = new RecordingRig(new SimulatedRig(SweepFixtures.singlePolarisationWire()));
        rig.stopWhenSwitchedOn = "stopped as the output went on";
        SweepResult result = new SweepEngine(rig).run(twoLevels(), SweepEventListener.NONE, rig.control,
                new RecordingJournal());

        assertEquals(SweepStatus.CANCELLED, result.status());
        assertTrue(result.reason().startsWith("stopped as the output went on as the output was switched on"),
                result.reason());
        assertTrue(rig.blockPeaks.isEmpty(), "no block was read");
        assertFalse(rig.commands.stream().anyMatch(c -> c.kind().equals("ramp") && c.amplitudeV() > 0),
                "no drive was ramped up: " + rig.commands);
        assertFalse(rig.exciter().isOutputEnabled());
    }
}
