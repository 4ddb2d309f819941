package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.tautline.driver.RigException;

class SweepPlanTest {
    private static final SafetyLimits LIMITS = new SafetyLimits(5.0, 10.0, 1.0, 1.0);

    @Test
    void stepsAreLogSpacedWithExactEnds() {
        SweepPlan plan = SweepPlan.uniform(100, 1000, 4, 10, 0, 10, 1, 0, 1, LIMITS);
        double[] f = plan.coarseFrequenciesHz();
        assertEquals(100.0, f[0], 0.0);
        assertEquals(215.44346900318837, f[1], 1e-9); // 100 * 10^(1/3)
        assertEquals(464.15888336127786, f[2], 1e-9); // 100 * 10^(2/3)
        assertEquals(1000.0, f[3], 0.0);
    }

    @Test
    void integrationSpansWholeCyclesToTheNearestSample() {
        SweepPlan plan = SweepPlan.uniform(100, 1000, 4, 10, 0, 40, 1, 0, 1, LIMITS);
        assertEquals(8000, plan.integrationSamples(100, 20000));
        assertEquals(3713, plan.integrationSamples(215.44346900318837, 20000)); // 40 * 20000 / 215.443 = 3713.2
    }

    @Test
    void aFixedDwellIsTheLongerOfCyclesAndTheMinimum() {
        SweepPlan plan = SweepPlan.uniform(100, 1000, 4, 250, 0.5, 40, 1, 0, 1, LIMITS);
        assertEquals(2.5, plan.settle().dwellS(100), 1e-12);
        assertEquals(0.5, plan.settle().dwellS(1000), 1e-12);
    }

    @Test
    void rejectsAnInvertedBand() {
        RigException e = assertThrows(RigException.class, () -> SweepPlan.uniform(500, 100, 4, 10, 0, 10, 1, 0, 1, LIMITS));
        assertEquals("sweep plan: stopHz (100.0 Hz) must be above startHz (500.0 Hz)", e.getMessage());
    }

    @Test
    void rejectsTooFewSteps() {
        RigException e = assertThrows(RigException.class, () -> SweepPlan.uniform(100, 500, 1, 10, 0, 10, 1, 0, 1, LIMITS));
        assertEquals("sweep plan: the step count must be 2 or more, got 1", e.getMessage());
    }

    @Test
    void rejectsADriveLevelAboveTheDriveLimit() {
        RigException e = assertThrows(RigException.class, () -> SweepPlan.uniform(100, 500, 4, 10, 0, 10, 6, 0, 1, LIMITS));
        assertEquals("sweep plan: drive level 6.0 V is above limits.driveV 5.0 V", e.getMessage());
    }

    @Test
    void describesItselfWithItsLimits() {
        SweepPlan plan = SweepPlan.uniform(180, 1500, 1061, 250, 0.02, 100, 1, 0.2, 3, LIMITS);
        assertEquals("stepped sine 180.0 to 1500 Hz in 1061 log-spaced steps, settle 250.0 cycles (at least 0.02000 s),"
                + " integrate 100 cycles, drive 1.000 V peak, ramp 0.2000 s, harmonics to order 3; limits: drive 5.000 V,"
                + " force 10.00 N, response 1.000 (sensor units), displacement 1.000 m", plan.describe());
    }
}
