package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

/**
 * A candidate model tried while a fit checks itself (a mode added where the residual shows one, a pole split in two,
 * a pole outside the band for the modes beyond it), and the test that keeps it.
 *
 * <p>A candidate is kept when its cost, the sum of squared residuals over the band in units of the variance the fit
 * is judged against ({@link NoiseFloor#judged}), falls by more than {@value #THRESHOLD} times the larger of 1 and the
 * candidate's robust residual variance per line ({@link #scale}). With the noise variance right, twice the fall is
 * chi-square with as many degrees of freedom as the candidate adds (3 or 4 for a mode), the likelihood-ratio test (S. S. Wilks, Ann. Math. Statist. 9:60-62, 1938); a fall of 30
 * has odds below 1e-11 of coming from noise. When the model leaves more than noise (the residual variance above 1),
 * the fall is measured against that residual variance instead, as the extra-sum-of-squares F-test does
 * (G. A. F. Seber and C. J. Wild, Nonlinear Regression, Wiley 1989, sec. 5.9; both from memory), so a candidate must
 * explain a misfit that stands out of the misfit left elsewhere.
 */
final class ModalCandidate {
    /** Fall of the cost, in noise variances, that keeps a candidate. */
    static final double THRESHOLD = 30;
    /**
     * Refinement iterations allowed a candidate model: one that needs more rarely lowers the cost enough to be
     * kept, and its failures dominated the worst-case time.
     */
    static final int ITERATIONS = 50;
    /**
     * Standard errors by which a new mode's modal constant must stand clear of zero: a pole whose strength the data
     * cannot tell from nothing is not a mode they show.
     */
    static final double SIGNIFICANT = 3;
    /** Line spacings within which a windowed estimate cannot show two modes (a Hann window's main lobe). */
    static final double WINDOW_LINES = 2;
    /**
     * Smallest misfit, relative to the response, that the search for missing modes acts on, and smallest peak, relative
     * to the response there, of a mode it adds: a little below the level at which {@link FitCheck} calls the data
     * unexplained, so that the search has tried what the check would report.
     */
    static final double MATERIAL = 0.02;

    private ModalCandidate() {
    }

    /**
     * The poles of a refined model, damping kept below 1 so a pole stays oscillating.
     *
     * @param fit the refined model
     * @return its poles, in its order
     */
    static List<Pole> poles(ModalRefinementResult fit) {
        List<Pole> poles = new ArrayList<>();
        for (FittedMode m : fit.modes()) {
            poles.add(Pole.of(m.mode().frequencyHz(), Math.min(m.mode().dampingRatio(), 0.99)));
        }
        return poles;
    }

    /**
     * A candidate with new poles, tried in two stages. First a local fit: the modes of the current model far from the
     * new poles are held (their response taken off the measured one), and the new poles, the nearby modes, the residual
     * terms and the coefficients of the poles beyond the band are fitted (LSFD, then the joint refinement) to what is
     * left. Its cost is that of the whole model, since the held modes' response was taken off exactly. Only a candidate
     * that passes the local stage ({@link #better} and the rules of {@link #checked}) is refined as a whole, from
     * the local result, and judged again. The joint refinement of 25 modes over 4000 lines for every candidate that is
     * then refused took most of a wide-band fit's time; a missing mode couples to the modes around it, and only weakly to
     * modes tens of half-power bandwidths away, which the whole refinement still adjusts when the candidate is kept.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line the fit is judged against
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param current the model now
     * @param kept the indices of the current model's modes the candidate keeps, in order
     * @param fresh the new poles, put after the kept modes
     * @param options the refinement options of the fit
     * @param rule a further rule the candidate must meet at both stages (true when none)
     * @return the refined candidate when it is kept, or null
     */
    static ModalRefinementResult tryNew(Frf h, double[] variance, double lowHz, double highHz,
                                        ModalRefinementResult current, List<Integer> kept, List<Pole> fresh,
                                        ModalRefinementOptions options,
                                        java.util.function.Predicate<ModalRefinementResult> rule) {
        ModalRefinementResult local = local(h, current, kept, fresh, options);
        if (local == null || !rule.test(local) || !better(h, variance, lowHz, highHz, current, local)) {
            return null;
        }
        ModalRefinementResult whole;
        try {
            whole = ModalRefinement.refine(h, ModalFit.plain(local), local.residualTerms(),
                    options.withMaxIterations(Math.min(options.maxIterations(), ITERATIONS)));
        } catch (AnalysisException e) {
            return null;
        }
        whole = checked(h, whole, fresh, options);
        return whole != null && rule.test(whole) && better(h, variance, lowHz, highHz, current, whole) ? whole : null;
    }

