package org.tautline.analysis.specimen;

import java.util.Arrays;

import org.tautline.analysis.AnalysisException;

/**
 * Assigns harmonic numbers to natural frequencies of a string when they are obvious.
 *
 * <p>For a taut string f_n ~ n f1 (Mersenne), raised slightly by bending stiffness (Fletcher 1964:
 * f_n = n f0 sqrt(1 + B n^2)). The fundamental is not necessarily the lowest frequency found: it
 * may be missing because a node sits at the forcing or sensor point. So every candidate
 * f1 = f_k / m (k any found mode, m = 1..{@value #MAX_DIVISOR}) is scored by how many modes lie
 * within a relative tolerance of an integer multiple of it; the candidate explaining the most modes
 * wins. A subharmonic (f1/2, f1/3) explains as many modes, but only by leaving harmonics unused, so
 * among equal scores the candidate with the fewest unused harmonics below the highest is taken.
 * Modes further than the tolerance from any multiple get harmonic 0 (not numbered). This is a
 * first numbering for a nearly ideal string: bending stiffness beyond the tolerance needs the
 * stiffness-aware numbering of the physics estimator.
 */
public final class HarmonicNumbering {
    /** Largest harmonic number tried for the lowest modes when looking for the fundamental. */
    public static final int MAX_DIVISOR = 6;

    private HarmonicNumbering() {
    }

    /**
     * Numbers the given frequencies.
     *
     * @param frequenciesHz natural frequencies, Hz, any order, all positive
     * @param relativeTolerance how far from n f1 a mode may be and still be numbered, for example 0.02
     * @return harmonic numbers in the order of the input, 0 where not obvious
     */
    public static int[] number(double[] frequenciesHz, double relativeTolerance) {
        if (!(relativeTolerance > 0 && relativeTolerance < 0.25)) {
            throw new AnalysisException("relative tolerance must lie between 0 and 0.25, got " + relativeTolerance);
        }
        for (int i = 0; i < frequenciesHz.length; i++) {
            if (!(frequenciesHz[i] > 0) || Double.isInfinite(frequenciesHz[i])) {
                throw new AnalysisException("frequency " + i + " must be positive and finite, got " + frequenciesHz[i] + " Hz");
            }
        }
        if (frequenciesHz.length == 0) {
            return new int[0];
        }
        double bestF1 = Double.NaN;
        int bestScore = -1;
        int bestGaps = Integer.MAX_VALUE;
        for (double fk : frequenciesHz) {
            for (int m = 1; m <= MAX_DIVISOR; m++) {
                double f1 = fk / m;
                int[] n = assign(frequenciesHz, f1, relativeTolerance);
                int score = (int) Arrays.stream(n).filter(h -> h > 0).count();
                int highest = Arrays.stream(n).max().orElse(0);
                int distinct = (int) Arrays.stream(n).filter(h -> h > 0).distinct().count();
                int gaps = highest - distinct;
                if (score > bestScore || score == bestScore && gaps < bestGaps) {
                    bestScore = score;
                    bestGaps = gaps;
                    bestF1 = f1;
                }
            }
        }
        return assign(frequenciesHz, bestF1, relativeTolerance);
    }

    private static int[] assign(double[] frequenciesHz, double f1, double relativeTolerance) {
        int[] n = new int[frequenciesHz.length];
        for (int i = 0; i < frequenciesHz.length; i++) {
            long harmonic = Math.round(frequenciesHz[i] / f1);
            if (harmonic >= 1 && Math.abs(frequenciesHz[i] / (harmonic * f1) - 1.0) <= relativeTolerance) {
                n[i] = (int) harmonic;
            }
        }
        return n;
    }
}
