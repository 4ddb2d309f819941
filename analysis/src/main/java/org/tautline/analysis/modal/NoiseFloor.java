package org.tautline.analysis.modal;

import java.util.Arrays;

import org.tautline.analysis.frf.Frf;

/**
 * The noise variance E|e_k|^2 of each line of a receptance: the FRF's own variance where it carries one, else an
 * estimate from the scatter of neighbouring lines.
 *
 * <p>The estimate uses the pseudo-residuals of T. Gasser, L. Sroka and C. Jennen-Steinmetz, "Residual variance and
 * residual pattern in nonlinear regression", Biometrika 73:625-633, 1986 (from memory): each interior line is
 * compared with the straight line through its two neighbours, e_k = a_k H_(k-1) + b_k H_(k+1) - H_k with
 * a_k = (f_(k+1) - f_k)/(f_(k+1) - f_(k-1)) and b_k = 1 - a_k, which removes a smooth response (on any line spacing)
 * and leaves noise of variance (a_k^2 + b_k^2 + 1) s_k^2. For circular complex Gaussian noise
 * |e_k|^2/((a_k^2 + b_k^2 + 1) s_k^2) is exponential with mean 1, so its median is ln 2. Where the response bends
 * sharply (a lightly damped peak a few lines wide) the pseudo-residual also holds the curvature; the median over
 * {@value #HALF_WIDTH} lines either side ignores such lines as long as they are fewer than half of them, the same
 * robustness that makes the median absolute deviation the usual noise estimate for wavelet coefficients
 * (D. L. Donoho and I. M. Johnstone, Biometrika 81:425-455, 1994, from memory). Two noise forms are estimated,
 * additive (the median of the normalised squares) and relative to |H| (the median of the squares over |H|^2,
 * times |H_k|^2), and the larger is taken at each line: an estimate on the high side makes the checks of the fit
 * that use it cautious rather than alarmed. Variances at or below zero in an FRF's own column (one average gives
 * zero) are replaced by this estimate. For judging, either is held at or above (({@value #RELATIVE_FLOOR}) |H_k|)^2
 * ({@link #judged}).
 */
final class NoiseFloor {
    /** Lines either side of a line whose pseudo-residuals give its noise estimate. */
    static final int HALF_WIDTH = 25;
    /**
     * The smallest standard deviation of a line's error, relative to its |H|, that a fit's decisions (a mode added, a
     * pole split, a pole beyond an edge kept, the data called unexplained) are judged against: no measured FRF is
     * known to better than about 0.01 % whatever the scatter of its readings says (the transient a stepped sine's
     * settling leaves near -80 dB, the drift of gains and of a step's frequency, the slight nonlinearity of a real
     * specimen; common practice). Judged against lines read to a few parts per million, the small imperfections of any
     * model (the account of the modes beyond the band) would outweigh the resonances themselves. The fit's weights
     * keep the lines' own variance, so its estimates stay those of maximum likelihood.
     */
    static final double RELATIVE_FLOOR = 1e-4;
    /** Smallest variance kept, relative to the largest |H|^2: keeps the weights finite on noise-free data. */
    private static final double SMALLEST = 1e-24;

    private NoiseFloor() {
    }

    /**
     * The noise variance of every line.
     *
     * @param receptance the FRF as receptance, at least three lines
     * @return E|e_k|^2 at each line, (m/N)^2, positive
     */
    static double[] of(Frf receptance) {
        double[] own = receptance.variance().orElse(null);
        double[] out;
        if (own != null && Arrays.stream(own).allMatch(v -> v > 0)) {
            out = own.clone();
        } else {
            double[] estimated = estimated(receptance);
            out = own == null ? estimated : own.clone();
            for (int k = 0; k < out.length; k++) {
                if (!(out[k] > 0)) {
                    out[k] = estimated[k];
                }
            }
        }
        return out;
    }

    /**
     * The variance a fit's decisions are judged against: the noise variance held at or above
     * (({@value #RELATIVE_FLOOR}) |H_k|)^2.
     *
     * @param receptance the FRF
     * @param noise the noise variance of each line
     * @return the variance for judging, one per line
     */
    static double[] judged(Frf receptance, double[] noise) {
        double[] out = noise.clone();
        for (int k = 0; k < out.length; k++) {
            double floor = RELATIVE_FLOOR * receptance.magnitude(k);
            out[k] = Math.max(out[k], floor * floor);
        }
        return out;
    }

