package org.tautline.analysis.modal;

import java.util.List;

/**
 * The result of a modal refinement: the fitted modes with standard errors, the residual terms and the fit figures.
 *
 * @param modes the fitted modes, in the order of the start modes, with standard errors of f_n, zeta and A
 * @param residualTerms the fitted UR and LR (zero when not fitted)
 * @param residualTermsStd standard errors of the real and imaginary parts of UR and LR (zero when not fitted)
 * @param iterations Levenberg-Marquardt iterations used
 * @param cost the weighted sum of squares sum_k w_k |H_k - H_model,k|^2 at the solution
 * @param residualVariance 2 cost/(2N - p), N lines and p real unknowns: with uniform weights an estimate of the
 *     per-line variance E|e|^2 of the receptance, (m/N)^2; with 1/variance weights close to 1 when the variances are right
 * @param varianceKnown true when the lines were weighted by the FRF's own 1/variance, so the standard errors are not
 *     rescaled by the residual variance
 */
public record ModalRefinementResult(List<FittedMode> modes, ResidualTerms residualTerms, ResidualTerms residualTermsStd,
                                    int iterations, double cost, double residualVariance, boolean varianceKnown) {
    /** Copies the list. */
    public ModalRefinementResult {
        modes = List.copyOf(modes);
    }
}
