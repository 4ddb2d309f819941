package org.tautline.driver.sweep;

/**
 * Estimates the wall-clock time a sweep still needs from its events: the rig seconds still to go times the wall
 * seconds each rig second has taken so far. Not thread-safe: feed it from the listener's thread.
 */
public final class WallTimeEstimate {
    private long firstWallNs;
    private double firstRigS = Double.NaN;

    /**
     * @param event an event of the sweep
     * @return the estimated wall time still to go, s; NaN until two events with different rig times were seen
     */
    public double remainingWallS(SweepEvent event) {
        long now = System.nanoTime();
        if (Double.isNaN(firstRigS)) {
            firstRigS = event.rigTimeS();
            firstWallNs = now;
            return Double.NaN;
        }
        double rigS = event.rigTimeS() - firstRigS;
        if (!(rigS > 0)) {
            return Double.NaN;
        }
        return (now - firstWallNs) * 1e-9 / rigS * event.remainingRigS();
    }
}
