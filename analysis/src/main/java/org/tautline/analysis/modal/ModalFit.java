package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

/**
 * The fit of a chosen set of poles: LSFD, the joint refinement with robust weights, then the fit's own search for what
 * it missed.
 *
 * <p>Lines are weighted by 1/variance of their noise ({@link NoiseFloor}); where the refined model leaves lines more
 * than twice {@value FitResidual#HUBER} standard deviations off, those lines are given Huber's weights and the
 * refinement repeated ({@link FitResidual}), up to {@value #ROBUST_PASSES} times: once before the search when they
 * dominate the first fit (its residual variance above {@value #DOMINATED} noise variances, as when a few steps of a
 * slightly nonlinear specimen stand a thousand standard deviations off), and after the search in any case, when the
 * modes it added will have explained some of them. Where the residual then stands
 * above the noise, the fit tries modes added where the residual shows them ({@link ModalResidualSearch}), fixed
 * poles beyond the band's edges for the modes outside it ({@link ModalRepair#beyondEdges}), and a pole split in two
 * ({@link ModalRepair#split}), each kept only when it lowers the cost as {@link ModalCandidate} asks; the robust
 * weights are then renewed once more. The order: first the poles beyond the edges that alone remove at least
 * {@value #DOMINANT_SHARE} of the misfit (strong modes just outside the band leave a misfit that spreads over it and
 * would call for many modes inside, each tried and refused), then the search, then poles beyond the edges again, and
 * the search once more when they changed the model. A mode missing near an edge may win a pole beyond it, but a pole
 * held at its place outside cannot stand in for the mode, whose own residual the search then finds.
 */
final class ModalFit {
    /**
     * Share of a model's misfit (its cost above what noise leaves) that a pole beyond an edge must remove to be tried
     * before the search for missing modes: then the modes beyond the band account for most of the misfit.
     */
    static final double DOMINANT_SHARE = 0.5;
    /** Most refinements with renewed robust weights. */
    static final int ROBUST_PASSES = 3;
    /**
     * Residual variance per line (in noise variances) above which lines far off the first model are taken to dominate
     * it, and are weighed down before the search for missing modes rather than after.
     */
    private static final double DOMINATED = 10;
    /** A weight below this marks a line far off the model (|e| above twice Huber's constant). */
    private static final double OUTLIER_WEIGHT = 0.5;

    /**
     * A refined model and the options (with the robust weights) it was refined with.
     *
     * @param refined the refinement
     * @param options its options
     */
    record Refined(ModalRefinementResult refined, ModalRefinementOptions options, boolean robust) {
    }

    /**
     * The outcome of the search for what the first fit missed.
     *
     * @param refined the final model and its options
     * @param added poles added where the residual showed a mode
     * @param splitHz frequencies of modes split in two, Hz
     */
    record Searched(Refined refined, List<Pole> added, List<Double> splitHz) {
    }

    private ModalFit() {
    }

    /**
     * LSFD on the poles and the joint refinement, with robust weights where lines lie far off the model.
     *
     * @param h the measured receptance
     * @param noise the noise variance of each line
     * @param poles the chosen poles
     * @param base the LSFD options without weights (mode form, residual terms, band)
     * @return the refined model
     * @throws AnalysisException when no refinement succeeds
     */
    static Refined refine(Frf h, double[] noise, List<Pole> poles, LsfdOptions base) {
        ModalRefinementOptions options = ModalRefinementOptions.of(base.withWeights(weights(noise, null)));
        LsfdResult start = Lsfd.fit(h, poles, options.lines());
        try {
            ModalRefinementResult refined = ModalRefinement.refine(h, start.modes(), start.residualTerms(), options);
            double[] u = FitResidual.of(h, noise, plain(refined), refined.residualTerms()).huberWeights();
            boolean dominated = min(u) < OUTLIER_WEIGHT && refined.residualVariance() > DOMINATED;
            return dominated ? reweighted(h, noise, refined, base, 1) : new Refined(refined, options, false);
        } catch (AnalysisException failure) {
            // Lines far off the LSFD model may have led the refinement astray: weigh them down and start again.
            double[] u = FitResidual.of(h, noise, start.modes(), start.residualTerms()).huberWeights();
            ModalRefinementOptions robust = ModalRefinementOptions.of(base.withWeights(weights(noise, u)));
            try {
                LsfdResult again = Lsfd.fit(h, poles, robust.lines());
                ModalRefinementResult refined = ModalRefinement.refine(h, again.modes(), again.residualTerms(), robust);
                return reweighted(h, noise, refined, base, 1);
            } catch (AnalysisException e) {
                throw failure;
            }
        }
    }

