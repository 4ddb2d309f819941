package org.tautline.analysis;

/**
 * The one unchecked exception of the analysis module.
 *
 * <p>Messages say what was wrong, where (file and line, field) and what was expected, with the
 * offending value, so that the command line and the workbench can show them as they are.
 */
public class AnalysisException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * Creates an exception with a message for the user.
     *
     * @param message what was wrong, where, and what was expected
     */
    public AnalysisException(String message) {
        super(message);
    }

    /**
     * Creates an exception with a message for the user and the underlying cause.
     *
     * @param message what was wrong, where, and what was expected
     * @param cause the underlying cause
     */
    public AnalysisException(String message, Throwable cause) {
        super(message, cause);
    }
}
