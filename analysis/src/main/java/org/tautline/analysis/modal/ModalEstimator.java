package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathRuntimeException;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * The whole modal fit of one FRF: poles by LSCF over a range of orders, automatic mode choice from
 * the stabilisation chart, modal constants by LSFD, then a joint nonlinear refinement.
 *
 * <p>Sources: LSCF, Guillaume et al., IMAC-XXI 2003 (from memory); LSFD and residual terms, Ewins,
 * Modal Testing, 2nd ed. 2000 (from memory); the refinement is a weighted Levenberg-Marquardt fit
 * of all parameters, whose Jacobian also gives the standard errors (see {@link ModalRefinement}).
 * The poles are estimated with uniform weights (LSCF's equation error weighted by 1/sigma would
 * lose lightly damped modes where the noise grows with |H|); the refinement weighs each line by
 * 1/variance when the FRF carries its variance, which makes it the maximum-likelihood fit for
 * Gaussian errors (Pintelon and Schoukens, System Identification, 2nd ed. 2012, from memory).
 * Nothing here needs tuning: the model orders, the stability thresholds and the mode choice are
 * fixed rules; a user may still add or drop poles by refitting from an edited {@link ModeSelection}.
 */
public final class ModalEstimator {
    /** Highest model order of the stabilisation chart. */
    public static final int MAX_ORDER = 64;
    /**
     * A fitted mode whose half-power band 2 zeta f is narrower than this fraction of the local line
     * spacing is left out: the data cannot resolve it, and such a "mode" is how a fit absorbs one
     * outlying line (a stepped-sine step disturbed by a transient, say).
     */
    public static final double UNRESOLVED_FRACTION = 0.5;
    /** Fewest lines in the band that a fit accepts. */
    public static final int MIN_LINES = 12;
    private static final int MIN_ORDER = 2;
    /** Skipped chart orders are worth a warning when they are more than a quarter of those tried. */
    private static final int SKIPPED_ORDERS_THAT_MATTER = 4;
    private static final int ORDER_STEP = 2;

    private final double bandLowHz;
    private final double bandHighHz;
    private final boolean complexModes;

    private ModalEstimator(double bandLowHz, double bandHighHz, boolean complexModes) {
        this.bandLowHz = bandLowHz;
        this.bandHighHz = bandHighHz;
        this.complexModes = complexModes;
    }

    /** @return an estimator over the whole FRF, for real (proportionally damped) modes */
    public static ModalEstimator defaults() {
        return new ModalEstimator(0, Double.POSITIVE_INFINITY, false);
    }

    /**
     * @param lowHz lowest frequency to fit, Hz
     * @param highHz highest frequency to fit, Hz, above lowHz
     * @return an estimator limited to the band
     */
    public ModalEstimator withBand(double lowHz, double highHz) {
        if (!(lowHz >= 0) || !(highHz > lowHz)) {
            throw new AnalysisException("fit band must have 0 <= low < high, got " + lowHz + " .. " + highHz + " Hz");
        }
        return new ModalEstimator(lowHz, highHz, complexModes);
    }

    /**
     * @param complex true to fit complex modal constants (non-proportional damping, sensor phase errors)
     * @return an estimator with that mode form
     */
    public ModalEstimator withComplexModes(boolean complex) {
        return new ModalEstimator(bandLowHz, bandHighHz, complex);
    }

    /**
     * Fits the FRF: the poles are chosen automatically.
     *
     * @param frf the measured FRF, any quantity, with per-line variance if known
     * @return the estimate (no modes when the data hold none)
     * @throws AnalysisException when the data cannot support a fit: too few lines in the band, a zero response
     */
    public ModalEstimate estimate(Frf frf) {
        try {
            return estimateReceptance(frf.toQuantity(FrfQuantity.RECEPTANCE));
        } catch (MathRuntimeException e) {
            throw failed(e);
        }
    }

    private ModalEstimate estimateReceptance(Frf h) {
        double low = Math.max(bandLowHz, h.frequencyHz(0));
        double high = Math.min(bandHighHz, h.frequencyHz(h.size() - 1));
        int lines = linesIn(h, low, high);
        if (lines < MIN_LINES) {
            throw new AnalysisException("a modal fit needs at least " + MIN_LINES + " frequency lines in the band " + low
                    + " .. " + high + " Hz, got " + lines);
        }
        // LSCF of order n needs n + 1 lines (Lscf.minimumLines); keep the orders even.
        int maxOrder = Math.min(MAX_ORDER, (lines - 1) / ORDER_STEP * ORDER_STEP);
        Lscf lscf = new Lscf(h, low, high, null, maxOrder);
        LsfdOptions lsfd = lsfdOptions(h, low, high, false);
        StabilisationChart chart = StabilisationChart.build(lscf, Math.min(MIN_ORDER, maxOrder), maxOrder, ORDER_STEP,
                poles -> residuesOfPlausible(h, poles, lsfd));
        return fit(h, ModeSelection.automatic(chart), chart, low, high);
    }

