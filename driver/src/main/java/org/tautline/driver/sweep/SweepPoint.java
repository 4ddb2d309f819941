package org.tautline.driver.sweep;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.signal.SinePhasor;

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

    /**
     * The point of a step from its two sine fits: the same arithmetic whether the fits are fresh or read back.
     *
     * @param frequencyHz step frequency, Hz
     * @param driveAmplitudeV commanded peak drive, V
     * @param force the force channel's fit
     * @param response the response channel's fit
     * @param rigTimeS rig time when the integration ended, s
     * @return the point: response / force, the larger relative residual, the combined relative error
     */
    public static SweepPoint of(double frequencyHz, double driveAmplitudeV, SinePhasor force, SinePhasor response,
                                double rigTimeS) {
        double relForceErr = force.amplitudeStd() / force.amplitude();
        double relResponseErr = response.amplitude() > 0 ? response.amplitudeStd() / response.amplitude() : 1.0;
        return new SweepPoint(frequencyHz, driveAmplitudeV, response.phasor().divide(force.phasor()), force.amplitude(),
                response.amplitude(), Math.max(force.relativeResidual(), response.relativeResidual()),
                Math.hypot(relForceErr, relResponseErr), force.totalHarmonicDistortion(),
                response.totalHarmonicDistortion(), rigTimeS);
    }
}
