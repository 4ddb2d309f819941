package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;

/**
 * The weighted modal receptance model and its analytic Jacobian, shared by the refinement and the Cramer-Rao bound.
 *
 * <p>Model: H(w) = sum_r A_r/D_r(w) + UR - LR/w^2 with D_r = w_r^2 - w^2 + 2 j zeta_r w_r w
 * (D. J. Ewins, Modal Testing, 2nd ed. 2000, ch. 2 and 4, from memory). Its derivatives, by the quotient rule:
 * dH/dw_r = -A_r (2 w_r + 2 j zeta_r w)/D_r^2, dH/dzeta_r = -A_r (2 j w_r w)/D_r^2, dH/dA_r = 1/D_r
 * (and j/D_r for the imaginary part), dH/dUR = 1, dH/dLR = -1/w^2.
 *
 * <p>Scaled parameters, all of order one at the start: per mode p_f with w_r = w0_r p_f (relative frequency),
 * p_z with zeta_r = zeta0_r exp(p_z) (log damping, which keeps zeta positive), p_a (and p_b for complex modes)
 * with A_r = |A0_r| (p_a + j p_b); then UR = u (p + j q) and LR = u w_lo^2 (p + j q), u the scale of |H| and
 * w_lo the lowest line; then for each fixed pole outside the band (held in the start residual terms, see
 * {@link ResidualTerms#outsideBand()}) its complex coefficient B_q = s_q (p + j q) on 1/D_q, s_q its start size.
 * Each line's real and imaginary parts are stacked and multiplied by sqrt(weight).
 */
final class ModalRefinementModel {
    private final double[] w;
    private final double[] root;
    private final boolean realModes;
    private final boolean upper;
    private final boolean lower;
    private final double[] w0;
    private final double[] zeta0;
    private final double[] aScale;
    private final double upperScale;
    private final double lowerScale;
    private final List<Mode> outside;
    private final double[] outsideScale;
    private final double[] start;

    ModalRefinementModel(double[] angularFrequencyRadPerS, double[] weight, List<Mode> modes, ResidualTerms residuals,
                         boolean realModes, boolean upper, boolean lower, double magnitudeScale) {
        this.w = angularFrequencyRadPerS.clone();
        this.root = new double[weight.length];
        for (int k = 0; k < weight.length; k++) {
            root[k] = Math.sqrt(weight[k]);
        }
        this.realModes = realModes;
        this.upper = upper;
        this.lower = lower;
        int n = modes.size();
        this.w0 = new double[n];
        this.zeta0 = new double[n];
        this.aScale = new double[n];
        this.upperScale = magnitudeScale;
        double wLow = w[0];
        this.lowerScale = magnitudeScale * wLow * wLow;
        this.outside = residuals.outsideBand();
        this.outsideScale = new double[outside.size()];
        this.start = new double[parameterCount(n, realModes, upper, lower) + 2 * outside.size()];
        int c = 0;
        for (int r = 0; r < n; r++) {
            Mode mode = modes.get(r);
            w0[r] = mode.angularFrequencyRadPerS();
            zeta0[r] = mode.dampingRatio();
            Complex a = mode.modalConstant();
            aScale[r] = realModes ? Math.abs(a.getReal()) : a.norm();
            start[c++] = 1;
            start[c++] = 0;
            start[c++] = a.getReal() / aScale[r];
            if (!realModes) {
                start[c++] = a.getImaginary() / aScale[r];
            }
        }
        if (upper) {
            start[c++] = residuals.upper().getReal() / upperScale;
            start[c++] = residuals.upper().getImaginary() / upperScale;
        }
        if (lower) {
            start[c++] = residuals.lower().getReal() / lowerScale;
            start[c++] = residuals.lower().getImaginary() / lowerScale;
        }
        for (int q = 0; q < outside.size(); q++) {
            Mode o = outside.get(q);
            double wq = o.angularFrequencyRadPerS();
            double size = o.modalConstant().norm();
            outsideScale[q] = size > 0 ? size : magnitudeScale * 2 * Math.max(o.dampingRatio(), 1e-3) * wq * wq;
            start[c++] = o.modalConstant().getReal() / outsideScale[q];
            start[c++] = o.modalConstant().getImaginary() / outsideScale[q];
        }
    }

