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
 * is dominated by the strongest peaks; a weak mode, the weaker partner of a close doublet, or a lightly damped
 * doublet resolved by only a few lines may then fail the chart's order-to-order criteria although it stands 30 dB
 * above the noise. With the FRF's variance known the whitened residual e_k = (H_k - H_model,k)/sigma_k of a
 * correct model is circular unit-variance noise, so |e_k|^2 is exponential with mean 1 and the sum over
 * {@link #WINDOW} adjacent lines is Gamma(5, 1) distributed (S. M. Kay, Fundamentals of Statistical Signal
 * Processing: Detection Theory, 1998, ch. 2, from memory). P(sum &gt; {@link #THRESHOLD}) is about 4e-9, so over
 * 10^5 windows a false alarm has odds near 4e-4.
 *
 * <p>Each round takes the windows whose sum exceeds the threshold, strongest first, and puts a pole at the line
 * of largest residual in each, started by {@link ModalResidualStart} from the residual around that line (or, when
 * that gives no plausible pole, with the damping ratio of the nearest fitted mode). A window is skipped when it
 * lies where a peak already taken would by itself stay above the detection level: a resonance of peak level P
 * and half-power half-width zeta f keeps |e|^2 above THRESHOLD/WINDOW out to zeta f sqrt(P WINDOW/THRESHOLD - 1)
 * from its peak (and at least {@link ModalResidualStart#FIRST_LINES} lines), so one missing mode gives one pole
 * and a close partner waits for the next round. LSFD and the joint refinement are then rerun with all poles. A
 * round is kept when the refined cost falls by more than the threshold per added pole and each added mode is
 * significant on its own: half of (A/std A)^2 for its modal constant, the linearised cost rise if it were
 * dropped, exceeds the threshold as well. A round of several poles that fails is retried with its strongest pole
 * alone; the search stops when that fails too, or when {@link #MAX_ADDED} modes have been added. Fitting,
 * inspecting the residual and adding a mode is the usual manual practice (D. J. Ewins, Modal Testing, 2nd ed.
 * 2000, ch. 4, from memory); the thresholds are our choice. Windows within {@link ModeSelection#EDGE_GUARD} of
 * the band edges are not searched.
 */
final class ModalResidualSearch {
    /** Adjacent lines summed by the detector. */
    static final int WINDOW = 5;
    /** Window sum of |e_k|^2 (and drop in refined cost per added mode) that marks a missed mode. */
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
            List<Pole> batch = candidates(h, variance, current, lowHz + guardHz, highHz - guardHz,
                    MAX_ADDED - added.size());
            if (batch.isEmpty()) {
                break;
            }
            ModalRefinementResult next = withPoles(h, current, batch, options);
            if (next == null && batch.size() > 1) {
                batch = batch.subList(0, 1);
                next = withPoles(h, current, batch, options);
            }
            if (next == null) {
                break;
            }
            current = next;
            added.addAll(batch);
        }
        return new Outcome(current, List.copyOf(added));
    }

    /** The refinement with the poles added, or null when it fails or an added mode is not significant. */
    private static ModalRefinementResult withPoles(Frf h, ModalRefinementResult current, List<Pole> batch,
                                                   ModalRefinementOptions options) {
        List<Pole> poles = new ArrayList<>();
        for (FittedMode m : current.modes()) {
            poles.add(Pole.of(m.mode().frequencyHz(), Math.min(m.mode().dampingRatio(), 0.99)));
        }
        poles.addAll(batch);
        ModalRefinementResult next;
        try {
            LsfdResult start = Lsfd.fit(h, poles, options.lines());
            next = ModalRefinement.refine(h, start.modes(), start.residualTerms(), options);
        } catch (AnalysisException e) {
            return null;
        }
        if (!(current.cost() - next.cost() > THRESHOLD * batch.size())) {
            return null;
        }
        List<FittedMode> modes = next.modes();
        for (int r = current.modes().size(); r < modes.size(); r++) {
            if (!(waldStatistic(modes.get(r)) > THRESHOLD)) {
                return null;
            }
        }
        return next;
    }

    /** Half of (A/std A)^2 summed over the parts of the modal constant that were fitted. */
    private static double waldStatistic(FittedMode m) {
        Complex a = m.mode().modalConstant();
        Complex std = m.modalConstantStd();
        double re = a.getReal() / std.getReal();
        double im = std.getImaginary() > 0 ? a.getImaginary() / std.getImaginary() : 0;
        return 0.5 * (re * re + im * im);
    }

    /** Start poles at the separated residual peaks above the threshold, strongest first, at most {@code most}. */
    private static List<Pole> candidates(Frf h, double[] variance, ModalRefinementResult fit, double fromHz,
                                         double toHz, int most) {
        int n = h.size();
        double[] f = h.frequenciesHz();
        Complex[] residual = new Complex[n];
        double[] e2 = new double[n];
        for (int k = 0; k < n; k++) {
            Complex model = fit.residualTerms().receptanceAt(f[k]);
            for (FittedMode m : fit.modes()) {
                model = model.add(m.mode().receptanceAt(f[k]));
            }
            residual[k] = h.value(k).subtract(model);
            double norm = residual[k].norm();
            e2[k] = variance[k] > 0 ? norm * norm / variance[k] : 0;
        }
        double[] windowSum = new double[n];
        double sum = 0;
        for (int k = 0; k < n; k++) {
            sum += e2[k];
            if (k >= WINDOW) {
                sum -= e2[k - WINDOW];
            }
            int start = k - WINDOW + 1;
            if (start >= 0 && f[start] >= fromHz && f[k] <= toHz) {
                windowSum[start] = sum;
            }
        }
        boolean[] taken = new boolean[n];
        List<Pole> out = new ArrayList<>();
        while (out.size() < most) {
            int best = -1;
            for (int s = 0; s + WINDOW <= n; s++) {
                if (windowSum[s] > THRESHOLD && !taken[s] && !taken[s + WINDOW - 1]
                        && (best < 0 || windowSum[s] > windowSum[best])) {
                    best = s;
                }
            }
            if (best < 0) {
                break;
            }
            int peak = best;
            for (int k = best; k < best + WINDOW; k++) {
                if (e2[k] > e2[peak]) {
                    peak = k;
                }
            }
            Pole local = ModalResidualStart.at(f, residual, peak);
            Pole pole = local != null ? local : Pole.of(f[peak], nearestDamping(fit.modes(), f[peak]));
            out.add(pole);
            double reachHz = pole.dampingRatio() * pole.frequencyHz()
                    * Math.sqrt(Math.max(0, e2[peak] * WINDOW / THRESHOLD - 1));
            for (int k = 0; k < n; k++) {
                if (2 * Math.abs(k - peak) <= ModalResidualStart.FIRST_LINES || Math.abs(f[k] - f[peak]) <= reachHz) {
                    taken[k] = true;
                }
            }
        }
        return out;
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
