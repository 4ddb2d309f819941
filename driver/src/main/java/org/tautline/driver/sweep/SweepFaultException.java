package org.tautline.driver.sweep;

import org.tautline.driver.RigException;

/**
 * A sweep stopped by a fault, thrown after the output was switched off; it keeps the steps completed before the fault.
 */
public final class SweepFaultException extends RigException {
    private static final long serialVersionUID = 1L;

    /** The record is immutable, so sharing it is safe; it is not serialised with the exception. */
    private final transient SweepRecord partial;

    /**
     * @param message what stopped the sweep, where, and what was kept
     * @param partial the steps completed before the fault
     * @param cause the fault
     */
    public SweepFaultException(String message, SweepRecord partial, Throwable cause) {
        super(message, cause);
        this.partial = partial;
    }

    /** @return the steps completed before the fault ({@code completed} false); null after deserialisation */
    public SweepRecord partial() {
        return partial;
    }
}
