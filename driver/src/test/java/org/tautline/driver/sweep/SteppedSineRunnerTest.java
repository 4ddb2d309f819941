package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.driver.RigException;

class SteppedSineRunnerTest {
    /** A single-degree-of-freedom receptance, 1/(k - m w^2 + j c w), the textbook viscous SDOF (Ewins 2000, ch. 2, from memory). */
    private static Complex sdof(double frequencyHz) {
        double w = 2 * Math.PI * frequencyHz;
        double m = 0.01;
        double k = m * Math.pow(2 * Math.PI * 300, 2);
        double c = 2 * 0.01 * Math.sqrt(k * m);
        return new Complex(k - m * w * w, c * w).reciprocal();
    }

    private static final SteppedSinePlan PLAN = new SteppedSinePlan(200, 400, 21, 10, 0.0, 8, 1.0, 0.05, 3);

    @Test
    void recoversTheRigsSteadyStateFrfAtEveryStep() {
        // Source: IEEE Std 1057 three-parameter fit is exact for a noise-free sine at a known frequency,
        // so the phasor ratio must equal the transfer function the rig applies.
        SteadyStateRig rig = new SteadyStateRig(20000, f -> new Complex(0.3, -0.1 * f / 300), SteppedSineRunnerTest::sdof);
        SweepRecord record = new SteppedSineRunner(rig).run(PLAN, SweepListener.NONE, () -> false);
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
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, SteppedSineRunnerTest::sdof);
        new SteppedSineRunner(rig).run(PLAN, SweepListener.NONE, () -> false);
        List<String> c = rig.commands;
        assertEquals("sine 200.0 0.0", c.get(0));
        assertEquals("on", c.get(1));
        assertEquals("ramp 1.0", c.get(2));
        assertEquals("ramp 0.0", c.get(c.size() - 2));
        assertEquals("off", c.get(c.size() - 1));
    }

    @Test
    void aCancelStopsAfterRampingDownAndKeepsTheCompletedSteps() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, SteppedSineRunnerTest::sdof);
        AtomicInteger steps = new AtomicInteger();
        SweepRecord record = new SteppedSineRunner(rig).run(PLAN, p -> steps.incrementAndGet(), () -> steps.get() >= 5);
        assertFalse(record.completed());
        assertEquals(5, record.points().size());
        assertEquals("off", rig.commands.get(rig.commands.size() - 1));
        assertFalse(rig.exciter().isOutputEnabled());
    }

    @Test
    void reportsProgressWithARemainingTimeThatFallsToZero() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, SteppedSineRunnerTest::sdof);
        List<SweepProgress> seen = new java.util.ArrayList<>();
        new SteppedSineRunner(rig).run(PLAN, seen::add, () -> false);
        assertEquals(21, seen.size());
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(seen.get(i).remainingRigTimeS() < seen.get(i - 1).remainingRigTimeS(), "remaining rig time falls");
        }
        SweepProgress last = seen.get(seen.size() - 1);
        assertEquals(1.0, last.fraction(), 0.0);
        assertEquals(PLAN.rampS(), last.remainingRigTimeS(), 1e-12, "only the final ramp is left");
        // This test rig ramps in no time, so the steps alone make up the rig time.
        assertEquals(PLAN.plannedRigTimeS(20000) - 2 * PLAN.rampS(), last.rigTimeS(), 1e-9);
    }

    @Test
    void aFaultDuringTheSweepStillSwitchesTheOutputOff() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> {
            if (f > 300) {
                throw new RigException("link lost at " + f + " Hz");
            }
            return Complex.ONE;
        }, SteppedSineRunnerTest::sdof);
        SweepFaultException e = assertThrows(SweepFaultException.class,
                () -> new SteppedSineRunner(rig).run(PLAN, SweepListener.NONE, () -> false));
        // Step 13 is the first above 300 Hz: 200 * 2^(12/20) = 303.14 Hz.
        assertEquals("sweep stopped by a fault at step 13 of 21 (303.14 Hz); the output is off and the 12 completed"
                + " step(s) are kept: link lost at 303.1433133020796 Hz", e.getMessage());
        assertEquals(12, e.partial().points().size());
        assertFalse(e.partial().completed());
        assertTrue(e.getCause().getMessage().startsWith("link lost at"));
        assertEquals("off", rig.commands.get(rig.commands.size() - 1));
        assertFalse(rig.commands.contains("ramp 0.0"), "a fault switches the output off at once, without a ramp");
    }

    @Test
    void rejectsADriveAboveTheExcitersLimit() {
        SteadyStateRig rig = new SteadyStateRig(20000, f -> Complex.ONE, SteppedSineRunnerTest::sdof);
        SteppedSinePlan loud = new SteppedSinePlan(200, 400, 3, 10, 0, 8, 7.5, 0.05, 1);
        RigException e = assertThrows(RigException.class,
                () -> new SteppedSineRunner(rig).run(loud, SweepListener.NONE, () -> false));
        assertEquals("sweep plan: drive amplitude 7.5 V is above the exciter's limit of 5.0 V", e.getMessage());
        assertTrue(rig.commands.isEmpty(), "nothing was commanded");
    }
}
