package org.tautline.analysis.modal;

import java.util.List;

/**
 * The result of an LSFD estimate: the modes with their fitted modal constants and the residual terms.
 *
 * @param modes one mode per given pole, in the same order: the pole's f_n and zeta, the fitted modal constant (1/kg)
 * @param residualTerms the fitted UR and LR (zero when not fitted)
 * @param linesUsed number of FRF lines inside the band
 * @param conditionNumber 2-norm condition number of the column-scaled least-squares system
 */
public record LsfdResult(List<Mode> modes, ResidualTerms residualTerms, int linesUsed, double conditionNumber) {
    /** Copies the list. */
    public LsfdResult {
        modes = List.copyOf(modes);
    }
}
