package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;

import org.hipparchus.exception.MathRuntimeException;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;

/**
 * One band of resonances an adaptive sweep is refining: the modes found there so far, and the steps it asks for next.
 *
 * <p>The band comes from the {@link PhaseSearch}: where the phase falls, with a damping estimate from its steepest
 * fall. It may hold more than one mode (a string's two polarisations one bandwidth apart), so everything here is
 * done for all the modes in it. Spacing follows the half-power bandwidth 2 zeta f_r, the width over which the FRF
 * of a mode carries its information about f_r and zeta (D. J. Ewins, Modal Testing: Theory, Practice and
 * Application, 2nd ed., Research Studies Press 2000, ch. 4, from memory). First the band is filled with steps a
 * quarter of a bandwidth apart (at the lower of the phase's damping estimate and the plan's initial damping, which
 * the plan puts at or below the damping expected) reaching {@link #FILL_MARGIN_BANDWIDTHS} estimated bandwidth
 * beyond it: the lines the local modal fit ({@link ModalEstimator}, whose residual search adds the weaker partner of
 * a close pair) needs to tell the modes apart. Each fit then places steps an eighth, then a sixteenth of each mode's
 * own bandwidth apart within one bandwidth of it, where the phase turns and the information on f_r and zeta lies,
 * until every mode's standard errors meet the targets. A fit that fails fills again, twice as densely and widely.
 */
final class ResonanceTracker {
    /** The first fill reaches this many estimated half-power bandwidths beyond the band. */
    static final double FILL_MARGIN_BANDWIDTHS = 1.0;
    /** The local fit reaches this many half-power bandwidths beyond the band. */
    static final double FIT_MARGIN_BANDWIDTHS = 4.0;
    /** Steps one fit may reject as standing alone far off it. */
    static final int MAX_REJECTIONS = 3;
    /** Fits before a band is given up. */
    static final int MAX_UPDATES = 6;
    /** A fitted mode whose frequency standard error exceeds this many half-power half-widths is not determined. */
    static final double MAX_FREQUENCY_STD_HALF_WIDTHS = 0.05;
    /** A fitted mode whose damping standard error exceeds this fraction of its damping is not determined. */
    static final double MAX_DAMPING_RELATIVE_STD = 0.25;
    /**
     * An undetermined fitted mode whose modal constant is below this fraction of the band's strongest is a minor
     * term, dropped without a word (see {@link #determined(FittedMode)}).
     */
    static final double MINOR_MODAL_CONSTANT_FRACTION = 0.05;
    /** Damping estimates are held below this: a higher one is no light resonance. */
    static final double MAX_DAMPING = 0.1;

    private final PhaseSearch.Region region;
    private final double bandLowHz;
    private final double bandHighHz;
    private final double spacingDamping;
    private double lowHz;
    private double highHz;
    private final double dampingGuess;
    private List<FittedMode> fit = List.of();
    private List<FittedMode> undetermined = List.of();
    private int refinements;
    private int updates;
    private int failedFits;
    private String lastFitProblem = "";
    private final List<Double> rejectedHz = new ArrayList<>();

    /**
     * @param region where the phase falls
     * @param bandLowHz the plan's lowest frequency, Hz: modes below are not reported
     * @param bandHighHz the plan's highest frequency, Hz
     * @param initialDampingRatio the plan's initial damping, the most the settle time assumes before a fit
     */
    ResonanceTracker(PhaseSearch.Region region, double bandLowHz, double bandHighHz, double initialDampingRatio) {
        this.region = region;
        this.bandLowHz = bandLowHz;
        this.bandHighHz = bandHighHz;
        this.lowHz = region.lowHz();
        this.highHz = region.highHz();
        double estimate = region.dampingRatio();
        this.dampingGuess = estimate > 0 ? Math.min(estimate, MAX_DAMPING) : initialDampingRatio;
        this.spacingDamping = Math.min(dampingGuess, initialDampingRatio);
    }

    PhaseSearch.Region region() {
        return region;
    }

    /** @return the modes of the last successful fit, increasing frequency */
    List<FittedMode> fit() {
        return fit;
    }

    /** @return the modes the last successful fit found but the data did not determine */
    List<FittedMode> undetermined() {
        return undetermined;
    }

    /** @return the steps this band's fits rejected as standing alone far off them, Hz, in the order rejected */
    List<Double> rejectedHz() {
        return List.copyOf(rejectedHz);
    }

    String lastFitProblem() {
        return lastFitProblem;
    }

