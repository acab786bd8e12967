package dev.penduline.physics.units;

import java.util.Comparator;
import java.util.Locale;
import java.util.Optional;

/**
 * A column name split into what it measures and the unit it is written in:
 * {@code "ixx_g_mm2"} is the base {@code "ixx"} in g·mm², {@code "time_ms"} the base
 * {@code "time"} in ms.
 *
 * <p>The longest unit suffix wins, so {@code "rate_deg_s"} is a rate in °/s, not a
 * {@code "rate_deg"} in seconds. Names are compared in lower case.
 *
 * @param base the part before the unit suffix, lower case (e.g. "mass", "inner_radius")
 * @param unit the unit the suffix names
 */
public record SuffixedName(String base, Unit unit) {

    /**
     * Splits a column name; the base must not be empty.
     *
     * @param columnName the column name as written in a file header
     * @return the split name, or empty when the name carries no known unit suffix
     */
    public static Optional<SuffixedName> parse(String columnName) {
        if (columnName == null) {
            return Optional.empty();
        }
        final String name = columnName.strip().toLowerCase(Locale.ROOT);
        return Unit.all().stream()
                .filter(u -> name.endsWith("_" + u.suffix()) && name.length() > u.suffix().length() + 1)
                .max(Comparator.comparingInt(u -> u.suffix().length()))
                .map(u -> new SuffixedName(name.substring(0, name.length() - u.suffix().length() - 1), u));
    }

    /**
     * The column name written with the same base and another unit.
     *
     * @param other the unit
     * @return e.g. {@code "mass_kg"} for base "mass" and the kilogram
     */
    public String nameIn(Unit other) {
        return base + "_" + other.suffix();
    }

    /**
     * Copy whose encoder-count unit knows its counts per revolution.
     *
     * @param countsPerRevolution counts per full turn
     * @return the copy; unchanged when the unit is not encoder counts
     */
    public SuffixedName withCountsPerRevolution(double countsPerRevolution) {
        return unit.suffix().equals(Unit.ENCODER_COUNT.suffix())
                ? new SuffixedName(base, Unit.encoderCounts(countsPerRevolution)) : this;
    }
}
