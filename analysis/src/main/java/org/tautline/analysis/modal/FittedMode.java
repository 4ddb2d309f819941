package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;

/**
 * A fitted mode with the standard errors of its parameters.
 *
 * @param mode natural frequency, damping ratio and modal constant (receptance form, 1/kg)
 * @param frequencyStdHz standard error of the natural frequency, Hz
 * @param dampingRatioStd standard error of the damping ratio
 * @param modalConstantStd standard errors of the real and imaginary parts of the modal constant, 1/kg
 */
public record FittedMode(Mode mode, double frequencyStdHz, double dampingRatioStd, Complex modalConstantStd) {
}
