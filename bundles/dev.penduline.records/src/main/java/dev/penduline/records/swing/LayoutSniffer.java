package dev.penduline.records.swing;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.units.Quantity;
import dev.penduline.physics.units.SuffixedName;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.DelimitedLine;
import dev.penduline.records.PlainText;
import dev.penduline.records.RecordFormatException;

/**
 * Decides, from the first lines of a record, what the user did not say: delimiter, decimal
 * separator, header, columns and units. Each decision is written down as an assumption.
 */
final class LayoutSniffer {

    /** A line kept for sniffing, with its 1-based number. */
    record SampleLine(String text, int number) {
    }

    private static final Set<String> TIME_NAMES = Set.of("time", "t", "timestamp", "elapsed", "seconds", "sec", "zeit");
    private static final Set<String> ANGLE_NAMES = Set.of("angle", "theta", "θ", "phi", "position", "pos", "encoder",
            "deflection", "winkel", "rotation");
    private static final Set<String> COUNT_NAMES = Set.of("counts", "count", "ticks", "encoder_counts");
    /** "time (s)", "angle [deg]", "t[ms]". */
    private static final Pattern BRACKETED = Pattern.compile("(.*?)\\s*[\\(\\[]\\s*([^\\)\\]]+?)\\s*[\\)\\]]\\s*");

    /** Why a comma cannot be both the delimiter and the decimal separator. */
    static final String DECIMAL_IS_DELIMITER = InputMessage.DECIMAL_IS_DELIMITER.format();

    private LayoutSniffer() {
    }

    static SwingRecordMapping decide(List<SampleLine> lines, SwingImportOptions o, String file, List<String> assumptions)
            throws RecordFormatException {
        if (lines.isEmpty()) {
            throw new RecordFormatException(file, 0, null, InputMessage.NO_DATA_LINES.format());
        }
        final char delimiter = o.delimiter() != null ? o.delimiter() : delimiter(lines, file, assumptions);
        final List<String> first = DelimitedLine.split(lines.get(0).text(), delimiter, file, lines.get(0).number());
        final char decimal = o.decimalSeparator() != null ? o.decimalSeparator()
                : decimal(lines, delimiter, assumptions);
        if (decimal == delimiter) {
            throw new RecordFormatException(file, lines.get(0).number(), null, DECIMAL_IS_DELIMITER);
        }
        boolean header;
        if (o.header() != null) {
            header = o.header();
        } else {
            header = first.stream().anyMatch(f -> Double.isNaN(NumberCell.parse(f, 0, f.length(), decimal)));
            assumptions.add(header ? "line " + lines.get(0).number() + " is a header row (it holds text)"
                    : "no header row: the first line holds numbers only");
        }
        final int headerLine = lines.get(0).number();
        if (header) {
            requireDistinctNames(first, file, headerLine);
        }
        final ColumnChoice time = column(o.timeColumn(), header ? first : null, TIME_NAMES, Set.of(), 1, -1, "time",
                file, headerLine, assumptions);
        final ColumnChoice angle = column(o.angleColumn(), header ? first : null, ANGLE_NAMES, COUNT_NAMES, 2,
                time.index(), "angle", file, headerLine, assumptions);
        if (time.index() == angle.index()) {
            throw new RecordFormatException(file, headerLine, time.label(), InputMessage.BOTH_TIME_AND_ANGLE.format());
        }
        for (ColumnChoice c : List.of(time, angle)) {
            final Optional<String> bad = c.name() == null ? Optional.empty() : PlainText.nameProblem(c.name());
            if (bad.isPresent()) {
                throw new RecordFormatException(file, headerLine, null, InputMessage.BAD_COLUMN_NAME.format(c.index(),
                        bad.get()));
            }
        }
        final Unit timeUnit = unit(o.timeUnit(), time, Quantity.TIME, Unit.SECOND, file, headerLine, assumptions);
        Unit angleUnit = o.angleUnit();
        if (angleUnit == null) {
            final boolean countsByName = angle.name() != null
                    && COUNT_NAMES.contains(angle.name().strip().toLowerCase(Locale.ROOT));
            if (countsByName) {
                angleUnit = Unit.ENCODER_COUNT;
                assumptions.add("angle column '" + angle.label() + "' is in encoder counts (from its name)");
            } else if (headerUnit(angle).isEmpty() && !Double.isNaN(o.countsPerRevolution())) {
                angleUnit = Unit.ENCODER_COUNT;
                assumptions.add("angle column '" + angle.label() + "' is in encoder counts (counts per revolution given)");
            } else {
                angleUnit = unit(null, angle, Quantity.ANGLE, Unit.DEGREE, file, headerLine, assumptions);
            }
        }
        double cpr = Double.NaN;
        if (angleUnit.suffix().equals(Unit.ENCODER_COUNT.suffix())) {
            if (Double.isNaN(o.countsPerRevolution())) {
                throw new RecordFormatException(file, headerLine, angle.label(), InputMessage.COUNTS_NEED_CPR.format());
            }
            cpr = o.countsPerRevolution();
            angleUnit = Unit.encoderCounts(cpr);
        }
        return new SwingRecordMapping(delimiter, decimal, header, time, angle, timeUnit, angleUnit, cpr);
    }

