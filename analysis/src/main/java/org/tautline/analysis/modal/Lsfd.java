package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

/**
 * Least-squares frequency-domain (LSFD) estimation of modal constants and residual terms with the poles fixed.
 *
 * <p>Source: the LSFD step of P. Guillaume, P. Verboven, S. Vanlanduit, H. Van der Auweraer and
 * B. Peeters, "A poly-reference implementation of the least-squares complex frequency-domain estimator",
 * Proc. IMAC-XXI, 2003, and B. Peeters et al., Shock and Vibration 11:395-409, 2004 (from memory): once
 * the poles are known, the receptance is linear in the residues and in the residual terms UR - LR/w^2
 * (D. J. Ewins, Modal Testing, 2nd ed. 2000, ch. 4, from memory), so one weighted linear least-squares
 * solve over the chosen lines gives them all. The solve works on real unknowns, stacking the real and
 * imaginary parts of each line, so that every mode stays a conjugate pair.
 *
 * <p>Basis. With D(w) = w_n^2 - w^2 + 2 j zeta w_n w the pair basis of a pole lambda = sigma + j w_d is
 * 1/(jw - lambda) + 1/(jw - conj(lambda)) = 2 (jw - sigma)/D and
 * j/(jw - lambda) - j/(jw - conj(lambda)) = -2 w_d/D. A real mode (R = A/(2 j w_d) purely imaginary) uses
 * the second only, with its coefficient Im(R) = -A/(2 w_d): one real unknown, the modal constant A on 1/D.
 * A complex mode uses the unknowns Re(A), Im(A) on the columns 1/D and j/D, which is exactly the
 * {@link Mode} model A/D with a complex constant that {@link ModalSynthesis} and {@link ModalRefinement}
 * use; the pure pair form with a complex residue would instead put a real multiple of jw/D beside 1/D, a
 * model that a {@link Mode} cannot hold. Both agree for real modes and near resonance.
 * Upper residual: columns 1 and j; lower residual: -1/w^2 and -j/w^2; a fixed pole outside the band (see
 * {@link LsfdOptions#outsideBandPoles()}): 1/D and j/D, a complex coefficient on its receptance form.
 *
 * <p>The solve is Householder QR on column-scaled data with an SVD of the triangular factor, stable for
 * close modes; a system whose scaled condition number exceeds 1e12 is reported, not solved.
 */
public final class Lsfd {
    private static final String WHAT = "LSFD";

    private Lsfd() {
    }

    /**
     * Fits modal constants and the chosen residual terms for fixed poles.
     *
     * @param frf the measured FRF, any quantity (converted to receptance)
     * @param poles the fixed poles, at least one, each with Re(lambda) &lt;= 0
     * @param options real or complex modes, residual terms, band, weights
     * @return one mode per pole and the residual terms
     */
    public static LsfdResult fit(Frf frf, List<Pole> poles, LsfdOptions options) {
        if (options == null) {
            throw new AnalysisException("LSFD needs options, got none; use LsfdOptions.defaults()");
        }
        checkPoles(poles);
        LinearSystem system = system(frf, poles, options);
        LsfdLines lines = system.lines();
        int m = lines.size();
        double[][] columns = system.columns();
        double[] rhs = system.rhs();
        LsfdLeastSquares solve = LsfdLeastSquares.solve(columns, rhs);
        if (!solve.fullRank()) {
            throw new AnalysisException("LSFD cannot separate the unknowns: the scaled least-squares system has condition "
                    + "number " + solve.conditionNumber() + " (limit " + LsfdLeastSquares.MAX_CONDITION + ") for "
                    + poles.size() + " poles on " + m + " lines; merge poles that are too close, or drop residual terms "
                    + "the band cannot tell from a mode");
        }
        double[] x = solve.solution();
        List<Mode> modes = new ArrayList<>();
        int c = 0;
        for (Pole pole : poles) {
            double re = x[c++];
            double im = options.realModes() ? 0 : x[c++];
            modes.add(new Mode(pole.frequencyHz(), pole.dampingRatio(), new Complex(re, im)));
        }
        Complex upper = Complex.ZERO;
        Complex lower = Complex.ZERO;
        if (options.upperResidual()) {
            upper = new Complex(x[c], x[c + 1]);
            c += 2;
        }
        if (options.lowerResidual()) {
            lower = new Complex(x[c], x[c + 1]);
            c += 2;
        }
        List<Mode> beyond = new ArrayList<>();
        for (Pole pole : options.outsideBandPoles()) {
            beyond.add(new Mode(pole.frequencyHz(), pole.dampingRatio(), new Complex(x[c], x[c + 1])));
            c += 2;
        }
        return new LsfdResult(modes, new ResidualTerms(upper, lower, beyond), m, solve.conditionNumber());
    }

    /**
     * The residues R = A/(2 j w_d) of the poles, from an LSFD fit.
     *
     * <p>For a consistency check of poles between model orders: the residue of a physical pole changes little.
     *
     * @param frf the measured FRF, any quantity
     * @param poles the fixed poles, at least one
     * @param options real or complex modes, residual terms, band, weights
     * @return one residue per pole, in the same order, in (m/N)(rad/s)
     */
    public static Complex[] residues(Frf frf, List<Pole> poles, LsfdOptions options) {
        List<Mode> modes = fit(frf, poles, options).modes();
        Complex[] residues = new Complex[modes.size()];
        for (int i = 0; i < residues.length; i++) {
            residues[i] = poles.get(i).residueOf(modes.get(i).modalConstant());
        }
        return residues;
    }

