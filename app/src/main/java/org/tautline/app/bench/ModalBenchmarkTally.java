package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

/**
 * Matches estimated modes to true ones and accumulates the modal benchmark's counts and squared normalised errors.
 *
 * <p>An estimate matches a true mode when its natural frequency lies within {@link #MATCH_BANDWIDTHS} of the
 * true mode's half-power bandwidths 2 zeta f; pairs are taken greedily in increasing distance so the matching is
 * one-to-one. Errors are normalised by the Cramer-Rao bound at the true model, so a fit that is as good as any
 * unbiased estimator can be scores about 1. Mutable, one per spacing; not thread-safe.
 */
final class ModalBenchmarkTally {
    /** Largest distance of a match, in half-power bandwidths of the true mode: 1. */
    static final double MATCH_BANDWIDTHS = 1.0;

    private int trials;
    private int failedFits;
    private int trueModes;
    private int matched;
    private int missed;
    private int spurious;
    private double frequencySquares;
    private double dampingSquares;
    private double worstFrequency;
    private double worstDamping;

    /**
     * One-to-one matching of estimates to true modes.
     *
     * @param truth the true modes
     * @param estimates the estimated modes
     * @return for each true mode the index of its estimate, or -1 when missed
     */
    static int[] match(List<Mode> truth, List<Mode> estimates) {
        List<double[]> pairs = new ArrayList<>();
        for (int t = 0; t < truth.size(); t++) {
            Mode m = truth.get(t);
            double bandwidthHz = 2 * m.dampingRatio() * m.frequencyHz();
            for (int e = 0; e < estimates.size(); e++) {
                double distance = Math.abs(estimates.get(e).frequencyHz() - m.frequencyHz()) / bandwidthHz;
                if (distance <= MATCH_BANDWIDTHS) {
                    pairs.add(new double[] {distance, t, e});
                }
            }
        }
        pairs.sort(Comparator.comparingDouble(p -> p[0]));
        int[] out = new int[truth.size()];
        Arrays.fill(out, -1);
        boolean[] used = new boolean[estimates.size()];
        for (double[] p : pairs) {
            int t = (int) p[1];
            int e = (int) p[2];
            if (out[t] < 0 && !used[e]) {
                out[t] = e;
                used[e] = true;
            }
        }
        return out;
    }

    /**
     * Adds one trial whose fit succeeded.
     *
     * @param truth the true modes
     * @param bounds the Cramer-Rao bounds at the truth, one per true mode
     * @param estimates the fitted modes
     */
    void add(List<Mode> truth, List<FittedMode> bounds, List<FittedMode> estimates) {
        trials++;
        trueModes += truth.size();
        List<Mode> plain = estimates.stream().map(FittedMode::mode).toList();
        int[] pairs = match(truth, plain);
        int hits = 0;
        for (int t = 0; t < truth.size(); t++) {
            if (pairs[t] < 0) {
                missed++;
                continue;
            }
            hits++;
            Mode e = plain.get(pairs[t]);
            double zf = (e.frequencyHz() - truth.get(t).frequencyHz()) / bounds.get(t).frequencyStdHz();
            double zz = (e.dampingRatio() - truth.get(t).dampingRatio()) / bounds.get(t).dampingRatioStd();
            frequencySquares += zf * zf;
            dampingSquares += zz * zz;
            worstFrequency = Math.max(worstFrequency, Math.abs(zf));
            worstDamping = Math.max(worstDamping, Math.abs(zz));
        }
        matched += hits;
        spurious += estimates.size() - hits;
    }

    /**
     * Adds one trial whose fit failed: every true mode is missed.
     *
     * @param truth the true modes
     */
    void addFailure(List<Mode> truth) {
        trials++;
        failedFits++;
        trueModes += truth.size();
        missed += truth.size();
    }

    /**
     * The figures so far.
     *
     * @param steppedSine the spacing these trials used
     * @return the figures
     */
    ModalBenchmark.SpacingFigures figures(boolean steppedSine) {
        return new ModalBenchmark.SpacingFigures(steppedSine, trials, failedFits, trueModes, matched, missed, spurious,
                rms(frequencySquares, matched), rms(dampingSquares, matched), worstFrequency, worstDamping,
                frequencySquares, dampingSquares);
    }

    private static double rms(double squares, int n) {
        return n == 0 ? Double.NaN : Math.sqrt(squares / n);
    }
}
