package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.FittedMode;

/**
 * One level and direction of a sweep: its steps, the resonances it refined and what it warned of.
 *
 * @param index the pass's place in the plan, 0 first
 * @param level the level, N (force control) or V (drive)
 * @param direction UP or DOWN
 * @param points the steps in the order run
 * @param responseQuantity what channel 1 measured: displacement, velocity or acceleration
 * @param rigTimeS rig time of the pass, from the end of the pass before (or the sweep's start), s
 * @param settleRigTimeS rig time spent settling, s (the rest is integration and ramps)
 * @param modes the local fit of each resonance refined, with standard errors (none for a uniform plan)
 * @param targetsMet true when every resonance met both accuracy targets (always true for a uniform plan)
 * @param complete true when the pass ran to its end
 * @param warnings plain sentences: levels not reached, settles that timed out, targets not met, a stop
 */
public record SweepPass(int index, double level, SweepDirection direction, List<SweepPoint> points,
                        String responseQuantity, double rigTimeS, double settleRigTimeS, List<FittedMode> modes,
                        boolean targetsMet, boolean complete, List<String> warnings) {

    /** Copies the lists. */
    public SweepPass {
        points = List.copyOf(points);
        modes = List.copyOf(modes);
        warnings = List.copyOf(warnings);
    }

    /** @return the FRF of the pass's steps, increasing frequency (see {@link #frfOf(List, String)}) */
    public Frf toFrf() {
        return frfOf(points, responseQuantity);
    }

    /**
     * The FRF of any list of sweep points, in increasing frequency, with each step's relative residual as its
     * quality figure and the variance of each value from the sine fits' standard errors.
     *
     * <p>The variance E|H_est - H|^2 is taken as 2 |H|^2 r^2, r the relative standard error of |H|: for small
     * errors the phase error (rad) of a ratio of phasors is about as large as its relative magnitude error
     * (Bendat and Piersol, Random Data, 2010, from memory), and the two add.
     *
     * @param points the points, in any order, no two at the same frequency
     * @param responseQuantity displacement, velocity or acceleration
     * @return the FRF in the quantity of the response (receptance for displacement)
     */
    public static Frf frfOf(List<SweepPoint> points, String responseQuantity) {
        List<SweepPoint> sorted = new ArrayList<>(points);
        sorted.sort(Comparator.comparingDouble(SweepPoint::frequencyHz));
        int n = sorted.size();
        double[] f = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        double[] quality = new double[n];
        double[] variance = new double[n];
        for (int i = 0; i < n; i++) {
            SweepPoint p = sorted.get(i);
            f[i] = p.frequencyHz();
            re[i] = p.response().getReal();
            im[i] = p.response().getImaginary();
            quality[i] = p.relativeResidual();
            double magnitude = p.response().norm();
            variance[i] = 2 * magnitude * magnitude * p.relativeStdError() * p.relativeStdError();
        }
        return Frf.of(f, re, im, FrfQuantity.forResponse(responseQuantity)).withQuality(quality).withVariance(variance);
    }
}
