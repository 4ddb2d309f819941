package org.tautline.app.ui.run;

import java.util.Locale;

import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepProgress;

/** The words the run screen shows for a sweep's progress, its time to go and its settling. Free of Swing. */
public final class ProgressText {
    private ProgressText() {
    }

    /**
     * @param p progress after a step
     * @return for example {@code step 12 of 300 | 231.4 Hz | about 1 min 05 s to go}
     */
    public static String progress(SweepProgress p) {
        return String.format(Locale.ROOT, "step %d of %d | %.1f Hz | %s", p.completedSteps(), p.totalSteps(),
                p.frequencyHz(), eta(p.remainingWallTimeS()));
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
     * @param p progress after a step
     * @param sampleRateHz the rig's sample rate, Hz
     * @return how long the next step settles and how well the last one fitted
     */
    public static String settle(SteppedSinePlan plan, SweepProgress p, double sampleRateHz) {
        SweepPoint last = p.point();
        double[] f = plan.frequenciesHz();
        String next = p.completedSteps() < f.length
                ? String.format(Locale.ROOT, "next step (%.1f Hz) settles %.2f s, then fits %d samples", f[p.completedSteps()],
                        plan.settleTimeS(f[p.completedSteps()]), plan.integrationSamples(f[p.completedSteps()], sampleRateHz))
                : "last step done";
        return String.format(Locale.ROOT, "Settling: %s. Last step: fit residual %.2f %%, standard error of |H| %.2f %%",
                next, 100 * last.relativeResidual(), 100 * last.relativeStdError());
    }
}
