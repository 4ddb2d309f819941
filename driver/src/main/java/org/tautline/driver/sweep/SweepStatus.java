package org.tautline.driver.sweep;

/** How a sweep session ended. */
public enum SweepStatus {
    /** Every planned step was run. */
    COMPLETED,
    /** A cancel was requested; the drive was ramped down and switched off. */
    CANCELLED,
    /** A safety limit was reached; the drive was ramped down and switched off. */
    LIMIT,
    /** A rig fault (or a failure to record a step) stopped the sweep; the output was switched off at once. */
    FAULT
}
