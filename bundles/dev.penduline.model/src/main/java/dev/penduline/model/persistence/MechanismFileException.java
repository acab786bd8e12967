package dev.penduline.model.persistence;

import java.nio.file.Path;

import dev.penduline.model.persistence.internal.LoadProblem;

/**
 * A mechanism file could not be read or written. The message names the file and, when the
 * problem has a place in it, the line and column, so that a user can open the file there.
 * Control characters echoed from the file are shown as escapes, so the message is one line.
 */
public final class MechanismFileException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient Path file;
    private final int line;
    private final int column;
    private final String problem;

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
        super(format(file, line, column, LoadProblem.printable(problem)), cause);
        this.file = file;
        this.line = Math.max(0, line);
        this.column = Math.max(0, column);
        this.problem = LoadProblem.printable(problem);
    }

    /**
     * The file concerned.
     *
     * @return the path as given to the load or save call
     */
    public Path file() {
        return file;
    }

    /**
     * The 1-based line of the problem.
     *
     * @return the line, or 0 when the problem has no place in the file
     */
    public int line() {
        return line;
    }

    /**
     * The 1-based column of the problem.
     *
     * @return the column, or 0 when unknown
     */
    public int column() {
        return column;
    }

    /**
     * What is wrong, without the file and position.
     *
     * @return the problem text (control characters escaped)
     */
    public String problem() {
        return problem;
    }

    private static String format(Path file, int line, int column, String problem) {
        final StringBuilder b = new StringBuilder(String.valueOf(file));
        if (line > 0) {
            b.append(':').append(line);
            if (column > 0) {
                b.append(':').append(column);
            }
        }
        return b.append(": ").append(problem).toString();
    }
}