    /** Modes on each side of a new pole that the local stage of {@link #tryNew} fits with it. */
    static final int LOCAL_NEIGHBOURS = 2;
    /** Reach, in the new pole's half-power bandwidths, within which every mode is fitted with it in the local stage. */
    static final double LOCAL_REACH = 20;

    /** The local stage of {@link #tryNew}: the whole model with only the modes near the new poles fitted anew. */
    private static ModalRefinementResult local(Frf h, ModalRefinementResult current, List<Integer> kept,
                                               List<Pole> fresh, ModalRefinementOptions options) {
        List<FittedMode> modes = current.modes();
        boolean[] near = new boolean[modes.size()];
        for (Pole p : fresh) {
            double f = p.frequencyHz();
            double reachHz = LOCAL_REACH * 2 * p.dampingRatio() * f;
            List<Integer> below = new ArrayList<>();
            List<Integer> above = new ArrayList<>();
            for (int i : kept) {
                double fi = modes.get(i).mode().frequencyHz();
                if (Math.abs(fi - f) <= reachHz) {
                    near[i] = true;
                }
                (fi < f ? below : above).add(i);
            }
            below.sort((a, b) -> Double.compare(modes.get(b).mode().frequencyHz(), modes.get(a).mode().frequencyHz()));
            above.sort((a, b) -> Double.compare(modes.get(a).mode().frequencyHz(), modes.get(b).mode().frequencyHz()));
            for (int j = 0; j < LOCAL_NEIGHBOURS; j++) {
                if (j < below.size()) {
                    near[below.get(j)] = true;
                }
                if (j < above.size()) {
                    near[above.get(j)] = true;
                }
            }
        }
        double from = Double.POSITIVE_INFINITY;
        double to = Double.NEGATIVE_INFINITY;
        for (Pole p : fresh) {
            double reachHz = LOCAL_REACH * 2 * p.dampingRatio() * p.frequencyHz();
            from = Math.min(from, p.frequencyHz() - reachHz);
            to = Math.max(to, p.frequencyHz() + reachHz);
        }
        for (int i : kept) {
            if (near[i]) {
                Mode m = modes.get(i).mode();
                double reachHz = LOCAL_REACH * 2 * m.dampingRatio() * m.frequencyHz();
                from = Math.min(from, m.frequencyHz() - reachHz);
                to = Math.max(to, m.frequencyHz() + reachHz);
            }
        }
        double bandFrom = Math.max(options.lines().fromHz(), h.frequencyHz(0));
        double bandTo = Math.min(options.lines().toHz(), h.frequencyHz(h.size() - 1));
        from = Math.max(from, bandFrom);
        to = Math.min(to, bandTo);
        // Where the reach covers most of the band (a narrow band, a few modes), the residual terms and the poles
        // beyond the band are as much the candidate's business as the modes near it: they are fitted with it.
        boolean narrow = to - from > LOCAL_WINDOW_SHARE * (bandTo - bandFrom);
        return localFit(h, current, kept, near, fresh, options, narrow ? null : new double[] {from, to});
    }

    /** Share of the band's width above which a candidate's local fit takes the whole band, terms and all. */
    static final double LOCAL_WINDOW_SHARE = 0.5;

    /**
     * The whole model with only some of its modes fitted anew, with new poles, the residual terms and the coefficients
     * of the poles beyond the band that the options hold: the other modes are held and their response taken off the
     * measured one, so the cost of the fit is that of the whole model.
     *
     * @param h the measured receptance
     * @param current the model now
     * @param kept the indices of the current model's modes kept, in order
     * @param near which of the current model's modes (by index) are fitted anew
     * @param fresh new poles, put after the kept modes (none for a pole beyond the band, which the options hold)
     * @param options the refinement options
     * @return the model, or null when the fit fails or leaves a mode the rules of {@link #checked} refuse
     */
    static ModalRefinementResult localFit(Frf h, ModalRefinementResult current, List<Integer> kept, boolean[] near,
                                          List<Pole> fresh, ModalRefinementOptions options) {
        return localFit(h, current, kept, near, fresh, options, null);
    }

