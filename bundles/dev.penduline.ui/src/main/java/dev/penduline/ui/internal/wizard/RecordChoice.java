package dev.penduline.ui.internal.wizard;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.ColumnChoice;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.ui.internal.chart.ChartSubject;
import dev.penduline.ui.internal.chart.SwingChartContent;

/**
 * One record in the import wizard: the file, what the user overrode of its mapping (blank: let
 * the reader detect it, as {@code analyze} does), and what reading it with that mapping gave —
 * the record and its detected layout, or the reader's message.
 */
final class RecordChoice {

    /** The time units a record may be written in ("" detects it from the header). */
    static final List<String> TIME_UNITS = List.of("", Unit.SECOND.suffix(), Unit.MILLISECOND.suffix(),
            Unit.MICROSECOND.suffix());
    /** The angle units a record may be written in ("" detects it from the header). */
    static final List<String> ANGLE_UNITS = List.of("", Unit.RADIAN.suffix(), Unit.DEGREE.suffix(),
            Unit.ENCODER_COUNT.suffix());

    private final Path file;
    private String name;
    private String timeColumn = "";
    private String angleColumn = "";
    private String timeUnit = "";
    private String angleUnit = "";
    private String counts = "";
    private SwingRecord record;
    private String error;

    RecordChoice(Path file) {
        this.file = file;
        this.name = file.getFileName().toString().replaceFirst("\\.[^.]*$", "");
    }

    Path file() {
        return file;
    }

    String name() {
        return name;
    }

    void name(String n) {
        name = n;
    }

    String timeColumn() {
        return timeColumn;
    }

    String angleColumn() {
        return angleColumn;
    }

    String timeUnit() {
        return timeUnit;
    }

    String angleUnit() {
        return angleUnit;
    }

    String counts() {
        return counts;
    }

    /**
     * Sets the overrides ("" for each one to detect) and reads the record again with them.
     *
     * @param time       the time column (a header name or a 1-based number)
     * @param angle      the angle column
     * @param tUnit      the time unit's suffix
     * @param aUnit      the angle unit's suffix
     * @param perRev     the counts per revolution
     */
    void mapping(String time, String angle, String tUnit, String aUnit, String perRev) {
        timeColumn = time.trim();
        angleColumn = angle.trim();
        timeUnit = tUnit;
        angleUnit = aUnit;
        counts = perRev.trim();
        read();
    }

    /** Reads the record with the current overrides. */
    void read() {
        record = null;
        try {
            record = SessionRecords.read(file, options());
            error = null;
        } catch (InputException e) {
            error = e.getMessage();
        } catch (IllegalArgumentException e) {
            error = file.getFileName() + ": " + e.getMessage();
        }
    }

    /**
     * The reader's options for the overrides.
     *
     * @return the options
     * @throws IllegalArgumentException naming the field when an override is not valid
     */
    SwingImportOptions options() {
        SwingImportOptions o = SwingImportOptions.defaults();
        if (!timeColumn.isEmpty()) {
            o = o.withTimeColumn(column(timeColumn, "time column"));
        }
        if (!angleColumn.isEmpty()) {
            o = o.withAngleColumn(column(angleColumn, "angle column"));
        }
        if (!timeUnit.isEmpty()) {
            o = o.withTimeUnit(unit(timeUnit));
        }
        if (!angleUnit.isEmpty()) {
            o = o.withAngleUnit(unit(angleUnit));
        }
        if (!counts.isEmpty()) {
            double c;
            try {
                c = Double.parseDouble(counts);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("counts per revolution: '" + counts + "' is not a number", e);
            }
            o = o.withCountsPerRevolution(c);
        }
        return o;
    }

    private static Unit unit(String suffix) {
        return Unit.forSuffix(suffix).orElseThrow(() -> new IllegalArgumentException("'" + suffix + "' is not a unit"));
    }

    private static ColumnChoice column(String text, String field) {
        if (text.matches("\\d+")) {
            int n = Integer.parseInt(text);
            if (n < 1) {
                throw new IllegalArgumentException(field + ": columns are numbered from 1");
            }
            return ColumnChoice.byIndex(n);
        }
        return ColumnChoice.byName(text);
    }

    /** @return the record as read, empty when it could not be read */
    Optional<SwingRecord> record() {
        return Optional.ofNullable(record);
    }

    /** @return the reader's message when it could not be read */
    Optional<String> error() {
        return Optional.ofNullable(error);
    }

    /** @return the layout the reader assumed ({@code analyze}'s "assumed:" lines), empty when unread */
    List<String> assumed() {
        return record == null ? List.of() : record.assumptions();
    }

    /**
     * What to plot: the record with its turning points, release and stop.
     *
     * @param mechanism the mechanism, for the period check
     * @return the content
     */
    SwingChartContent content(Optional<MechanismSource> mechanism) {
        if (record == null) {
            return SwingChartContent.failed(String.valueOf(file.getFileName()), error == null ? "not read" : error);
        }
        return ChartSubject.ofRecord(name + " (" + file.getFileName() + ")", record, mechanism, List.of());
    }

    /** @return a short state for the list: samples read, or the error */
    String state() {
        if (record != null) {
            return record.size() + " samples";
        }
        return error == null ? "not read" : "cannot be read";
    }
}