    static int parameterCount(int modes, boolean realModes, boolean upper, boolean lower) {
        return modes * (realModes ? 3 : 4) + (upper ? 2 : 0) + (lower ? 2 : 0);
    }

    int parameterCount() {
        return start.length;
    }

    int valueCount() {
        return 2 * w.length;
    }

    double[] start() {
        return start.clone();
    }

    /**
     * The Jacobian by columns, filling the whitened model values when asked.
     *
     * @param p scaled parameters
     * @param values receives the 2m whitened model values, or null
     * @return one column of 2m entries per parameter
     */
    double[][] jacobianColumns(double[] p, double[] values) {
        int m = w.length;
        double[][] columns = new double[p.length][2 * m];
        int n = w0.length;
        for (int k = 0; k < m; k++) {
            double wk = w[k];
            double sq = root[k];
            Complex sum = Complex.ZERO;
            int c = 0;
            for (int r = 0; r < n; r++) {
                double wn = w0[r] * p[c];
                double zeta = zeta0[r] * Math.exp(p[c + 1]);
                Complex a = new Complex(aScale[r] * p[c + 2], realModes ? 0 : aScale[r] * p[c + 3]);
                Complex inverse = new Complex(wn * wn - wk * wk, 2 * zeta * wn * wk).reciprocal();
                Complex term = a.multiply(inverse);
                sum = sum.add(term);
                Complex common = term.multiply(inverse).negate();
                put(columns[c], k, sq, common.multiply(new Complex(2 * wn, 2 * zeta * wk)).multiply(w0[r]));
                put(columns[c + 1], k, sq, common.multiply(new Complex(0, 2 * wn * wk)).multiply(zeta));
                put(columns[c + 2], k, sq, inverse.multiply(aScale[r]));
                c += 3;
                if (!realModes) {
                    put(columns[c], k, sq, inverse.multiply(new Complex(0, aScale[r])));
                    c++;
                }
            }
            if (upper) {
                sum = sum.add(new Complex(upperScale * p[c], upperScale * p[c + 1]));
                put(columns[c++], k, sq, new Complex(upperScale, 0));
                put(columns[c++], k, sq, new Complex(0, upperScale));
            }
            if (lower) {
                double g = -lowerScale / (wk * wk);
                sum = sum.add(new Complex(g * p[c], g * p[c + 1]));
                put(columns[c++], k, sq, new Complex(g, 0));
                put(columns[c++], k, sq, new Complex(0, g));
            }
            for (int q = 0; q < outside.size(); q++) {
                Complex basis = outsideBasis(q, wk);
                sum = sum.add(basis.multiply(new Complex(p[c], p[c + 1])));
                put(columns[c++], k, sq, basis);
                put(columns[c++], k, sq, basis.multiply(Complex.I));
            }
            if (values != null) {
                values[2 * k] = sq * sum.getReal();
                values[2 * k + 1] = sq * sum.getImaginary();
            }
        }
        return columns;
    }

