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
 * P(sum &gt; {@link #THRESHOLD}) is about 4e-9, so over 10^5 windows a false alarm has odds near 4e-4.
 *
 * <p>Each round ranks the windows whose sum exceeds the threshold and whose misfit is material (at least
 * {@link ModalCandidate#MATERIAL} of the response over the window), strongest first, keeping a window only where no
 * stronger peak already ranked would by itself stay above the detection level: a resonance of peak level P and
 * half-power half-width zeta f keeps |e|^2 above THRESHOLD/WINDOW out to zeta f sqrt(P WINDOW/THRESHOLD - 1) from
 * its peak (and at least {@link ModalResidualStart#FIRST_LINES}/2 lines). One pole is put at the line of largest
 * residual in the first window with the damping ratio of the nearest fitted mode (close modes of one specimen damp
 * alike; a string's two polarisations nearly equally), and the model is fitted again with it, first near the new pole
 * and then as a whole ({@link ModalCandidate#tryNew}). The new model is kept when {@link ModalCandidate#better} says
 * its cost fell far enough. If not,
 * the pole of {@link ModalResidualStart} (a one-pole fit of the residual around that line) is tried from the same
 * window, then that pole together with the local pole of the strongest line within the window's reach but outside
 * two half-power half-widths of the first (a pair missing together, whose one added pole cannot settle while its
 * partner's residual pulls at it), then the next window, up to {@link #TRIES_PER_ROUND} windows. The neighbour's
 * damping goes first because a local one-pole fit over an unresolved doublet returns one broad pole between its
 * modes. A round adds one pole,
 * or one pair, so a close partner of a found mode waits for the next round's residual. The search
 * stops when a round adds nothing or {@link #MAX_ADDED} modes have been added. Fitting, inspecting the residual
 * and adding a mode is the usual manual practice (D. J. Ewins, Modal Testing, 2nd ed. 2000, ch. 4, from memory);
 * the thresholds are our choice. Windows within {@link ModeSelection#EDGE_GUARD} of the band edges are not
 * searched.
 */
final class ModalResidualSearch {
    /** Adjacent lines summed by the detector. */
    static final int WINDOW = 5;
    /** Window sum of |e_k|^2 that marks a missed mode (the fall of the refined cost is {@link ModalCandidate}'s). */
    static final double THRESHOLD = ModalCandidate.THRESHOLD;
    /** Most modes added to one fit. */
    static final int MAX_ADDED = 10;
    /** Residual peaks tried, strongest first, before a round gives up. */
    static final int TRIES_PER_ROUND = 4;

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
        return search(h, variance, lowHz, highHz, fit, options);
    }

    /**
     * Searches the residual of a refined fit and adds the modes it shows.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line of h, positive
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param fit the refinement of the chosen poles
     * @param options the refinement options used for it
     * @return the final refinement and the poles added (none when the residual is noise)
     */
    static Outcome search(Frf h, double[] variance, double lowHz, double highHz, ModalRefinementResult fit,
                          ModalRefinementOptions options) {
        return search(h, variance, lowHz, highHz, fit, options, ModeSelection.EDGE_GUARD);
    }

    /**
     * Searches the residual of a refined fit, away from the band's edges, and adds the modes it shows.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line of h, positive
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param fit the refinement of the chosen poles
     * @param options the refinement options used for it
     * @param margin the fraction of the band's width at each edge whose windows are not searched
     * @return the final refinement and the poles added (none when the residual is noise)
     */
    static Outcome search(Frf h, double[] variance, double lowHz, double highHz, ModalRefinementResult fit,
                          ModalRefinementOptions options, double margin) {
        double guardHz = margin * (highHz - lowHz);
        ModalRefinementResult current = fit;
        List<Pole> added = new ArrayList<>();
        while (added.size() < MAX_ADDED) {
            ModalRefinementResult next = null;
            for (List<List<Pole>> starts : candidates(h, variance, current, lowHz + guardHz, highHz - guardHz)) {
                List<Integer> kept = java.util.stream.IntStream.range(0, current.modes().size()).boxed().toList();
                for (List<Pole> poles : starts) {
                    ModalRefinementResult candidate = ModalCandidate.tryNew(h, variance, lowHz, highHz, current, kept,
                            poles, options, c -> true);
                    if (candidate != null) {
                        next = candidate;
                        added.addAll(poles);
                        break;
                    }
                }
                if (next != null) {
                    break;
                }
            }
            if (next == null) {
                break;
            }
            current = next;
        }
        return new Outcome(current, List.copyOf(added));
    }

    /** |e_k|^2 of the whitened residual at each line, the residual itself stored in {@code residual}. */
    private static double[] whitenedSquares(Frf h, double[] variance, List<Mode> modes, ResidualTerms terms,
                                            Complex[] residual) {
        FitResidual fit = FitResidual.of(h, variance, modes, terms);
        Complex[] r = fit.residual();
        System.arraycopy(r, 0, residual, 0, r.length);
        double[] e2 = fit.whitenedSquares();
        for (int k = 0; k < e2.length; k++) {
            if (!(variance[k] > 0)) {
                e2[k] = 0; // a line without a noise variance carries no weight
            }
        }
        return e2;
    }

    /**
     * For each separated residual peak above the threshold, strongest first and at most a round's tries, its sets
     * of start poles in the order tried: the pole at the peak line with the nearest mode's damping, then the local
     * one-pole fit when that is plausible, then that pole with its partner when one stands out.
     */
    private static List<List<List<Pole>>> candidates(Frf h, double[] variance, ModalRefinementResult fit, double fromHz,
                                                     double toHz) {
        int n = h.size();
        double[] f = h.frequenciesHz();
        Complex[] residual = new Complex[n];
        List<Mode> modes = fit.modes().stream().map(FittedMode::mode).toList();
        double[] e2 = whitenedSquares(h, variance, modes, fit.residualTerms(), residual);
        double[] windowSum = new double[n];
        double sum = 0;
        for (int k = 0; k < n; k++) {
            sum += e2[k];
            if (k >= WINDOW) {
                sum -= e2[k - WINDOW];
            }
            int start = k - WINDOW + 1;
            if (start >= 0 && f[start] >= fromHz && f[k] <= toHz && material(h, residual, start)) {
                windowSum[start] = sum;
            }
        }
        boolean[] taken = new boolean[n];
        List<List<List<Pole>>> out = new ArrayList<>();
        while (out.size() < TRIES_PER_ROUND) {
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
            Pole neighbour = Pole.of(f[peak], nearestDamping(fit.modes(), f[peak]));
            Pole reach = local == null ? neighbour : local;
            double reachHz = reach.dampingRatio() * reach.frequencyHz()
                    * Math.sqrt(Math.max(0, e2[peak] * WINDOW / THRESHOLD - 1));
            List<List<Pole>> starts = new ArrayList<>();
            starts.add(List.of(neighbour));
            if (local != null) {
                starts.add(List.of(local));
                Pole partner = partner(f, e2, residual, local, reachHz);
                if (partner != null) {
                    starts.add(List.of(local, partner));
                }
            }
            out.add(starts);
            for (int k = 0; k < n; k++) {
                if (2 * Math.abs(k - peak) <= ModalResidualStart.FIRST_LINES || Math.abs(f[k] - f[peak]) <= reachHz) {
                    taken[k] = true;
                }
            }
        }
        return out;
    }

    /**
     * The local pole of the strongest residual line within reach of a local pole but outside two of its half-power
     * half-widths, or null when no line there is above the detection level: the partner of a missing pair.
     */
    private static Pole partner(double[] f, double[] e2, Complex[] residual, Pole local, double reachHz) {
        double centreHz = local.frequencyHz();
        double clearHz = 2 * local.dampingRatio() * centreHz;
        int best = -1;
        for (int k = 0; k < f.length; k++) {
            double d = Math.abs(f[k] - centreHz);
            if (d > clearHz && d <= reachHz && e2[k] > THRESHOLD / WINDOW && (best < 0 || e2[k] > e2[best])) {
                best = k;
            }
        }
        if (best < 0) {
            return null;
        }
        Pole p = ModalResidualStart.at(f, residual, best);
        return p == null || Math.abs(p.frequencyHz() - centreHz) <= clearHz ? null : p;
    }

    /** Whether the misfit over the window starting at a line is material ({@link ModalCandidate#MATERIAL} of |H| there). */
    static boolean material(Frf h, Complex[] residual, int start) {
        double misfit = 0;
        double response = 0;
        for (int k = start; k < start + WINDOW; k++) {
            misfit += residual[k].norm() * residual[k].norm();
            response += h.magnitude(k) * h.magnitude(k);
        }
        return misfit >= ModalCandidate.MATERIAL * ModalCandidate.MATERIAL * response;
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
