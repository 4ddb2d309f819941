package org.tautline.driver.sweep;

/** The order in which each pass of an adaptive sweep visits its frequencies. */
public enum SweepDirection {
    /** Increasing frequency. */
    UP,
    /** Decreasing frequency. */
    DOWN,
    /** The whole sweep up, then the whole sweep again down (a check for a level-dependent, nonlinear specimen). */
    BOTH
}
