package org.tautline.driver.serial;

/** A command the virtual device refuses, with the error it reports (PROTOCOL.md, section 7). */
final class CommandFault extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final int code;

    /**
     * @param code the error code, for example -222
     * @param message the error text, starting with the code's standard wording, for example
     *        {@code "Data out of range; ..."}
     */
    CommandFault(int code, String message) {
        super(message, null, false, false);
        this.code = code;
    }

    /** @return the queue entry or {@code !ERR} text */
    DeviceError error() {
        return new DeviceError(code, getMessage());
    }
}
