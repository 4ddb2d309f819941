package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;

/**
 * One mode of a damped modal model in the viscous, single-degree-of-freedom form.
 *
 * <p>The mode contributes {@code A/(w_n^2 - w^2 + 2 j zeta w_n w)} to the receptance, with
 * {@code w_n = 2 pi frequencyHz}, {@code zeta = dampingRatio} and {@code A = modalConstant}
 * (for mass-normalised real modes A = phi(x_s) phi(x_f), real, in 1/kg). Immutable.
 *
 * @param frequencyHz undamped natural frequency f_n, Hz
 * @param dampingRatio viscous damping ratio zeta, dimensionless
 * @param modalConstant the numerator A, 1/kg for receptance in m/N
 */
public record Mode(double frequencyHz, double dampingRatio, Complex modalConstant) {

    /** Checks the values. */
    public Mode {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new AnalysisException("mode frequencyHz must be positive and finite, got " + frequencyHz);
        }
        if (!(dampingRatio >= 0) || Double.isInfinite(dampingRatio)) {
            throw new AnalysisException("mode dampingRatio must be zero or positive and finite, got " + dampingRatio);
        }
        if (modalConstant == null || modalConstant.isNaN() || modalConstant.isInfinite()) {
            throw new AnalysisException("mode modalConstant must be a finite complex number, got " + modalConstant);
        }
    }

    /** @return the natural angular frequency w_n = 2 pi f_n, rad/s */
    public double angularFrequencyRadPerS() {
        return 2.0 * Math.PI * frequencyHz;
    }

    /**
     * The mode's receptance contribution at one frequency.
     *
     * @param frequencyHzAt the drive frequency, Hz
     * @return A/(w_n^2 - w^2 + 2 j zeta w_n w), m/N
     */
    public Complex receptanceAt(double frequencyHzAt) {
        double wn = angularFrequencyRadPerS();
        double w = 2.0 * Math.PI * frequencyHzAt;
        Complex denominator = new Complex(wn * wn - w * w, 2.0 * dampingRatio * wn * w);
        return modalConstant.divide(denominator);
    }
}
