package org.tautline.app.bench;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.ProgressListener;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.CramerRaoBound;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.LsfdOptions;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.modal.ModalRefinementOptions;
import org.tautline.analysis.modal.ResidualTerms;

/**
 * A seeded Monte Carlo of the automatic modal fit on invented stiff-string FRFs, against the Cramer-Rao bound.
 *
 * <p>Each trial draws a {@link SyntheticStringCase} (8 to 10 modes, 4000 lines, weakest mode 30 to 50 dB above the
 * noise), alternately on uniform and on log-spaced (stepped-sine) lines, runs {@link ModalEstimator#defaults()}
 * and matches its modes one-to-one to the true ones (see {@code ModalBenchmarkTally}). For each matched mode the
 * errors of f_n and zeta are divided by their Cramer-Rao bounds, computed at the true model and the true noise
 * variance with the same free parameters the fit has (real modes, UR and LR); the figure is the RMS of that ratio
 * (S. M. Kay, Fundamentals of Statistical Signal Processing: Estimation Theory, 1993, ch. 3, from memory: an
 * efficient unbiased estimator scores 1). Targets: no mode missed and none spurious, RMS error/bound at most 1.5
 * for frequency and 2 for damping, a whole fit under 1 s. The figures are printed, never asserted. All cases are
 * invented: no measured data enter.
 */
public final class ModalBenchmark {
    /** Repeats of the timed fit after warm-up; the median is reported. */
    private static final int TIMED_REPEATS = 5;
    /** Untimed fits before the trials, so the trial times are not those of the JIT compiler. */
    private static final int WARM_UP_FITS = 3;
    private static final long TIMED_CASE_SALT = 0x5DEECE66DL;

    /**
     * The figures of the trials on one line spacing.
     *
     * @param steppedSine true for log-spaced lines, false for uniform
     * @param trials trials run
     * @param failedFits trials whose fit threw (all their modes count as missed)
     * @param trueModes true modes over all trials
     * @param matched true modes matched by an estimate
     * @param missed true modes with no estimate within a half-power bandwidth
     * @param spurious estimates matched to no true mode
     * @param frequencyErrorPerBound RMS over matched modes of (f_est - f_true)/bound_f
     * @param dampingErrorPerBound RMS over matched modes of (zeta_est - zeta_true)/bound_zeta
     * @param worstFrequencyErrorPerBound largest |f_est - f_true|/bound_f
     * @param worstDampingErrorPerBound largest |zeta_est - zeta_true|/bound_zeta
     * @param frequencySquares the sum of squares behind the frequency RMS
     * @param dampingSquares the sum of squares behind the damping RMS
     */
    public record SpacingFigures(boolean steppedSine, int trials, int failedFits, int trueModes, int matched, int missed,
                                 int spurious, double frequencyErrorPerBound, double dampingErrorPerBound,
                                 double worstFrequencyErrorPerBound, double worstDampingErrorPerBound,
                                 double frequencySquares, double dampingSquares) {
    }

    /**
     * What a benchmark run measured.
     *
     * @param seed the seed of the run
     * @param uniform figures on uniform lines
     * @param steppedSine figures on log-spaced lines
     * @param frequencyErrorPerBound RMS of (f_est - f_true)/bound_f over both spacings
     * @param dampingErrorPerBound RMS of (zeta_est - zeta_true)/bound_zeta over both spacings
     * @param medianFitS median wall time of one whole fit over all trials (after three untimed
     *     fits), s
     * @param maxFitS longest whole fit over all trials, s
     * @param timedFitS median of five fits of one uniform case after the trials (JIT warm), s
     * @param timedFitLines lines of that case
     * @param timedFitModes true modes of that case
     * @param warnings trials whose estimate carried a warning
     */
    public record Figures(long seed, SpacingFigures uniform, SpacingFigures steppedSine, double frequencyErrorPerBound,
                          double dampingErrorPerBound, double medianFitS, double maxFitS, double timedFitS,
                          int timedFitLines, int timedFitModes, int warnings) {
        /** @return trials over both spacings */
        public int trials() {
            return uniform.trials() + steppedSine.trials();
        }

        /** @return true modes missed over both spacings */
        public int missed() {
            return uniform.missed() + steppedSine.missed();
        }

        /** @return spurious modes over both spacings */
        public int spurious() {
            return uniform.spurious() + steppedSine.spurious();
        }
    }

    private ModalBenchmark() {
    }

