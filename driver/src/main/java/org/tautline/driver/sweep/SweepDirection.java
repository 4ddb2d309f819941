package org.tautline.driver.sweep;

/** The order in which each pass of a sweep visits its frequencies. */
public enum SweepDirection {
    /** Increasing frequency. */
    UP("up"),
    /** Decreasing frequency. */
    DOWN("down"),
    /** The whole sweep up, then the whole sweep again down (a check for a level-dependent, nonlinear specimen). */
    BOTH("up, then down");

    private final String label;

    SweepDirection(String label) {
        this.label = label;
    }

    /** @return the direction in words, for messages and reports ("up", "down", "up, then down") */
    public String label() {
        return label;
    }
}
