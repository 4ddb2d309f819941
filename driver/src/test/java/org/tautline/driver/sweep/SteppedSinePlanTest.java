package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.tautline.driver.RigException;

class SteppedSinePlanTest {

    @Test
    void stepsAreLogSpacedWithExactEnds() {
        SteppedSinePlan plan = new SteppedSinePlan(100, 1000, 4, 10, 0, 10, 1, 0, 1);
        double[] f = plan.frequenciesHz();
        assertEquals(100.0, f[0], 0.0);
        assertEquals(215.44346900318837, f[1], 1e-9); // 100 * 10^(1/3)
        assertEquals(464.15888336127786, f[2], 1e-9); // 100 * 10^(2/3)
        assertEquals(1000.0, f[3], 0.0);
    }

    @Test
    void integrationSpansWholeCyclesToTheNearestSample() {
        SteppedSinePlan plan = new SteppedSinePlan(100, 1000, 4, 10, 0, 40, 1, 0, 1);
        assertEquals(8000, plan.integrationSamples(100, 20000));
        assertEquals(3713, plan.integrationSamples(215.44346900318837, 20000)); // 40 * 20000 / 215.443 = 3713.2
    }

    @Test
    void settleTimeIsTheLongerOfCyclesAndTheMinimum() {
        SteppedSinePlan plan = new SteppedSinePlan(100, 1000, 4, 250, 0.5, 40, 1, 0, 1);
        assertEquals(2.5, plan.settleTimeS(100), 1e-12);
        assertEquals(0.5, plan.settleTimeS(1000), 1e-12);
    }

    @Test
    void rejectsAnInvertedBand() {
        RigException e = assertThrows(RigException.class, () -> new SteppedSinePlan(500, 100, 4, 10, 0, 10, 1, 0, 1));
        assertEquals("sweep plan: stopHz (100.0 Hz) must be above startHz (500.0 Hz)", e.getMessage());
    }

    @Test
    void rejectsTooFewSteps() {
        RigException e = assertThrows(RigException.class, () -> new SteppedSinePlan(100, 500, 1, 10, 0, 10, 1, 0, 1));
        assertEquals("sweep plan: stepCount must be 2 or more, got 1", e.getMessage());
    }
}
