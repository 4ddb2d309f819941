package org.tautline.driver.serial;

/**
 * A fault the virtual rig can inject into what it sends (see {@link FaultSchedule} and
 * {@link VirtualRigServer#schedule(FaultSchedule)}).
 *
 * <p>The first four are link faults a host recovers from (a re-request, a retry, or at worst a read that throws
 * {@link org.tautline.driver.RigDataLostException}); the last three end a session.
 */
public enum InjectedFault {
    /**
     * Cuts bytes (the parameter, default 7) out of the item sent at that moment, line or block, never a line's
     * terminator: the first cut takes the item's first bytes, later ones land further in (a head, a number, samples).
     */
    DROP_BYTES("drop-bytes", 7),
    /** Flips one bit in the middle of the next data block. */
    CORRUPT_BLOCK("corrupt-block", 0),
    /** Does not send the next data block. */
    LOSE_BLOCK("lose-block", 0),
    /** Sends nothing for the parameter's milliseconds (default 50), then goes on; commands are still obeyed. */
    STALL("stall", 50),
    /** Forgets the blocks kept for resends, so that a re-request is answered by {@code !ERR 102}. */
    FORGET_HISTORY("forget-history", 0),
    /** Resets the device: it forgets its state, switches the output off and sends {@code !RESET}. */
    RESET("reset", 0),
    /** An amplifier fault: output off, error 110 queued, {@code !FAULT 110} sent at once. */
    AMPLIFIER_FAULT("amplifier-fault", 0),
    /** The device vanishes: output off, port closed, pseudo-terminal pair killed. */
    DISAPPEAR("disappear", 0);

    private final String label;
    private final int defaultParameter;

    InjectedFault(String label, int defaultParameter) {
        this.label = label;
        this.defaultParameter = defaultParameter;
    }

    /** @return the name used on the command line and in the log, for example {@code drop-bytes} */
    public String label() {
        return label;
    }

    /** @return bytes for {@link #DROP_BYTES}, milliseconds for {@link #STALL}, 0 for the others */
    public int defaultParameter() {
        return defaultParameter;
    }

    /** @return true for the faults that change one item sent (bytes dropped, block corrupted or lost) */
    boolean changesAnItem() {
        return this == DROP_BYTES || this == CORRUPT_BLOCK || this == LOSE_BLOCK;
    }
}