    private static char delimiter(List<SampleLine> lines, String file, List<String> assumptions)
            throws RecordFormatException {
        for (char c : new char[] {'\t', ';', ','}) {
            final int count = count(lines.get(0).text(), c);
            if (count == 0) {
                continue;
            }
            int agreeing = 0;
            for (SampleLine l : lines) {
                if (count(l.text(), c) == count) {
                    agreeing++;
                }
            }
            // most lines, not all: a broken line among the first ones is reported by the parser with its number
            if (agreeing >= 0.8 * lines.size()) {
                assumptions.add("delimiter " + name(c) + " (" + count + " per line on " + agreeing + " of the first "
                        + lines.size() + " lines)");
                return c;
            }
        }
        throw new RecordFormatException(file, lines.get(0).number(), null, InputMessage.UNKNOWN_DELIMITER.format());
    }

    private static char decimal(List<SampleLine> lines, char delimiter, List<String> assumptions) {
        if (delimiter == ',') {
            assumptions.add("decimal separator '.' (the comma delimits fields)");
            return '.';
        }
        for (SampleLine l : lines) {
            final String t = l.text();
            for (int i = 1; i + 1 < t.length(); i++) {
                if (Character.isDigit(t.charAt(i - 1)) && Character.isDigit(t.charAt(i + 1))) {
                    if (t.charAt(i) == ',') {
                        assumptions.add("decimal separator ',' (as in line " + l.number() + ")");
                        return ',';
                    }
                    if (t.charAt(i) == '.') {
                        assumptions.add("decimal separator '.' (as in line " + l.number() + ")");
                        return '.';
                    }
                }
            }
        }
        assumptions.add("decimal separator '.' (no decimals seen in the first lines)");
        return '.';
    }

