package dev.penduline.services;

/**
 * A problem with what the user gave: a missing or unreadable file, a malformed line, an
 * inconsistent value. The message names the file, line and field and says what to do.
 */
public class InputException extends Exception {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message the complete, user-facing message
     */
    public InputException(String message) {
        super(message);
    }

    /**
     * Creates the exception with its cause kept for logs.
     *
     * @param message the complete, user-facing message
     * @param cause   the underlying failure
     */
    public InputException(String message, Throwable cause) {
        super(message, cause);
    }
}
