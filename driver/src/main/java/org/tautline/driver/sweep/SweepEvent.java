package org.tautline.driver.sweep;

/**
 * One progress event of an adaptive sweep: a step started settling, settled, or was completed.
 *
 * @param phase what the engine is doing: "coarse", "locate", "refine"
 * @param level the level being run (N or V)
 * @param direction the pass being run
 * @param stepNumber steps completed in this pass, counting the one reported when {@code completed}
 * @param plannedSteps steps the pass expects in all, from the plan and the current estimates
 * @param frequencyHz the step's frequency, Hz
 * @param settleState the step's settle state
 * @param rigTimeS rig time of this pass so far, s
 * @param etaRigS expected rig time still to go in this pass, s, from the plan and the current damping estimates
 * @param completed true when the step has been fitted and recorded
 * @param point the completed step, or null when not {@code completed}
 */
public record SweepEvent(String phase, double level, SweepDirection direction, int stepNumber, int plannedSteps,
                         double frequencyHz, SettleState settleState, double rigTimeS, double etaRigS,
                         boolean completed, SweepPoint point) {

    /**
     * The event as the plain progress of a stepped-sine sweep, for progress bars.
     *
     * @return the progress (the wall-clock estimate is not known here: NaN)
     */
    public SweepProgress toProgress() {
        return new SweepProgress(stepNumber, Math.max(stepNumber, plannedSteps), frequencyHz, rigTimeS, etaRigS,
                Double.NaN, point);
    }
}
