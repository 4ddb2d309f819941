package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

/**
 * Adds modes that the stabilisation chart missed, where the refined model leaves a residual far above the noise.
 *
 * <p>LSCF with uniform weights is not a consistent estimator under noise, and over a wide band its equation error
 * is dominated by the strongest peaks; a weak mode, or the weaker partner of a close doublet, may then fail the
 * chart's order-to-order criteria although it stands 30 dB above the noise. With the FRF's variance known the
 * whitened residual e_k = (H_k - H_model,k)/sigma_k of a correct model is circular unit-variance noise, so
 * |e_k|^2 is exponential with mean 1 and the sum over {@link #WINDOW} adjacent lines is Gamma(5, 1) distributed
 * (S. M. Kay, Fundamentals of Statistical Signal Processing: Detection Theory, 1998, ch. 2, from memory).
 * P(sum &gt; {@link #THRESHOLD}) is about 4e-9, so over 10^5 windows a false alarm has odds near 4e-4. Where the
 * largest window sum exceeds the threshold, a pole is put at the line of largest residual in it, with the damping
 * ratio of the nearest fitted mode (close modes of one specimen damp alike; a string's two polarisations nearly
 * equally); LSFD and the joint refinement are rerun with all poles. The new model is kept only when the refined
 * cost falls by more than the threshold as well; at most {@link #MAX_ADDED} modes are added. The idea of fitting,
 * inspecting the residual and adding a mode is the usual manual practice (D. J. Ewins, Modal Testing, 2nd ed.
 * 2000, ch. 4, from memory); the thresholds are our choice. Windows within {@link ModeSelection#EDGE_GUARD} of
 * the band edges are not searched.
 */
final class ModalResidualSearch {
    /** Adjacent lines summed by the detector. */
    static final int WINDOW = 5;
    /** Window sum of |e_k|^2 (and drop in refined cost) that marks a missed mode. */
    static final double THRESHOLD = 30;
    /** Most modes added to one fit. */
    static final int MAX_ADDED = 10;

    /**
     * The outcome of a search.
     *
     * @param refined the refinement of the final model
     * @param added the poles added, in the order found
     */
    record Outcome(ModalRefinementResult refined, List<Pole> added) {
    }

    private ModalResidualSearch() {
    }

    /**
     * Searches the residual of a refined fit and adds the modes it shows.
     *
     * @param h the measured receptance with its per-line variance
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param fit the refinement of the chosen poles
     * @param options the refinement options used for it
     * @return the final refinement and the poles added (none when the residual is noise)
     */
    static Outcome search(Frf h, double lowHz, double highHz, ModalRefinementResult fit, ModalRefinementOptions options) {
        double[] variance = h.variance().orElseThrow(() -> new AnalysisException(
                "the residual search needs the FRF's variance, got none"));
        double guardHz = ModeSelection.EDGE_GUARD * (highHz - lowHz);
        ModalRefinementResult current = fit;
        List<Pole> added = new ArrayList<>();
        while (added.size() < MAX_ADDED) {
            int peak = strongestWindowPeak(h, variance, current, lowHz + guardHz, highHz - guardHz);
            if (peak < 0) {
                break;
            }
            Pole pole = Pole.of(h.frequencyHz(peak), nearestDamping(current.modes(), h.frequencyHz(peak)));
            List<Pole> poles = new ArrayList<>();
            for (FittedMode m : current.modes()) {
                poles.add(Pole.of(m.mode().frequencyHz(), Math.min(m.mode().dampingRatio(), 0.99)));
            }
            poles.add(pole);
            ModalRefinementResult next;
            try {
                LsfdResult start = Lsfd.fit(h, poles, options.lines());
                next = ModalRefinement.refine(h, start.modes(), start.residualTerms(), options);
            } catch (AnalysisException e) {
                break;
            }
            if (!(current.cost() - next.cost() > THRESHOLD)) {
                break;
            }
            current = next;
            added.add(pole);
        }
        return new Outcome(current, List.copyOf(added));
    }

    /** The line of largest whitened residual in the window of largest sum above the threshold, or -1. */
    private static int strongestWindowPeak(Frf h, double[] variance, ModalRefinementResult fit, double fromHz,
                                           double toHz) {
        int n = h.size();
        double[] e2 = new double[n];
        for (int k = 0; k < n; k++) {
            double f = h.frequencyHz(k);
            Complex model = fit.residualTerms().receptanceAt(f);
            for (FittedMode m : fit.modes()) {
                model = model.add(m.mode().receptanceAt(f));
            }
            e2[k] = h.value(k).subtract(model).norm();
            e2[k] = variance[k] > 0 ? e2[k] * e2[k] / variance[k] : 0;
        }
        double best = THRESHOLD;
        int bestStart = -1;
        double sum = 0;
        for (int k = 0; k < n; k++) {
            sum += e2[k];
            if (k >= WINDOW) {
                sum -= e2[k - WINDOW];
            }
            int start = k - WINDOW + 1;
            if (start >= 0 && h.frequencyHz(start) >= fromHz && h.frequencyHz(k) <= toHz && sum > best) {
                best = sum;
                bestStart = start;
            }
        }
        if (bestStart < 0) {
            return -1;
        }
        int peak = bestStart;
        for (int k = bestStart; k < bestStart + WINDOW; k++) {
            if (e2[k] > e2[peak]) {
                peak = k;
            }
        }
        return peak;
    }

    private static double nearestDamping(List<FittedMode> modes, double frequencyHz) {
        double zeta = 0.01;
        double distance = Double.POSITIVE_INFINITY;
        for (FittedMode m : modes) {
            double d = Math.abs(m.mode().frequencyHz() - frequencyHz);
            if (d < distance) {
                distance = d;
                zeta = m.mode().dampingRatio();
            }
        }
        return Math.min(Math.max(zeta, 1e-5), ModeSelection.MAX_DAMPING_RATIO);
    }
}
