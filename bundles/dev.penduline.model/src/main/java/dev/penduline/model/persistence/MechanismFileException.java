package dev.penduline.model.persistence;

import java.nio.file.Path;

import dev.penduline.physics.UserInputException;

/**
 * A mechanism file could not be read or written. The message names the file and, when the
 * problem has a place in it, the line and column, so that a user can open the file there.
 * Control characters echoed from the file are shown as escapes, so the message is one line
 * (the form of every user error, {@link UserInputException}).
 */
public final class MechanismFileException extends UserInputException {

    private static final long serialVersionUID = 1L;

    private final transient Path file;

    /**
     * Creates the exception.
     *
     * @param file    the file concerned
     * @param line    1-based line of the problem, or 0 when it has no place in the file
     * @param column  1-based column of the problem, or 0 when unknown
     * @param problem what is wrong and, where it helps, what to do
     * @param cause   the underlying exception, or null
     */
    public MechanismFileException(Path file, int line, int column, String problem, Throwable cause) {
        super(String.valueOf(file), line, column, null, problem, null, cause);
        this.file = file;
    }

    /**
     * The file concerned.
     *
     * @return the path as given to the load or save call
     */
    public Path file() {
        return file;
    }
}
