package dev.penduline.records;

import java.util.ArrayList;
import java.util.List;

import dev.penduline.physics.InputMessage;

/**
 * Splits one line of delimited text (comma, semicolon, tab, ...), shared by every reader of
 * Penduline's text records.
 *
 * <p>Two ways in:
 * <ul>
 * <li>{@link #split} for header rows and lines with quotes: fields may be quoted with double
 * quotes, may then hold the delimiter, and a doubled quote inside stands for one quote. Fields
 * are stripped of surrounding blanks. A quoted field cannot run over a line end.</li>
 * <li>{@link #fieldBounds} for the hot loop of a long numeric record: it only finds where each
 * field starts and ends, creating no objects, so a reader can parse numbers straight from the
 * line. It does not interpret quotes; call {@link #split} for a line that contains one.</li>
 * </ul>
 */
public final class DelimitedLine {

    private DelimitedLine() {
    }

    /**
     * Splits a line into its fields, honouring double quotes.
     *
     * @param line       the line, without its line terminator
     * @param delimiter  the field separator, e.g. {@code ','}, {@code ';'} or {@code '\t'}
     * @param file       the file name for messages
     * @param lineNumber the 1-based line number for messages
     * @return the fields, stripped of surrounding blanks unless quoted
     * @throws RecordFormatException for a misplaced or unclosed quote
     */
    public static List<String> split(String line, char delimiter, String file, int lineNumber)
            throws RecordFormatException {
        final List<String> fields = new ArrayList<>();
        final StringBuilder field = new StringBuilder();
        boolean quoted = false;
        boolean wasQuoted = false;
        for (int i = 0; i < line.length(); i++) {
            final char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        field.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    field.append(c);
                }
            } else if (c == '"') {
                if (!field.toString().isBlank() || wasQuoted) {
                    throw new RecordFormatException(file, lineNumber, null, InputMessage.QUOTE_INSIDE_FIELD.format(
                            fields.size() + 1));
                }
                field.setLength(0);
                quoted = true;
                wasQuoted = true;
            } else if (c == delimiter) {
                fields.add(wasQuoted ? field.toString() : field.toString().strip());
                field.setLength(0);
                wasQuoted = false;
            } else if (wasQuoted) {
                if (!Character.isWhitespace(c)) {
                    throw new RecordFormatException(file, lineNumber, null, InputMessage.TEXT_AFTER_QUOTE.format(
                            fields.size() + 1));
                }
            } else {
                field.append(c);
            }
        }
        if (quoted) {
            throw new RecordFormatException(file, lineNumber, null, InputMessage.UNCLOSED_QUOTE.format(fields.size() + 1));
        }
        fields.add(wasQuoted ? field.toString() : field.toString().strip());
        return fields;
    }

    /**
     * Finds where the fields of an unquoted line start and end, without creating objects.
     * Field {@code k} (0-based) occupies {@code line.substring(bounds[2k], bounds[2k+1])},
     * stripped of surrounding blanks; only as many fields as {@code bounds} has room for are
     * recorded, but all are counted.
     *
     * @param line      the line, without its line terminator
     * @param delimiter the field separator
     * @param bounds    receives start (inclusive) and end (exclusive) of each field, in pairs
     * @return the number of fields on the line
     */
    public static int fieldBounds(CharSequence line, char delimiter, int[] bounds) {
        final int length = line.length();
        final int room = bounds.length / 2;
        int count = 0;
        int start = 0;
        for (int i = 0; i <= length; i++) {
            if (i == length || line.charAt(i) == delimiter) {
                if (count < room) {
                    int a = start;
                    int b = i;
                    while (a < b && Character.isWhitespace(line.charAt(a))) {
                        a++;
                    }
                    while (b > a && Character.isWhitespace(line.charAt(b - 1))) {
                        b--;
                    }
                    bounds[2 * count] = a;
                    bounds[2 * count + 1] = b;
                }
                count++;
                start = i + 1;
            }
        }
        return count;
    }
}
