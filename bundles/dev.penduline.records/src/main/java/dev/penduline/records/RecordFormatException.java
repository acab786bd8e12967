package dev.penduline.records;

/**
 * A file the user gave cannot be read as the record it should be; the message names the file,
 * the 1-based line and the column (by its header name) so the user can go and fix it, for
 * example {@code parts.csv:4: column 'mass_kg': 'abc' is not a number}.
 */
public class RecordFormatException extends Exception {

    private static final long serialVersionUID = 1L;

    /** The file as the user named it. */
    private final String fileName;
    /** The 1-based line, 0 for the whole file. */
    private final int lineNumber;
    /** The column's header name, null for the whole line. */
    private final String columnName;
    /** What is wrong, without the location. */
    private final String problem;

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
        super(format(fileName, lineNumber, columnName == null ? null : PlainText.visible(columnName),
                PlainText.visible(problem)));
        this.fileName = fileName;
        this.lineNumber = lineNumber;
        this.columnName = columnName == null ? null : PlainText.visible(columnName);
        this.problem = PlainText.visible(problem);
    }

    /**
     * The file the problem is in.
     *
     * @return the file name as the user gave it
     */
    public String getFileName() {
        return fileName;
    }

    /**
     * The 1-based line of the problem.
     *
     * @return the line, 0 when the problem concerns the whole file
     */
    public int getLineNumber() {
        return lineNumber;
    }

    /**
     * The column of the problem, by its header name.
     *
     * @return the column's header name (control characters escaped), or null when the whole line is concerned
     */
    public String getColumnName() {
        return columnName;
    }

    /**
     * What is wrong, without the location.
     *
     * @return the problem, with control characters escaped
     */
    public String getProblem() {
        return problem;
    }

    private static String format(String file, int line, String column, String problem) {
        final StringBuilder b = new StringBuilder(file == null ? "<input>" : PlainText.visible(file));
        if (line > 0) {
            b.append(':').append(line);
        }
        b.append(": ");
        if (column != null) {
            b.append("column '").append(column).append("': ");
        }
        return b.append(problem).toString();
    }
}
