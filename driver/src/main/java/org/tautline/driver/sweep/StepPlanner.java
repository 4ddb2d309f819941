package org.tautline.driver.sweep;

import java.util.List;
import java.util.OptionalDouble;

import org.tautline.analysis.modal.FittedMode;

/**
 * Decides, one step at a time, what a pass measures next from what it has measured so far.
 *
 * <p>A planner is a pure function of the points it is shown and the pass's elapsed rig time, so that a
 * sweep continued from its recorded steps makes the same decisions as the sweep that recorded them.
 */
interface StepPlanner {

    /**
     * @param points the pass's completed steps, in the order run
     * @param elapsedS rig time of the pass up to its last completed step, s
     * @return the next step's frequency, Hz; empty when the pass is done
     */
    OptionalDouble next(List<SweepPoint> points, double elapsedS);

    /** @return what the step last asked for is for */
    StepPhase phase();

    /**
     * @param frequencyHz a step frequency, Hz
     * @return the time constant of the slowest mode thought to be near it, s (for settling)
     */
    double tauS(double frequencyHz);

    /**
     * @param done steps completed in the pass
     * @return steps the pass now expects in all
     */
    int plannedSteps(int done);

    /**
     * @param done steps completed in the pass
     * @param sampleRateHz sample rate, Hz
     * @return expected rig time still to go in the pass, its final ramp included, s
     */
    double remainingRigTimeS(int done, double sampleRateHz);

    /** @return the local fit of each resonance refined so far */
    List<FittedMode> modes();

    /** @return true when every resonance refined met the targets */
    boolean targetsMet();

    /** @return what the planner warns of: targets not met, and why */
    List<String> warnings();
}
