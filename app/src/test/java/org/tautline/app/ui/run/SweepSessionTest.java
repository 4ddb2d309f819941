package org.tautline.app.ui.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepRecord;

class SweepSessionTest {
    /** A short sweep across the demo wire's fundamental: 12 steps, little settling. */
    private static final SteppedSinePlan PLAN = new SteppedSinePlan(200.0, 260.0, 12, 20, 0.005, 20, 0.5, 0.02, 1);

    @Test
    void pauseKeepsTheStepsAndResumeGoesOnFromTheNextOne() {
        AtomicLong tapped = new AtomicLong();
        try (TappedRig rig = RigConnection.open(RigDrivers.standard(), "sim", Map.of("seed", "3"),
                block -> tapped.addAndGet(block.length()))) {
            SweepSession session = new SweepSession(rig, PLAN);
            SweepRecord partial = session.run(p -> {
                if (p.completedSteps() == 5) {
                    session.requestStop(SweepSession.StopRequest.PAUSE);
                }
            });
            assertFalse(partial.completed());
            assertEquals(SweepSession.State.PAUSED, session.state());
            assertEquals(5, partial.points().size());
            SweepRecord whole = session.resume(p -> { });
            assertTrue(whole.completed());
            assertEquals(SweepSession.State.COMPLETE, session.state());
            assertArrayEquals(PLAN.frequenciesHz(), whole.points().stream().mapToDouble(SweepPoint::frequencyHz).toArray());
            assertEquals(partial.points(), whole.points().subList(0, 5));
            long fitted = 0;
            for (double f : PLAN.frequenciesHz()) {
                fitted += PLAN.integrationSamples(f, rig.acquisition().sampleRateHz());
            }
            // Every fitted sample went through the tap; ramps advance the rig without reads, so the tap sees fewer
            // samples than the rig clock counts.
            assertTrue(tapped.get() >= fitted, tapped.get() + " tapped, " + fitted + " fitted");
            assertTrue(tapped.get() <= rig.acquisition().nextSampleIndex());
        }
    }

    @Test
    void cancelForgetsTheStepsAndResumeIsRefused() {
        try (TappedRig rig = RigConnection.open(RigDrivers.standard(), "sim", Map.of(), block -> { })) {
            SweepSession session = new SweepSession(rig, PLAN);
            SweepRecord r = session.run(p -> session.requestStop(SweepSession.StopRequest.CANCEL));
            assertEquals(1, r.points().size());
            assertEquals(SweepSession.State.READY, session.state());
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> session.resume(p -> { }));
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
