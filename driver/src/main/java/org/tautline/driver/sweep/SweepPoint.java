package org.tautline.driver.sweep;

import org.hipparchus.complex.Complex;

/**
 * One completed step of a stepped-sine sweep.
 *
 * @param frequencyHz drive frequency, Hz
 * @param driveAmplitudeV commanded peak drive voltage, V
 * @param response the FRF value: response phasor / force phasor, in the response unit per newton
 * @param forceAmplitudeN fitted peak force, N
 * @param responseAmplitude fitted peak response, response unit
 * @param relativeResidual quality figure: the larger of the two channels' fit residual RMS relative to their RMS amplitude
 * @param relativeStdError standard error of |response| relative to |response| (from both channels' fit errors)
 * @param forceDistortion total harmonic distortion of the force, ratio
 * @param responseDistortion total harmonic distortion of the response, ratio
 * @param rigTimeS rig time when the step's integration ended, s
 */
public record SweepPoint(double frequencyHz, double driveAmplitudeV, Complex response, double forceAmplitudeN,
                         double responseAmplitude, double relativeResidual, double relativeStdError,
                         double forceDistortion, double responseDistortion, double rigTimeS) {
}
