package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Which measured steps an adaptive pass may trust, and where a new step may go.
 *
 * <p>When a pass moves on from a step where a resonance responded strongly, that mode rings on at its own
 * frequency and decays with its own time constant; a step that settles by the convergence of its own phasors can be
 * fitted while the ringing is still large, which raises the fit's residual and so its standard error. Such a step is
 * <i>disturbed</i>: the step before it responded more than {@link #RINGING_AMPLITUDE_RATIO} times as strongly and its
 * relative standard error is more than {@link #RINGING_ERROR_RATIO} times the step before's (and above
 * {@link #ERROR_FLOOR}); a step whose relative error exceeds {@link #USELESS_RELATIVE_STD} is of no use either. Noise
 * alone does not make a step disturbed: where the force drops at a sharp resonance the error grows from step to small
 * step along with it. The phase search and the local fits leave disturbed steps out, and a step is measured beside
 * each in its place. The ratios are our choice; a disturbed step of the demo wire is 100 to 600 times worse than the
 * step before, noise at a resonance at most 3 times. No two steps of a pass share a frequency.
 */
final class StepGrid {
    /** The step before must have responded this many times more strongly. */
    static final double RINGING_AMPLITUDE_RATIO = 3.0;
    /** ... and the step's relative standard error must be this many times the step before's. */
    static final double RINGING_ERROR_RATIO = 10.0;
    /** ... and above this. */
    static final double ERROR_FLOOR = 0.005;
    /** A step whose relative standard error of |H| exceeds this is of no use. */
    static final double USELESS_RELATIVE_STD = 0.5;

    private StepGrid() {
    }

    /**
     * @param points the steps of a pass, in the order run
     * @param rejectedHz steps a local fit rejected as standing alone far off it ({@link FitResiduals}), Hz
     * @return for each step, whether it is disturbed (rejected ones included)
     */
    static boolean[] disturbed(List<SweepPoint> points, Set<Double> rejectedHz) {
        boolean[] out = new boolean[points.size()];
        for (int i = 0; i < out.length; i++) {
            SweepPoint p = points.get(i);
            double r = p.relativeStdError();
            out[i] = !(r <= USELESS_RELATIVE_STD) || rejectedHz.contains(p.frequencyHz());
            if (i > 0 && !out[i]) {
                SweepPoint before = points.get(i - 1);
                out[i] = before.responseAmplitude() > RINGING_AMPLITUDE_RATIO * p.responseAmplitude()
                        && r > RINGING_ERROR_RATIO * before.relativeStdError() && r > ERROR_FLOOR;
            }
        }
        return out;
    }

    /**
     * @param points the steps of a pass, in the order run
     * @param rejectedHz steps a local fit rejected, Hz
     * @return the steps that are not disturbed, in the order given
     */
    static List<SweepPoint> reliable(List<SweepPoint> points, Set<Double> rejectedHz) {
        boolean[] disturbed = disturbed(points, rejectedHz);
        List<SweepPoint> out = new ArrayList<>();
        for (int i = 0; i < disturbed.length; i++) {
            if (!disturbed[i]) {
                out.add(points.get(i));
            }
        }
        return out;
    }

    /**
     * Adds a step to a batch unless a reliable step done, or one already in the batch, lies within {@code within}
     * of it; a step that would land on a disturbed one is moved by twice {@code within} (a step beside it).
     *
     * @param batch the batch being built
     * @param done every step of the pass so far, in the order run
     * @param rejectedHz steps a local fit rejected, Hz
     * @param f the step wanted, Hz
     * @param within the tolerance, Hz
     */
    static void add(List<Double> batch, List<SweepPoint> done, Set<Double> rejectedHz, double f, double within) {
        boolean[] disturbed = disturbed(done, rejectedHz);
        double g = f;
        if (taken(done, disturbed, batch, g, within, false)) {
            return;
        }
        if (taken(done, disturbed, batch, g, within, true)) {
            g += 2 * within;
            if (taken(done, disturbed, batch, g, within, false) || taken(done, disturbed, batch, g, within, true)) {
                return;
            }
        }
        if (g > 0) {
            batch.add(g);
        }
    }

    private static boolean taken(List<SweepPoint> done, boolean[] disturbed, List<Double> batch, double f,
                                 double within, boolean disturbedOnes) {
        for (int i = 0; i < disturbed.length; i++) {
            if (disturbed[i] == disturbedOnes && Math.abs(done.get(i).frequencyHz() - f) <= within) {
                return true;
            }
        }
        if (!disturbedOnes) {
            for (double g : batch) {
                if (Math.abs(g - f) <= within) {
                    return true;
                }
            }
        }
        return false;
    }

    /** @return the batch as an increasing array */
    static double[] sorted(List<Double> batch) {
        return batch.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    }
}
