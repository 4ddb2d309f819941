package org.tautline.analysis.modal;

import java.util.List;

import org.tautline.analysis.AnalysisException;

/**
 * The Cramer-Rao lower bound on the standard errors of f_n, zeta and A of a modal model measured on given lines.
 *
 * <p>With circular complex Gaussian noise of variance s_k^2 = E|e_k|^2 at line k, the Fisher information of the
 * real parameters theta is F = 2 Re(J^H diag(1/s_k^2) J), J the complex Jacobian dH/dtheta; stacking real and
 * imaginary parts and whitening by 1/s_k this is 2 J_s^T J_s, and the bound is diag(F^-1)
 * (S. M. Kay, Fundamentals of Statistical Signal Processing: Estimation Theory, Prentice Hall, 1993, ch. 3 and 15;
 * R. Pintelon and J. Schoukens, System Identification: A Frequency Domain Approach, 2nd ed. 2012, from memory).
 * The Jacobian is the one {@link ModalRefinement} uses, so the bound is what a 1/variance-weighted refinement
 * with the same free parameters reports at the true model.
 */
public final class CramerRaoBound {
    private CramerRaoBound() {
    }

    /**
     * The bound for modes alone (no residual terms fitted).
     *
     * @param modes the true modes, positive damping and non-zero modal constants
     * @param frequencyHz the measured lines, Hz, positive
     * @param noiseVariance E|e|^2 of the receptance at each line, (m/N)^2, positive
     * @param realModes true when the modal constants are estimated as real
     * @return one mode per input mode, its std fields holding the bounds
     */
    public static List<FittedMode> of(List<Mode> modes, double[] frequencyHz, double[] noiseVariance, boolean realModes) {
        return of(modes, ResidualTerms.NONE, frequencyHz, noiseVariance,
                ModalRefinementOptions.defaults().withRealModes(realModes));
    }

    /**
     * The bound for the free parameters of a refinement with the given options.
     *
     * @param modes the true modes, positive damping and non-zero modal constants
     * @param residualTerms the true residual terms
     * @param frequencyHz the measured lines, Hz, positive
     * @param noiseVariance E|e|^2 of the receptance at each line, (m/N)^2, positive
     * @param options which parameters are free (mode form, residual terms); the band selects lines; weights are
     *     ignored, the noise variance sets them
     * @return one mode per input mode, its std fields holding the bounds
     */
    public static List<FittedMode> of(List<Mode> modes, ResidualTerms residualTerms, double[] frequencyHz,
                                      double[] noiseVariance, ModalRefinementOptions options) {
        if (modes == null || modes.isEmpty()) {
            throw new AnalysisException("the Cramer-Rao bound needs at least one mode, got none");
        }
        if (residualTerms == null || options == null) {
            throw new AnalysisException("the Cramer-Rao bound needs residual terms and options; use ResidualTerms.NONE "
                    + "and ModalRefinementOptions.defaults()");
        }
        if (frequencyHz == null || noiseVariance == null || frequencyHz.length != noiseVariance.length) {
            throw new AnalysisException("the Cramer-Rao bound needs one noise variance per frequency line, got "
                    + (frequencyHz == null ? "no lines" : frequencyHz.length + " lines") + " and "
                    + (noiseVariance == null ? "no variances" : noiseVariance.length + " variances"));
        }
        LsfdOptions o = options.lines();
        int count = 0;
        for (int k = 0; k < frequencyHz.length; k++) {
            if (!(frequencyHz[k] > 0) || Double.isInfinite(frequencyHz[k])) {
                throw new AnalysisException("the Cramer-Rao bound needs positive finite lines; line " + k + " is "
                        + frequencyHz[k] + " Hz");
            }
            if (!(noiseVariance[k] > 0) || Double.isInfinite(noiseVariance[k])) {
                throw new AnalysisException("the Cramer-Rao bound needs a positive finite noise variance at every line; line "
                        + k + " (" + frequencyHz[k] + " Hz) has " + noiseVariance[k]);
            }
            if (frequencyHz[k] >= o.fromHz() && frequencyHz[k] <= o.toHz()) {
                count++;
            }
        }
        double[] w = new double[count];
        double[] weight = new double[count];
        int c = 0;
        for (int k = 0; k < frequencyHz.length; k++) {
            if (frequencyHz[k] >= o.fromHz() && frequencyHz[k] <= o.toHz()) {
                w[c] = 2 * Math.PI * frequencyHz[k];
                weight[c] = 1 / noiseVariance[k];
                c++;
            }
        }
        int p = ModalRefinementModel.parameterCount(modes.size(), o.realModes(), o.upperResidual(), o.lowerResidual())
                + 2 * residualTerms.outsideBand().size();
        if (2 * count < p) {
            throw new AnalysisException("the Cramer-Rao bound has " + p + " real unknowns but only " + count + " lines ("
                    + 2 * count + " real values) in the band");
        }
        double scale = 0;
        for (Mode mode : modes) {
            if (!(mode.dampingRatio() > 0)) {
                throw new AnalysisException("the Cramer-Rao bound needs positive damping; mode at " + mode.frequencyHz()
                        + " Hz has " + mode.dampingRatio());
            }
            double size = o.realModes() ? Math.abs(mode.modalConstant().getReal()) : mode.modalConstant().norm();
            if (!(size > 0)) {
                throw new AnalysisException("the Cramer-Rao bound needs non-zero modal constants; mode at "
                        + mode.frequencyHz() + " Hz has " + mode.modalConstant());
            }
            scale = Math.max(scale, size / Math.pow(2 * Math.PI * mode.frequencyHz(), 2));
        }
        ModalRefinementModel model = new ModalRefinementModel(w, weight, modes, residualTerms, o.realModes(),
                o.upperResidual(), o.lowerResidual(), scale);
        double[] start = model.start();
        LsfdLeastSquares factor = LsfdLeastSquares.solve(model.jacobianColumns(start, null), null);
        if (!factor.fullRank()) {
            throw new AnalysisException("the Cramer-Rao bound is unbounded: the Fisher information is singular (scaled "
                    + "condition number " + factor.conditionNumber() + ") for " + p + " unknowns on " + count + " lines");
        }
        double[][] covariance = factor.inverseNormal();
        for (double[] row : covariance) {
            for (int j = 0; j < row.length; j++) {
                row[j] *= 0.5;
            }
        }
        return model.fittedModes(start, covariance);
    }
}
