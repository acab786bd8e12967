package dev.penduline.cli.commands;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.UsageException;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.ColumnChoice;
import dev.penduline.records.swing.SwingImportOptions;

/** The options that say how to read a swing record; anything not given is detected. */
final class RecordOptions {

    /** Options that take a value. */
    static final Set<String> VALUE_OPTIONS = Set.of("time-column", "angle-column", "time-unit", "angle-unit",
            "counts-per-rev", "delimiter", "decimal");

    /** Usage lines for the options. */
    static final String USAGE = """
              --time-column NAME|N     the time column, by header name or 1-based number
              --angle-column NAME|N    the angle column, by header name or 1-based number
              --time-unit s|ms|us      unit of the time column (default: from its name, else s)
              --angle-unit deg|rad|counts
                                       unit of the angle column (default: from its name, else deg)
              --counts-per-rev N       encoder counts per revolution (with counts)
              --delimiter comma|semicolon|tab, --decimal point|comma
                                       override the detected layout""";

    private RecordOptions() {
    }

    /**
     * The record options together with others.
     *
     * @param own further option names
     * @return all of them
     */
    static String[] with(String... own) {
        List<String> all = new ArrayList<>(VALUE_OPTIONS);
        all.addAll(List.of(own));
        return all.toArray(new String[0]);
    }

    /**
     * Whether any record option was given.
     *
     * @param a the arguments
     * @return true when at least one of the record options is present
     */
    static boolean anyGiven(Arguments a) {
        return VALUE_OPTIONS.stream().anyMatch(a::has);
    }

    /**
     * Builds the import options from the arguments.
     *
     * @param a the arguments
     * @return the options
     * @throws UsageException when a value is not understood
     */
    static SwingImportOptions from(Arguments a) throws UsageException {
        SwingImportOptions o = SwingImportOptions.defaults();
        try {
            if (a.has("time-column")) {
                o = o.withTimeColumn(column(a.value("time-column")));
            }
            if (a.has("angle-column")) {
                o = o.withAngleColumn(column(a.value("angle-column")));
            }
            if (a.has("time-unit")) {
                o = o.withTimeUnit(unit("time-unit", a.value("time-unit"), Set.of("s", "ms", "us")));
            }
            if (a.has("angle-unit")) {
                String v = a.value("angle-unit").toLowerCase(Locale.ROOT);
                if (v.equals("count")) {
                    v = "counts";
                }
                o = o.withAngleUnit(unit("angle-unit", v, Set.of("deg", "rad", "counts")));
            }
            if (a.has("counts-per-rev")) {
                long cpr = a.whole("counts-per-rev", 0);
                if (cpr < 4) {
                    throw new UsageException("option --counts-per-rev: '" + cpr + "' is out of range for a record: an encoder "
                            + "has at least 4 counts per revolution");
                }
                o = o.withCountsPerRevolution(cpr);
            }
            if (a.has("delimiter")) {
                o = o.withDelimiter(switch (a.value("delimiter").toLowerCase(Locale.ROOT)) {
                    case "comma", "," -> ',';
                    case "semicolon", ";" -> ';';
                    case "tab" -> '\t';
                    default -> throw new UsageException("--delimiter: '" + a.value("delimiter")
                            + "' is not comma, semicolon or tab");
                });
            }
            if (a.has("decimal")) {
                o = o.withDecimalSeparator(switch (a.value("decimal").toLowerCase(Locale.ROOT)) {
                    case "point", "." -> '.';
                    case "comma", "," -> ',';
                    default -> throw new UsageException("--decimal: '" + a.value("decimal") + "' is not point or comma");
                });
            }
        } catch (InvalidValueException e) {
            throw new UsageException(e.getMessage());
        }
        return o;
    }

    private static ColumnChoice column(String v) {
        return v.matches("\\d+") ? ColumnChoice.byIndex(Integer.parseInt(v)) : ColumnChoice.byName(v);
    }

    private static Unit unit(String option, String v, Set<String> allowed) throws UsageException {
        if (!allowed.contains(v)) {
            throw new UsageException("--" + option + ": '" + v + "' is not one of " + String.join(", ", allowed));
        }
        return Unit.forSuffix(v).orElseThrow(() -> new UsageException("--" + option + ": unknown unit '" + v + "'"));
    }
}