    /**
     * The unscaled normal equations J^T J and J^T (target - values) of the whitened model, accumulated line by line
     * without storing J (the same entries as {@link #jacobianColumns}, in plain arithmetic), filling the model values.
     *
     * @param p scaled parameters
     * @param target the whitened stacked measurements, 2m values
     * @param values receives the 2m whitened model values
     * @param matrix receives J^T J, p x p, zeroed by the caller (upper triangle and diagonal filled)
     * @param gradient receives J^T (target - values), p values, zeroed by the caller
     */
    void normalEquations(double[] p, double[] target, double[] values, double[][] matrix, double[] gradient) {
        int count = p.length;
        int n = w0.length;
        double[] re = new double[count];
        double[] im = new double[count];
        ModeValues modes = modeValues(p);
        for (int k = 0; k < w.length; k++) {
            double wk = w[k];
            double sq = root[k];
            double sumRe = 0;
            double sumIm = 0;
            int c = 0;
            for (int r = 0; r < n; r++) {
                double wn = modes.wn[r];
                double zeta = modes.zeta[r];
                double ar = modes.ar[r];
                double ai = modes.ai[r];
                double dr = wn * wn - wk * wk;
                double di = 2 * zeta * wn * wk;
                double d2 = dr * dr + di * di;
                double invRe = dr / d2;
                double invIm = -di / d2;
                double tRe = ar * invRe - ai * invIm;
                double tIm = ar * invIm + ai * invRe;
                sumRe += tRe;
                sumIm += tIm;
                double cRe = -(tRe * invRe - tIm * invIm);
                double cIm = -(tRe * invIm + tIm * invRe);
                double u = 2 * wn;
                double v = 2 * zeta * wk;
                re[c] = sq * w0[r] * (cRe * u - cIm * v);
                im[c] = sq * w0[r] * (cRe * v + cIm * u);
                double s = 2 * wn * wk * zeta;
                re[c + 1] = -sq * cIm * s;
                im[c + 1] = sq * cRe * s;
                re[c + 2] = sq * aScale[r] * invRe;
                im[c + 2] = sq * aScale[r] * invIm;
                c += 3;
                if (!realModes) {
                    re[c] = -sq * aScale[r] * invIm;
                    im[c] = sq * aScale[r] * invRe;
                    c++;
                }
            }
            if (upper) {
                sumRe += upperScale * p[c];
                sumIm += upperScale * p[c + 1];
                re[c] = sq * upperScale;
                im[c++] = 0;
                re[c] = 0;
                im[c++] = sq * upperScale;
            }
            if (lower) {
                double g = -lowerScale / (wk * wk);
                sumRe += g * p[c];
                sumIm += g * p[c + 1];
                re[c] = sq * g;
                im[c++] = 0;
                re[c] = 0;
                im[c++] = sq * g;
            }
            for (int q = 0; q < outside.size(); q++) {
                Mode o = outside.get(q);
                double wq = o.angularFrequencyRadPerS();
                double dr = wq * wq - wk * wk;
                double di = 2 * o.dampingRatio() * wq * wk;
                double d2 = dr * dr + di * di;
                double bRe = outsideScale[q] * dr / d2;
                double bIm = -outsideScale[q] * di / d2;
                sumRe += bRe * p[c] - bIm * p[c + 1];
                sumIm += bRe * p[c + 1] + bIm * p[c];
                re[c] = sq * bRe;
                im[c++] = sq * bIm;
                re[c] = -sq * bIm;
                im[c++] = sq * bRe;
            }
            values[2 * k] = sq * sumRe;
            values[2 * k + 1] = sq * sumIm;
            double eRe = target[2 * k] - values[2 * k];
            double eIm = target[2 * k + 1] - values[2 * k + 1];
            for (int j = 0; j < count; j++) {
                double xr = re[j];
                double xi = im[j];
                gradient[j] += xr * eRe + xi * eIm;
                double[] row = matrix[j];
                for (int l = j; l < count; l++) {
                    row[l] += xr * re[l] + xi * im[l];
                }
            }
        }
    }

    /**
     * Each mode's natural angular frequency, damping ratio and modal constant at the scaled parameters, worked out
     * once for all lines.
     */
    private record ModeValues(double[] wn, double[] zeta, double[] ar, double[] ai) {
    }

    private ModeValues modeValues(double[] p) {
        int n = w0.length;
        ModeValues v = new ModeValues(new double[n], new double[n], new double[n], new double[n]);
        for (int r = 0; r < n; r++) {
            int c = index(r);
            v.wn[r] = w0[r] * p[c];
            v.zeta[r] = zeta0[r] * Math.exp(p[c + 1]);
            v.ar[r] = aScale[r] * p[c + 2];
            v.ai[r] = realModes ? 0 : aScale[r] * p[c + 3];
        }
        return v;
    }

