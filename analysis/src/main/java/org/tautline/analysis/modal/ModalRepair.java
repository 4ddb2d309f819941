package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

/**
 * Two repairs a fit tries where its residual stands above the noise: a pole outside the band for the modes beyond it,
 * and a pole split in two.
 *
 * <p>Modes beyond the band act on it through the residual terms UR - LR/w^2, which stand for modes far from it: the
 * receptance A/(w_r^2 - w^2) of a mode a few per cent above the band's top changes across the band's last tenth by
 * more than any constant can follow, and a fit then bends its highest modes to make up for it. Representing such
 * modes by poles just outside the band, as residual modes, is how out-of-band modes are usually taken into account
 * when the residual terms alone do not suffice (D. J. Ewins, Modal Testing, 2nd ed. 2000, sec. 4.3, from memory).
 * Where the residual in the outer {@value #EDGE_REGION} of the band holds a window above the detection level, one
 * fixed pole beyond that edge with a fitted complex coefficient is added ({@link LsfdOptions#outsideBandPoles()}):
 * it is placed where LSFD, with the other poles held, fits best (see {@code bestOutsidePole}), and the model refined;
 * it is kept when no mode enters the band and the cost falls as {@link ModalCandidate} asks; where the residual still
 * calls for it, a second pole is tried the same way (a pair follows the several modes beyond an edge more closely than
 * one). A fixed pole cannot wander into the band or grow so wide that it merges with the upper residual, which a free
 * one does.
 *
 * <p>Two modes closer than about a half-power bandwidth (the two polarisations of a string) may come out of the
 * stabilisation chart as one pole between them. Where the residual within {@value #SPLIT_REACH} half-power
 * bandwidths of a mode stands above the detection level, the mode's pole is replaced by two poles, one half-power
 * bandwidth apart and then half of that, with the mode's damping, and the model fitted again, first near the pair and
 * then as a whole ({@link ModalCandidate#tryNew}); the pair is kept when both
 * poles stay resolved, inside the band and at least {@value #PAIR_LINES} line spacings apart, and the cost falls as
 * {@link ModalCandidate} asks, the test of one model
 * nested in another by a likelihood ratio. The detection level is that of {@link ModalResidualSearch}.
 */
final class ModalRepair {
    /** Outer fraction of the band, at each edge, whose residual calls for a pole beyond that edge. */
    static final double EDGE_REGION = 0.15;
    /** Most poles beyond each edge. */
    static final int POLES_PER_EDGE = 3;
    /** Nearest a pole beyond an edge may lie, in band widths from the edge. */
    static final double NEAREST = 0.005;
    /** Farthest a pole beyond an edge may lie, in band widths from the edge. */
    static final double FARTHEST = 2;
    /** Points of the first, logarithmic grid of distances. */
    static final int GRID = 9;
    /** Golden-section steps after the grid. */
    static final int GOLDEN_STEPS = 10;
    /** The damping ratio a pole beyond an edge is searched with. */
    static final double SEARCH_DAMPING = 0.01;
    /** Reach around a mode, in its half-power bandwidths 2 zeta f, whose residual calls for a split. */
    static final double SPLIT_REACH = 2;
    /** Fewest line spacings between the two poles of a split. */
    static final double PAIR_LINES = 2;
    /** Most poles split in one fit. */
    static final int MAX_SPLITS = 6;

    private ModalRepair() {
    }

    /**
     * Adds a fixed pole beyond each edge of the band where the residual near that edge calls for one and the pole is
     * kept.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param fit the refined model
     * @param options its refinement options
     * @return the model with the poles kept and the options that hold them (the same when none is kept)
     */
    static Edges beyondEdges(Frf h, double[] variance, double lowHz, double highHz, ModalRefinementResult fit,
                             ModalRefinementOptions options) {
        return beyondEdges(h, variance, lowHz, highHz, fit, options, 0);
    }