    /** @return true once a fit has found the band's modes */
    boolean located() {
        return !fit.isEmpty();
    }

    boolean exhausted() {
        return updates >= MAX_UPDATES;
    }

    /** @return true when f lies within {@code bandwidths} bandwidths of the band */
    boolean near(double frequencyHz, double bandwidths) {
        double b = bandwidthHz();
        return frequencyHz >= lowHz - bandwidths * b && frequencyHz <= highHz + bandwidths * b;
    }

    /** @return the time constant 1/(zeta w_r) of the slowest mode of the band, s (settling) */
    double tauS() {
        if (fit.isEmpty()) {
            return 1.0 / (spacingDamping * 2 * Math.PI * region.peakHz());
        }
        double tau = 0;
        for (FittedMode m : fit) {
            tau = Math.max(tau, 1.0 / (Math.max(1e-5, m.mode().dampingRatio()) * m.mode().angularFrequencyRadPerS()));
        }
        return tau;
    }

    /** @return the half-power bandwidth used for the band as a whole, Hz: the narrowest mode's, or the estimate */
    double bandwidthHz() {
        if (fit.isEmpty()) {
            return 2 * dampingGuess * region.peakHz();
        }
        double b = Double.POSITIVE_INFINITY;
        for (FittedMode m : fit) {
            b = Math.min(b, bandwidth(m));
        }
        return b;
    }

    private static double bandwidth(FittedMode m) {
        return 2 * Math.max(1e-5, m.mode().dampingRatio()) * m.mode().frequencyHz();
    }

    /**
     * The next batch of steps, increasing; steps within an eighth of the spacing of a reliable step done (or of
     * another step of the batch) are left out, and one on a disturbed step is moved beside it ({@link StepGrid}).
     *
     * @param done every step of the pass so far, in the order run
     * @param rejectedHz steps the pass's fits rejected, Hz
     * @return the batch (empty when the grid is already covered)
     */
    double[] nextBatch(List<SweepPoint> done, Set<Double> rejectedHz) {
        List<Double> batch = new ArrayList<>();
        if (fit.isEmpty()) {
            // Spacing from the lower of the estimate and the plan's initial damping (at or below what is expected),
            // reach from the estimate; each failed fit fills more densely and more widely.
            double spacing = 2 * spacingDamping * region.peakHz() / (4 << Math.min(failedFits, 2));
            double margin = FILL_MARGIN_BANDWIDTHS * (1 + failedFits) * bandwidthHz();
            double from = lowHz - margin;
            int count = (int) Math.floor((highHz + margin - from) / spacing);
            for (int i = 0; i <= count; i++) {
                StepGrid.add(batch, done, rejectedHz, from + i * spacing, spacing / 8);
            }
        } else {
            for (FittedMode m : fit) {
                grid(batch, done, rejectedHz, m.mode().frequencyHz(), bandwidth(m));
            }
            // A mode the fit found but the data do not determine gets steps at the band's spacing: more lines may
            // settle it either way, and its own (undetermined) width is no guide.
            for (FittedMode m : undetermined) {
                grid(batch, done, rejectedHz, m.mode().frequencyHz(), bandwidthHz());
            }
        }
        return StepGrid.sorted(batch);
    }

    /** Steps an eighth, then a sixteenth of a bandwidth apart within one bandwidth of a mode. */
    private void grid(List<Double> batch, List<SweepPoint> done, Set<Double> rejectedHz, double frequencyHz,
                      double bandwidthHz) {
        double spacing = bandwidthHz / (8 << Math.min(refinements, 1));
        int k = (int) Math.floor(bandwidthHz / spacing);
        for (int i = -k; i <= k; i++) {
            StepGrid.add(batch, done, rejectedHz, frequencyHz + i * spacing, spacing / 8);
        }
    }

