package org.tautline.driver.sweep;

/** Thrown inside the adaptive engine to stop a sweep on a cancel or a safety limit; never leaves the engine. */
final class SweepStop extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** True for a safety limit, false for a cancel. */
    final boolean limit;

    SweepStop(boolean limit, String reason) {
        super(reason, null, false, false);
        this.limit = limit;
    }
}