    /**
     * Adds fixed poles beyond the edges as {@link #beyondEdges(Frf, double[], double, double, ModalRefinementResult,
     * ModalRefinementOptions)} does, but only those that take at least a given share of the model's misfit.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param fit the refined model
     * @param options its refinement options
     * @param minShare the least share, 0..1, of the cost above what noise leaves that the best pole's LSFD fit must
     *     remove
     * @return the model with the poles kept and the options that hold them
     */
    static Edges beyondEdges(Frf h, double[] variance, double lowHz, double highHz, ModalRefinementResult fit,
                             ModalRefinementOptions options, double minShare) {
        double width = highHz - lowHz;
        ModalRefinementResult current = fit;
        ModalRefinementOptions currentOptions = options;
        int[] keptPerEdge = new int[2];
        boolean progress = true;
        // Rounds of one try at each edge, while a round keeps a pole: a pole refused at one edge may be kept once the
        // other edge is described, as the misfit it had to explain is then smaller.
        while (progress) {
            progress = false;
            for (int edge = 0; edge < 2; edge++) {
                boolean above = edge == 0;
                if (keptPerEdge[edge] >= POLES_PER_EDGE) {
                    continue;
                }
                double from = above ? highHz - EDGE_REGION * width : lowHz;
                double to = above ? highHz : lowHz + EDGE_REGION * width;
                // Unscaled: the misfit the modes beyond an edge leave spreads over the whole band and raises its scale.
                if (!detected(h, variance, lowHz, highHz, current, from, to, false)) {
                    continue;
                }
                List<Pole> inside = ModalCandidate.poles(current);
                Outside found = bestOutsidePole(h, inside, currentOptions, above ? highHz : lowHz, above ? width : -width);
                if (found == null || found.share() < minShare) {
                    continue;
                }
                ModalRefinementOptions best = found.options();
                // The modes near the edge, the residual terms and every pole beyond the band are fitted anew; the
                // whole model is refined once the edges are described.
                ModalRefinementResult candidate = ModalCandidate.localFit(h, current,
                        java.util.stream.IntStream.range(0, current.modes().size()).boxed().toList(),
                        nearEdge(current, above ? highHz : lowHz, width), List.of(), best);
                // A mode that leaves the band once the edge is described stood in for the modes beyond it; the search
                // that follows finds it again if it was a mode.
                if (candidate != null && insideCount(candidate, lowHz, highHz) <= insideCount(current, lowHz, highHz)
                        && ModalCandidate.better(h, variance, lowHz, highHz, current, candidate)) {
                    current = candidate;
                    currentOptions = best;
                    keptPerEdge[edge]++;
                    progress = true;
                }
            }
        }
        if (current == fit) {
            return new Edges(fit, options);
        }
        ModalRefinementResult whole;
        try {
            whole = ModalRefinement.refine(h, ModalFit.plain(current), current.residualTerms(), currentOptions);
        } catch (AnalysisException e) {
            return new Edges(fit, options);
        }
        whole = ModalCandidate.checked(h, whole, List.of(), currentOptions);
        return whole == null ? new Edges(fit, options) : new Edges(whole, currentOptions);
    }

    /**
     * The modes fitted anew when a pole beyond an edge is tried: those within {@value #NEAR_EDGE} of the band's width
     * of that edge, and at least the {@value ModalCandidate#LOCAL_NEIGHBOURS} nearest to it. The modes beyond an edge act
     * most on the modes near it; those farther in move little and are refined with the whole model afterwards.
     */
    private static boolean[] nearEdge(ModalRefinementResult current, double edgeHz, double widthHz) {
        List<FittedMode> modes = current.modes();
        boolean[] near = new boolean[modes.size()];
        Integer[] order = java.util.stream.IntStream.range(0, modes.size()).boxed().toArray(Integer[]::new);
        java.util.Arrays.sort(order, java.util.Comparator.comparingDouble(
                r -> Math.abs(modes.get(r).mode().frequencyHz() - edgeHz)));
        for (int i = 0; i < order.length; i++) {
            double distance = Math.abs(modes.get(order[i]).mode().frequencyHz() - edgeHz);
            near[order[i]] = i < ModalCandidate.LOCAL_NEIGHBOURS || distance <= NEAR_EDGE * widthHz;
        }
        return near;
    }

    /** Fraction of the band's width, from an edge, within which modes are fitted anew with a pole beyond that edge. */
    static final double NEAR_EDGE = 2 * EDGE_REGION;

