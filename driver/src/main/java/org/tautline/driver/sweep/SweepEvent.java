package org.tautline.driver.sweep;

/**
 * One progress event of a sweep: a step started settling, settled, or was completed.
 *
 * @param pass the pass being run, 0 first
 * @param passCount passes in the plan
 * @param level the pass's level (N or V)
 * @param direction the pass's direction
 * @param phase what the step is for
 * @param stepNumber steps completed in this pass, counting the one reported when {@code completed}
 * @param plannedSteps steps the pass expects in all, from the plan and the current estimates
 * @param frequencyHz the step's frequency, Hz
 * @param settleState the step's settle state
 * @param rigTimeS rig time of the sweep so far, s
 * @param remainingRigS expected rig time still to go in the whole sweep, s, from the plan and the current estimates
 * @param completed true when the step has been fitted and recorded (or taken over from an earlier session)
 * @param point the completed step, or null when not {@code completed}
 */
public record SweepEvent(int pass, int passCount, double level, SweepDirection direction, StepPhase phase,
                         int stepNumber, int plannedSteps, double frequencyHz, SettleState settleState, double rigTimeS,
                         double remainingRigS, boolean completed, SweepPoint point) {

    /** @return the fraction of the whole sweep done, 0..1 */
    public double fraction() {
        double inPass = plannedSteps == 0 ? 1.0 : Math.min(1.0, (double) stepNumber / Math.max(stepNumber, plannedSteps));
        return (pass + inPass) / passCount;
    }
}
