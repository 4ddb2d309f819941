package org.tautline.app.ui.setup;

import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.specimen.Specimen;
import org.tautline.app.qualify.LevelCheck;
import org.tautline.driver.RigException;
import org.tautline.driver.sweep.SweepPlan;

/**
 * How much rig time a sweep plan takes, for the setup screen. Free of Swing.
 *
 * <p>A step with a fixed dwell takes its dwell, max(cycles / f, shortest dwell), then the fitted cycles,
 * integration cycles / f; each pass adds a ramp up and a ramp down. That is the rig time of a uniform plan to within
 * a sample per step. Steps that settle by detection end when the transient has died away, which the plan cannot
 * know: only the fitted cycles are certain, so the time is given as "at least". An adaptive plan's refinement stops
 * at its time budget per pass, which bounds it. The level check after the sweep runs its own short sweep across the
 * fundamental; its time is estimated at the fundamental the stated tension and mass per length give (Mersenne's
 * law, f1 = sqrt(T / mu) / 2L).
 *
 * @param sweepS rig time of the sweep's steps and ramps, s (a lower bound when {@code atLeast})
 * @param atLeast true when the steps settle by detection, so the time can only be bounded below
 * @param refinementBudgetS the most rig time an adaptive plan's refinement may add, s; 0 for a uniform plan
 * @param levelCheckS rig time of the level check, s; empty when the stated specimen gives no fundamental
 */
public record RigTimeEstimate(double sweepS, boolean atLeast, double refinementBudgetS, Optional<Double> levelCheckS) {

    /**
     * @param plan the sweep plan
     * @param specimen the stated specimen, for the level check's fundamental
     * @return the estimate
     */
    public static RigTimeEstimate of(SweepPlan plan, Specimen specimen) {
        double budget = plan.refinement().map(r -> r.timeBudgetS() * plan.passCount()).orElse(0.0);
        double f1Hz = Math.sqrt(specimen.nominalTensionN() / specimen.linearDensityKgPerM()) / (2 * specimen.lengthM());
        Optional<Double> level = Optional.empty();
        if (Double.isFinite(f1Hz) && f1Hz > 0) {
            try {
                level = Optional.of(stepsS(LevelCheck.plan(plan, f1Hz, plan.limits().driveV())));
            } catch (RigException e) {
                // No level check fits this plan (the fundamental lies outside what a plan accepts): none is counted.
                level = Optional.empty();
            }
        }
        return new RigTimeEstimate(stepsS(plan), plan.settle().detects(), budget, level);
    }

    /** The coarse steps of every pass with their ramps: dwell (fixed only) and fitted cycles per step, s. */
    static double stepsS(SweepPlan plan) {
        double pass = 2 * plan.rampS();
        for (double f : plan.coarseFrequenciesHz()) {
            pass += plan.settle().dwellS(f) + plan.integrationCycles() / f;
        }
        return plan.passCount() * pass;
    }

    /** @return the estimate in words, for example "about 14 min 17 s for the sweep, then about 9 s for the level check" */
    public String text() {
        String sweep = (atLeast ? "at least " : "about ") + duration(sweepS) + " for the sweep"
                + (atLeast ? " (steps settle until the transient has died away, which only the rig can tell)" : "");
        String refinement = refinementBudgetS > 0 ? ", and up to " + duration(refinementBudgetS)
                + " more for refining the resonances" : "";
        String level = levelCheckS.map(s -> ", then " + (atLeast ? "at least " : "about ") + duration(s)
                + " for the level check at the fundamental").orElse("");
        return "Rig time: " + sweep + refinement + level + ".";
    }

    /**
     * @param seconds a duration, s
     * @return for example "14 min 17 s", "1 h 02 min", "8.5 s"
     */
    static String duration(double seconds) {
        if (!Double.isFinite(seconds) || seconds < 0) {
            return "an unknown time";
        }
        if (seconds < 10) {
            return String.format(Locale.ROOT, "%.1f s", seconds);
        }
        long s = Math.round(seconds);
        if (s < 60) {
            return s + " s";
        }
        if (s < 3600) {
            return String.format(Locale.ROOT, "%d min %02d s", s / 60, s % 60);
        }
        long minutes = Math.round(seconds / 60);
        return String.format(Locale.ROOT, "%d h %02d min", minutes / 60, minutes % 60);
    }
}
