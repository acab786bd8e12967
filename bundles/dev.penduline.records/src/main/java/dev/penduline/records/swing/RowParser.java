package dev.penduline.records.swing;

import java.util.List;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.DelimitedLine;
import dev.penduline.records.InputLimits;
import dev.penduline.records.RecordFormatException;

/** Reads the time and angle of one data line, converts them to SI and checks the time order. */
final class RowParser {

    private final int timeField;
    private final int angleField;
    private final int needed;
    private final char delimiter;
    private final char decimal;
    private final Unit timeUnit;
    private final Unit angleUnit;
    private final String timeLabel;
    private final String angleLabel;
    private final String file;
    private final int[] bounds;
    private final int headerWidth;

    RowParser(SwingRecordMapping mapping, String file, int headerWidth) {
        this.headerWidth = headerWidth;
        this.timeField = mapping.timeColumn().index() - 1;
        this.angleField = mapping.angleColumn().index() - 1;
        this.needed = Math.max(timeField, angleField) + 1;
        this.delimiter = mapping.delimiter();
        this.decimal = mapping.decimalSeparator();
        this.timeUnit = mapping.timeUnit();
        this.angleUnit = mapping.angleUnit();
        this.timeLabel = label(mapping.timeColumn());
        this.angleLabel = label(mapping.angleColumn());
        this.file = file;
        this.bounds = new int[2 * needed];
    }

    void parse(String line, int number, SampleSeries out) throws RecordFormatException {
        final double rawTime;
        final double rawAngle;
        if (line.indexOf('"') >= 0) {
            final List<String> fields = DelimitedLine.split(line, delimiter, file, number);
            requireWidth(fields.size(), number);
            rawTime = cell(fields.get(timeField), 0, fields.get(timeField).length(), number, timeLabel);
            rawAngle = cell(fields.get(angleField), 0, fields.get(angleField).length(), number, angleLabel);
        } else {
            requireWidth(DelimitedLine.fieldBounds(line, delimiter, bounds), number);
            rawTime = cell(line, bounds[2 * timeField], bounds[2 * timeField + 1], number, timeLabel);
            rawAngle = cell(line, bounds[2 * angleField], bounds[2 * angleField + 1], number, angleLabel);
        }
        final double t = timeUnit.toSi(rawTime);
        final double theta = angleUnit.toSi(rawAngle);
        if (!Double.isFinite(t) || !Double.isFinite(theta)) {
            throw new RecordFormatException(file, number, Double.isFinite(t) ? angleLabel : timeLabel,
                    InputMessage.VALUE_OUT_OF_RANGE.format());
        }
        if (out.size() > 0) {
            final double previous = out.lastTime();
            if (t == previous) {
                throw new RecordFormatException(file, number, timeLabel, InputMessage.DUPLICATE_TIMESTAMP.format(
                        out.lastLine(), SwingRecordReader.format(rawTime), timeUnit.symbol()));
            }
            if (t < previous) {
                throw new RecordFormatException(file, number, timeLabel, InputMessage.TIME_GOES_BACKWARDS.format(
                        SwingRecordReader.format(rawTime), timeUnit.symbol(), SwingRecordReader.format(timeUnit.fromSi(previous)),
                        timeUnit.symbol(), out.lastLine()));
            }
        }
        if (out.size() >= InputLimits.MAX_RECORD_SAMPLES) {
            throw new RecordFormatException(file, number, null, InputMessage.TOO_MANY_SAMPLES.format(
                    InputLimits.MAX_RECORD_SAMPLES));
        }
        out.add(t, theta, number);
    }

    private void requireWidth(int fields, int number) throws RecordFormatException {
        if (headerWidth > 0 && fields > headerWidth) {
            throw new RecordFormatException(file, number, null, InputMessage.FIELD_COUNT_MISMATCH.format(fields,
                    headerWidth, decimal == '.' && delimiter == ',' ? " (a decimal comma in a comma-separated file?)" : ""));
        }
        if (fields < needed) {
            final String missing = timeField >= fields ? timeLabel : angleLabel;
            throw new RecordFormatException(file, number, missing, InputMessage.FIELDS_MISSING.format(fields,
                    fields == 1 ? "" : "s", fields == 1 ? " (is the delimiter right?)" : ""));
        }
    }

    private double cell(String line, int from, int to, int number, String label) throws RecordFormatException {
        final double v = NumberCell.parse(line, from, to, decimal);
        if (!Double.isNaN(v)) {
            return v;
        }
        final String text = line.substring(from, to);
        if (text.isBlank()) {
            throw new RecordFormatException(file, number, label, InputMessage.EMPTY_SAMPLE.format());
        }
        if (NumberCell.namesNonFinite(text)) {
            throw new RecordFormatException(file, number, label, InputMessage.NOT_A_FINITE_NUMBER.format(text));
        }
        final char other = decimal == '.' ? ',' : '.';
        final String hint = text.indexOf(other) >= 0 ? " (the decimal separator is '" + decimal + "')" : "";
        throw new RecordFormatException(file, number, label, InputMessage.SAMPLE_NOT_A_NUMBER.format(text, hint));
    }

    private static String label(ColumnChoice c) {
        return c.name() != null ? c.name() : String.valueOf(c.index());
    }
}
