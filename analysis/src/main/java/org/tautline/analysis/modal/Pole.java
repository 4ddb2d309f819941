package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;

/**
 * A pole of a damped mode in the Laplace domain, lambda = -zeta w_n + j w_n sqrt(1 - zeta^2).
 *
 * <p>Only the pole with positive imaginary part is kept; its conjugate is implied. The mode's
 * receptance contribution in pole-residue form is R/(jw - lambda) + conj(R)/(jw - conj(lambda)),
 * and the residue of a viscous mode with modal constant A is R = A/(2 j w_d), w_d = Im(lambda)
 * (D. J. Ewins, Modal Testing, 2nd ed. 2000, ch. 2, from memory).
 *
 * @param real Re(lambda) = -zeta w_n, rad/s (negative for a stable mode)
 * @param imag Im(lambda) = w_d, the damped natural frequency, rad/s (positive)
 */
public record Pole(double real, double imag) {

    /** Checks the pole. */
    public Pole {
        if (!Double.isFinite(real) || !(imag > 0) || Double.isInfinite(imag)) {
            throw new AnalysisException("a pole needs a finite real part and a positive finite imaginary part, got "
                    + real + " + j" + imag + " rad/s");
        }
    }

    /**
     * The pole of a mode given by its undamped natural frequency and damping ratio.
     *
     * @param frequencyHz undamped natural frequency f_n, Hz
     * @param dampingRatio zeta, 0 <= zeta < 1
     * @return lambda = -zeta w_n + j w_n sqrt(1 - zeta^2)
     */
    public static Pole of(double frequencyHz, double dampingRatio) {
        if (!(dampingRatio >= 0 && dampingRatio < 1)) {
            throw new AnalysisException("damping ratio must lie in 0 <= zeta < 1 for an oscillating mode, got " + dampingRatio);
        }
        double wn = 2 * Math.PI * frequencyHz;
        return new Pole(-dampingRatio * wn, wn * Math.sqrt(1 - dampingRatio * dampingRatio));
    }

    /**
     * The pole from a complex value, taking the root with positive imaginary part.
     *
     * @param lambda a complex pole, rad/s
     * @return the pole with Im > 0 (the conjugate when Im(lambda) is negative)
     */
    public static Pole of(Complex lambda) {
        return new Pole(lambda.getReal(), Math.abs(lambda.getImaginary()));
    }

    /** @return lambda as a complex number, rad/s */
    public Complex lambda() {
        return new Complex(real, imag);
    }

    /** @return the undamped natural angular frequency |lambda|, rad/s */
    public double angularFrequencyRadPerS() {
        return Math.hypot(real, imag);
    }

    /** @return the undamped natural frequency |lambda|/(2 pi), Hz */
    public double frequencyHz() {
        return angularFrequencyRadPerS() / (2 * Math.PI);
    }

    /** @return the damping ratio -Re(lambda)/|lambda| (negative for an unstable pole) */
    public double dampingRatio() {
        return -real / angularFrequencyRadPerS();
    }

    /**
     * The residue of a viscous mode with a given modal constant.
     *
     * @param modalConstant A in A/(w_n^2 - w^2 + 2 j zeta w_n w)
     * @return R = A/(2 j w_d)
     */
    public Complex residueOf(Complex modalConstant) {
        return modalConstant.divide(new Complex(0, 2 * imag));
    }

    /**
     * The modal constant of a residue.
     *
     * @param residue R of the pole
     * @return A = 2 j w_d R
     */
    public Complex modalConstantOf(Complex residue) {
        return residue.multiply(new Complex(0, 2 * imag));
    }
}
