package org.tautline.analysis.frf;

import org.tautline.analysis.AnalysisException;

/**
 * First-order random errors of FRF and coherence estimates averaged over n_d segments.
 *
 * <p>J. S. Bendat and A. G. Piersol, Random Data: Analysis and Measurement Procedures, 4th ed.,
 * Wiley 2010, sec. 9.2 (from memory), for Gaussian data and n_d independent averages, with
 * g2 = gamma^2 the coherence and |g| = sqrt(g2):
 * <ul>
 *   <li>normalised random error of |H|: std(|H_est|)/|H| = sqrt(1 - g2) / (|g| sqrt(2 n_d));</li>
 *   <li>standard deviation of the phase, radians: the same expression;</li>
 *   <li>normalised random error of the coherence: std(g2_est)/g2 = sqrt(2) (1 - g2) / (|g| sqrt(n_d)).</li>
 * </ul>
 * The formulas hold to first order for either H1 or H2 and are good when the error is small
 * (n_d of 20 or more, coherence not near zero). With overlapped segments, pass the equivalent
 * number of independent averages (see {@code CrossSpectra.effectiveAverageCount()}); the raw
 * segment count makes the errors optimistic.
 */
public final class FrfRandomError {
    private FrfRandomError() {
    }

    /**
     * The relative standard deviation of the magnitude, std(|H_est|)/|H|.
     *
     * @param coherence gamma^2, 0 < coherence <= 1
     * @param averages n_d, positive
     * @return sqrt(1 - g2) / (|g| sqrt(2 n_d))
     */
    public static double magnitudeRelativeStd(double coherence, double averages) {
        check(coherence, averages);
        return Math.sqrt((1 - coherence) / (coherence * 2 * averages));
    }

    /**
     * The standard deviation of the phase, radians; equal to {@link #magnitudeRelativeStd(double, double)}.
     *
     * @param coherence gamma^2, 0 < coherence <= 1
     * @param averages n_d, positive
     * @return sqrt(1 - g2) / (|g| sqrt(2 n_d)), rad
     */
    public static double phaseStdRad(double coherence, double averages) {
        return magnitudeRelativeStd(coherence, averages);
    }

    /**
     * The variance of the complex estimate, E|H_est - H|^2: magnitude and phase errors added in quadrature.
     *
     * <p>It is |H|^2 (1 - g2) / (g2 n_d), twice the per-component value |H|^2 (1 - g2) / (2 g2 n_d)
     * that the real and imaginary parts (or |H| and |H| times the phase) each carry.
     *
     * @param magnitudeSquared |H|^2
     * @param coherence gamma^2, 0 < coherence <= 1
     * @param averages n_d, positive
     * @return E|H_est - H|^2, in the units of |H|^2
     */
    public static double variance(double magnitudeSquared, double coherence, double averages) {
        check(coherence, averages);
        return magnitudeSquared * (1 - coherence) / (coherence * averages);
    }

    /**
     * The relative standard deviation of the coherence estimate, std(g2_est)/g2.
     *
     * @param coherence gamma^2, 0 < coherence <= 1
     * @param averages n_d, positive
     * @return sqrt(2) (1 - g2) / (|g| sqrt(n_d))
     */
    public static double coherenceRelativeStd(double coherence, double averages) {
        check(coherence, averages);
        return Math.sqrt(2.0) * (1 - coherence) / Math.sqrt(coherence * averages);
    }

    private static void check(double coherence, double averages) {
        if (!(coherence > 0 && coherence <= 1)) {
            throw new AnalysisException("coherence for a random error must satisfy 0 < coherence <= 1, got " + coherence);
        }
        if (!(averages > 0) || Double.isInfinite(averages)) {
            throw new AnalysisException("number of averages for a random error must be positive and finite, got " + averages);
        }
    }
}