    /**
     * A numerical library failure (an iteration that did not converge, a singular matrix) as a plain analysis error,
     * so no library exception escapes a fit.
     */
    private static AnalysisException failed(MathRuntimeException e) {
        return new AnalysisException("the modal fit failed: a numerical step did not converge or met a singular matrix ("
                + e.getMessage() + "); try a narrower band or a cleaner measurement", e);
    }

    /**
     * Fits the FRF with an edited pole choice (poles added or dropped by hand).
     *
     * @param frf the measured FRF
     * @param selection the poles to use
     * @param chart the chart the selection came from
     * @return the estimate
     */
    public ModalEstimate refit(Frf frf, ModeSelection selection, StabilisationChart chart) {
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        try {
            return fit(h, selection, chart, chart.bandLowHz(), chart.bandHighHz());
        } catch (MathRuntimeException e) {
            throw failed(e);
        }
    }

    private ModalEstimate fit(Frf h, ModeSelection selection, StabilisationChart chart, double low, double high) {
        List<Pole> poles = selection.poles();
        if (poles.isEmpty()) {
            return new ModalEstimate(List.of(), ResidualTerms.NONE, ResidualTerms.NONE, Optional.empty(), chart,
                    selection, low, high, List.of());
        }
        List<String> warnings = new ArrayList<>();
        int asked = chart.orders().size() + chart.skippedOrders().size();
        if (SKIPPED_ORDERS_THAT_MATTER * chart.skippedOrders().size() > asked) {
            warnings.add(String.format(java.util.Locale.ROOT, "the resonances of %d of the %d model orders tried could"
                    + " not be computed, so the choice of modes rests on fewer orders than usual",
                    chart.skippedOrders().size(), asked));
        }
        LsfdResult start = Lsfd.fit(h, poles, lsfdOptions(h, low, high, false));
        boolean weighted = h.variance().isPresent();
        ModalRefinementOptions refine = ModalRefinementOptions.of(lsfdOptions(h, low, high, weighted));
        List<FittedMode> modes;
        ResidualTerms residuals;
        ResidualTerms residualsStd;
        try {
            ModalRefinementResult refined = ModalRefinement.refine(h, start.modes(), start.residualTerms(), refine);
            if (weighted) {
                ModalResidualSearch.Outcome found = ModalResidualSearch.search(h, low, high, refined, refine);
                refined = found.refined();
                for (Pole p : found.added()) {
                    selection = selection.withFoundInResidual(p);
                    warnings.add(String.format(java.util.Locale.ROOT, "a mode near %.4g Hz was missed by the "
                            + "stabilisation chart and added because the fit left a residual far above the noise there",
                            p.frequencyHz()));
                }
            }
            modes = refined.modes();
            residuals = refined.residualTerms();
            residualsStd = refined.residualTermsStd();
        } catch (AnalysisException e) {
            warnings.add("the joint refinement failed (" + e.getMessage() + "); the modes are the LSCF/LSFD estimates"
                    + " and carry no standard errors");
            modes = withoutErrors(start.modes());
            residuals = start.residualTerms();
            residualsStd = ResidualTerms.NONE;
        }
        List<FittedMode> kept = new ArrayList<>();
        for (FittedMode m : modes) {
            double f = m.mode().frequencyHz();
            double bandwidthHz = 2 * m.mode().dampingRatio() * f;
            double spacingHz = localSpacingHz(h, f);
            if (f < low || f > high) {
                warnings.add(String.format(java.util.Locale.ROOT,
                        "a mode refined to %.4g Hz, outside the band %.4g .. %.4g Hz, was left out", f, low, high));
            } else if (!isResolved(h, m.mode())) {
                warnings.add(String.format(java.util.Locale.ROOT,
                        "a mode at %.4g Hz narrower (half-power band %.3g Hz) than half the line spacing (%.3g Hz) was left"
                                + " out: it cannot be told from a single bad line", f, bandwidthHz, spacingHz));
            } else {
                kept.add(m);
            }
        }
        kept.sort(java.util.Comparator.comparingDouble(m -> m.mode().frequencyHz()));
        List<Mode> plain = kept.stream().map(FittedMode::mode).toList();
        Optional<FitQuality> quality = plain.isEmpty() ? Optional.empty()
                : Optional.of(FitQuality.of(bandOf(h, low, high), plain, residuals, 3.0));
        return new ModalEstimate(kept, residuals, residualsStd, quality, chart, selection, low, high, warnings);
    }

