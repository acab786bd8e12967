package dev.penduline.physics;

import java.util.Locale;

/**
 * Input the user got wrong: a file, a line in it, an option or a value that Penduline cannot take,
 * told as the place, what is wrong and, where it helps, what to do. Every layer's checked user
 * error extends it (the readers' {@code RecordFormatException}, the mechanism file's
 * {@code MechanismFileException}, the services' {@code InputException}, the command line's
 * {@code UsageException}), so a caller that only shows the message catches this one type, and a
 * {@link RuntimeException} is never mistaken for bad input (see this package's documentation).
 *
 * <p>The message is {@code FILE[:LINE[:COLUMN]]: [column 'FIELD': ]PROBLEM[; ADVICE]}, or the
 * problem alone when the input has no place in a file (an option, say). Control characters echoed
 * from the input are written as visible escapes ({@link #visible(String)}), so the message is one
 * line that cannot drive a terminal.
 */
public class UserInputException extends Exception {

    private static final long serialVersionUID = 1L;

    /** The file as the user named it, null when the input is not a file. */
    private final String file;
    /** The 1-based line, 0 for the whole file. */
    private final int line;
    /** The 1-based character column, 0 when unknown. */
    private final int column;
    /** The field (a column's header name, an option), null for the whole line. */
    private final String field;
    /** What is wrong, without the place. */
    private final String problem;
    /** What to do, null when the problem says it or there is nothing to add. */
    private final String advice;

    /**
     * Creates the exception for a place in a file.
     *
     * @param file    the file as the user named it, or null when the input is not a file
     * @param line    the 1-based line, or 0 when the problem concerns the whole file
     * @param column  the 1-based character column, or 0 when unknown
     * @param field   the field as written in the input (a column's header name), or null for the whole line
     * @param problem what is wrong
     * @param advice  what to do, or null
     * @param cause   the underlying failure, or null
     */
    protected UserInputException(String file, int line, int column, String field, String problem, String advice,
            Throwable cause) {
        super(format(file, Math.max(0, line), Math.max(0, column), field, problem, advice), cause);
        this.file = file;
        this.line = Math.max(0, line);
        this.column = Math.max(0, column);
        this.field = field == null ? null : visible(field);
        this.problem = visible(problem);
        this.advice = advice == null ? null : visible(advice);
    }

    /**
     * Creates the exception from a message that already names the place and says what to do; it is
     * kept as it is (it may hold several lines, each already made visible by its writer).
     *
     * @param message the complete, user-facing message
     * @param cause   the underlying failure, or null
     */
    public UserInputException(String message, Throwable cause) {
        super(message, cause);
        this.file = null;
        this.line = 0;
        this.column = 0;
        this.field = null;
        this.problem = message;
        this.advice = null;
    }

    /**
     * Creates the exception of a higher layer for a user error a lower one found: the same place,
     * problem, advice and message, with the lower one kept as the cause.
     *
     * @param found the user error as the lower layer told it
     */
    protected UserInputException(UserInputException found) {
        super(found.getMessage(), found);
        this.file = found.file;
        this.line = found.line;
        this.column = found.column;
        this.field = found.field;
        this.problem = found.problem;
        this.advice = found.advice;
    }

    /**
     * Creates the exception from one of the message keys.
     *
     * @param message the key of the message's text
     * @param args    the values its format string takes
     */
    public UserInputException(InputMessage message, Object... args) {
        this(message.format(args), null);
    }

    /**
     * The file the problem is in.
     *
     * @return the file as the user named it, or null when the input is not a file
     */
    public String fileName() {
        return file;
    }

    /**
     * The 1-based line of the problem.
     *
     * @return the line, 0 when the problem concerns the whole file or the input has no lines
     */
    public int line() {
        return line;
    }

    /**
     * The 1-based character column of the problem.
     *
     * @return the column, 0 when unknown
     */
    public int column() {
        return column;
    }

    /**
     * The field of the problem: a column by its header name.
     *
     * @return the field (control characters escaped), or null when the whole line is concerned
     */
    public String field() {
        return field;
    }

    /**
     * What is wrong, without the place.
     *
     * @return the problem, with control characters escaped
     */
    public String problem() {
        return problem;
    }

    /**
     * What to do about it, when told apart from the problem.
     *
     * @return the advice (control characters escaped), or null
     */
    public String advice() {
        return advice;
    }

    /**
     * A text as it may be shown inside a message: every control character (C0, DEL and C1, line
     * feed and tab included, since a message is one line) and every half of a surrogate pair
     * without its other half written as a visible escape, {@code \\u001b} for ESC, so that text
     * echoed from a user's file can never drive a terminal or break a message's line.
     *
     * @param text the text, e.g. a cell or a header name from a file
     * @return the text with those characters escaped (the same string when there are none)
     */
    public static String visible(String text) {
        StringBuilder b = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean escape = Character.isISOControl(c) || isLoneSurrogate(text, i);
            if (escape && b == null) {
                b = new StringBuilder(text.length() + 8).append(text, 0, i);
            }
            if (escape) {
                b.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
            } else if (b != null) {
                b.append(c);
            }
        }
        return b == null ? text : b.toString();
    }

    private static boolean isLoneSurrogate(String s, int i) {
        char c = s.charAt(i);
        if (Character.isHighSurrogate(c)) {
            return i + 1 >= s.length() || !Character.isLowSurrogate(s.charAt(i + 1));
        }
        return Character.isLowSurrogate(c) && (i == 0 || !Character.isHighSurrogate(s.charAt(i - 1)));
    }

    private static String format(String file, int line, int column, String field, String problem, String advice) {
        StringBuilder b = new StringBuilder();
        if (file != null || line > 0 || field != null) {
            b.append(file == null ? "<input>" : visible(file));
            if (line > 0) {
                b.append(':').append(line);
                if (column > 0) {
                    b.append(':').append(column);
                }
            }
            b.append(": ");
            if (field != null) {
                b.append("column '").append(visible(field)).append("': ");
            }
        }
        b.append(visible(problem));
        if (advice != null) {
            b.append("; ").append(visible(advice));
        }
        return b.toString();
    }
}