    /**
     * Runs the Monte Carlo: {@code trialsPerSpacing} trials on each spacing, then the timed fit.
     *
     * @param trialsPerSpacing trials on each of the two spacings, at least 1
     * @param seed the seed of the random cases
     * @param progress told after each trial (done, total), and once more after the timed fit
     * @return the figures
     */
    public static Figures run(int trialsPerSpacing, long seed, ProgressListener progress) {
        if (trialsPerSpacing < 1) {
            throw new IllegalArgumentException("the modal benchmark needs at least 1 trial per spacing, got "
                    + trialsPerSpacing);
        }
        ProgressListener listener = progress == null ? ProgressListener.NONE : progress;
        SplittableRandom random = new SplittableRandom(seed);
        SyntheticStringCase timed = SyntheticStringCase.draw(new SplittableRandom(seed ^ TIMED_CASE_SALT), false);
        for (int i = 0; i < WARM_UP_FITS; i++) {
            ModalEstimator.defaults().estimate(timed.frf());
        }
        ModalBenchmarkTally uniform = new ModalBenchmarkTally();
        ModalBenchmarkTally stepped = new ModalBenchmarkTally();
        int total = 2 * trialsPerSpacing;
        double[] times = new double[total];
        int warnings = 0;
        for (int i = 0; i < total; i++) {
            boolean steppedSine = i % 2 == 1;
            SyntheticStringCase c = SyntheticStringCase.draw(random, steppedSine);
            ModalBenchmarkTally tally = steppedSine ? stepped : uniform;
            long start = System.nanoTime();
            ModalEstimate estimate;
            try {
                estimate = ModalEstimator.defaults().estimate(c.frf());
            } catch (AnalysisException e) {
                estimate = null;
            }
            times[i] = (System.nanoTime() - start) * 1e-9;
            if (estimate == null) {
                tally.addFailure(c.truth());
            } else {
                tally.add(c.truth(), bounds(c), estimate.modes());
                warnings += estimate.warnings().isEmpty() ? 0 : 1;
            }
            listener.progress(i + 1, total + 1);
        }
        double[] repeats = new double[TIMED_REPEATS];
        for (int r = 0; r < TIMED_REPEATS; r++) {
            long start = System.nanoTime();
            ModalEstimator.defaults().estimate(timed.frf());
            repeats[r] = (System.nanoTime() - start) * 1e-9;
        }
        listener.progress(total + 1, total + 1);
        SpacingFigures u = uniform.figures(false);
        SpacingFigures s = stepped.figures(true);
        int matched = u.matched() + s.matched();
        return new Figures(seed, u, s, rms(u.frequencySquares() + s.frequencySquares(), matched),
                rms(u.dampingSquares() + s.dampingSquares(), matched), median(times),
                Arrays.stream(times).max().orElseThrow(), median(repeats), timed.frf().size(), timed.truth().size(),
                warnings);
    }

    /**
     * The Cramer-Rao bounds of a case's true modes, for the free parameters of the default fit.
     *
     * @param c the case
     * @return one bound per true mode
     */
    static List<FittedMode> bounds(SyntheticStringCase c) {
        Frf frf = c.frf();
        double[] variance = new double[frf.size()];
        Arrays.fill(variance, c.noiseVariance());
        ModalRefinementOptions free = ModalRefinementOptions.of(
                LsfdOptions.defaults().withRealModes(true).withUpperResidual(true).withLowerResidual(true));
        return CramerRaoBound.of(c.truth(), ResidualTerms.NONE, frf.frequenciesHz(), variance, free);
    }

    /**
     * The figures as a few lines of text, with the targets beside them.
     *
     * @param f the figures
     * @return the text, lines ending in a newline
     */
    public static String text(Figures f) {
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "modal benchmark: %d trials (seed %d) on invented stiff-string FRFs of %d"
                + " lines, 8-10 modes, weakest mode 30-50 dB above the noise%n", f.trials(), f.seed(),
                SyntheticStringCase.LINES));
        for (SpacingFigures s : List.of(f.uniform(), f.steppedSine())) {
            b.append(String.format(Locale.ROOT, "  %-12s %3d trials: %4d modes, %d missed, %d spurious, %d failed fits;"
                    + " RMS error/CRLB f %.2f, zeta %.2f (worst %.1f, %.1f)%n",
                    s.steppedSine() ? "stepped sine" : "uniform", s.trials(), s.trueModes(), s.missed(), s.spurious(),
                    s.failedFits(), s.frequencyErrorPerBound(), s.dampingErrorPerBound(),
                    s.worstFrequencyErrorPerBound(), s.worstDampingErrorPerBound()));
        }
        b.append(String.format(Locale.ROOT, "  overall: %d missed, %d spurious (target 0 and 0); RMS error/CRLB f %.2f"
                + " (target <= 1.5), zeta %.2f (target <= 2); %d fits with warnings%n", f.missed(), f.spurious(),
                f.frequencyErrorPerBound(), f.dampingErrorPerBound(), f.warnings()));
        b.append(String.format(Locale.ROOT, "  whole fit (LSCF chart to order %d, mode choice, LSFD, refinement):"
                + " median %.0f ms, max %.0f ms per trial%n", ModalEstimator.MAX_ORDER, 1e3 * f.medianFitS(),
                1e3 * f.maxFitS()));
        b.append(String.format(Locale.ROOT, "  one fit of %d lines, %d modes, after warm-up: %.0f ms (target < 1000 ms)%n",
                f.timedFitLines(), f.timedFitModes(), 1e3 * f.timedFitS()));
        return b.toString();
    }

    private static double rms(double squares, int n) {
        return n == 0 ? Double.NaN : Math.sqrt(squares / n);
    }

    private static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
    }
}