    /**
     * The outcome of the poles beyond the edges.
     *
     * @param refined the model
     * @param options its refinement options, holding the poles beyond the edges it has
     */
    record Edges(ModalRefinementResult refined, ModalRefinementOptions options) {
    }

    /**
     * The fixed pole beyond an edge that LSFD fits best with the other poles held: its distance from the edge is
     * searched on a logarithmic grid of {@value #GRID} points from {@value #NEAREST} to {@value #FARTHEST} band widths,
     * then by golden-section search between the grid neighbours of the best point (J. Kiefer, Proc. AMS 4:502-506,
     * 1953, from memory), at damping ratio {@value #SEARCH_DAMPING}; then damping ratios a third and three times that
     * are tried at the distance found. Beyond the edge a mode's effect depends on its frequency far more than on its
     * damping.
     *
     * @return the options with the best pole added and the share of the misfit it removes, or null when none can be
     *     fitted
     */
    private static Outside bestOutsidePole(Frf full, List<Pole> inside, ModalRefinementOptions options, double edgeHz,
                                           double signedWidthHz) {
        // The search compares places for one pole: every SEARCH_LINES-th part of the band's lines tells them apart.
        Frf h = decimated(full, options.lines().fromHz(), options.lines().toHz());
        ModalRefinementOptions searchOptions = ModalRefinementOptions.of(options.lines().withWeights(
                decimatedWeights(full, options.lines().weights(), options.lines().fromHz(), options.lines().toHz())));
        // The system of the poles held is factored once; each place tried adds only the new pole's two columns.
        Lsfd.LinearSystem held;
        try {
            held = Lsfd.system(h, inside, searchOptions.lines());
        } catch (AnalysisException e) {
            return null;
        }
        LsfdLeastSquares.Factor factor = LsfdLeastSquares.factor(held.columns(), held.rhs());
        java.util.function.BiFunction<Double, Double, Pole> poleAt = (distance, zeta) -> {
            double f = edgeHz + distance * signedWidthHz;
            return f > 0 ? Pole.of(f, zeta) : null;
        };
        java.util.function.BiFunction<Double, Double, Double> costAt = (distance, zeta) -> {
            Pole pole = poleAt.apply(distance, zeta);
            return pole == null ? Double.POSITIVE_INFINITY : factor.residualWith(Lsfd.poleColumns(held.lines(), pole));
        };
        java.util.function.DoubleUnaryOperator cost = logDistance -> costAt.apply(Math.exp(logDistance), SEARCH_DAMPING);
        double from = Math.log(NEAREST);
        double step = (Math.log(FARTHEST) - from) / (GRID - 1);
        int bestIndex = 0;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int i = 0; i < GRID; i++) {
            double c = cost.applyAsDouble(from + i * step);
            if (c < bestCost) {
                bestCost = c;
                bestIndex = i;
            }
        }
        if (!Double.isFinite(bestCost)) {
            return null;
        }
        double a = from + Math.max(0, bestIndex - 1) * step;
        double b = from + Math.min(GRID - 1, bestIndex + 1) * step;
        double ratio = (Math.sqrt(5) - 1) / 2;
        double x1 = b - ratio * (b - a);
        double x2 = a + ratio * (b - a);
        double c1 = cost.applyAsDouble(x1);
        double c2 = cost.applyAsDouble(x2);
        for (int i = 0; i < GOLDEN_STEPS; i++) {
            if (c1 < c2) {
                b = x2;
                x2 = x1;
                c2 = c1;
                x1 = b - ratio * (b - a);
                c1 = cost.applyAsDouble(x1);
            } else {
                a = x1;
                x1 = x2;
                c1 = c2;
                x2 = a + ratio * (b - a);
                c2 = cost.applyAsDouble(x2);
            }
        }
        double distance = Math.exp(c1 < c2 ? x1 : x2);
        double bestZeta = SEARCH_DAMPING;
        double bestAtDistance = costAt.apply(distance, SEARCH_DAMPING);
        for (double zeta : new double[] {SEARCH_DAMPING / 3, SEARCH_DAMPING * 3}) {
            double c = costAt.apply(distance, zeta);
            if (c < bestAtDistance) {
                bestAtDistance = c;
                bestZeta = zeta;
            }
        }
        double without = factor.residual();
        double share = (without - bestAtDistance) / Math.max(without - h.size(), Double.MIN_NORMAL);
        List<Pole> outside = new ArrayList<>(options.lines().outsideBandPoles());
        outside.add(poleAt.apply(distance, bestZeta));
        return new Outside(ModalRefinementOptions.of(options.lines().withOutsideBandPoles(outside)), share);
    }

    /**
     * A pole beyond an edge and the share of the misfit it removes.
     *
     * @param options the refinement options holding it
     * @param share the fall of the LSFD cost it gives over the cost above what noise leaves (one per line)
     */
    private record Outside(ModalRefinementOptions options, double share) {
    }

    /** Lines kept when an edge pole's place is searched. */
    static final int SEARCH_LINES = 800;

    /** The band's lines, every k-th so that about {@value #SEARCH_LINES} remain, and the lines outside the band. */
    private static Frf decimated(Frf h, double fromHz, double toHz) {
        int step = step(h, fromHz, toHz);
        List<Integer> keep = kept(h, fromHz, toHz, step);
        double[] f = new double[keep.size()];
        double[] re = new double[keep.size()];
        double[] im = new double[keep.size()];
        for (int i = 0; i < f.length; i++) {
            f[i] = h.frequencyHz(keep.get(i));
            re[i] = h.value(keep.get(i)).getReal();
            im[i] = h.value(keep.get(i)).getImaginary();
        }
        return Frf.of(f, re, im, h.quantity());
    }

    private static double[] decimatedWeights(Frf h, double[] weights, double fromHz, double toHz) {
        List<Integer> keep = kept(h, fromHz, toHz, step(h, fromHz, toHz));
        double[] out = new double[keep.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = weights[keep.get(i)];
        }
        return out;
    }

    private static int step(Frf h, double fromHz, double toHz) {
        int inBand = 0;
        for (int k = 0; k < h.size(); k++) {
            if (h.frequencyHz(k) >= fromHz && h.frequencyHz(k) <= toHz) {
                inBand++;
            }
        }
        return Math.max(1, inBand / SEARCH_LINES);
    }

    private static List<Integer> kept(Frf h, double fromHz, double toHz, int step) {
        List<Integer> keep = new ArrayList<>();
        int inBand = 0;
        for (int k = 0; k < h.size(); k++) {
            if (h.frequencyHz(k) >= fromHz && h.frequencyHz(k) <= toHz && inBand++ % step == 0) {
                keep.add(k);
            }
        }
        return keep;
    }

    /**
     * Splits the poles of modes whose neighbourhood holds a residual above the detection level, where the split is
     * kept.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param fit the refined model
     * @param options its refinement options
     * @return the model with the splits kept, and the frequencies of the modes split
     */
    static Split split(Frf h, double[] variance, double lowHz, double highHz, ModalRefinementResult fit,
                       ModalRefinementOptions options) {
        ModalRefinementResult current = fit;
        List<Double> splitHz = new ArrayList<>();
        // One flag per mode of the current model, in its order: a split pole's two successors go last.
        List<Boolean> tried = new ArrayList<>();
        for (int r = 0; r < fit.modes().size(); r++) {
            tried.add(false);
        }
        while (splitHz.size() < MAX_SPLITS) {
            int chosen = -1;
            List<FittedMode> modes = current.modes();
            // The residual of the model now, once for all its modes.
            FitResidual residual = FitResidual.of(h, variance, ModalFit.plain(current), current.residualTerms());
            double level = ModalResidualSearch.THRESHOLD
                    * Math.max(1, ModalCandidate.scale(h, variance, lowHz, highHz, current));
            for (int r = 0; r < modes.size(); r++) {
                Mode m = modes.get(r).mode();
                double f = m.frequencyHz();
                double reach = SPLIT_REACH * 2 * m.dampingRatio() * f;
                if (f >= lowHz && f <= highHz && !tried.get(r) && detected(h, residual, level, f - reach, f + reach)) {
                    chosen = r;
                    break;
                }
                tried.set(r, true);
            }
            if (chosen < 0) {
                break;
            }
            Mode m = modes.get(chosen).mode();
            tried.set(chosen, true);
            ModalRefinementResult kept = null;
            List<Integer> others = new ArrayList<>();
            for (int r = 0; r < modes.size(); r++) {
                if (r != chosen) {
                    others.add(r);
                }
            }
            int inside = insideCount(current, lowHz, highHz);
            for (double halfSplit : new double[] {m.dampingRatio(), 0.5 * m.dampingRatio()}) {
                List<Pole> pair = List.of(Pole.of(m.frequencyHz() * (1 - halfSplit), m.dampingRatio()),
                        Pole.of(m.frequencyHz() * (1 + halfSplit), m.dampingRatio()));
                ModalRefinementResult candidate = ModalCandidate.tryNew(h, variance, lowHz, highHz, current, others,
                        pair, options, c -> resolvedPair(h, c) && insideCount(c, lowHz, highHz) == inside + 1);
                if (candidate != null) {
                    kept = candidate;
                    break;
                }
            }
            if (kept != null) {
                splitHz.add(m.frequencyHz());
                tried.remove(chosen);
                tried.add(true);
                tried.add(true);
                current = kept;
            }
        }
        return new Split(current, List.copyOf(splitHz));
    }

    /**
     * The outcome of the splits.
     *
     * @param refined the model
     * @param splitHz the frequencies of the modes that were split in two, Hz
     */
    record Split(ModalRefinementResult refined, List<Double> splitHz) {
    }

    /**
     * Whether a window of the residual between two frequencies stands above the detection level (scaled, when asked,
     * by the model's robust residual variance when that exceeds 1) with a material misfit.
     */
    static boolean detected(Frf h, double[] variance, double lowHz, double highHz, ModalRefinementResult fit,
                            double fromHz, double toHz, boolean scaled) {
        FitResidual residual = FitResidual.of(h, variance, fit.modes().stream().map(FittedMode::mode).toList(),
                fit.residualTerms());
        double level = ModalResidualSearch.THRESHOLD
                * (scaled ? Math.max(1, ModalCandidate.scale(h, variance, lowHz, highHz, fit)) : 1);
        return detected(h, residual, level, fromHz, toHz);
    }

    /** As above, for a residual already computed and a detection level already scaled. */
    private static boolean detected(Frf h, FitResidual residual, double level, double fromHz, double toHz) {
        double[] e2 = residual.whitenedSquares();
        Complex[] r = residual.residual();
        int window = ModalResidualSearch.WINDOW;
        for (int start = 0; start + window <= h.size(); start++) {
            if (h.frequencyHz(start) < fromHz || h.frequencyHz(start + window - 1) > toHz) {
                continue;
            }
            double sum = 0;
            for (int k = start; k < start + window; k++) {
                sum += e2[k];
            }
            if (sum > level && ModalResidualSearch.material(h, r, start)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether the last two modes of a split stand at least {@value #PAIR_LINES} line spacings apart: a window's
     * smoothing of a peak a couple of lines wide (a Welch estimate at coarse resolution) is fitted better by two poles
     * a line apart than by one, which no line spacing can resolve as two modes.
     */
    private static boolean resolvedPair(Frf h, ModalRefinementResult fit) {
        List<FittedMode> modes = fit.modes();
        double a = modes.get(modes.size() - 2).mode().frequencyHz();
        double b = modes.get(modes.size() - 1).mode().frequencyHz();
        int nearest = 1;
        for (int k = 1; k < h.size(); k++) {
            if (Math.abs(h.frequencyHz(k) - a) < Math.abs(h.frequencyHz(nearest) - a)) {
                nearest = k;
            }
        }
        double spacing = h.frequencyHz(nearest) - h.frequencyHz(nearest - 1);
        return Math.abs(b - a) >= PAIR_LINES * spacing;
    }

    private static int insideCount(ModalRefinementResult fit, double lowHz, double highHz) {
        int n = 0;
        for (FittedMode m : fit.modes()) {
            double f = m.mode().frequencyHz();
            if (f >= lowHz && f <= highHz) {
                n++;
            }
        }
        return n;
    }
}
