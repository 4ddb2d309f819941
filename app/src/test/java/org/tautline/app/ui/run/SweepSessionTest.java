package org.tautline.app.ui.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sim.SimulatedRigDriver;
import org.tautline.driver.sweep.RecordingRig;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepStatus;

class SweepSessionTest {
    /** A short sweep across the demo wire's fundamental: 12 steps, little settling. */
    private static final SweepPlan PLAN = SweepPlan.uniform(200.0, 260.0, 12, 20, 0.005, 20, 0.5, 0.02, 1,
            DemoScenario.LIMITS);

    private static SweepEventListener stopAt(SweepSession session, int step, SweepSession.StopRequest request) {
        return e -> {
            if (e.completed() && e.stepNumber() == step) {
                session.requestStop(request, "stopped by the test");
            }
        };
    }

    @Test
    void pauseKeepsTheStepsAndResumeGoesOnFromTheNextOne() {
        AtomicLong tapped = new AtomicLong();
        try (TappedRig rig = RigConnection.open(RigDrivers.standard(), "sim", Map.of("seed", "3"),
                block -> tapped.addAndGet(block.length()))) {
            SweepSession session = new SweepSession(PLAN);
            SweepResult partial = session.run(rig, stopAt(session, 5, SweepSession.StopRequest.PAUSE));
            assertFalse(partial.completed());
            assertEquals(SweepSession.State.PAUSED, session.state());
            assertEquals(5, partial.points().size());
            SweepResult whole = session.resume(rig, SweepEventListener.NONE);
            assertTrue(whole.completed());
            assertEquals(SweepSession.State.COMPLETE, session.state());
            assertArrayEquals(PLAN.coarseFrequenciesHz(), whole.points().stream().mapToDouble(SweepPoint::frequencyHz)
                    .toArray());
            assertEquals(partial.points(), whole.points().subList(0, 5));
            long fitted = 0;
            for (double f : PLAN.coarseFrequenciesHz()) {
                fitted += PLAN.integrationSamples(f, rig.acquisition().sampleRateHz());
            }
            // Every fitted sample went through the tap; ramps advance the rig without reads, so the tap sees fewer
            // samples than the rig clock counts.
            assertTrue(tapped.get() >= fitted, tapped.get() + " tapped, " + fitted + " fitted");
            assertTrue(tapped.get() <= rig.acquisition().nextSampleIndex());
        }
    }

    @Test
    void resumeGoesOnWithTheSameRigReconnectedButRefusesAnother() {
        SweepSession session = new SweepSession(PLAN);
        SweepResult partial;
        try (TappedRig first = RigConnection.open(RigDrivers.standard(), "sim", Map.of("seed", "3"), block -> { })) {
            partial = session.run(first, stopAt(session, 4, SweepSession.StopRequest.PAUSE));
        }
        assertEquals(4, partial.points().size());
        try (TappedRig other = RigConnection.open(RigDrivers.standard(), "sim", Map.of("seed", "4"), block -> { })) {
            RigException e = assertThrows(RigException.class, () -> session.resume(other, SweepEventListener.NONE));
            assertTrue(e.getMessage().endsWith("a sweep can only be resumed on the rig it started on"), e.getMessage());
            assertFalse(other.exciter().isOutputEnabled(), "nothing was excited");
        }
        assertEquals(SweepSession.State.PAUSED, session.state(), "the kept steps are still kept");
        try (TappedRig again = RigConnection.open(RigDrivers.standard(), "sim", Map.of("seed", "3"), block -> { })) {
            SweepResult whole = session.resume(again, SweepEventListener.NONE);
            assertTrue(whole.completed(), whole.reason());
            assertEquals(partial.points(), whole.points().subList(0, 4));
        }
    }

    @Test
    void aSafetyLimitStopsTheSweepAndKeepsTheSteps() {
        SweepPlan tight = SweepPlan.uniform(200.0, 260.0, 12, 20, 0.005, 20, 0.5, 0.02, 1,
                new org.tautline.driver.sweep.SafetyLimits(5.0, 2.0, 5e-4, 1e-5));
        // The workbench's path: the sweep session on the connected rig, here the simulated wire recorded.
        try (RecordingRig rig = new RecordingRig(new SimulatedRigDriver().open(Map.of()))) {
            SweepSession session = new SweepSession(tight);
            SweepResult r = session.run(rig, SweepEventListener.NONE);
            assertEquals(SweepStatus.LIMIT, r.status(), r.reason());
            assertTrue(r.reason().startsWith("safety limit reached: specimen displacement"), r.reason());
            rig.assertTrippedOnTheLastBlock("specimen displacement", tight.limits());
            rig.assertRampedDownThenOff(tight.rampS());
            assertEquals(SweepSession.State.PAUSED, session.state());
        }
    }

    @Test
    void cancelForgetsTheStepsAndResumeIsRefused() {
        try (TappedRig rig = RigConnection.open(RigDrivers.standard(), "sim", Map.of(), block -> { })) {
            SweepSession session = new SweepSession(PLAN);
            SweepResult r = session.run(rig, stopAt(session, 1, SweepSession.StopRequest.CANCEL));
            assertEquals(1, r.points().size());
            assertEquals(SweepSession.State.READY, session.state());
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> session.resume(rig, SweepEventListener.NONE));
            assertEquals("the sweep can only resume after a pause; it is READY", e.getMessage());
        }
    }

    @Test
    void healthSaysTheSimulatedRigIsReady() {
        try (TappedRig rig = RigConnection.open(RigDrivers.standard(), "sim", Map.of("scenario", " "), block -> { })) {
            assertEquals("Health: ready (force on channel 0, response on channel 1)", RigConnection.health(rig).get(3));
        }
    }
}
