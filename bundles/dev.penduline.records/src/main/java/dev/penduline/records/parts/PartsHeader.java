package dev.penduline.records.parts;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.units.SuffixedName;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.PlainText;
import dev.penduline.records.RecordFormatException;

/**
 * The header row of a parts list: which known column sits where, in which unit. Unknown columns
 * are ignored with a warning, but a name within a small edit distance of a known one is taken as
 * a typo and refused, since silently ignoring "lenght_m" would drop every length.
 */
final class PartsHeader {

    /** Where a known column is and how to read it. */
    record Slot(int index, String header, Unit unit) {
    }

    private final Map<PartsColumn, Slot> slots;
    private final List<String> warnings;
    private final int width;

    private PartsHeader(Map<PartsColumn, Slot> slots, List<String> warnings, int width) {
        this.slots = slots;
        this.warnings = warnings;
        this.width = width;
    }

    static PartsHeader parse(List<String> cells, String file, int line) throws RecordFormatException {
        final Map<PartsColumn, Slot> slots = new EnumMap<>(PartsColumn.class);
        final List<String> warnings = new ArrayList<>();
        for (int i = 0; i < cells.size(); i++) {
            final String header = cells.get(i);
            final String h = header.strip().toLowerCase(Locale.ROOT);
            if (h.isEmpty()) {
                warnings.add(file + ":" + line + ": column " + (i + 1) + " has no name and is ignored");
                continue;
            }
            final Slot slot = recognise(h, header, i, file, line);
            if (slot == null) {
                warnings.add(file + ":" + line + ": column '" + PlainText.visible(header)
                        + "' is not a parts-list column and is ignored");
                continue;
            }
            final PartsColumn column = columnOf(h);
            final Slot previous = slots.put(column, slot);
            if (previous != null) {
                throw new RecordFormatException(file, line, header,
                        InputMessage.SAME_VALUE_AS_COLUMN.format(previous.header()));
            }
        }
        requireColumns(slots, file, line);
        return new PartsHeader(slots, List.copyOf(warnings), cells.size());
    }

    Optional<Slot> slot(PartsColumn column) {
        return Optional.ofNullable(slots.get(column));
    }

    /** Number of cells in the header row. */
    int width() {
        return width;
    }

    List<String> warnings() {
        return warnings;
    }

    private static PartsColumn columnOf(String h) {
        final PartsColumn text = PartsColumn.byBase(h);
        if (text != null && text.isText()) {
            return text;
        }
        return PartsColumn.byBase(SuffixedName.parse(h).orElseThrow().base());
    }

    /** The slot for a recognised header, null for an unknown one, an exception for a near miss. */
    private static Slot recognise(String h, String header, int index, String file, int line)
            throws RecordFormatException {
        final PartsColumn bare = PartsColumn.byBase(h);
        if (bare != null && bare.isText()) {
            return new Slot(index, header, null);
        }
        if (bare != null) {
            throw new RecordFormatException(file, line, header, InputMessage.NEEDS_UNIT_SUFFIX.format(bare.canonicalName()));
        }
        final Optional<SuffixedName> split = SuffixedName.parse(h);
        if (split.isPresent()) {
            final PartsColumn c = PartsColumn.byBase(split.get().base());
            final Unit unit = split.get().unit();
            if (c != null && !c.isText()) {
                if (c.quantity() != unit.quantity()) {
                    throw new RecordFormatException(file, line, header, InputMessage.UNIT_OF_OTHER_QUANTITY.format(
                            unit.symbol(), unit.quantity().readableName(), c.base(), c.quantity().readableName(),
                            c.canonicalName()));
                }
                return new Slot(index, header, unit);
            }
            final String near = nearestBase(split.get().base(), unit);
            if (near != null) {
                throw typo(file, line, header, near + "_" + unit.suffix());
            }
        }
        for (PartsColumn c : PartsColumn.values()) {
            if (isNearMiss(h, c.canonicalName())) {
                throw typo(file, line, header, c.canonicalName());
            }
        }
        return null;
    }

    private static String nearestBase(String base, Unit unit) {
        for (PartsColumn c : PartsColumn.values()) {
            if (!c.isText() && c.quantity() == unit.quantity() && isNearMiss(base, c.base())) {
                return c.base();
            }
        }
        return null;
    }

    private static RecordFormatException typo(String file, int line, String header, String intended) {
        return new RecordFormatException(file, line, header,
                InputMessage.NOT_A_PARTS_COLUMN.format(intended));
    }

    /**
     * A near miss is at most two edits away, and at most one for names of five letters or fewer,
     * so that short unrelated names ("note" against "name") are not taken for typos.
     */
    static boolean isNearMiss(String written, String known) {
        final int limit = known.length() <= 5 ? 1 : 2;
        final int d = editDistance(written, known);
        return d > 0 && d <= limit;
    }

    /** Optimal-string-alignment distance: insertions, deletions, substitutions, adjacent swaps. */
    static int editDistance(String a, String b) {
        final int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                final int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }

    private static void requireColumns(Map<PartsColumn, Slot> slots, String file, int line)
            throws RecordFormatException {
        final List<String> missing = new ArrayList<>();
        for (PartsColumn c : List.of(PartsColumn.NAME, PartsColumn.SHAPE, PartsColumn.X, PartsColumn.Y, PartsColumn.Z)) {
            if (!slots.containsKey(c)) {
                missing.add("'" + c.canonicalName() + "'");
            }
        }
        if (!slots.containsKey(PartsColumn.MASS) && !slots.containsKey(PartsColumn.DENSITY)) {
            missing.add("'" + PartsColumn.MASS.canonicalName() + "' (or '" + PartsColumn.DENSITY.canonicalName() + "')");
        }
        if (!missing.isEmpty()) {
            throw new RecordFormatException(file, line, null, InputMessage.MISSING_COLUMNS.format(
                    missing.size() > 1 ? "s" : "", String.join(", ", missing)));
        }
    }
}
