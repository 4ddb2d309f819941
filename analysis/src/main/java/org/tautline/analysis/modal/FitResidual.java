package org.tautline.analysis.modal;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;

/**
 * The residual of a modal model against a measured receptance, whitened by the noise of each line, and the robust
 * weights it gives.
 *
 * <p>Whitened, e_k = (H_k - H_model,k)/s_k with s_k^2 = E|noise_k|^2, a correct model leaves circular noise with
 * E|e_k|^2 = 1. Lines whose misfit is many times their stated noise (a stepped-sine step at the largest motion of a
 * slightly nonlinear specimen, a transient that the settling did not clear) would otherwise steer a least-squares
 * fit whose other lines they outweigh a thousandfold. They are given the weight of Huber's M-estimator,
 * u_k = min(1, c/|e_k|), c = {@value #HUBER}, so that no line pulls harder than a line c standard deviations off
 * (P. J. Huber, "Robust estimation of a location parameter", Ann. Math. Statist. 35:73-101, 1964), the weights being
 * recomputed from each fit and the fit repeated (iteratively reweighted least squares: P. W. Holland and
 * R. E. Welsch, Commun. Statist. A6:813-827, 1977; both from memory). For noise that is what the variance says,
 * |e_k| exceeds c with probability exp(-c^2) ~ 1e-4, so the weights of a fit that explains the data stay 1.
 */
final class FitResidual {
    /** Huber's constant, in standard deviations of the complex residual. */
    static final double HUBER = 3.0;

    private final Complex[] residual;
    private final double[] whitenedSquare;

    private FitResidual(Complex[] residual, double[] whitenedSquare) {
        this.residual = residual;
        this.whitenedSquare = whitenedSquare;
    }

    /**
     * The residual of a model at every line of the FRF (lines outside the fitted band included).
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line, positive
     * @param modes the model's modes
     * @param terms the model's residual terms
     * @return the residual
     */
    static FitResidual of(Frf h, double[] variance, List<Mode> modes, ResidualTerms terms) {
        return of(h, variance, modes, terms, false);
    }

    /**
     * The residual of a model, whitened or not.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line (ignored when {@code residualOnly})
     * @param modes the model's modes
     * @param terms the model's residual terms
     * @param residualOnly true to skip the whitening (the whitened squares are then zero)
     * @return the residual
     */
    static FitResidual of(Frf h, double[] variance, List<Mode> modes, ResidualTerms terms, boolean residualOnly) {
        int n = h.size();
        List<Mode> all = new java.util.ArrayList<>(modes);
        all.addAll(terms.outsideBand());
        int count = all.size();
        // Each mode's A/(w_n^2 - w^2 + 2 j zeta w_n w) in plain arithmetic (Mode.receptanceAt, without its objects).
        double[] wn2 = new double[count];
        double[] twoZetaWn = new double[count];
        double[] aRe = new double[count];
        double[] aIm = new double[count];
        for (int r = 0; r < count; r++) {
            Mode m = all.get(r);
            double wn = m.angularFrequencyRadPerS();
            wn2[r] = wn * wn;
            twoZetaWn[r] = 2.0 * m.dampingRatio() * wn;
            aRe[r] = m.modalConstant().getReal();
            aIm[r] = m.modalConstant().getImaginary();
        }
        double upperRe = terms.upper().getReal();
        double upperIm = terms.upper().getImaginary();
        double lowerRe = terms.lower().getReal();
        double lowerIm = terms.lower().getImaginary();
        Complex[] r = new Complex[n];
        double[] e2 = new double[n];
        double[] re = h.realParts();
        double[] im = h.imaginaryParts();
        for (int k = 0; k < n; k++) {
            double w = 2.0 * Math.PI * h.frequencyHz(k);
            double w2 = w * w;
            double modelRe = upperRe - lowerRe / w2;
            double modelIm = upperIm - lowerIm / w2;
            for (int q = 0; q < count; q++) {
                double dr = wn2[q] - w2;
                double di = twoZetaWn[q] * w;
                double d2 = dr * dr + di * di;
                modelRe += (aRe[q] * dr + aIm[q] * di) / d2;
                modelIm += (aIm[q] * dr - aRe[q] * di) / d2;
            }
            double eRe = re[k] - modelRe;
            double eIm = im[k] - modelIm;
            r[k] = new Complex(eRe, eIm);
            e2[k] = residualOnly ? 0 : (eRe * eRe + eIm * eIm) / variance[k];
        }
        return new FitResidual(r, e2);
    }

    /** @return H_k - H_model,k at each line, m/N */
    Complex[] residual() {
        return residual.clone();
    }

    /** @return |e_k|^2, the squared residual over the noise variance, at each line */
    double[] whitenedSquares() {
        return whitenedSquare.clone();
    }

    /**
     * Huber's weights u_k = min(1, c/|e_k|).
     *
     * @return one weight per line, 0 &lt; u_k &lt;= 1
     */
    double[] huberWeights() {
        double[] u = new double[whitenedSquare.length];
        for (int k = 0; k < u.length; k++) {
            double e = Math.sqrt(whitenedSquare[k]);
            u[k] = e <= HUBER ? 1 : HUBER / e;
        }
        return u;
    }
}
