package org.tautline.driver.sweep;

import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.SampleBlock;

/**
 * One step's integration samples fitted: the force and response phasors and the point they make.
 *
 * @param point the FRF value and its quality
 * @param force the force channel's fit
 * @param response the response channel's fit
 */
record StepFit(SweepPoint point, SinePhasor force, SinePhasor response) {

    /**
     * Fits force and response over the same samples (IEEE Std 1057 three-parameter fit with harmonics).
     *
     * @param block the integration samples, channel 0 force, channel 1 response
     * @param f the step frequency, Hz
     * @param driveV the commanded peak drive, V
     * @param harmonicOrder highest harmonic fitted, 1 or more
     * @param fs sample rate, Hz
     * @param rigTimeS sweep rig time when the integration ended, s
     * @return the fitted step
     * @throws RigException when no force was measured
     */
    static StepFit of(SampleBlock block, double f, double driveV, int harmonicOrder, double fs, double rigTimeS) {
        SinePhasor[] fitted = SineFit.fitChannels(new double[][] {block.samples()[0], block.samples()[1]}, fs, f,
                harmonicOrder);
        SinePhasor force = fitted[0];
        SinePhasor response = fitted[1];
        if (!(force.amplitude() > 0)) {
            throw new RigException("no force measured at " + f + " Hz: check the force sensor on channel 0 and the stinger");
        }
        return new StepFit(SweepPoint.of(f, driveV, force, response, rigTimeS), force, response);
    }
}