    /**
     * Refines a model again with Huber's weights from its own residual, until no line lies far off it or the passes
     * are done; a refinement that fails ends the passes.
     *
     * @param h the measured receptance
     * @param noise the noise variance of each line
     * @param fit the model
     * @param base the LSFD options without weights
     * @param passes most refinements, at least 1
     * @return the last model refined
     */
    static Refined reweighted(Frf h, double[] noise, ModalRefinementResult fit, LsfdOptions base, int passes) {
        ModalRefinementResult current = fit;
        ModalRefinementOptions options = null;
        double[] u = FitResidual.of(h, noise, plain(current), current.residualTerms()).huberWeights();
        for (int pass = 0; pass < passes; pass++) {
            ModalRefinementOptions robust = ModalRefinementOptions.of(base.withWeights(weights(noise, u)));
            try {
                current = ModalRefinement.refine(h, plain(current), current.residualTerms(), robust);
                options = robust;
            } catch (AnalysisException e) {
                break;
            }
            u = FitResidual.of(h, noise, plain(current), current.residualTerms()).huberWeights();
            if (min(u) >= OUTLIER_WEIGHT) {
                break;
            }
        }
        if (options == null) {
            u = FitResidual.of(h, noise, plain(fit), fit.residualTerms()).huberWeights();
            options = ModalRefinementOptions.of(base.withWeights(weights(noise, u)));
        }
        return new Refined(current, options, true);
    }

    /**
     * Where the residual of a refined model stands above the noise: a pole beyond an edge, missed modes, split poles,
     * then the robust weights renewed.
     *
     * @param h the measured receptance
     * @param noise the noise variance of each line, for the weights
     * @param judged the variance the decisions are judged against ({@link NoiseFloor#judged})
     * @param lowHz lower edge of the band, Hz
     * @param highHz upper edge, Hz
     * @param first the refined model of the chosen poles
     * @param base the LSFD options without weights
     * @return the final model and what was added
     */
    static Searched search(Frf h, double[] noise, double[] judged, double lowHz, double highHz, Refined first,
                           LsfdOptions base) {
        ModalRefinementResult current = first.refined();
        ModalRefinementOptions options = first.options();
        List<Pole> added = new ArrayList<>();
        ModalRepair.Edges dominant = ModalRepair.beyondEdges(h, judged, lowHz, highHz, current, options, DOMINANT_SHARE);
        current = dominant.refined();
        options = dominant.options();
        ModalResidualSearch.Outcome inside = ModalResidualSearch.search(h, judged, lowHz, highHz, current, options);
        added.addAll(inside.added());
        current = inside.refined();
        ModalRepair.Edges edges = ModalRepair.beyondEdges(h, judged, lowHz, highHz, current, options);
        options = edges.options();
        LsfdOptions withEdges = base.withOutsideBandPoles(options.lines().outsideBandPoles());
        ModalResidualSearch.Outcome found = new ModalResidualSearch.Outcome(edges.refined(), List.of());
        if (edges.refined() != current) {
            found = ModalResidualSearch.search(h, judged, lowHz, highHz, edges.refined(), options);
            added.addAll(found.added());
        }
        ModalRepair.Split split = ModalRepair.split(h, judged, lowHz, highHz, found.refined(), options);
        current = split.refined();
        Refined last = new Refined(current, options, first.robust());
        double[] u = FitResidual.of(h, noise, plain(current), current.residualTerms()).huberWeights();
        if (first.robust() || min(u) < OUTLIER_WEIGHT) {
            last = reweighted(h, noise, current, withEdges, ROBUST_PASSES);
        }
        return new Searched(last, added, split.splitHz());
    }

    /** Weights u_k/variance_k (u_k = 1 when absent). */
    static double[] weights(double[] noise, double[] u) {
        double[] w = new double[noise.length];
        for (int k = 0; k < w.length; k++) {
            w[k] = (u == null ? 1 : u[k]) / noise[k];
        }
        return w;
    }

    static List<Mode> plain(ModalRefinementResult fit) {
        List<Mode> out = new ArrayList<>();
        for (FittedMode m : fit.modes()) {
            out.add(m.mode());
        }
        return out;
    }

    private static double min(double[] values) {
        double m = Double.POSITIVE_INFINITY;
        for (double v : values) {
            m = Math.min(m, v);
        }
        return m;
    }
}
