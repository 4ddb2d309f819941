package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

/**
 * How one fit of a suite case did against its truth and the Cramer-Rao bound.
 *
 * <p>A true mode is determinable when the bound on its damping ratio is below {@link #DETERMINABLE_DAMPING_FRACTION}
 * of its value. Fitted modes are matched one-to-one to true ones as in the Monte Carlo
 * ({@link ModalBenchmarkTally#match}: within one half-power bandwidth of the true mode, closest pairs first), so a
 * doublet fitted as one mode leaves one of its two modes missed. A fitted mode matched to nothing is spurious; it
 * is counted apart, with the modes the bound cannot determine, when it lies within
 * {@link #NEIGHBOURHOOD_BANDWIDTHS} half-power bandwidths of such a mode (a weak mode found too far off, say).
 * Errors are divided by the bound at the truth (S. M. Kay, Fundamentals of Statistical Signal Processing: Estimation
 * Theory, 1993, ch. 3, from memory: an efficient unbiased estimator scores 1), over determinable matched modes only.
 *
 * @param modes true modes in the fit band
 * @param determinable how many of them the bound calls determinable
 * @param missedDeterminable determinable true modes with no fitted mode
 * @param spuriousDeterminable fitted modes matched to nothing and not near a mode the bound cannot determine
 * @param missedOther true modes the bound cannot determine and the fit did not find
 * @param spuriousOther fitted modes matched to nothing that lie near a mode the bound cannot determine
 * @param fitted fitted modes
 * @param matchedDeterminable determinable true modes with a fitted mode
 * @param frequencySquares sum over those of ((f_fit - f_true)/bound_f)^2
 * @param dampingSquares sum over those of ((zeta_fit - zeta_true)/bound_zeta)^2
 * @param worstFrequencyErrorPerBound the largest |f_fit - f_true|/bound_f among them
 * @param worstDampingErrorPerBound the largest |zeta_fit - zeta_true|/bound_zeta among them
 * @param truth each true mode with its bound and what the fit made of it
 * @param spuriousHz the natural frequencies of the spurious fitted modes, Hz
 */
