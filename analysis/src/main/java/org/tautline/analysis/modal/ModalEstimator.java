package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
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
    /** Highest model order of the stabilisation chart for a band of up to a dozen resonance peaks. */
    public static final int MAX_ORDER = 64;
    /** Highest model order of the stabilisation chart for a band of many peaks. */
    public static final int MOST_ORDER = 160;
    /** Orders beyond four per peak. */
    private static final int SPARE_ORDERS = 16;
    /** Prominence of a resonance peak over the local noise, in its standard deviations. */
    private static final double PEAK_SIGMAS = 6;
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
        int maxOrder = Math.min(highestOrder(h, NoiseFloor.of(h), low, high), (lines - 1) / ORDER_STEP * ORDER_STEP);
        Lscf lscf = new Lscf(h, low, high, null, maxOrder);
        LsfdOptions lsfd = lsfdOptions(low, high);
        StabilisationChart chart = StabilisationChart.build(lscf, Math.min(MIN_ORDER, maxOrder), maxOrder, ORDER_STEP,
                poles -> residuesOfPlausible(h, poles, lsfd));
        return fit(h, ModeSelection.automatic(chart), chart, low, high);
    }

    /**
     * The highest model order of the chart: {@value #MAX_ORDER}, or more where the band holds many resonance peaks:
     * 4 per peak (a peak may hide a doublet, and each mode takes two orders) and {@value #SPARE_ORDERS} for the modes
     * beyond the band, at most {@value #MOST_ORDER}. The chart's columns must stand in a quarter of its orders, so a
     * band of 24 modes needs orders well past 48 to show them.
     */
    private static int highestOrder(Frf h, double[] noise, double low, double high) {
        int wanted = (4 * peakCount(h, noise, low, high) + SPARE_ORDERS) / ORDER_STEP * ORDER_STEP;
        return Math.max(MAX_ORDER, Math.min(MOST_ORDER, wanted));
    }

    /**
     * The resonance peaks of the band: local maxima of |H| whose prominence (the height above the higher of the lowest
     * points between them and the nearest higher line on each side) exceeds both {@value #PEAK_SIGMAS} standard
     * deviations of the line's noise ({@link NoiseFloor}, local, so a noise that grows across the band does not
     * make peaks of itself) and 1 dB of the peak, the rule of {@link PeakPicking}.
     */
    static int peakCount(Frf h, double[] noise, double low, double high) {
        int n = h.size();
        int count = 0;
        double oneDb = 1 - Math.pow(10, -1.0 / 20);
        for (int k = 1; k < n - 1; k++) {
            double f = h.frequencyHz(k);
            double m = h.magnitude(k);
            if (f < low || f > high || !(m > h.magnitude(k - 1) && m >= h.magnitude(k + 1))) {
                continue;
            }
            double base = Math.max(lowestTowardsHigher(h, k, -1), lowestTowardsHigher(h, k, 1));
            double prominence = m - base;
            if (prominence > PEAK_SIGMAS * Math.sqrt(noise[k]) && prominence > oneDb * m) {
                count++;
            }
        }
        return count;
    }

    private static double lowestTowardsHigher(Frf h, int peak, int step) {
        double lowest = h.magnitude(peak);
        for (int j = peak + step; j >= 0 && j < h.size(); j += step) {
            if (h.magnitude(j) > h.magnitude(peak)) {
                break;
            }
            lowest = Math.min(lowest, h.magnitude(j));
        }
        return lowest;
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
        List<String> warnings = new ArrayList<>();
        int asked = chart.orders().size() + chart.skippedOrders().size();
        if (SKIPPED_ORDERS_THAT_MATTER * chart.skippedOrders().size() > asked) {
            warnings.add(String.format(Locale.ROOT, "the resonances of %d of the %d model orders tried could"
                    + " not be computed, so the choice of modes rests on fewer orders than usual",
                    chart.skippedOrders().size(), asked));
        }
        double[] noise = NoiseFloor.of(h);
        double[] judged = NoiseFloor.judged(h, noise);
        boolean estimatedNoise = h.variance().isEmpty();
        LsfdOptions base = lsfdOptions(low, high);
        List<Pole> poles = selection.poles();
        if (poles.isEmpty()) {
            List<Pole> peaks = peaksOf(h, low, high);
            if (peaks.isEmpty()) {
                Optional<String> unexplained = BackgroundFit.unexplained(h, judged, low, high, estimatedNoise);
                unexplained.ifPresent(warnings::add);
                return new ModalEstimate(List.of(), ResidualTerms.NONE, ResidualTerms.NONE, Optional.empty(), chart,
                        selection, low, high, warnings, unexplained);
            }
            for (Pole p : peaks) {
                selection = selection.withFoundInResidual(p);
                warnings.add(String.format(Locale.ROOT, "no mode stood out on the stabilisation chart; the resonance"
                        + " near %.4g Hz was taken from the peak of the response", p.frequencyHz()));
            }
            poles = selection.poles();
        }
        List<Pole> added = new ArrayList<>();
        List<FittedMode> modes;
        List<Mode> model;
        ResidualTerms residuals;
        ResidualTerms residualsStd;
        Optional<String> unexplained;
        try {
            ModalFit.Refined first = ModalFit.refine(h, noise, poles, base);
            if (estimatedNoise) {
                noise = NoiseFloor.fromResidual(noise, FitResidual.of(h, noise, ModalFit.plain(first.refined()),
                        first.refined().residualTerms()).residual(), h, low, high);
                first = ModalFit.refine(h, noise, ModalCandidate.poles(first.refined()), base);
                judged = NoiseFloor.judged(h, noise);
            }
            List<Double> outsideAtFirst = outside(first.refined(), low, high);
            ModalFit.Searched searched = ModalFit.search(h, noise, judged, low, high, first, base);
            ModalRefinementResult refined = searched.refined().refined();
            for (Pole p : searched.added()) {
                selection = selection.withFoundInResidual(p);
                added.add(p);
            }
            for (double f : searched.splitHz()) {
                warnings.add(String.format(Locale.ROOT, "the mode near %.4g Hz was fitted as two close modes because one"
                        + " mode left a residual far above the noise around it", f));
            }
            for (double f : outsideAtFirst) {
                warnings.add(String.format(Locale.ROOT, "a mode refined to %.4g Hz, outside the band %.4g .. %.4g Hz,"
                        + " was left out of the modes (it still stands for the response beyond the band)", f, low, high));
            }
            modes = refined.modes();
            model = ModalFit.plain(refined);
            residuals = refined.residualTerms();
            residualsStd = refined.residualTermsStd();
        } catch (AnalysisException e) {
            warnings.add("the joint refinement failed (" + e.getMessage() + "); the modes are the estimates of the pole search"
                    + " and the modal-constant fit, and carry no standard errors");
            LsfdResult start = Lsfd.fit(h, poles, base);
            modes = withoutErrors(start.modes());
            model = start.modes();
            residuals = start.residualTerms();
            residualsStd = ResidualTerms.NONE;
        }
        unexplained = FitCheck.unexplained(h, judged, low, high, model, residuals, estimatedNoise);
        unexplained.ifPresent(warnings::add);
        FitCheck.smallMisfit(h, judged, low, high, model, residuals, estimatedNoise).ifPresent(warnings::add);
        List<FittedMode> kept = new ArrayList<>();
        List<Mode> outsideBand = new ArrayList<>(residuals.outsideBand());
        for (FittedMode m : modes) {
            double f = m.mode().frequencyHz();
            double bandwidthHz = 2 * m.mode().dampingRatio() * f;
            double spacingHz = localSpacingHz(h, f);
            if (f < low || f > high) {
                outsideBand.add(m.mode());
            } else if (!isResolved(h, m.mode())) {
                warnings.add(String.format(Locale.ROOT,
                        "a mode at %.4g Hz narrower (half-power band %.3g Hz) than half the line spacing (%.3g Hz) was left"
                                + " out: it cannot be told from a single bad line", f, bandwidthHz, spacingHz));
            } else {
                kept.add(m);
            }
        }
        residuals = residuals.withOutsideBand(outsideBand);
        kept.sort(java.util.Comparator.comparingDouble(m -> m.mode().frequencyHz()));
        for (Pole p : added) {
            // Said only of a mode that is among the fitted modes at the end (within a half-power bandwidth).
            boolean kept1 = kept.stream().anyMatch(m -> Math.abs(m.mode().frequencyHz() - p.frequencyHz())
                    <= 2 * Math.max(m.mode().dampingRatio(), p.dampingRatio()) * p.frequencyHz());
            if (kept1) {
                warnings.add(String.format(Locale.ROOT, "a mode near %.4g Hz was missed by the stabilisation chart and"
                        + " added because the fit left a residual far above the noise there", p.frequencyHz()));
            }
        }
        List<Mode> plain = kept.stream().map(FittedMode::mode).toList();
        Optional<FitQuality> quality = plain.isEmpty() ? Optional.empty()
                : Optional.of(FitQuality.of(h.withinBand(low, high), plain, residuals, 3.0));
        return new ModalEstimate(kept, residuals, residualsStd, quality, chart, selection, low, high, warnings,
                unexplained);
    }

    /**
     * The resonance peaks of the band as start poles, for a band whose stabilisation chart holds no column (a narrow
     * band has few lines, so few model orders): {@link PeakPicking} on the band's lines, peaks within
     * {@link ModeSelection#EDGE_GUARD} of an edge and implausible damping left out.
     */
    private static List<Pole> peaksOf(Frf h, double low, double high) {
        if (linesIn(h, low, high) < PeakPicking.MINIMUM_LINES) {
            return List.of();
        }
        Frf band = h.withinBand(low, high);
        double guard = ModeSelection.EDGE_GUARD * (high - low);
        List<Pole> out = new ArrayList<>();
        List<PeakEstimate> found;
        try {
            found = PeakPicking.estimate(band);
        } catch (AnalysisException e) {
            return List.of();
        }
        for (Mode m : PeakPicking.modes(found)) {
            double f = m.frequencyHz();
            if (m.dampingRatio() > 0 && m.dampingRatio() < ModeSelection.MAX_DAMPING_RATIO && f >= low + guard
                    && f <= high - guard) {
                out.add(Pole.of(f, m.dampingRatio()));
            }
        }
        return out;
    }

    private static List<Double> outside(ModalRefinementResult fit, double low, double high) {
        List<Double> out = new ArrayList<>();
        for (FittedMode m : fit.modes()) {
            double f = m.mode().frequencyHz();
            if (f < low || f > high) {
                out.add(f);
            }
        }
        return out;
    }

    /** Real or complex modes, both residual terms, the band; no weights (the fit adds its own). */
    private LsfdOptions lsfdOptions(double low, double high) {
        return LsfdOptions.defaults().withRealModes(!complexModes).withUpperResidual(true).withLowerResidual(true)
                .withBandHz(low, high);
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

}
