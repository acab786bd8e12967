package dev.penduline.records.swing;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.units.Quantity;
import dev.penduline.physics.units.Unit;

/**
 * What the user told the swing-record reader; every null (or NaN) setting is detected from the
 * file and reported as an assumption. Immutable; {@code withX} return copies.
 *
 * @param delimiter           field separator ({@code ','}, {@code ';'}, {@code '\t'}), null to detect
 * @param decimalSeparator    {@code '.'} or {@code ','}, null to detect
 * @param header              whether the first non-comment line is a header, null to detect
 * @param timeColumn          the time column, null to detect from the header
 * @param angleColumn         the angle column, null to detect from the header
 * @param timeUnit            unit of the time column, null to take it from the header
 * @param angleUnit           unit of the angle column, null to take it from the header
 * @param countsPerRevolution encoder counts per revolution (after quadrature), NaN when unknown
 * @param gapFactor           a step longer than this many median steps is reported as a gap (&gt; 1)
 * @param minimumSamples      fewest samples accepted (≥ 10)
 * @param minimumMotion       smallest angle range taken as motion (rad, &gt; 0)
 */
public record SwingImportOptions(Character delimiter, Character decimalSeparator, Boolean header,
        ColumnChoice timeColumn, ColumnChoice angleColumn, Unit timeUnit, Unit angleUnit, double countsPerRevolution,
        double gapFactor, int minimumSamples, double minimumMotion) {

    /**
     * Checks the settings that are given.
     *
     * @throws IllegalArgumentException naming the setting and its value
     */
    public SwingImportOptions {
        if (delimiter != null && delimiter != ',' && delimiter != ';' && delimiter != '\t') {
            throw new InvalidValueException("delimiter must be ',', ';' or tab, got '" + delimiter + "'");
        }
        if (decimalSeparator != null && decimalSeparator != '.' && decimalSeparator != ',') {
            throw new InvalidValueException("decimal separator must be '.' or ',', got '" + decimalSeparator + "'");
        }
        if (delimiter != null && delimiter == ',' && decimalSeparator != null && decimalSeparator == ',') {
            throw new InvalidValueException(LayoutSniffer.DECIMAL_IS_DELIMITER);
        }
        if (timeUnit != null && timeUnit.quantity() != Quantity.TIME) {
            throw new InvalidValueException("time unit '" + timeUnit.symbol() + "' is not a unit of time");
        }
        if (angleUnit != null && angleUnit.quantity() != Quantity.ANGLE) {
            throw new InvalidValueException("angle unit '" + angleUnit.symbol() + "' is not a unit of angle");
        }
        if (!Double.isNaN(countsPerRevolution) && !(countsPerRevolution > 0 && Double.isFinite(countsPerRevolution))) {
            throw new InvalidValueException("counts per revolution must be positive, got " + countsPerRevolution);
        }
        if (!(gapFactor > 1) || Double.isInfinite(gapFactor)) {
            throw new InvalidValueException("gap factor must be a finite number > 1, got " + gapFactor);
        }
        if (minimumSamples < 10) {
            throw new InvalidValueException("minimum samples must be at least 10, got " + minimumSamples);
        }
        if (!(minimumMotion > 0) || Double.isInfinite(minimumMotion)) {
            throw new InvalidValueException("minimum motion must be a finite angle > 0 rad, got " + minimumMotion);
        }
    }

    /**
     * Detect everything; gaps beyond 5 median steps, at least 20 samples, at least 0.1° of motion.
     *
     * @return the default options
     */
    public static SwingImportOptions defaults() {
        return new SwingImportOptions(null, null, null, null, null, null, null, Double.NaN, 5, 20, Math.toRadians(0.1));
    }

    /**
     * @param c field separator
     * @return a copy with the delimiter set
     */
    public SwingImportOptions withDelimiter(char c) {
        return new SwingImportOptions(c, decimalSeparator, header, timeColumn, angleColumn, timeUnit, angleUnit,
                countsPerRevolution, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param c decimal separator, '.' or ','
     * @return a copy with the decimal separator set
     */
    public SwingImportOptions withDecimalSeparator(char c) {
        return new SwingImportOptions(delimiter, c, header, timeColumn, angleColumn, timeUnit, angleUnit,
                countsPerRevolution, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param hasHeader whether the first non-comment line is a header
     * @return a copy with the header setting
     */
    public SwingImportOptions withHeader(boolean hasHeader) {
        return new SwingImportOptions(delimiter, decimalSeparator, hasHeader, timeColumn, angleColumn, timeUnit,
                angleUnit, countsPerRevolution, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param column the time column
     * @return a copy with the time column chosen
     */
    public SwingImportOptions withTimeColumn(ColumnChoice column) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, column, angleColumn, timeUnit, angleUnit,
                countsPerRevolution, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param column the angle column
     * @return a copy with the angle column chosen
     */
    public SwingImportOptions withAngleColumn(ColumnChoice column) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, timeColumn, column, timeUnit, angleUnit,
                countsPerRevolution, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param unit unit of the time column (s, ms, µs)
     * @return a copy with the time unit set
     */
    public SwingImportOptions withTimeUnit(Unit unit) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, timeColumn, angleColumn, unit, angleUnit,
                countsPerRevolution, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param unit unit of the angle column (rad, deg or counts)
     * @return a copy with the angle unit set
     */
    public SwingImportOptions withAngleUnit(Unit unit) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, timeColumn, angleColumn, timeUnit, unit,
                countsPerRevolution, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param cpr encoder counts per revolution, after quadrature decoding
     * @return a copy with the counts per revolution set
     */
    public SwingImportOptions withCountsPerRevolution(double cpr) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, timeColumn, angleColumn, timeUnit,
                angleUnit, cpr, gapFactor, minimumSamples, minimumMotion);
    }

    /**
     * @param factor a step longer than this many median steps is a gap (&gt; 1)
     * @return a copy with the gap factor set
     */
    public SwingImportOptions withGapFactor(double factor) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, timeColumn, angleColumn, timeUnit,
                angleUnit, countsPerRevolution, factor, minimumSamples, minimumMotion);
    }

    /**
     * @param samples fewest samples accepted (≥ 10)
     * @return a copy with the minimum set
     */
    public SwingImportOptions withMinimumSamples(int samples) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, timeColumn, angleColumn, timeUnit,
                angleUnit, countsPerRevolution, gapFactor, samples, minimumMotion);
    }

    /**
     * @param radians smallest angle range taken as motion (rad)
     * @return a copy with the threshold set
     */
    public SwingImportOptions withMinimumMotion(double radians) {
        return new SwingImportOptions(delimiter, decimalSeparator, header, timeColumn, angleColumn, timeUnit,
                angleUnit, countsPerRevolution, gapFactor, minimumSamples, radians);
    }
}
