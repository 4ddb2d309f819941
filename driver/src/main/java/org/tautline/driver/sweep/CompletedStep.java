package org.tautline.driver.sweep;

import java.util.Objects;

import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.spi.SampleBlock;

/**
 * Everything a sweep learned at one completed step: the point, the fits it came from and the samples fitted.
 *
 * @param index the step's place in the plan, 0 first
 * @param point the step as the sweep record holds it
 * @param force the sine fit of the force channel (channel 0)
 * @param response the sine fit of the response channel (channel 1)
 * @param samples the integration samples the fits were made on, both channels
 */
public record CompletedStep(int index, SweepPoint point, SinePhasor force, SinePhasor response, SampleBlock samples) {

    /** Checks that nothing is missing. */
    public CompletedStep {
        if (index < 0) {
            throw new IllegalArgumentException("step index must be 0 or more, got " + index);
        }
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(force, "force");
        Objects.requireNonNull(response, "response");
        Objects.requireNonNull(samples, "samples");
    }
}
