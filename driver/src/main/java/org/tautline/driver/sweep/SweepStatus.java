package org.tautline.driver.sweep;

/** How a sweep session ended; in every case the output is off. */
public enum SweepStatus {
    /** Every planned step was run. */
    COMPLETED("completed"),
    /** A stop was asked for (a pause, a cancel, an interrupt); the drive was ramped down and switched off. */
    CANCELLED("cancelled"),
    /** A safety limit was reached; the drive was ramped down and switched off. */
    LIMIT("stopped at a safety limit"),
    /** A rig fault (or a failure to record a step) stopped the sweep; the output was switched off at once. */
    FAULT("stopped by a fault");

    private final String label;

    SweepStatus(String label) {
        this.label = label;
    }

    /** @return the status in words, for messages and reports */
    public String label() {
        return label;
    }
}
