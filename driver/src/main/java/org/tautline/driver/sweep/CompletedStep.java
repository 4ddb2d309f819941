package org.tautline.driver.sweep;

import java.util.Objects;
import java.util.Optional;

import org.tautline.analysis.signal.SinePhasor;

/**
 * Everything a sweep keeps of one completed step: where it belongs, the point, and the fits it came from.
 *
 * <p>A sweep can be continued from its completed steps alone (after a pause, or from the journal): the
 * engine runs the plan again, takes these steps in place of measuring them while they match what the plan
 * asks for, and measures from the first one missing.
 *
 * @param index the step's place in the sweep, 0 first, counting every pass
 * @param pass the pass it belongs to, 0 first (levels times directions, in plan order)
 * @param phase what the step was for
 * @param point the step as the sweep's FRF holds it; its rig time counts from the start of the sweep
 * @param force the sine fit of the force channel (channel 0)
 * @param response the sine fit of the response channel (channel 1)
 * @param settleState how settling ended
 * @param settleS rig time spent settling (and correcting the level), s
 * @param warning a level the control could not reach at this step, if any
 */
public record CompletedStep(int index, int pass, StepPhase phase, SweepPoint point, SinePhasor force,
                            SinePhasor response, SettleState settleState, double settleS, Optional<String> warning) {

    /** Checks that nothing is missing. */
    public CompletedStep {
        if (index < 0 || pass < 0) {
            throw new IllegalArgumentException("step index and pass must be 0 or more, got " + index + " and " + pass);
        }
        Objects.requireNonNull(phase, "phase");
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(force, "force");
        Objects.requireNonNull(response, "response");
        Objects.requireNonNull(settleState, "settleState");
        Objects.requireNonNull(warning, "warning");
    }
}
