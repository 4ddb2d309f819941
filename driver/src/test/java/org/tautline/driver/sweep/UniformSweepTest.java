package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.driver.RigException;

/** The engine on a uniform plan: log-spaced steps, a fixed dwell, one drive level. */
class UniformSweepTest {
    /** A single-degree-of-freedom receptance, 1/(k - m w^2 + j c w), the textbook viscous SDOF (Ewins 2000, ch. 2, from memory). */
    private static Complex sdof(double frequencyHz) {
        double w = 2 * Math.PI * frequencyHz;
        double m = 0.01;
        double k = m * Math.pow(2 * Math.PI * 300, 2);
        double c = 2 * 0.01 * Math.sqrt(k * m);
        return new Complex(k - m * w * w, c * w).reciprocal();
    }

    private static final SafetyLimits LIMITS = new SafetyLimits(5.0, 100.0, 1.0, 1.0);
    private static final SweepPlan PLAN = SweepPlan.uniform(200, 400, 21, 10, 0.0, 8, 1.0, 0.05, 3, LIMITS);

    private static SweepResult run(SteadyStateRig rig, SweepPlan plan, SweepEventListener listener, SweepControl control) {
        return new SweepEngine(rig).run(plan, listener, control, SweepJournal.NONE);
    }

    @Test
    void recoversTheRigsSteadyStateFrfAtEveryStep() {
        // Source: IEEE Std 1057 three-parameter fit is exact for a noise-free sine at a known frequency,
        // so the phasor ratio must equal the transfer function the rig applies.
        SteadyStateRig rig = new SteadyStateRig(20000, f -> new Complex(0.3, -0.1 * f / 300), UniformSweepTest::sdof);
        SweepResult record = run(rig, PLAN, SweepEventListener.NONE, SweepControl.none());
        assertTrue(record.completed());
        Frf frf = record.toFrf();
        assertEquals(FrfQuantity.RECEPTANCE, frf.quantity());
        assertEquals(21, frf.size());
        for (int i = 0; i < frf.size(); i++) {
            Complex expected = sdof(frf.frequencyHz(i));
            assertEquals(0.0, frf.value(i).subtract(expected).norm() / expected.norm(), 1e-9,
                    "FRF at " + frf.frequencyHz(i) + " Hz");
        }
        assertEquals(200.0, frf.frequencyHz(0), 0.0);
        assertEquals(400.0, frf.frequencyHz(20), 0.0);
    }

    @Test
    void rampsUpFirstAndSwitchesTheOutputOffAtTheEnd() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, UniformSweepTest::sdof);
        run(rig, PLAN, SweepEventListener.NONE, SweepControl.none());
        List<String> c = rig.commands;
        assertEquals("sine 200.0 0.0", c.get(0));
        assertEquals("on", c.get(1));
        assertEquals("ramp 1.0", c.get(2));
        assertEquals("ramp 0.0", c.get(c.size() - 2));
        assertEquals("off", c.get(c.size() - 1));
    }

    @Test
    void aStopRampsDownAndKeepsTheCompletedSteps() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, UniformSweepTest::sdof);
        SweepControl control = new SweepControl();
        SweepResult record = run(rig, PLAN, e -> {
            if (e.completed() && e.stepNumber() == 5) {
                control.requestStop("stopped by the operator");
            }
        }, control);
        assertFalse(record.completed());
        assertEquals(SweepStatus.CANCELLED, record.status());
        assertTrue(record.reason().startsWith("stopped by the operator during the step at"), record.reason());
        assertEquals(5, record.points().size());
        assertEquals(5, record.steps().size());
        assertEquals("ramp 0.0", rig.commands.get(rig.commands.size() - 2));
        assertEquals("off", rig.commands.get(rig.commands.size() - 1));
        assertFalse(rig.exciter().isOutputEnabled());
    }

    @Test
    void reportsProgressWithARemainingTimeThatFallsToTheFinalRamp() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, UniformSweepTest::sdof);
        List<SweepEvent> seen = new ArrayList<>();
        run(rig, PLAN, e -> {
            if (e.completed()) {
                seen.add(e);
            }
        }, SweepControl.none());
        assertEquals(21, seen.size());
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(seen.get(i).remainingRigS() < seen.get(i - 1).remainingRigS(), "remaining rig time falls");
        }
        SweepEvent last = seen.get(seen.size() - 1);
        assertEquals(1.0, last.fraction(), 0.0);
        assertEquals(PLAN.rampS(), last.remainingRigS(), 1e-12, "only the final ramp is left");
        // This test rig ramps in no time, so the steps alone make up the rig time.
        assertEquals(PLAN.expectedRigTimeS(20000) - 2 * PLAN.rampS(), last.rigTimeS(), 1e-9);
    }

    @Test
    void aFaultDuringTheSweepSwitchesTheOutputOffAtOnceAndKeepsTheSteps() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> {
            if (f > 300) {
                throw new RigException("link lost at " + f + " Hz");
            }
            return Complex.ONE;
        }, UniformSweepTest::sdof);
        RecordingJournal journal = new RecordingJournal();
        SweepResult result = new SweepEngine(rig).run(PLAN, SweepEventListener.NONE, SweepControl.none(), journal);
        // Step 13 is the first above 300 Hz: 200 * 2^(12/20) = 303.14 Hz.
        assertEquals(SweepStatus.FAULT, result.status());
        assertEquals("link lost at 303.1433133020796 Hz", result.reason());
        assertEquals(12, result.points().size());
        assertEquals(12, journal.steps.size());
        assertEquals(List.of(SweepStatus.FAULT), journal.endings);
        assertEquals("off", rig.commands.get(rig.commands.size() - 1));
        assertFalse(rig.commands.contains("ramp 0.0"), "a fault switches the output off at once, without a ramp");
    }

    @Test
    void refusesADriveLimitAboveTheExcitersBeforeAnyExcitation() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, UniformSweepTest::sdof);
        SweepPlan loud = SweepPlan.uniform(200, 400, 3, 10, 0, 8, 7.5, 0.05, 1, new SafetyLimits(7.5, 100, 1, 1));
        RigException e = assertThrows(RigException.class, () -> run(rig, loud, SweepEventListener.NONE,
                SweepControl.none()));
        assertEquals("sweep plan: the drive limit 7.5 V is above the exciter's limit of 5.0 V; lower limits.driveV",
                e.getMessage());
        assertTrue(rig.commands.isEmpty(), "nothing was commanded");
    }

    @Test
    void refusesAPlanAboveHalfTheSampleRateBeforeAnyExcitation() {
        SteadyStateRig rig = new SteadyStateRig(2000, f -> Complex.ONE, UniformSweepTest::sdof);
        SweepPlan high = SweepPlan.uniform(200, 1200, 3, 10, 0, 8, 1.0, 0.05, 1, LIMITS);
        RigException e = assertThrows(RigException.class, () -> run(rig, high, SweepEventListener.NONE,
                SweepControl.none()));
        assertEquals("sweep plan: stopHz 1200 Hz is not below half the rig's sample rate (1000 Hz), so the rig can"
                + " neither drive nor measure it; lower stopHz", e.getMessage());
        assertTrue(rig.commands.isEmpty(), "nothing was commanded");
    }
}
