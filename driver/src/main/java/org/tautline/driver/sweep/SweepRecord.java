package org.tautline.driver.sweep;

import java.util.List;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * The outcome of a stepped-sine sweep: every completed step, in the order run.
 *
 * @param plan the plan that was run
 * @param responseQuantity what the response channel measured: displacement, velocity or acceleration
 * @param points completed steps (all of them when {@code completed}, those before the stop otherwise)
 * @param rigTimeS rig time the sweep took, ramps included, s
 * @param completed true when every planned step was run, false after a cancel
 */
public record SweepRecord(SteppedSinePlan plan, String responseQuantity, List<SweepPoint> points, double rigTimeS,
                          boolean completed) {

    /** Copies the list so the record stays immutable. */
    public SweepRecord {
        points = List.copyOf(points);
    }

    /**
     * The FRF of the completed steps, with each step's relative residual as its quality figure and
     * the variance of each value from the sine fits' standard errors.
     *
     * <p>The variance E|H_est - H|^2 is taken as 2 |H|^2 r^2, r the relative standard error of |H|:
     * for small errors the phase error (rad) of a ratio of phasors is about as large as its relative
     * magnitude error (Bendat and Piersol, Random Data, 2010, from memory), and the two add.
     *
     * @return the FRF in the quantity of the response channel (receptance for displacement)
     */
    public Frf toFrf() {
        return frfOf(points, responseQuantity);
    }

    /**
     * The FRF of any list of sweep points, in increasing frequency, as {@link #toFrf()} describes.
     *
     * @param points the points, in any order, no two at the same frequency
     * @param responseQuantity displacement, velocity or acceleration
     * @return the FRF
     */
    public static Frf frfOf(List<SweepPoint> points, String responseQuantity) {
        List<SweepPoint> sorted = new java.util.ArrayList<>(points);
        sorted.sort(java.util.Comparator.comparingDouble(SweepPoint::frequencyHz));
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
