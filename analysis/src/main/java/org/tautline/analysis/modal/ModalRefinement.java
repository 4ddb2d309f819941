package org.tautline.analysis.modal;

import java.util.List;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

/**
 * Nonlinear least-squares refinement of every pole, modal constant and residual term of a modal model together.
 *
 * <p>The weighted sum sum_k w_k |H_k - H_model(w_k)|^2 of the receptance is minimised by Levenberg-Marquardt
 * (see {@code ModalRefinementSolver}) with the analytic Jacobian of {@code ModalRefinementModel} in scaled
 * parameters. With w_k = 1/variance this is the frequency-domain
 * maximum-likelihood estimator for circular complex Gaussian noise (R. Pintelon and J. Schoukens, System
 * Identification: A Frequency Domain Approach, 2nd ed., Wiley-IEEE Press, 2012, from memory).
 *
 * <p>Standard errors come from the Jacobian J of the whitened, stacked residuals at the solution.
 * Each of the real and imaginary parts of circular noise carries half of E|e|^2, so:
 * <ul>
 * <li>variance known (weights 1/variance from the FRF): covariance = (1/2) (J^T J)^-1, unscaled;</li>
 * <li>variance unknown (uniform or explicit relative weights): covariance = s^2 (J^T J)^-1 with
 *     s^2 = chi^2/(2N - p) the residual variance per real component.</li>
 * </ul>
 * The standard errors of f_n, zeta and A follow by the chain rule of the parameter scaling. (J^T J)^-1 comes from the
 * eigen-decomposition of the column-scaled J^T J when J's scaled condition number is at most
 * {@link WellConditionedInverse#MAX_CONDITION}, where that loses no accuracy worth having, and otherwise from a Householder
 * QR of J with an SVD of its triangle, which also tells a degenerate model (two merged modes) from a nearly degenerate one.
 */
public final class ModalRefinement {
    private static final String WHAT = "modal refinement";

    private ModalRefinement() {
    }

    /**
     * Refines a modal model against a measured FRF.
     *
     * @param frf the measured FRF, any quantity (converted to receptance)
     * @param start the start modes (for example from LSFD), each with positive damping and a non-zero modal constant
     * @param startResidualTerms start values of UR and LR (used only for the terms the options fit)
     * @param options mode form, residual terms, band, weights, iteration limit
     * @return the refined model with standard errors
     */
    public static ModalRefinementResult refine(Frf frf, List<Mode> start, ResidualTerms startResidualTerms,
                                               ModalRefinementOptions options) {
        if (options == null) {
            throw new AnalysisException("modal refinement needs options, got none; use ModalRefinementOptions.defaults()");
        }
        if (startResidualTerms == null) {
            throw new AnalysisException("modal refinement needs start residual terms; use ResidualTerms.NONE for none");
        }
        checkStart(start, options.realModes());
        LsfdOptions o = options.lines();
        LsfdLines lines = LsfdLines.select(WHAT, frf, o.fromHz(), o.toHz(), o.weights());
        int m = lines.size();
        int p = ModalRefinementModel.parameterCount(start.size(), o.realModes(), o.upperResidual(), o.lowerResidual())
                + 2 * startResidualTerms.outsideBand().size();
        FitQuality.requireFittable(WHAT, m, p, lines.peakMagnitude(), lines.minimumMagnitude());
        if (!lines.absolute() && 2 * m == p) {
            throw new AnalysisException(WHAT + " has " + p + " real unknowns and " + m + " lines (" + 2 * m
                    + " real values): without the FRF's variance it needs at least one real value more to estimate the "
                    + "noise; widen the band or attach the variance");
        }
        double[] w = new double[m];
        double[] weight = new double[m];
        double[] target = new double[2 * m];
        for (int k = 0; k < m; k++) {
            w[k] = lines.angularFrequency(k);
            weight[k] = lines.weight(k);
            double root = Math.sqrt(weight[k]);
            target[2 * k] = root * lines.real(k);
            target[2 * k + 1] = root * lines.imag(k);
        }
        ModalRefinementModel model = new ModalRefinementModel(w, weight, start, startResidualTerms, o.realModes(),
                o.upperResidual(), o.lowerResidual(), lines.peakMagnitude());
        ModalRefinementSolver.Outcome optimum = ModalRefinementSolver.minimise(model, target, options.maxIterations());
        if (!optimum.converged()) {
            throw new AnalysisException(WHAT + " did not converge within " + options.maxIterations() + " iterations ("
                    + start.size() + " modes, " + m + " lines); start closer (LSFD with poles from the stabilisation "
                    + "chart) or raise maxIterations");
        }
        double[] point = optimum.point();
        for (int r = 0; r < start.size(); r++) {
            if (!(model.angularFrequency(point, r) > 0)) {
                throw new AnalysisException(WHAT + " drove mode " + r + " (start " + start.get(r).frequencyHz()
                        + " Hz) to a non-positive frequency; the start is too far from the data");
            }
        }
        double chiSquare = optimum.cost();
        double perComponent = chiSquare / (2 * m - p);
        double scale = lines.absolute() ? 0.5 : perComponent;
        double[][] covariance = WellConditionedInverse.of(model, point, target);
        if (covariance == null) {
            LsfdLeastSquares factor = LsfdLeastSquares.solve(model.jacobianColumns(point, null), null);
            if (!factor.fullRank()) {
                throw new AnalysisException(WHAT + " is degenerate at the solution: the scaled Jacobian has condition number "
                        + factor.conditionNumber() + " (limit " + LsfdLeastSquares.MAX_CONDITION + ") for " + p
                        + " unknowns; two modes have merged or a parameter has no effect on the " + m + " lines");
            }
            covariance = factor.inverseNormal();
        }
        for (double[] row : covariance) {
            for (int j = 0; j < row.length; j++) {
                row[j] *= scale;
            }
        }
        return new ModalRefinementResult(model.fittedModes(point, covariance), model.residualTerms(point, null),
                model.residualTerms(point, covariance), optimum.iterations(), chiSquare,
                2 * perComponent, lines.absolute());
    }

    private static void checkStart(List<Mode> start, boolean realModes) {
        if (start == null || start.isEmpty()) {
            throw new AnalysisException("modal refinement needs at least one start mode, got none");
        }
        for (int r = 0; r < start.size(); r++) {
            Mode mode = start.get(r);
            if (mode == null) {
                throw new AnalysisException("modal refinement start mode " + r + " is missing");
            }
            if (!(mode.dampingRatio() > 0)) {
                throw new AnalysisException("modal refinement start mode " + r + " (" + mode.frequencyHz()
                        + " Hz) has damping ratio " + mode.dampingRatio()
                        + "; damping is refined on a log scale and needs a positive start");
            }
            double size = realModes ? Math.abs(mode.modalConstant().getReal()) : mode.modalConstant().norm();
            if (!(size > 0)) {
                throw new AnalysisException("modal refinement start mode " + r + " (" + mode.frequencyHz()
                        + " Hz) has modal constant " + mode.modalConstant() + (realModes ? " with a zero real part" : "")
                        + "; start from a non-zero value, for example from LSFD");
            }
        }
    }
}