    /**
     * As {@link #localFit(Frf, ModalRefinementResult, List, boolean[], List, ModalRefinementOptions)}, but, given a
     * window, fitted on the window's lines only, with the residual terms and the poles beyond the band held as well:
     * the modes fitted anew are then set by the lines around them, and the whole model's cost is what the caller judges.
     *
     * @param window the lowest and highest frequency fitted, Hz, or null for the whole band with the terms free
     */
    private static ModalRefinementResult localFit(Frf h, ModalRefinementResult current, List<Integer> kept,
                                                  boolean[] near, List<Pole> fresh, ModalRefinementOptions options,
                                                  double[] window) {
        List<FittedMode> modes = current.modes();
        List<Mode> held = new ArrayList<>();
        List<Pole> free = new ArrayList<>();
        for (int i : kept) {
            if (near[i]) {
                Mode m = modes.get(i).mode();
                free.add(Pole.of(m.frequencyHz(), Math.min(m.dampingRatio(), 0.99)));
            } else {
                held.add(modes.get(i).mode());
            }
        }
        free.addAll(fresh);
        ResidualTerms heldTerms = window == null ? ResidualTerms.NONE : current.residualTerms();
        org.hipparchus.complex.Complex[] left = FitResidual.of(h, new double[h.size()], held, heldTerms, true)
                .residual();
        double[] re = new double[h.size()];
        double[] im = new double[h.size()];
        for (int k = 0; k < re.length; k++) {
            re[k] = left[k].getReal();
            im[k] = left[k].getImaginary();
        }
        Frf rest = Frf.of(h.frequenciesHz(), re, im, h.quantity());
        ModalRefinementOptions fitOptions = window == null ? options
                : ModalRefinementOptions.of(options.lines().withUpperResidual(false).withLowerResidual(false)
                        .withOutsideBandPoles(List.of()).withBandHz(window[0], window[1]))
                        .withMaxIterations(options.maxIterations());
        ModalRefinementResult fitted;
        try {
            LsfdResult start = Lsfd.fit(rest, free, fitOptions.lines());
            fitted = ModalRefinement.refine(rest, start.modes(), start.residualTerms(),
                    fitOptions.withMaxIterations(Math.min(fitOptions.maxIterations(), ITERATIONS)));
        } catch (AnalysisException e) {
            return null;
        }
        List<FittedMode> combined = new ArrayList<>();
        int next = 0;
        for (int i : kept) {
            combined.add(near[i] ? fitted.modes().get(next++) : modes.get(i));
        }
        combined.addAll(fitted.modes().subList(next, fitted.modes().size()));
        // A windowed fit's cost covers the window only; the whole model's is for the caller to compute (it is not kept).
        ModalRefinementResult whole = window == null
                ? new ModalRefinementResult(combined, fitted.residualTerms(), fitted.residualTermsStd(),
                        fitted.iterations(), fitted.cost(), fitted.residualVariance(), fitted.varianceKnown())
                : new ModalRefinementResult(combined, current.residualTerms(), current.residualTermsStd(),
                        fitted.iterations(), Double.NaN, Double.NaN, fitted.varianceKnown());
        return checked(h, whole, fresh, options);
    }

    /**
     * The candidate when its modes meet the rules for a model with new modes (the new ones last, started at
     * {@code starts}), or null: every mode resolved by the lines and, inside the band, material; no new mode outside
     * the band, with a modal constant within {@value #SIGNIFICANT} standard errors of zero, moved more than a
     * half-power bandwidth 2 zeta f from where it started (it then explains something other than the residual that
     * called for it), within {@value #WINDOW_LINES} line spacings of another mode in an FRF from windowed spectra, or
     * with its half-power band reaching the band's edge guard.
     */
    static ModalRefinementResult checked(Frf h, ModalRefinementResult next, List<Pole> starts,
                                                 ModalRefinementOptions options) {
        double lowHz = Math.max(options.lines().fromHz(), h.frequencyHz(0));
        double highHz = Math.min(options.lines().toHz(), h.frequencyHz(h.size() - 1));
        for (FittedMode m : next.modes()) {
            double f = m.mode().frequencyHz();
            if (!ModalEstimator.isResolved(h, m.mode()) || f >= lowHz && f <= highHz && !material(h, m.mode())) {
                return null;
            }
        }
        List<FittedMode> modes = next.modes();
        int added = starts.size();
        for (int r = modes.size() - added; r < modes.size(); r++) {
            FittedMode m = modes.get(r);
            double f = m.mode().frequencyHz();
            double std = m.modalConstantStd().norm();
            Pole start = starts.get(r - (modes.size() - added));
            double reachHz = 2 * Math.max(start.dampingRatio(), m.mode().dampingRatio()) * Math.max(f, start.frequencyHz());
            if (f < lowHz || f > highHz || !(m.mode().modalConstant().norm() >= SIGNIFICANT * std)
                    || Math.abs(f - start.frequencyHz()) > reachHz || tooCloseForAWindow(h, modes, r)
                    || !withinGuard(m.mode(), lowHz, highHz)) {
                return null;
            }
        }
        return next;
    }

