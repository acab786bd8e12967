package dev.penduline.records.swing;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.units.Quantity;
import dev.penduline.physics.units.Unit;

/**
 * How a swing record's text was read: everything needed to read the same file the same way
 * again, as the project file stores it beside the record's path and hash.
 *
 * @param delimiter           field separator: {@code ','}, {@code ';'} or {@code '\t'}
 * @param decimalSeparator    {@code '.'} or {@code ','}
 * @param header              whether the first non-comment line is a header row
 * @param timeColumn          the time column, resolved: its 1-based index, and its header name
 *                            when there is a header
 * @param angleColumn         the angle column, resolved likewise
 * @param timeUnit            the unit the time column is written in
 * @param angleUnit           the unit the angle column is written in; for encoder counts the
 *                            unit made by {@link Unit#encoderCounts(double)}
 * @param countsPerRevolution counts per revolution when the angle is in counts, else NaN
 */
public record SwingRecordMapping(char delimiter, char decimalSeparator, boolean header, ColumnChoice timeColumn,
        ColumnChoice angleColumn, Unit timeUnit, Unit angleUnit, double countsPerRevolution) {

    /**
     * Checks the combination.
     *
     * @throws IllegalArgumentException for a comma used both ways, units of the wrong quantity,
     *                                  or counts without a count per revolution
     */
    public SwingRecordMapping {
        if (delimiter == decimalSeparator) {
            throw new InvalidValueException("the delimiter and the decimal separator cannot both be '"
                    + delimiter + "'");
        }
        if (decimalSeparator != '.' && decimalSeparator != ',') {
            throw new InvalidValueException("the decimal separator must be '.' or ',', got '" + decimalSeparator + "'");
        }
        if (timeUnit.quantity() != Quantity.TIME) {
            throw new InvalidValueException("time unit '" + timeUnit.symbol() + "' is not a unit of time");
        }
        if (angleUnit.quantity() != Quantity.ANGLE) {
            throw new InvalidValueException("angle unit '" + angleUnit.symbol() + "' is not a unit of angle");
        }
        if (angleUnit.suffix().equals(Unit.ENCODER_COUNT.suffix()) && !(countsPerRevolution > 0)) {
            throw new InvalidValueException("an angle in encoder counts needs the counts per revolution");
        }
        if (timeColumn.index() < 1 || angleColumn.index() < 1) {
            throw new IllegalArgumentException("a mapping holds resolved columns with their 1-based positions");
        }
    }

    /**
     * Options that read a file exactly this way again, detecting nothing.
     *
     * @return the options
     */
    public SwingImportOptions toOptions() {
        SwingImportOptions o = SwingImportOptions.defaults().withDelimiter(delimiter)
                .withDecimalSeparator(decimalSeparator).withHeader(header)
                .withTimeColumn(ColumnChoice.byIndex(timeColumn.index()))
                .withAngleColumn(ColumnChoice.byIndex(angleColumn.index()))
                .withTimeUnit(timeUnit).withAngleUnit(angleUnit);
        if (countsPerRevolution > 0) {
            o = o.withCountsPerRevolution(countsPerRevolution);
        }
        return o;
    }
}
