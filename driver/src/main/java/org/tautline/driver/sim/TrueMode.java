package org.tautline.driver.sim;

import org.tautline.analysis.modal.Mode;

/**
 * One mode the simulated rig really has, with the receptance modal constant of its FRF.
 *
 * @param harmonic harmonic number n, 1 or more
 * @param polarisation transverse polarisation, 1 (principal axis 1) or 2
 * @param mode frequency, damping ratio and modal constant phi_n(x_s) phi_n(x_f) (e_p . d)(e_p . s), 1/kg
 */
public record TrueMode(int harmonic, int polarisation, Mode mode) {

    /** Checks the numbering. */
    public TrueMode {
        Checks.intRange("TrueMode", "harmonic", harmonic, 1, Integer.MAX_VALUE);
        Checks.intRange("TrueMode", "polarisation", polarisation, 1, 2);
        Checks.present("TrueMode", "mode", mode);
    }
}
