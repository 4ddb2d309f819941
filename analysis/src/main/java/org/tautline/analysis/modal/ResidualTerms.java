package org.tautline.analysis.modal;

import java.util.List;

import org.hipparchus.complex.Complex;

/**
 * Out-of-band modes, as two terms added to the receptance, upper - lower/w^2, and poles outside the band.
 *
 * <p>The upper residual (a constant, the stiffness-like effect of modes above the band) and the
 * lower residual (a mass-like term, modes below the band) follow D. J. Ewins, Modal Testing, 2nd ed.
 * 2000, ch. 4 (from memory). Both are complex to absorb small phase errors of the sensors. Modes just outside the
 * band, whose effect varies across it more than these terms follow, are held as modes outside the band (residual
 * modes, see {@code ModalRepair}); they describe the band's edges, not the specimen's resonances, and are not
 * reported as modes.
 *
 * @param upper UR, m/N
 * @param lower LR, m rad^2/(N s^2): the receptance term is -LR/w^2
 * @param outsideBand modes outside the fitted band that the model holds, possibly none
 */
public record ResidualTerms(Complex upper, Complex lower, List<Mode> outsideBand) {
    /** No residual terms. */
    public static final ResidualTerms NONE = new ResidualTerms(Complex.ZERO, Complex.ZERO);

    /** Copies the list. */
    public ResidualTerms {
        outsideBand = List.copyOf(outsideBand);
    }

    /**
     * Upper and lower residual without modes outside the band.
     *
     * @param upper UR, m/N
     * @param lower LR, m rad^2/(N s^2)
     */
    public ResidualTerms(Complex upper, Complex lower) {
        this(upper, lower, List.of());
    }

    /**
     * The same terms with modes outside the band.
     *
     * @param modes the modes outside the band
     * @return new terms
     */
    public ResidualTerms withOutsideBand(List<Mode> modes) {
        return new ResidualTerms(upper, lower, modes);
    }

    /**
     * The residual terms' receptance at one frequency.
     *
     * @param frequencyHz Hz, positive
     * @return UR - LR/w^2 plus the modes outside the band
     */
    public Complex receptanceAt(double frequencyHz) {
        double w = 2 * Math.PI * frequencyHz;
        Complex sum = upper.subtract(lower.divide(w * w));
        for (Mode m : outsideBand) {
            sum = sum.add(m.receptanceAt(frequencyHz));
        }
        return sum;
    }
}
