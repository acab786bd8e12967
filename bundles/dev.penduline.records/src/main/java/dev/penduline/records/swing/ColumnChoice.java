package dev.penduline.records.swing;

import dev.penduline.physics.InvalidValueException;

/**
 * A column of a delimited record, by its header name, by its 1-based position, or (once
 * resolved) by both.
 *
 * @param name  the header name as written in the file, or null when chosen by position in a file
 *              without a header
 * @param index the 1-based position, or 0 when chosen by name and not yet resolved
 */
public record ColumnChoice(String name, int index) {

    /**
     * Checks that the choice names a column.
     *
     * @throws IllegalArgumentException when neither a name nor a position ≥ 1 is given
     */
    public ColumnChoice {
        if ((name == null || name.isBlank()) && index < 1) {
            throw new InvalidValueException("a column is chosen by a header name or a 1-based position ≥ 1, got "
                    + (name == null ? "no name" : "'" + name + "'") + " and position " + index);
        }
        if (index < 0) {
            throw new InvalidValueException("column position must be ≥ 1 (1-based), got " + index);
        }
    }

    /**
     * The column with this header name (compared without case and surrounding blanks).
     *
     * @param headerName the header name
     * @return the choice
     */
    public static ColumnChoice byName(String headerName) {
        return new ColumnChoice(headerName, 0);
    }

    /**
     * The column at this position.
     *
     * @param oneBasedIndex 1 for the first column
     * @return the choice
     */
    public static ColumnChoice byIndex(int oneBasedIndex) {
        if (oneBasedIndex < 1) {
            throw new InvalidValueException("column position must be ≥ 1 (1-based), got " + oneBasedIndex);
        }
        return new ColumnChoice(null, oneBasedIndex);
    }

    /**
     * How the column is named in messages: its header name, else "column N".
     *
     * @return the label
     */
    public String label() {
        return name != null ? name : "column " + index;
    }
}
