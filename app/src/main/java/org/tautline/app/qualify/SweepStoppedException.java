package org.tautline.app.qualify;

import org.tautline.driver.sweep.SweepResult;

/**
 * A qualification sweep that ended before its end (a stop, a safety limit, a fault): nothing is qualified from it.
 *
 * <p>The output is off and the completed steps are in {@link #sweep()}; the message says how the sweep ended and why.
 */
public final class SweepStoppedException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** The result is immutable; it is not serialised with the exception. */
    private final transient SweepResult sweep;

    /** @param sweep the sweep as it ended */
    public SweepStoppedException(SweepResult sweep) {
        super("the sweep " + sweep.status().label() + " before its end after " + sweep.steps().size() + " steps ("
                + sweep.reason() + "); the output is off and nothing was qualified from it");
        this.sweep = sweep;
    }

    /** @return the sweep as it ended; null after deserialisation */
    public SweepResult sweep() {
        return sweep;
    }
}
