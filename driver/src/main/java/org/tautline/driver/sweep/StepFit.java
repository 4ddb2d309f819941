package org.tautline.driver.sweep;

import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.SampleBlock;

/** Fits one step's integration samples and forms its sweep point. */
final class StepFit {
    private StepFit() {
    }

    /**
     * Fits force and response over the same samples (IEEE Std 1057 three-parameter fit with harmonics).
     *
     * @param index the step's place in the plan
     * @param block the integration samples, channel 0 force, channel 1 response
     * @param f the step frequency, Hz
     * @param plan the plan (drive level and harmonic order)
     * @param fs sample rate, Hz
     * @param rigTimeS rig time when the integration ended, s
     * @return the completed step
     */
    static CompletedStep fit(int index, SampleBlock block, double f, SteppedSinePlan plan, double fs, double rigTimeS) {
        return fit(index, block, f, plan.driveAmplitudeV(), plan.harmonicOrder(), fs, rigTimeS);
    }

    /**
     * Fits force and response over the same samples, for any drive level and harmonic order.
     *
     * @param index the step's place in the sweep
     * @param block the integration samples, channel 0 force, channel 1 response
     * @param f the step frequency, Hz
     * @param driveV the commanded peak drive, V
     * @param harmonicOrder highest harmonic fitted, 1 or more
     * @param fs sample rate, Hz
     * @param rigTimeS rig time when the integration ended, s
     * @return the completed step
     */
    static CompletedStep fit(int index, SampleBlock block, double f, double driveV, int harmonicOrder, double fs,
                             double rigTimeS) {
        SinePhasor[] fitted = SineFit.fitChannels(new double[][] {block.samples()[0], block.samples()[1]}, fs, f,
                harmonicOrder);
        SinePhasor force = fitted[0];
        SinePhasor response = fitted[1];
        if (!(force.amplitude() > 0)) {
            throw new RigException("no force measured at " + f + " Hz: check the force sensor on channel 0 and the stinger");
        }
        return new CompletedStep(index, SweepPoint.of(f, driveV, force, response, rigTimeS), force, response, block);
    }
}
