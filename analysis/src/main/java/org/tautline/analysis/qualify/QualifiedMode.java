package org.tautline.analysis.qualify;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

/**
 * A fitted mode with its place in the harmonic series.
 *
 * @param fitted the mode with its standard errors
 * @param harmonic harmonic number n, 0 when the mode fits no harmonic (a rig mode, a spurious peak)
 * @param polarisation 0 for a single mode, 1 or 2 for the lower or upper member of a polarisation doublet
 */
public record QualifiedMode(FittedMode fitted, int harmonic, int polarisation) {

    /** @return the mode without its standard errors */
    public Mode mode() {
        return fitted.mode();
    }
}
