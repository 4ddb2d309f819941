package org.tautline.driver.sweep;

/**
 * Where a running sweep is, for progress bars.
 *
 * @param completedSteps steps done so far
 * @param totalSteps steps planned
 * @param frequencyHz frequency of the step just done, Hz
 * @param rigTimeS rig time spent so far, s
 * @param remainingRigTimeS planned rig time still to go, s
 * @param remainingWallTimeS estimated wall-clock time still to go, s (from the rate so far)
 * @param point the step just completed
 */
public record SweepProgress(int completedSteps, int totalSteps, double frequencyHz, double rigTimeS,
                            double remainingRigTimeS, double remainingWallTimeS, SweepPoint point) {

    /** @return completed fraction 0..1 */
    public double fraction() {
        return totalSteps == 0 ? 1.0 : (double) completedSteps / totalSteps;
    }
}