public record ModalCaseScore(int modes, int determinable, int missedDeterminable, int spuriousDeterminable,
                             int missedOther, int spuriousOther, int fitted, int matchedDeterminable,
                             double frequencySquares, double dampingSquares, double worstFrequencyErrorPerBound,
                             double worstDampingErrorPerBound, List<TrueMode> truth, List<Double> spuriousHz) {
    /** A mode is determinable when its damping-ratio bound is below this fraction of the damping ratio: 5 %. */
    public static final double DETERMINABLE_DAMPING_FRACTION = 0.05;
    /** Reach, in the true mode's half-power bandwidths, within which a spurious mode is put down to a weak mode. */
    public static final double NEIGHBOURHOOD_BANDWIDTHS = 3;

    /**
     * One true mode: its bound, and the fitted mode matched to it.
     *
     * @param frequencyHz true f_n, Hz
     * @param dampingRatio true zeta
     * @param frequencyBoundHz the Cramer-Rao bound of f_n, Hz (NaN when the bound could not be computed)
     * @param dampingRatioBound the Cramer-Rao bound of zeta
     * @param determinable whether the bound calls it determinable
     * @param found whether a fitted mode was matched to it
     * @param fittedFrequencyHz the matched mode's f_n, Hz, NaN when none
     * @param fittedDampingRatio the matched mode's zeta, NaN when none
     * @param frequencyErrorPerBound (f_fit - f_true)/bound_f, NaN when none
     * @param dampingErrorPerBound (zeta_fit - zeta_true)/bound_zeta, NaN when none
     */
    public record TrueMode(double frequencyHz, double dampingRatio, double frequencyBoundHz, double dampingRatioBound,
                           boolean determinable, boolean found, double fittedFrequencyHz, double fittedDampingRatio,
                           double frequencyErrorPerBound, double dampingErrorPerBound) {
    }

    /** Copies the lists. */
    public ModalCaseScore {
        truth = List.copyOf(truth);
        spuriousHz = List.copyOf(spuriousHz);
    }

    /** @return RMS over determinable matched modes of (f_fit - f_true)/bound_f, NaN when there is none */
    public double frequencyErrorPerBound() {
        return matchedDeterminable == 0 ? Double.NaN : Math.sqrt(frequencySquares / matchedDeterminable);
    }

    /** @return RMS over determinable matched modes of (zeta_fit - zeta_true)/bound_zeta, NaN when there is none */
    public double dampingErrorPerBound() {
        return matchedDeterminable == 0 ? Double.NaN : Math.sqrt(dampingSquares / matchedDeterminable);
    }

    /**
     * Scores a fit.
     *
     * @param truth the true modes in the fit band
     * @param bounds the Cramer-Rao bound of each true mode, or null when it could not be computed (then no mode is
     *     determinable)
     * @param fitted the fitted modes (empty when the fit failed)
     * @return the score
     */
    static ModalCaseScore of(List<Mode> truth, List<FittedMode> bounds, List<Mode> fitted) {
        int n = truth.size();
        boolean[] determinable = new boolean[n];
        int determinableCount = 0;
        for (int t = 0; t < n; t++) {
            determinable[t] = bounds != null && bounds.get(t).dampingRatioStd()
                    < DETERMINABLE_DAMPING_FRACTION * truth.get(t).dampingRatio();
            determinableCount += determinable[t] ? 1 : 0;
        }
        int[] pairs = ModalBenchmarkTally.match(truth, fitted);
        boolean[] used = new boolean[fitted.size()];
        int missedDeterminable = 0;
        int missedOther = 0;
        int matchedDeterminable = 0;
        double fSquares = 0;
        double zSquares = 0;
        double worstF = 0;
        double worstZ = 0;
        List<TrueMode> modes = new ArrayList<>();
        for (int t = 0; t < n; t++) {
            Mode m = truth.get(t);
            double boundF = bounds == null ? Double.NaN : bounds.get(t).frequencyStdHz();
            double boundZ = bounds == null ? Double.NaN : bounds.get(t).dampingRatioStd();
            if (pairs[t] < 0) {
                missedDeterminable += determinable[t] ? 1 : 0;
                missedOther += determinable[t] ? 0 : 1;
                modes.add(new TrueMode(m.frequencyHz(), m.dampingRatio(), boundF, boundZ, determinable[t], false,
                        Double.NaN, Double.NaN, Double.NaN, Double.NaN));
                continue;
            }
            used[pairs[t]] = true;
            Mode e = fitted.get(pairs[t]);
            double zf = (e.frequencyHz() - m.frequencyHz()) / boundF;
            double zz = (e.dampingRatio() - m.dampingRatio()) / boundZ;
            modes.add(new TrueMode(m.frequencyHz(), m.dampingRatio(), boundF, boundZ, determinable[t], true,
                    e.frequencyHz(), e.dampingRatio(), zf, zz));
            if (determinable[t]) {
                matchedDeterminable++;
                fSquares += zf * zf;
                zSquares += zz * zz;
                worstF = Math.max(worstF, Math.abs(zf));
                worstZ = Math.max(worstZ, Math.abs(zz));
            }
        }
        int spuriousDeterminable = 0;
        int spuriousOther = 0;
        List<Double> spuriousHz = new ArrayList<>();
        for (int e = 0; e < fitted.size(); e++) {
            if (used[e]) {
                continue;
            }
            double f = fitted.get(e).frequencyHz();
            spuriousHz.add(f);
            boolean nearUndeterminable = false;
            for (int t = 0; t < n; t++) {
                Mode m = truth.get(t);
                double reach = NEIGHBOURHOOD_BANDWIDTHS * 2 * m.dampingRatio() * m.frequencyHz();
                nearUndeterminable |= !determinable[t] && Math.abs(f - m.frequencyHz()) <= reach;
            }
            spuriousOther += nearUndeterminable ? 1 : 0;
            spuriousDeterminable += nearUndeterminable ? 0 : 1;
        }
        return new ModalCaseScore(n, determinableCount, missedDeterminable, spuriousDeterminable, missedOther,
                spuriousOther, fitted.size(), matchedDeterminable, fSquares, zSquares, worstF, worstZ, modes, spuriousHz);
    }
}
