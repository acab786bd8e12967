package dev.penduline.services;

import dev.penduline.physics.UserInputException;

/**
 * A problem with what the user gave: a missing or unreadable file, a malformed line, an
 * inconsistent value. The message names the file, line and field and says what to do. It is the
 * services' {@link UserInputException}; a failure that is not the user's (a
 * {@link RuntimeException}) is never turned into one.
 */
public class InputException extends UserInputException {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message the complete, user-facing message
     */
    public InputException(String message) {
        super(message, null);
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

    /**
     * The services' exception for a user error a reader or the mechanism file found: the same
     * file, line, field and message.
     *
     * @param found what the reader or the mechanism file reported
     */
    public InputException(UserInputException found) {
        super(found);
    }
}