    /**
     * The weighted linear system of an LSFD fit: one column per real unknown (modes, residual terms, poles beyond the
     * band, in that order), the real and imaginary parts of each line stacked and multiplied by the root of its weight.
     *
     * @param columns the columns, 2m values each
     * @param rhs the weighted measured values, 2m
     * @param lines the lines
     */
    record LinearSystem(double[][] columns, double[] rhs, LsfdLines lines) {
    }

    /**
     * Builds the weighted system of an LSFD fit without solving it.
     *
     * @param frf the measured FRF, any quantity
     * @param poles the fixed poles, at least one
     * @param options real or complex modes, residual terms, band, weights
     * @return the system
     */
    static LinearSystem system(Frf frf, List<Pole> poles, LsfdOptions options) {
        LsfdLines lines = LsfdLines.select(WHAT, frf, options.fromHz(), options.toHz(), options.weights());
        int perMode = options.realModes() ? 1 : 2;
        List<Pole> outside = options.outsideBandPoles();
        int unknowns = perMode * poles.size() + (options.upperResidual() ? 2 : 0) + (options.lowerResidual() ? 2 : 0)
                + 2 * outside.size();
        FitQuality.requireFittable(WHAT, lines.size(), unknowns, lines.peakMagnitude(), lines.minimumMagnitude());
        int m = lines.size();
        double[][] columns = new double[unknowns][2 * m];
        double[] rhs = new double[2 * m];
        double[] wn2 = new double[poles.size()];
        double[] real = new double[poles.size()];
        for (int r = 0; r < poles.size(); r++) {
            double wn = poles.get(r).angularFrequencyRadPerS();
            wn2[r] = wn * wn;
            real[r] = poles.get(r).real();
        }
        for (int k = 0; k < m; k++) {
            double w = lines.angularFrequency(k);
            double root = Math.sqrt(lines.weight(k));
            rhs[2 * k] = root * lines.real(k);
            rhs[2 * k + 1] = root * lines.imag(k);
            int c = 0;
            for (int r = 0; r < poles.size(); r++) {
                // 1/D with D = wn^2 - w^2 + 2 j zeta wn w = wn^2 - w^2 - 2 j Re(lambda) w, in plain arithmetic.
                double dr = wn2[r] - w * w;
                double di = -2 * real[r] * w;
                double d2 = dr * dr + di * di;
                double invRe = dr / d2;
                double invIm = -di / d2;
                put(columns[c++], k, root, invRe, invIm);
                if (!options.realModes()) {
                    put(columns[c++], k, root, -invIm, invRe);
                }
            }
            if (options.upperResidual()) {
                put(columns[c++], k, root, 1, 0);
                put(columns[c++], k, root, 0, 1);
            }
            if (options.lowerResidual()) {
                double g = -1 / (w * w);
                put(columns[c++], k, root, g, 0);
                put(columns[c++], k, root, 0, g);
            }
            for (Pole pole : outside) {
                c = poleColumns(columns, c, k, root, w, pole);
            }
        }
        return new LinearSystem(columns, rhs, lines);
    }

    /**
     * The two weighted columns of a pole beyond the band on the system's lines: its receptance basis 1/D and j/D.
     *
     * @param lines the lines of a system
     * @param pole the pole
     * @return two columns of 2m values
     */
    static double[][] poleColumns(LsfdLines lines, Pole pole) {
        double[][] columns = new double[2][2 * lines.size()];
        for (int k = 0; k < lines.size(); k++) {
            poleColumns(columns, 0, k, Math.sqrt(lines.weight(k)), lines.angularFrequency(k), pole);
        }
        return columns;
    }

    private static int poleColumns(double[][] columns, int c, int k, double root, double w, Pole pole) {
        double wn = pole.angularFrequencyRadPerS();
        Complex inverse = new Complex(wn * wn - w * w, -2 * pole.real() * w).reciprocal();
        put(columns[c], k, root, inverse.getReal(), inverse.getImaginary());
        put(columns[c + 1], k, root, -inverse.getImaginary(), inverse.getReal());
        return c + 2;
    }

    private static void checkPoles(List<Pole> poles) {
        if (poles == null || poles.isEmpty()) {
            throw new AnalysisException("LSFD needs at least one pole, got none");
        }
        for (int i = 0; i < poles.size(); i++) {
            Pole pole = poles.get(i);
            if (pole == null) {
                throw new AnalysisException("LSFD pole " + i + " is missing");
            }
            if (pole.real() > 0) {
                throw new AnalysisException("LSFD pole " + i + " is unstable (Re(lambda) = " + pole.real()
                        + " rad/s > 0, damping ratio " + pole.dampingRatio() + "); drop it before fitting");
            }
        }
    }

    private static void put(double[] column, int k, double root, double re, double im) {
        column[2 * k] = root * re;
        column[2 * k + 1] = root * im;
    }
}