    /** Two columns of one name would make a choice by name silently take one of them. */
    private static void requireDistinctNames(List<String> header, String file, int line) throws RecordFormatException {
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i).strip();
            for (int j = i + 1; j < header.size() && !name.isEmpty(); j++) {
                if (header.get(j).strip().equalsIgnoreCase(name)) {
                    throw new RecordFormatException(file, line, header.get(j).strip(), InputMessage.SAME_COLUMN_NAME.format(i + 1,
                            j + 1));
                }
            }
        }
    }

    private static ColumnChoice column(ColumnChoice given, List<String> header, Set<String> names, Set<String> alsoNames,
            int fallback, int taken, String what, String file, int line, List<String> assumptions)
            throws RecordFormatException {
        if (given != null && given.name() != null) {
            if (header == null) {
                throw new RecordFormatException(file, line, null, InputMessage.COLUMN_BY_NAME_NO_HEADER.format(what,
                        given.name()));
            }
            for (int i = 0; i < header.size(); i++) {
                if (header.get(i).strip().equalsIgnoreCase(given.name().strip())) {
                    return new ColumnChoice(header.get(i), i + 1);
                }
            }
            throw new RecordFormatException(file, line, null, InputMessage.NO_COLUMN_NAMED.format(given.name(),
                    String.join(", ", header)));
        }
        if (given != null) {
            final int width = header != null ? header.size() : Integer.MAX_VALUE;
            if (given.index() > width) {
                throw new RecordFormatException(file, line, null, InputMessage.COLUMN_NUMBER_TOO_HIGH.format(what,
                        given.index(), width));
            }
            return new ColumnChoice(header != null ? header.get(given.index() - 1) : null, given.index());
        }
        if (header != null) {
            for (int i = 0; i < header.size(); i++) {
                final String base = baseName(header.get(i));
                if (i + 1 != taken && (names.contains(base) || alsoNames.contains(base))) {
                    assumptions.add(what + " column: '" + header.get(i) + "' (column " + (i + 1) + ", from its name)");
                    return new ColumnChoice(header.get(i), i + 1);
                }
            }
        }
        int index = fallback;
        if (index == taken) {
            index = taken == 1 ? 2 : 1;
        }
        assumptions.add(what + " column: number " + index + (header != null && index <= header.size()
                ? " ('" + header.get(index - 1) + "')" : "") + ", by position (no " + what + " name recognised)");
        return new ColumnChoice(header != null && index <= header.size() ? header.get(index - 1) : null, index);
    }

    private static Unit unit(Unit given, ColumnChoice column, Quantity quantity, Unit fallback, String file, int line,
            List<String> assumptions) throws RecordFormatException {
        if (given != null) {
            return given;
        }
        final Optional<Unit> named = headerUnit(column);
        if (named.isPresent()) {
            if (named.get().quantity() != quantity) {
                throw new RecordFormatException(file, line, column.label(), InputMessage.NOT_A_UNIT_OF.format(
                        named.get().symbol(), quantity.readableName()));
            }
            assumptions.add(quantity.readableName() + " in " + named.get().symbol() + " (from the header '"
                    + column.label() + "')");
            return named.get();
        }
        assumptions.add(quantity.readableName() + " in " + fallback.symbol() + ": no unit in the "
                + (column.name() != null ? "header '" + column.label() + "'" : "file") + "; set the "
                + quantity.readableName() + " unit if this is wrong");
        return fallback;
    }

    /** The unit a header names by suffix ("time_ms") or in brackets ("angle (deg)"). */
    static Optional<Unit> headerUnit(ColumnChoice column) {
        if (column.name() == null) {
            return Optional.empty();
        }
        final Matcher m = BRACKETED.matcher(column.name().strip());
        if (m.matches()) {
            final String u = m.group(2).strip().toLowerCase(Locale.ROOT);
            final String suffix = switch (u) {
                case "°", "degrees", "degree" -> "deg";
                case "µs", "μs" -> "us";
                case "sec", "seconds" -> "s";
                case "radians" -> "rad";
                default -> u;
            };
            return Unit.forSuffix(suffix);
        }
        return SuffixedName.parse(column.name()).map(SuffixedName::unit);
    }

    private static String baseName(String header) {
        final String h = header.strip().toLowerCase(Locale.ROOT);
        final Matcher m = BRACKETED.matcher(h);
        if (m.matches()) {
            return m.group(1).strip();
        }
        return SuffixedName.parse(h).map(SuffixedName::base).orElse(h);
    }

    private static int count(String text, char c) {
        int n = 0;
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == c) {
                n++;
            }
        }
        return n;
    }

    private static String name(char c) {
        return c == '\t' ? "tab" : "'" + c + "'";
    }
}
