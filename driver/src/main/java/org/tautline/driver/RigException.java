package org.tautline.driver;

/**
 * The one unchecked exception of the driver module: a rig, link or sweep fault.
 *
 * <p>Messages say what failed, where (port, channel, step) and what was expected.
 */
public class RigException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** @param message what failed, where, and what was expected */
    public RigException(String message) {
        super(message);
    }

    /**
     * @param message what failed, where, and what was expected
     * @param cause the underlying cause
     */
    public RigException(String message, Throwable cause) {
        super(message, cause);
    }
}
