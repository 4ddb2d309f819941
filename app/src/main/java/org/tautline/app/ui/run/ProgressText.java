package org.tautline.app.ui.run;

import java.util.Locale;

import org.tautline.driver.sweep.SweepEvent;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepPoint;

/** The words the run screen shows for a sweep's progress, its time to go and its settling. Free of Swing. */
public final class ProgressText {
    private ProgressText() {
    }

    /**
     * @param e a sweep event
     * @param remainingWallS estimated wall-clock time still to go, s, or not finite when unknown
     * @return for example {@code step 12 of 300 | 231.4 Hz | about 1 min 05 s to go}, with the pass when there are several
     */
    public static String progress(SweepEvent e, double remainingWallS) {
        String pass = e.passCount() > 1 ? String.format(Locale.ROOT, "pass %d of %d | ", e.pass() + 1, e.passCount()) : "";
        return String.format(Locale.ROOT, "%sstep %d of %d | %.1f Hz | %s", pass, e.stepNumber(),
                Math.max(e.stepNumber(), e.plannedSteps()), e.frequencyHz(), eta(remainingWallS));
    }

    /**
     * @param seconds estimated wall-clock time still to go, s, or not finite when unknown
     * @return for example {@code about 2 min 05 s to go}
     */
    public static String eta(double seconds) {
        if (!Double.isFinite(seconds) || seconds < 0) {
            return "time to go not known yet";
        }
        long s = Math.round(seconds);
        return s >= 60 ? String.format(Locale.ROOT, "about %d min %02d s to go", s / 60, s % 60)
                : String.format(Locale.ROOT, "about %d s to go", s);
    }

    /**
     * @param plan the sweep plan
     * @param e the event of a completed step
     * @param sampleRateHz the rig's sample rate, Hz
     * @return how long the next step settles and how well the last one fitted
     */
    public static String settle(SweepPlan plan, SweepEvent e, double sampleRateHz) {
        SweepPoint last = e.point();
        double[] f = plan.coarseFrequenciesHz();
        int next = e.stepNumber();
        String settling = plan.adaptive() ? "the next step settles until its transient is below "
                + String.format(Locale.ROOT, "%.3g %%", 100 * plan.settle().tolerance())
                : next < f.length ? String.format(Locale.ROOT, "next step (%.1f Hz) settles %.2f s, then fits %d samples",
                        f[next], plan.settle().dwellS(f[next]), plan.integrationSamples(f[next], sampleRateHz))
                : "last step done";
        return String.format(Locale.ROOT, "Settling: %s. Last step: fit residual %.2f %%, standard error of |H| %.2f %%",
                settling, 100 * last.relativeResidual(), 100 * last.relativeStdError());
    }
}
