package org.tautline.driver.sweep;

/** What the levels of an adaptive sweep plan hold. */
public enum LevelMode {
    /** Levels are peak force amplitudes, N, held by closed-loop control of the drive. */
    FORCE,
    /** Levels are peak drive voltages, V, applied open loop. */
    DRIVE
}
