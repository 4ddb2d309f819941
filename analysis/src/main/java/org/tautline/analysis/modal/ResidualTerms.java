package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;

/**
 * Out-of-band modes, as two terms added to the receptance: upper - lower/w^2.
 *
 * <p>The upper residual (a constant, the stiffness-like effect of modes above the band) and the
 * lower residual (a mass-like term, modes below the band) follow D. J. Ewins, Modal Testing, 2nd ed.
 * 2000, ch. 4 (from memory). Both are complex to absorb small phase errors of the sensors.
 *
 * @param upper UR, m/N
 * @param lower LR, m rad^2/(N s^2): the receptance term is -LR/w^2
 */
public record ResidualTerms(Complex upper, Complex lower) {
    /** No residual terms. */
    public static final ResidualTerms NONE = new ResidualTerms(Complex.ZERO, Complex.ZERO);

    /**
     * The residual terms' receptance at one frequency.
     *
     * @param frequencyHz Hz, positive
     * @return UR - LR/w^2
     */
    public Complex receptanceAt(double frequencyHz) {
        double w = 2 * Math.PI * frequencyHz;
        return upper.subtract(lower.divide(w * w));
    }
}