    private LsfdOptions lsfdOptions(Frf h, double low, double high, boolean varianceWeights) {
        LsfdOptions o = LsfdOptions.defaults().withRealModes(!complexModes).withUpperResidual(true)
                .withLowerResidual(true).withBandHz(low, high);
        if (varianceWeights) {
            double[] variance = h.variance().orElseThrow();
            double[] w = new double[variance.length];
            double floor = Arrays.stream(variance).filter(v -> v > 0).min().orElse(1.0);
            for (int i = 0; i < w.length; i++) {
                w[i] = 1.0 / Math.max(variance[i], floor);
            }
            o = o.withWeights(w);
        }
        return o;
    }

    /**
     * Residues for the chart's modal-constant check, fitted only for plausible poles (inside the band,
     * 0 < zeta < 0.2) to keep the check cheap; implausible poles get a zero residue, which never
     * matches a physical one.
     */
    private static Complex[] residuesOfPlausible(Frf h, List<Pole> poles, LsfdOptions options) {
        List<Pole> plausible = new ArrayList<>();
        int[] index = new int[poles.size()];
        Arrays.fill(index, -1);
        for (int i = 0; i < poles.size(); i++) {
            Pole p = poles.get(i);
            double f = p.frequencyHz();
            if (p.dampingRatio() > 0 && p.dampingRatio() < ModeSelection.MAX_DAMPING_RATIO && f >= options.fromHz()
                    && f <= options.toHz()) {
                index[i] = plausible.size();
                plausible.add(p);
            }
        }
        Complex[] residues = new Complex[poles.size()];
        Arrays.fill(residues, Complex.ZERO);
        if (plausible.isEmpty()) {
            return residues;
        }
        Complex[] fitted;
        try {
            fitted = Lsfd.residues(h, plausible, options);
        } catch (AnalysisException e) {
            return residues;
        }
        for (int i = 0; i < poles.size(); i++) {
            if (index[i] >= 0) {
                residues[i] = fitted[index[i]];
            }
        }
        return residues;
    }

    private static List<FittedMode> withoutErrors(List<Mode> modes) {
        List<FittedMode> out = new ArrayList<>();
        for (Mode m : modes) {
            out.add(new FittedMode(m, Double.NaN, Double.NaN, new Complex(Double.NaN, Double.NaN)));
        }
        return out;
    }

    /**
     * Whether the lines resolve a mode: its half-power band 2 zeta f is at least
     * {@value #UNRESOLVED_FRACTION} of the local line spacing.
     *
     * @param h the FRF
     * @param mode the mode
     * @return true when resolved
     */
    static boolean isResolved(Frf h, Mode mode) {
        double f = mode.frequencyHz();
        return 2 * mode.dampingRatio() * f >= UNRESOLVED_FRACTION * localSpacingHz(h, f);
    }

    /** The spacing of the lines around a frequency, Hz. */
    private static double localSpacingHz(Frf h, double frequencyHz) {
        int i = 1;
        while (i < h.size() - 1 && h.frequencyHz(i) < frequencyHz) {
            i++;
        }
        return h.size() < 2 ? Double.POSITIVE_INFINITY : h.frequencyHz(i) - h.frequencyHz(i - 1);
    }

    private static int linesIn(Frf h, double low, double high) {
        int n = 0;
        for (int i = 0; i < h.size(); i++) {
            if (h.frequencyHz(i) >= low && h.frequencyHz(i) <= high) {
                n++;
            }
        }
        return n;
    }

    private static Frf bandOf(Frf h, double low, double high) {
        List<Integer> keep = new ArrayList<>();
        for (int i = 0; i < h.size(); i++) {
            if (h.frequencyHz(i) >= low && h.frequencyHz(i) <= high) {
                keep.add(i);
            }
        }
        double[] f = new double[keep.size()];
        double[] re = new double[keep.size()];
        double[] im = new double[keep.size()];
        for (int k = 0; k < keep.size(); k++) {
            int i = keep.get(k);
            f[k] = h.frequencyHz(i);
            re[k] = h.value(i).getReal();
            im[k] = h.value(i).getImaginary();
        }
        return Frf.of(f, re, im, h.quantity());
    }
}
