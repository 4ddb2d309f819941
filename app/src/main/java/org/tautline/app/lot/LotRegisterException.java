package org.tautline.app.lot;

/** The lot register could not be opened, read or written; the message names the register and what was expected. */
public final class LotRegisterException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param message what went wrong, naming the register
     * @param cause the database error, if any
     */
    public LotRegisterException(String message, Throwable cause) {
        super(message, cause);
    }
}
