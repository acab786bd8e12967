package dev.penduline.physics;

/**
 * A value that can come from the user (a mass, a length, a rate, a duration, a record's samples, a
 * stored fit's figures) is outside what a computation can take: the physics' own user error.
 *
 * <p>The physics validates its arguments with it where the value can come from a file or an
 * option, and with a plain {@link IllegalArgumentException} where only a programming error can
 * give a wrong one (arrays of different lengths, a missing part of a shape). The layer that read
 * the value turns this one into its checked {@link UserInputException} with the file and field;
 * the command line also recognises it when it is left untranslated, as a usage or input error
 * (exit code 2, no trace), never as a defect. It stays an {@code IllegalArgumentException}, so
 * the physics' signatures and callers keep their shape.
 */
public class InvalidValueException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message what is wrong with the value, in words a user can act on
     */
    public InvalidValueException(String message) {
        super(message);
    }

    /**
     * Creates the exception with its cause kept for logs.
     *
     * @param message what is wrong with the value, in words a user can act on
     * @param cause   the underlying failure
     */
    public InvalidValueException(String message, Throwable cause) {
        super(message, cause);
    }
}