    /**
     * Whether a mode's half-power band f (1 -+ zeta) lies inside the band less {@link ModeSelection#EDGE_GUARD} of its
     * width at each edge, the rule the chart's poles are chosen by: a broad pole reaching past an edge stands for the
     * modes beyond it.
     */
    private static boolean withinGuard(Mode mode, double lowHz, double highHz) {
        double guard = ModeSelection.EDGE_GUARD * (highHz - lowHz);
        double f = mode.frequencyHz();
        return f * (1 - mode.dampingRatio()) >= lowHz + guard && f * (1 + mode.dampingRatio()) <= highHz - guard;
    }

    /**
     * Whether a new mode of an FRF estimated from windowed spectra (one that carries a coherence) stands within
     * {@value #WINDOW_LINES} line spacings of another mode. Such an estimate is the true FRF smoothed over its window's
     * main lobe, two lines either side of a line for a Hann window (F. J. Harris, Proc. IEEE 66:51-83, 1978, from
     * memory), so a peak a couple of lines wide comes out broadened, and two poles a line apart fit it better than one:
     * a doublet the lines cannot show.
     */
    private static boolean tooCloseForAWindow(Frf h, List<FittedMode> modes, int index) {
        if (h.coherence().isEmpty()) {
            return false;
        }
        double f = modes.get(index).mode().frequencyHz();
        int nearest = 1;
        for (int k = 1; k < h.size(); k++) {
            if (Math.abs(h.frequencyHz(k) - f) < Math.abs(h.frequencyHz(nearest) - f)) {
                nearest = k;
            }
        }
        double spacing = h.frequencyHz(nearest) - h.frequencyHz(nearest - 1);
        for (int r = 0; r < modes.size(); r++) {
            if (r != index && Math.abs(modes.get(r).mode().frequencyHz() - f) < WINDOW_LINES * spacing) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether a mode's own peak, |A|/(2 zeta w_n^2), is at least {@link #MATERIAL} of the measured response at
     * the line nearest its frequency: a "mode" weaker than that beside the response is how a fit bends itself round a
     * small systematic misfit (two such poles with opposite modal constants are the usual sign), not a resonance
     * anyone could attribute.
     */
    static boolean material(Frf h, Mode mode) {
        double w = mode.angularFrequencyRadPerS();
        double peak = mode.modalConstant().norm() / (2 * mode.dampingRatio() * w * w);
        int nearest = 0;
        for (int k = 1; k < h.size(); k++) {
            if (Math.abs(h.frequencyHz(k) - mode.frequencyHz()) < Math.abs(h.frequencyHz(nearest) - mode.frequencyHz())) {
                nearest = k;
            }
        }
        return peak >= MATERIAL * h.magnitude(nearest);
    }

    /**
     * Whether a candidate lowers the cost enough to be kept.
     *
     * @param h the measured receptance
     * @param noise the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param current the model now
     * @param candidate the candidate, or null
     * @return true when the candidate is kept
     */
    static boolean better(Frf h, double[] noise, double lowHz, double highHz, ModalRefinementResult current,
                          ModalRefinementResult candidate) {
        return candidate != null && cost(h, noise, lowHz, highHz, current) - cost(h, noise, lowHz, highHz, candidate)
                > THRESHOLD * Math.max(1, scale(h, noise, lowHz, highHz, candidate));
    }

    /** sum |e_k|^2 over the band's lines, whitened by the given variance. */
    private static double cost(Frf h, double[] noise, double lowHz, double highHz, ModalRefinementResult fit) {
        double[] e2 = FitResidual.of(h, noise, fit.modes().stream().map(FittedMode::mode).toList(), fit.residualTerms())
                .whitenedSquares();
        double sum = 0;
        for (int k = 0; k < e2.length; k++) {
            if (h.frequencyHz(k) >= lowHz && h.frequencyHz(k) <= highHz) {
                sum += e2[k];
            }
        }
        return sum;
    }

    /**
     * A robust residual variance of a model, in noise variances: the median of |e_k|^2 over the fitted lines divided by
     * ln 2, its value for circular Gaussian noise of unit variance. Unlike the mean it is not raised by a few lines far
     * off the model (those that robust weights hold down), only by a misfit spread over most lines.
     *
     * @param h the measured receptance
     * @param noise the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param fit the model
     * @return the variance, 1 for a model that explains the data
     */
    static double scale(Frf h, double[] noise, double lowHz, double highHz, ModalRefinementResult fit) {
        double[] e2 = FitResidual.of(h, noise, fit.modes().stream().map(FittedMode::mode).toList(), fit.residualTerms())
                .whitenedSquares();
        double[] inBand = java.util.stream.IntStream.range(0, e2.length)
                .filter(k -> h.frequencyHz(k) >= lowHz && h.frequencyHz(k) <= highHz).mapToDouble(k -> e2[k]).sorted()
                .toArray();
        return inBand.length == 0 ? 1 : inBand[inBand.length / 2] / Math.log(2);
    }
}
