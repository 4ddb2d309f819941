package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * Where the resonances of a sweep lie, from the phase of its FRF: the steps still needed to find every mode, and
 * the bands the modes turn the phase in.
 *
 * <p>Through one mode the phase of the receptance falls by 180 degrees, fastest at the natural frequency, where
 * d(phase)/df = -1/(zeta f_r) (the single-degree-of-freedom receptance: D. J. Ewins, Modal Testing: Theory,
 * Practice and Application, 2nd ed., Research Studies Press 2000, ch. 2, from memory). That fall shows between
 * any two steps on either side of the mode, however far apart, while a magnitude peak between two steps hides
 * when both stand on its flanks. So every interval between adjacent steps over which the phase falls by more
 * than {@link #SPLIT_DEGREES} (beyond a noise allowance) is split at its middle, round after round, until no
 * interval is flagged or it is narrower than {@link #MIN_WIDTH_BANDWIDTHS} half-power bandwidths at the plan's
 * initial damping (which the plan puts at or below the damping expected). Near a mode this ends with steps about
 * a quarter of a bandwidth apart (30 degrees is 0.52 zeta f_r at the steepest point); away from modes the coarse
 * spacing stays. A change near 180 degrees, whose sense two phases cannot tell, is split as well; a rise (an
 * antiresonance) is not. The noise allowance is {@link #NOISE_SIGMAS} standard errors of the phase difference,
 * the phase error of a step being about its relative magnitude error (J. S. Bendat and A. G. Piersol, Random
 * Data, 4th ed., Wiley 2010, from memory). Splitting where the phase turns fast is common practice.
 */
final class PhaseSearch {
    /** A fall of the phase between adjacent steps above this, degrees, is split. */
    static final double SPLIT_DEGREES = 30.0;
    /** A change above this, degrees, is split whatever its sign: its sense is ambiguous. */
    static final double AMBIGUOUS_DEGREES = 150.0;
    /** A fall above this, degrees, starts a resonance's band. */
    static final double CORE_DEGREES = 10.0;
    /**
     * A run extends over intervals falling at this fraction of its steepest rate or more: a single mode falls at
     * 1/(1 + x^2) of its peak rate x half-power half-widths away, so this reaches x = 7, beyond 95 % of its fall.
     */
    static final double SKIRT_FRACTION = 0.02;
    /** A band whose phase falls by less than this in all, degrees, is not a resonance. */
    static final double MIN_TURN_DEGREES = 45.0;
    /** A region's band holds every interval falling at this fraction of its steepest rate or more. */
    static final double STRONG_FRACTION = 0.25;
    /** A region's band reaches this many estimated half-power half-widths either side of its steepest fall. */
    static final double CORE_HALF_WIDTHS = 3.078;
    /** Intervals narrower than this many half-power bandwidths (at the initial damping) are not split. */
    static final double MIN_WIDTH_BANDWIDTHS = 0.125;
    /** Standard errors of the phase difference allowed for noise. */
    static final double NOISE_SIGMAS = 3.0;
    /** Runs whose bands come within this many estimated half-power bandwidths of each other are joined. */
    static final double MARGIN_BANDWIDTHS = 1.5;

    /**
     * Where the phase turns: the band that holds the modes, with a damping estimate.
     *
     * @param lowHz lower edge of the band, Hz
     * @param highHz upper edge of the band, Hz
     * @param peakHz the step of largest response in the run, Hz
     * @param dampingRatio damping estimated from the steepest interval, width / (f |fall in rad|): the
     *        single-mode slope 1/(zeta f) averaged over the interval, so at or above the damping of the mode
     * @param turnDegrees the phase's whole fall over the run, skirts included, degrees
     */
    record Region(double lowHz, double highHz, double peakHz, double dampingRatio, double turnDegrees) {
        /** @return the half-power bandwidth at the peak from the damping estimate, Hz */
        double bandwidthHz() {
            return 2 * dampingRatio * peakHz;
        }
    }

    private PhaseSearch() {
    }

    /**
     * The windows a coarse pass asks to search: runs of adjacent intervals over which the phase falls fast (or by
     * an ambiguous amount), each from its first step to its last.
     *
     * @param frf the coarse FRF, increasing frequency, any quantity
     * @param lowHz lowest frequency searched, Hz
     * @param highHz highest frequency searched, Hz
     * @return the windows as {low, high} pairs, Hz, increasing
     */
    static List<double[]> windows(Frf frf, double lowHz, double highHz) {
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i + 1 < h.size(); i++) {
            double fa = h.frequencyHz(i);
            double fb = h.frequencyHz(i + 1);
            if (fa < lowHz || fb > highHz || !flagged(h, i)) {
                continue;
            }
            double[] last = out.isEmpty() ? null : out.get(out.size() - 1);
            if (last != null && last[1] == fa) {
                last[1] = fb;
            } else {
                out.add(new double[] {fa, fb});
            }
        }
        return out;
    }

    /**
     * The steps the search asks for next: the middle of every interval where the phase falls fast.
     *
     * @param frf the sweep's FRF so far, increasing frequency, any quantity
     * @param lowHz lowest frequency searched, Hz
     * @param highHz highest frequency searched, Hz
     * @param minDampingRatio the lowest damping expected (the plan's initial damping ratio)
     * @return the new steps, increasing (empty when the search is done)
     */
    static double[] splits(Frf frf, double lowHz, double highHz, double minDampingRatio) {
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        List<Double> out = new ArrayList<>();
        for (int i = 0; i + 1 < h.size(); i++) {
            double fa = h.frequencyHz(i);
            double fb = h.frequencyHz(i + 1);
            double middle = 0.5 * (fa + fb);
            if (fa >= lowHz && fb <= highHz && fb - fa >= MIN_WIDTH_BANDWIDTHS * 2 * minDampingRatio * middle
                    && flagged(h, i)) {
                out.add(middle);
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** @return true when the phase falls fast from line i to line i + 1, or by an amount whose sense is ambiguous */
    private static boolean flagged(Frf h, int i) {
        double turn = Math.toDegrees(turnRad(h, i));
        double allowance = Math.toDegrees(allowanceRad(h, i));
        return -turn > SPLIT_DEGREES + allowance || (Math.abs(turn) > AMBIGUOUS_DEGREES && allowance < SPLIT_DEGREES);
    }

    /**
     * The bands where the phase falls. A run starts at intervals over which the phase falls by more than
     * {@link #CORE_DEGREES} (beyond noise), or would over half a bandwidth at the initial damping (so that a finely
     * stepped mode counts as well as a coarsely stepped one); it extends over the mode's skirts while the phase keeps
     * falling at {@link #SKIRT_FRACTION} or more of the run's steepest rate (out to about 7 half-power half-widths of
     * a single mode). Runs that touch, or whose margins of {@link #MARGIN_BANDWIDTHS} estimated bandwidths overlap,
     * are joined; those over which the phase falls by {@link #MIN_TURN_DEGREES} or more in all are kept.
     *
     * @param frf the sweep's FRF, increasing frequency, any quantity
     * @param lowHz lowest frequency searched, Hz
     * @param highHz highest frequency searched, Hz
     * @param minDampingRatio the lowest damping expected (the plan's initial damping ratio)
     * @return the regions, increasing frequency
     */
    static List<Region> regions(Frf frf, double lowHz, double highHz, double minDampingRatio) {
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        int n = h.size() - 1;
        boolean[] inside = new boolean[Math.max(n, 0)];
        boolean[] seed = new boolean[inside.length];
        for (int i = 0; i < n; i++) {
            inside[i] = h.frequencyHz(i) >= lowHz && h.frequencyHz(i + 1) <= highHz;
            double fall = Math.toDegrees(-turnRad(h, i)) - Math.toDegrees(allowanceRad(h, i));
            double span = minDampingRatio * 0.5 * (h.frequencyHz(i) + h.frequencyHz(i + 1));
            seed[i] = inside[i] && (fall > CORE_DEGREES || fall * span / width(h, i) > CORE_DEGREES);
        }
        List<int[]> runs = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!seed[i] || (i > 0 && seed[i - 1])) {
                continue;
            }
            int first = i;
            int last = i;
            double steepest = 0;
            while (last < n && seed[last]) {
                steepest = Math.max(steepest, -turnRad(h, last) / width(h, last));
                last++;
            }
            int[] run = {first, last};
            while (run[0] > 0 && onSkirt(h, run[0] - 1, inside, steepest)) {
                run[0]--;
            }
            while (run[1] < n && onSkirt(h, run[1], inside, steepest)) {
                run[1]++;
            }
            int[] previous = runs.isEmpty() ? null : runs.get(runs.size() - 1);
            if (previous != null && (previous[1] >= run[0]
                    || reach(region(h, previous), 1) >= reach(region(h, run), -1))) {
                previous[0] = Math.min(previous[0], run[0]);
                previous[1] = Math.max(previous[1], run[1]);
            } else {
                runs.add(run);
            }
        }
        return runs.stream().map(r -> region(h, r)).filter(r -> r.turnDegrees() >= MIN_TURN_DEGREES).toList();
    }

    /** @return true when interval i lies in the window and its phase falls, beyond noise, at the skirt's rate */
    private static boolean onSkirt(Frf h, int i, boolean[] inside, double steepestRadPerHz) {
        double fall = -turnRad(h, i);
        return inside[i] && fall > allowanceRad(h, i) && fall / width(h, i) >= SKIRT_FRACTION * steepestRadPerHz;
    }

    private static double width(Frf h, int i) {
        return h.frequencyHz(i + 1) - h.frequencyHz(i);
    }

    /** @return the edge of a region's margin: above it for side 1, below it for side -1, Hz */
    private static double reach(Region r, int side) {
        return side > 0 ? r.highHz() + MARGIN_BANDWIDTHS * r.bandwidthHz() : r.lowHz() - MARGIN_BANDWIDTHS * r.bandwidthHz();
    }

    /**
     * The region of the lines run[0] to run[1]. Its band spans {@link #CORE_HALF_WIDTHS} estimated half-power
     * half-widths either side of the steepest fall, for one mode the 10 % to 90 % of its fall (where the phase is 18
     * degrees from either end: 1/tan(18 deg) = 3.078 half-widths from the peak), and every interval falling at
     * {@link #STRONG_FRACTION} of the steepest rate or more (a second mode), within the run.
     */
    private static Region region(Frf h, int[] run) {
        double turn = 0;
        double steepest = 0;
        double steepestHz = Double.NaN;
        double damping = Double.NaN;
        int peak = run[0];
        for (int i = run[0]; i < run[1]; i++) {
            double fall = -turnRad(h, i);
            double middle = 0.5 * (h.frequencyHz(i) + h.frequencyHz(i + 1));
            if (fall / width(h, i) > steepest) {
                steepest = fall / width(h, i);
                damping = width(h, i) / (middle * fall);
                steepestHz = middle;
            }
            turn += fall;
        }
        double reach = CORE_HALF_WIDTHS * damping * steepestHz;
        double low = steepestHz - reach;
        double high = steepestHz + reach;
        for (int i = run[0]; i < run[1]; i++) {
            if (-turnRad(h, i) / width(h, i) >= STRONG_FRACTION * steepest) {
                low = Math.min(low, h.frequencyHz(i));
                high = Math.max(high, h.frequencyHz(i + 1));
            }
        }
        for (int i = run[0]; i <= run[1]; i++) {
            if (h.magnitude(i) > h.magnitude(peak)) {
                peak = i;
            }
        }
        return new Region(Math.max(h.frequencyHz(run[0]), low), Math.min(h.frequencyHz(run[1]), high),
                h.frequencyHz(peak), damping, Math.toDegrees(turn));
    }

    /** @return the change of phase from line i to line i + 1, rad, in (-pi, pi] */
    static double turnRad(Frf h, int i) {
        Complex ratio = h.value(i + 1).multiply(h.value(i).conjugate());
        return ratio.getArgument();
    }

    /** @return the noise allowance of the phase change from line i to line i + 1, rad */
    private static double allowanceRad(Frf h, int i) {
        return NOISE_SIGMAS * Math.hypot(phaseStdRad(h, i), phaseStdRad(h, i + 1));
    }

    /** Standard error of the phase of line i, rad: about the relative error of |H| (sqrt(variance / 2) / |H|). */
    private static double phaseStdRad(Frf h, int i) {
        double m = h.magnitude(i);
        if (!(m > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return h.variance().map(v -> Math.sqrt(v[i] / 2) / m).orElse(0.0);
    }
}
