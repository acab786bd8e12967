package dev.penduline.records;

import dev.penduline.physics.UserInputException;

/**
 * A file the user gave cannot be read as the record it should be; the message names the file,
 * the 1-based line and the column (by its header name) so the user can go and fix it, for
 * example {@code parts.csv:4: column 'mass_kg': 'abc' is not a number}. The place and the
 * message's form are those of every user error ({@link UserInputException}); the texts are
 * {@link dev.penduline.physics.InputMessage}'s.
 */
public class RecordFormatException extends UserInputException {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param fileName   the file as the user named it
     * @param lineNumber the 1-based line, or 0 when the problem concerns the whole file
     * @param columnName the column's header name as written in the file, or null when the
     *                   problem concerns the whole line
     * @param problem    what is wrong, and where helpful what to do; control characters in it
     *                   (echoed from the file) are escaped
     */
    public RecordFormatException(String fileName, int lineNumber, String columnName, String problem) {
        super(fileName == null ? "<input>" : fileName, lineNumber, 0, columnName, problem, null, null);
    }

    /**
     * The file the problem is in.
     *
     * @return the file name as the user gave it
     */
    public String getFileName() {
        return fileName();
    }

    /**
     * The 1-based line of the problem.
     *
     * @return the line, 0 when the problem concerns the whole file
     */
    public int getLineNumber() {
        return line();
    }

    /**
     * The column of the problem, by its header name.
     *
     * @return the column's header name (control characters escaped), or null when the whole line is concerned
     */
    public String getColumnName() {
        return field();
    }

    /**
     * What is wrong, without the location.
     *
     * @return the problem, with control characters escaped
     */
    public String getProblem() {
        return problem();
    }
}