    /**
     * The noise variance estimated from the data alone.
     *
     * @param h the FRF, any quantity (the estimate is in its units squared)
     * @return E|e_k|^2 at each line, positive
     */
    static double[] estimated(Frf h) {
        int n = h.size();
        double[] f = h.frequenciesHz();
        double[] additive = new double[n];
        double[] relative = new double[n];
        double peak = 0;
        for (int k = 0; k < n; k++) {
            peak = Math.max(peak, h.magnitude(k));
        }
        double smallest = SMALLEST * peak * peak;
        if (n < 3) {
            double[] flat = new double[n];
            Arrays.fill(flat, Math.max(smallest, Double.MIN_NORMAL));
            return flat;
        }
        for (int k = 1; k < n - 1; k++) {
            double a = (f[k + 1] - f[k]) / (f[k + 1] - f[k - 1]);
            double b = 1 - a;
            double re = a * h.value(k - 1).getReal() + b * h.value(k + 1).getReal() - h.value(k).getReal();
            double im = a * h.value(k - 1).getImaginary() + b * h.value(k + 1).getImaginary() - h.value(k).getImaginary();
            double normalised = (re * re + im * im) / (a * a + b * b + 1);
            additive[k] = normalised;
            double m = h.magnitude(k);
            relative[k] = m > 0 ? normalised / (m * m) : 0;
        }
        additive[0] = additive[1];
        additive[n - 1] = additive[n - 2];
        relative[0] = relative[1];
        relative[n - 1] = relative[n - 2];
        double[] out = new double[n];
        double ln2 = Math.log(2);
        for (int k = 0; k < n; k++) {
            int from = Math.max(0, k - HALF_WIDTH);
            int to = Math.min(n, k + HALF_WIDTH + 1);
            double m = h.magnitude(k);
            double byAdditive = median(additive, from, to) / ln2;
            double byRelative = median(relative, from, to) / ln2 * m * m;
            out[k] = Math.max(Math.max(byAdditive, byRelative), Math.max(smallest, Double.MIN_NORMAL));
        }
        return out;
    }

    /**
     * The noise variance estimated again from the residual of a fit to data that carry no variance of their own.
     *
     * <p>Near a lightly damped peak the pseudo-residuals of {@link #estimated} hold the peak's curvature over many
     * lines and overstate the noise; the residual of a fitted model does not. The estimate is the running median of
     * |r_k|^2 over {@value #HALF_WIDTH} lines either side, divided by ln 2 (its median for circular Gaussian noise):
     * robust, like the median absolute deviation, against the few lines where a mode is missing. It is taken only
     * where it is below the first estimate; elsewhere (a misfit wider than the median's reach) the first stands.
     *
     * @param first the first estimate, one variance per line
     * @param residual the residual of the fit at every line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param h the FRF
     * @return the new estimate, one variance per line
     */
    static double[] fromResidual(double[] first, org.hipparchus.complex.Complex[] residual, Frf h, double lowHz,
                                 double highHz) {
        int n = h.size();
        double[] squares = new double[n];
        int from = n;
        int to = -1;
        for (int k = 0; k < n; k++) {
            squares[k] = residual[k].norm() * residual[k].norm();
            if (h.frequencyHz(k) >= lowHz && h.frequencyHz(k) <= highHz) {
                from = Math.min(from, k);
                to = Math.max(to, k);
            }
        }
        double[] out = first.clone();
        double ln2 = Math.log(2);
        for (int k = from; k <= to; k++) {
            int a = Math.max(from, k - HALF_WIDTH);
            int b = Math.min(to + 1, k + HALF_WIDTH + 1);
            double v = median(squares, a, b) / ln2;
            if (v > 0 && v < out[k]) {
                out[k] = v;
            }
        }
        return out;
    }

    private static double median(double[] values, int from, int to) {
        double[] part = Arrays.copyOfRange(values, from, to);
        Arrays.sort(part);
        int m = part.length;
        return m % 2 == 1 ? part[m / 2] : 0.5 * (part[m / 2 - 1] + part[m / 2]);
    }
}
