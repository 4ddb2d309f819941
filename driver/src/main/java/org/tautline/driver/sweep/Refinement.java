package org.tautline.driver.sweep;

import java.util.Locale;

import org.tautline.driver.RigException;

/**
 * What the adaptive part of a plan aims at: refine each resonance until its local fit meets the targets.
 *
 * @param frequencyRelStd target standard error of each natural frequency, relative (1e-5 = 10 ppm)
 * @param dampingRelStd target standard error of each damping ratio, relative (0.02 = 2 %)
 * @param timeBudgetS the most rig time one level and direction may take, s; refinement stops there
 */
public record Refinement(double frequencyRelStd, double dampingRelStd, double timeBudgetS) {

    /** Checks the targets; messages name the plan field. */
    public Refinement {
        SweepPlan.positive("frequencyRelStd", frequencyRelStd);
        SweepPlan.positive("dampingRelStd", dampingRelStd);
        SweepPlan.positive("timeBudgetS", timeBudgetS);
        if (frequencyRelStd >= 1 || dampingRelStd >= 1) {
            throw new RigException("sweep plan: frequencyRelStd and dampingRelStd are relative (0.02 = 2 %) and must be"
                    + " below 1, got " + frequencyRelStd + " and " + dampingRelStd);
        }
    }

    /** @return the targets in words, for reports */
    public String describe() {
        return String.format(Locale.ROOT, "refine each resonance to f within %.2g and damping within %.2g (relative"
                + " standard errors), at most %.4g s per pass", frequencyRelStd, dampingRelStd, timeBudgetS);
    }
}
