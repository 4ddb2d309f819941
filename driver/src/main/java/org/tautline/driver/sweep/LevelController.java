package org.tautline.driver.sweep;

/**
 * Closed-loop control of the force amplitude by the drive voltage, one correction per settled measurement.
 *
 * <p>The rig is linear in the drive at a fixed frequency (force = g(f) V), so the exact correction is
 * V' = V F_target / F_measured; it is bounded to a factor {@link #MAX_GAIN_STEP} per correction (a
 * wrong reading, a sensor fault, cannot make the drive jump) and never above the drive limit. Where
 * the force drops at a resonance (the heavy armature nearly pins the specimen) the drive needed can
 * exceed the limit: the controller then sits at the limit and says so.
 *
 * @param targetN target peak force, N
 * @param tolerance relative force error accepted, e.g. 0.01
 * @param maxDriveV drive limit, V
 */
public record LevelController(double targetN, double tolerance, double maxDriveV) {
    /** Largest factor by which one correction may change the drive. */
    public static final double MAX_GAIN_STEP = 2.0;

    /** @param forceN measured peak force, N @return true when within the tolerance of the target */
    public boolean within(double forceN) {
        return Math.abs(forceN / targetN - 1.0) <= tolerance;
    }

    /**
     * The corrected drive.
     *
     * @param driveV the drive that gave the force, V
     * @param forceN measured peak force, N
     * @return the next drive, V, bounded by the gain step and the limit
     */
    public double nextDriveV(double driveV, double forceN) {
        double ratio = forceN > 0 ? targetN / forceN : MAX_GAIN_STEP;
        ratio = Math.max(1.0 / MAX_GAIN_STEP, Math.min(MAX_GAIN_STEP, ratio));
        return Math.min(maxDriveV, driveV * ratio);
    }

    /** @param driveV drive, V @return true when the drive is at the limit */
    public boolean atLimit(double driveV) {
        return driveV >= maxDriveV * (1 - 1e-12);
    }
}
