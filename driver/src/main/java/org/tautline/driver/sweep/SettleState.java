package org.tautline.driver.sweep;

/** Where a step is in its settling, as progress events report it. */
public enum SettleState {
    /** Waiting for the transient of the frequency or level change to decay. */
    SETTLING,
    /** Steady state within the tolerance: the whole-cycle integration is running or done. */
    SETTLED,
    /** The settle cap (a multiple of the expected settle time) was reached before the block phasors converged. */
    TIMED_OUT,
    /** A fixed dwell, as the plan asks, instead of detection. */
    FIXED_DWELL
}
