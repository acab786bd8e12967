package dev.penduline.records.parts;

import java.util.ArrayList;
import java.util.List;

import dev.penduline.records.RecordFormatException;

/**
 * Splits one line of comma-separated values: fields may be quoted with double quotes, may then
 * hold commas, and a doubled quote inside stands for one quote. Fields are stripped of
 * surrounding blanks. A quoted field cannot run over a line end.
 */
final class CsvLine {

    private CsvLine() {
    }

    static List<String> split(String line, String file, int lineNumber) throws RecordFormatException {
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
                    throw new RecordFormatException(file, lineNumber, null, "a quote in the middle of field "
                            + (fields.size() + 1) + ": quote the whole field and double any quote inside it");
                }
                field.setLength(0);
                quoted = true;
                wasQuoted = true;
            } else if (c == ',') {
                fields.add(wasQuoted ? field.toString() : field.toString().strip());
                field.setLength(0);
                wasQuoted = false;
            } else if (wasQuoted) {
                if (!Character.isWhitespace(c)) {
                    throw new RecordFormatException(file, lineNumber, null, "text after the closing quote of field "
                            + (fields.size() + 1));
                }
            } else {
                field.append(c);
            }
        }
        if (quoted) {
            throw new RecordFormatException(file, lineNumber, null, "field " + (fields.size() + 1)
                    + " opens a quote that is not closed on this line");
        }
        fields.add(wasQuoted ? field.toString() : field.toString().strip());
        return fields;
    }
}
