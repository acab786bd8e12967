package dev.penduline.records.parts;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Pattern;

import dev.penduline.physics.InputMessage;
import dev.penduline.records.RecordFormatException;

/** One data line of a parts list, with its cells read through the header and converted to SI. */
final class PartsRow {

    /** A plain decimal number; Java's parser would also take "NaN", "Infinity", hex and "1d". */
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private final PartsHeader header;
    private final List<String> cells;
    private final String file;
    private final int line;

    PartsRow(PartsHeader header, List<String> cells, String file, int line) {
        this.header = header;
        this.cells = cells;
        this.file = file;
        this.line = line;
    }

    /** Cells beyond the header's width that are not blank: the line has too many fields. */
    boolean hasExtraCells() {
        for (int i = header.width(); i < cells.size(); i++) {
            if (!cells.get(i).isBlank()) {
                return true;
            }
        }
        return false;
    }

    /** Columns the file has, by their header names, with a non-blank cell on this line. */
    boolean isFilled(PartsColumn column) {
        return text(column).isPresent();
    }

    int line() {
        return line;
    }

    String file() {
        return file;
    }

    /** The cell's text, empty when the column is absent or the cell blank. */
    Optional<String> text(PartsColumn column) {
        return header.slot(column).map(s -> s.index() < cells.size() ? cells.get(s.index()) : "")
                .filter(t -> !t.isBlank()).map(String::strip);
    }

    /** The header name the file uses for a column, or its SI name when the column is absent. */
    String headerName(PartsColumn column) {
        return header.slot(column).map(PartsHeader.Slot::header).orElse(column.canonicalName());
    }

    /** A number converted to SI, empty when the column is absent or the cell blank. */
    OptionalDouble number(PartsColumn column) throws RecordFormatException {
        final Optional<String> t = text(column);
        if (t.isEmpty()) {
            return OptionalDouble.empty();
        }
        if (!NUMBER.matcher(t.get()).matches()) {
            throw error(column, InputMessage.CELL_NOT_A_NUMBER.format(t.get()));
        }
        final double v = header.slot(column).orElseThrow().unit().toSi(Double.parseDouble(t.get()));
        if (!Double.isFinite(v) || Math.abs(v) > column.maxMagnitude()) {
            String limit = String.format(Locale.ROOT, "%.0e", column.maxMagnitude()).replace("e+0", "e");
            throw error(column, InputMessage.CELL_TOO_LARGE.format(t.get(), limit, column.quantity().siSymbol()));
        }
        return OptionalDouble.of(v);
    }

    /** A number the shape needs. */
    double required(PartsColumn column, String why) throws RecordFormatException {
        if (header.slot(column).isEmpty()) {
            throw new RecordFormatException(file, line, null, InputMessage.COLUMN_NEEDED.format(
                    column.canonicalName(), why));
        }
        final OptionalDouble v = number(column);
        if (v.isEmpty()) {
            throw error(column, InputMessage.EMPTY_BUT_NEEDED.format(why));
        }
        return v.getAsDouble();
    }

    /** A number that must be strictly positive. */
    double requiredPositive(PartsColumn column, String why) throws RecordFormatException {
        final double v = required(column, why);
        requirePositive(column, v);
        return v;
    }

    void requirePositive(PartsColumn column, double si) throws RecordFormatException {
        if (!(si > 0)) {
            throw error(column, InputMessage.CELL_NOT_POSITIVE.format(text(column).orElse("")));
        }
    }

    /** A number that must not be negative, 0 when absent. */
    double nonNegative(PartsColumn column) throws RecordFormatException {
        final double v = number(column).orElse(0);
        if (v < 0) {
            throw error(column, InputMessage.CELL_NEGATIVE.format(text(column).orElse("")));
        }
        return v;
    }

    RecordFormatException error(PartsColumn column, String problem) {
        return new RecordFormatException(file, line, headerName(column), problem);
    }
}
