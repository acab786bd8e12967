package dev.penduline.cli;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.UserInputException;

/**
 * A mistake on the command line or in an input file: reported as one message, exit code 2, never
 * a stack trace. It is the command line's {@link UserInputException}.
 */
public class UsageException extends UserInputException {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message what is wrong and, where it helps, what to do instead
     */
    public UsageException(String message) {
        super(message, null);
    }

    /**
     * Creates the exception from one of the message keys.
     *
     * @param message the key of the message's text
     * @param args    the values its format string takes
     */
    public UsageException(InputMessage message, Object... args) {
        super(message, args);
    }
}
