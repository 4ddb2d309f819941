package org.tautline.driver;

/**
 * A fault on the link to a rig: a timeout, a damaged or missing data block, a reset, a lost port.
 *
 * <p>The message says what happened, where (the port) and what was expected, for example
 * {@code "no reply to *IDN? within 500 ms on /dev/ttyUSB0; expected one reply line"}.
 */
public class RigLinkException extends RigException {
    private static final long serialVersionUID = 1L;

    /** What went wrong on the link. */
    public enum Kind {
        /** The device did not answer in time. */
        TIMEOUT,
        /** A data block arrived whose CRC-32 did not match. */
        CRC,
        /** A data block or a run of samples is missing: sequence or sample index jumped. */
        SEQUENCE_GAP,
        /** The device restarted and forgot its state. */
        DEVICE_RESET,
        /** The port went away: read or write failed, or the device node disappeared. */
        PORT_GONE,
        /** The device reported an error from its error queue. */
        DEVICE_ERROR,
        /** The device said something the protocol does not allow. */
        PROTOCOL
    }

    private final Kind kind;
    private final String port;

    /**
     * Builds the exception with the message {@code what + " on " + port + "; expected " + expected}.
     *
     * @param kind what went wrong
     * @param port where: the port name or path
     * @param what what happened
     * @param expected what the host expected instead
     */
    public RigLinkException(Kind kind, String port, String what, String expected) {
        super(what + " on " + port + "; expected " + expected);
        this.kind = kind;
        this.port = port;
    }

    /**
     * Builds the exception with a cause.
     *
     * @param kind what went wrong
     * @param port where: the port name or path
     * @param what what happened
     * @param expected what the host expected instead
     * @param cause the underlying cause
     */
    public RigLinkException(Kind kind, String port, String what, String expected, Throwable cause) {
        super(what + " on " + port + "; expected " + expected, cause);
        this.kind = kind;
        this.port = port;
    }

    /** @return what went wrong */
    public Kind kind() {
        return kind;
    }

    /** @return the port name or path */
    public String port() {
        return port;
    }
}