    /**
     * Fits the band with the steps measured so far. A step that stands alone far off the fit ({@link FitResiduals})
     * is rejected, at most {@link #MAX_REJECTIONS} per fit, and the band fitted again without it.
     *
     * @param usable the pass's steps that are not disturbed or rejected, in the order run
     * @param responseQuantity what channel 1 measures
     * @param frequencyRelStd target relative standard error of f
     * @param dampingRelStd target relative standard error of zeta
     * @return true when every mode of the band meets the targets and the fit found nothing it could not determine
     */
    boolean update(List<SweepPoint> usable, String responseQuantity, double frequencyRelStd, double dampingRelStd) {
        updates++;
        if (!fit.isEmpty()) {
            refinements++;
        }
        double b = bandwidthHz();
        double low = Math.max(0, lowHz - FIT_MARGIN_BANDWIDTHS * (1 + failedFits) * b);
        double high = highHz + FIT_MARGIN_BANDWIDTHS * (1 + failedFits) * b;
        List<SweepPoint> use = new ArrayList<>(usable);
        use.removeIf(p -> rejectedHz.contains(p.frequencyHz()));
        ModalEstimate estimate;
        try {
            for (int rejections = 0; ; rejections++) {
                Frf frf = SweepPass.frfOf(use, responseQuantity);
                estimate = ModalEstimator.defaults().withBand(low, high).estimate(frf);
                OptionalDouble outlier = rejections < MAX_REJECTIONS
                        ? FitResiduals.isolatedOutlierHz(frf, estimate) : OptionalDouble.empty();
                if (outlier.isEmpty()) {
                    break;
                }
                rejectedHz.add(outlier.getAsDouble());
                use.removeIf(p -> p.frequencyHz() == outlier.getAsDouble());
            }
        } catch (AnalysisException | MathRuntimeException e) {
            // A fit the data cannot support (too few lines), or one whose numerics fail (an eigenvalue search that
            // does not converge): either way the band needs more, or other, steps.
            lastFitProblem = e.getMessage();
            failedFits++;
            return false;
        }
        List<FittedMode> kept = new ArrayList<>();
        List<FittedMode> vague = new ArrayList<>();
        for (FittedMode m : estimate.modes()) {
            double f = m.mode().frequencyHz();
            double mb = bandwidth(m);
            if (f >= lowHz - mb && f <= highHz + mb && f >= bandLowHz && f <= bandHighHz
                    && m.mode().dampingRatio() > 0 && m.mode().dampingRatio() < MAX_DAMPING) {
                (determined(m) ? kept : vague).add(m);
            }
        }
        if (kept.isEmpty()) {
            lastFitProblem = String.format(Locale.ROOT, "the fit over %.2f .. %.2f Hz found no mode there", low, high);
            failedFits++;
            return false;
        }
        kept.sort(Comparator.comparingDouble(m -> m.mode().frequencyHz()));
        double strongest = 0;
        for (FittedMode m : kept) {
            strongest = Math.max(strongest, m.mode().modalConstant().norm());
        }
        List<FittedMode> major = new ArrayList<>();
        for (FittedMode m : vague) {
            if (m.mode().modalConstant().norm() >= MINOR_MODAL_CONSTANT_FRACTION * strongest) {
                major.add(m);
            }
        }
        fit = List.copyOf(kept);
        undetermined = List.copyOf(major);
        lowHz = Math.min(lowHz, fit.get(0).mode().frequencyHz());
        highHz = Math.max(highHz, fit.get(fit.size() - 1).mode().frequencyHz());
        boolean met = undetermined.isEmpty();
        for (FittedMode m : fit) {
            met &= meets(m, frequencyRelStd, dampingRelStd);
        }
        return met;
    }

    /**
     * Whether the data determine a fitted mode: its frequency known to within {@link #MAX_FREQUENCY_STD_HALF_WIDTHS}
     * of its half-power half-width zeta f and its damping to within {@link #MAX_DAMPING_RELATIVE_STD}. A weak mode
     * that fails this (modal constant below {@link #MINOR_MODAL_CONSTANT_FRACTION} of the band's strongest) is how a
     * fit absorbs what a linear modal model cannot follow, such as the level-dependent frequency of a string driven
     * hard (on the simulated demo wire such terms stay below 2 % of the strongest, a polarisation partner is 22 %);
     * it is dropped. A stronger one may be a mode the steps do not yet resolve: the band is refined around it, and
     * if it stays undetermined it is not reported and the pass says so. The thresholds are our choice.
     *
     * @param m a fitted mode
     * @return true when determined
     */
    static boolean determined(FittedMode m) {
        return m.frequencyStdHz() <= MAX_FREQUENCY_STD_HALF_WIDTHS * m.mode().dampingRatio() * m.mode().frequencyHz()
                && m.dampingRatioStd() <= MAX_DAMPING_RELATIVE_STD * m.mode().dampingRatio();
    }

    /** @return true when the mode's standard errors are known and within the targets */
    static boolean meets(FittedMode m, double frequencyRelStd, double dampingRelStd) {
        return m.frequencyStdHz() / m.mode().frequencyHz() <= frequencyRelStd
                && m.dampingRatioStd() / m.mode().dampingRatio() <= dampingRelStd;
    }
}
