package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealVector;

/**
 * The start pole of a mode found in a fit's residual, from a linear one-pole fit of the residual around its peak.
 *
 * <p>Near a missing, lightly damped mode the residual is r(w) ~ R/(jw - lambda) + c, the conjugate pole and the
 * misfit of other modes being nearly constant over a few half-power bands. Multiplying out gives equations linear
 * in lambda, b = R - c lambda and c: r_k jw_k = lambda r_k + b + c jw_k, solved by least squares (the equation-error
 * linearisation of E. C. Levy, "Complex-curve fitting", IRE Trans. Automatic Control AC-4:37-43, 1959, from memory;
 * LSCF is its z-domain, many-pole form). The frequency axis is taken relative to the peak line and scaled by the
 * half-width of the fitted lines, so the columns of b and c are not nearly parallel. The fit is made first on
 * {@link #FIRST_LINES} lines centred on the peak, then once more on the lines within two half-power half-widths
 * 2 zeta f of its pole, if that is wider. Its damping then comes from the data around the peak rather than from a
 * neighbouring mode, so the joint refinement that follows starts close and converges in a few steps.
 */
final class ModalResidualStart {
    /** Lines of the first local fit, centred on the peak. */
    static final int FIRST_LINES = 15;
    /** Most lines of the second local fit. */
    private static final int MOST_LINES = 400;

    private ModalResidualStart() {
    }

    /**
     * The local pole, or null when no plausible pole (0 &lt; zeta &lt; {@link ModeSelection#MAX_DAMPING_RATIO},
     * frequency inside the fitted lines) comes out.
     *
     * @param frequencyHz the line frequencies, increasing
     * @param residual the residual of the fit at each line
     * @param peak the line of the peak
     * @return the pole or null
     */
    static Pole at(double[] frequencyHz, Complex[] residual, int peak) {
        int n = frequencyHz.length;
        Pole first = fit(frequencyHz, residual, peak, Math.max(0, peak - FIRST_LINES / 2),
                Math.min(n - 1, peak + FIRST_LINES / 2));
        if (first == null) {
            return null;
        }
        double reachHz = 2 * first.dampingRatio() * first.frequencyHz();
        int from = peak;
        while (from > 0 && peak - from < MOST_LINES / 2 && frequencyHz[peak] - frequencyHz[from - 1] <= reachHz) {
            from--;
        }
        int to = peak;
        while (to < n - 1 && to - peak < MOST_LINES / 2 && frequencyHz[to + 1] - frequencyHz[peak] <= reachHz) {
            to++;
        }
        if (to - from + 1 <= FIRST_LINES) {
            return first;
        }
        Pole second = fit(frequencyHz, residual, peak, from, to);
        return second == null ? first : second;
    }

    private static Pole fit(double[] frequencyHz, Complex[] residual, int peak, int from, int to) {
        int m = to - from + 1;
        if (m < 4) {
            return null;
        }
        // u = (w - w_peak)/half, so with mu = (lambda - j w_peak)/half and c' = c the equations read
        // r_k j u_k = mu r_k + b' + c' j u_k, every column of order one or of the residual's size.
        double centre = 2 * Math.PI * frequencyHz[peak];
        double half = Math.PI * (frequencyHz[to] - frequencyHz[from]);
        double[][] a = new double[2 * m][6];
        double[] y = new double[2 * m];
        for (int k = 0; k < m; k++) {
            double u = (2 * Math.PI * frequencyHz[from + k] - centre) / half;
            double rr = residual[from + k].getReal();
            double ri = residual[from + k].getImaginary();
            // Unknowns: Re mu, Im mu, Re b', Im b', Re c', Im c'.
            a[2 * k] = new double[] {rr, -ri, 1, 0, 0, -u};
            y[2 * k] = -ri * u;
            a[2 * k + 1] = new double[] {ri, rr, 0, 1, u, 0};
            y[2 * k + 1] = rr * u;
        }
        RealVector solution;
        try {
            solution = new QRDecomposition(new Array2DRowRealMatrix(a, false), 1e-12).getSolver()
                    .solve(new ArrayRealVector(y, false));
        } catch (MathRuntimeException e) {
            return null;
        }
        double re = solution.getEntry(0) * half;
        double im = centre + solution.getEntry(1) * half;
        if (!(re < 0) || !(im > 0) || !Double.isFinite(re) || !Double.isFinite(im)) {
            return null;
        }
        Pole p = new Pole(re, im);
        boolean plausible = p.dampingRatio() < ModeSelection.MAX_DAMPING_RATIO && p.frequencyHz() >= frequencyHz[from]
                && p.frequencyHz() <= frequencyHz[to];
        return plausible ? p : null;
    }
}