    /**
     * The whitened stacked model values alone, without the Jacobian.
     *
     * @param p scaled parameters
     * @param values receives the 2m values
     * @return {@code values}
     */
    double[] values(double[] p, double[] values) {
        int n = w0.length;
        ModeValues modes = modeValues(p);
        for (int k = 0; k < w.length; k++) {
            double wk = w[k];
            double re = 0;
            double im = 0;
            for (int r = 0; r < n; r++) {
                // A/D with D = w_n^2 - w^2 + 2 j zeta w_n w: (A conj(D))/|D|^2.
                double dr = modes.wn[r] * modes.wn[r] - wk * wk;
                double di = 2 * modes.zeta[r] * modes.wn[r] * wk;
                double d2 = dr * dr + di * di;
                re += (modes.ar[r] * dr + modes.ai[r] * di) / d2;
                im += (modes.ai[r] * dr - modes.ar[r] * di) / d2;
            }
            int c = n * (realModes ? 3 : 4);
            if (upper) {
                re += upperScale * p[c];
                im += upperScale * p[c + 1];
                c += 2;
            }
            if (lower) {
                double g = -lowerScale / (wk * wk);
                re += g * p[c];
                im += g * p[c + 1];
                c += 2;
            }
            for (int q = 0; q < outside.size(); q++) {
                Complex term = outsideBasis(q, wk).multiply(new Complex(p[c], p[c + 1]));
                re += term.getReal();
                im += term.getImaginary();
                c += 2;
            }
            values[2 * k] = root[k] * re;
            values[2 * k + 1] = root[k] * im;
        }
        return values;
    }

    /** The scaled receptance basis of fixed outside pole q at w: scale/(w_q^2 - w^2 + 2 j zeta_q w_q w). */
    private Complex outsideBasis(int q, double wk) {
        Mode o = outside.get(q);
        double wq = o.angularFrequencyRadPerS();
        return new Complex(wq * wq - wk * wk, 2 * o.dampingRatio() * wq * wk).reciprocal().multiply(outsideScale[q]);
    }

    private static void put(double[] column, int k, double sq, Complex value) {
        column[2 * k] = sq * value.getReal();
        column[2 * k + 1] = sq * value.getImaginary();
    }

    /** @return the angular frequency of mode r at p, rad/s (may be non-positive while iterating) */
    double angularFrequency(double[] p, int r) {
        return w0[r] * p[index(r)];
    }

    private int index(int r) {
        return r * (realModes ? 3 : 4);
    }

    /**
     * The fitted modes with standard errors.
     *
     * @param p scaled parameters
     * @param covariance covariance of the scaled parameters
     * @return one fitted mode per mode
     */
    List<FittedMode> fittedModes(double[] p, double[][] covariance) {
        List<FittedMode> out = new ArrayList<>();
        for (int r = 0; r < w0.length; r++) {
            int c = index(r);
            double zeta = zeta0[r] * Math.exp(p[c + 1]);
            double im = realModes ? 0 : aScale[r] * p[c + 3];
            Mode mode = new Mode(w0[r] * p[c] / (2 * Math.PI), zeta, new Complex(aScale[r] * p[c + 2], im));
            double imStd = realModes ? 0 : aScale[r] * Math.sqrt(covariance[c + 3][c + 3]);
            out.add(new FittedMode(mode, w0[r] / (2 * Math.PI) * Math.sqrt(covariance[c][c]),
                    zeta * Math.sqrt(covariance[c + 1][c + 1]),
                    new Complex(aScale[r] * Math.sqrt(covariance[c + 2][c + 2]), imStd)));
        }
        return out;
    }

    /**
     * The residual terms, or their standard errors (UR and LR std of real and imaginary parts).
     *
     * @param p scaled parameters
     * @param covariance covariance of the scaled parameters, or null for the values
     * @return the terms or their standard errors
     */
    ResidualTerms residualTerms(double[] p, double[][] covariance) {
        int c = index(w0.length);
        Complex ur = Complex.ZERO;
        Complex lr = Complex.ZERO;
        if (upper) {
            ur = pick(p, covariance, c, upperScale);
            c += 2;
        }
        if (lower) {
            lr = pick(p, covariance, c, lowerScale);
            c += 2;
        }
        List<Mode> beyond = new ArrayList<>();
        for (int q = 0; q < outside.size(); q++) {
            Mode o = outside.get(q);
            beyond.add(new Mode(o.frequencyHz(), o.dampingRatio(), pick(p, covariance, c, outsideScale[q])));
            c += 2;
        }
        return new ResidualTerms(ur, lr, beyond);
    }

    private static Complex pick(double[] p, double[][] covariance, int c, double scale) {
        if (covariance == null) {
            return new Complex(scale * p[c], scale * p[c + 1]);
        }
        return new Complex(scale * Math.sqrt(covariance[c][c]), scale * Math.sqrt(covariance[c + 1][c + 1]));
    }
}
