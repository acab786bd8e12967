package dev.penduline.records.swing;

import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * An encoder's counts per revolution as a record's own comment lines (before its header) state
 * it — "4096 counts/rev", "counts per revolution: 4096", "counts_per_rev = 4096" — so that a record
 * that says how to read itself need not be told again.
 *
 * @param counts the counts per revolution stated
 * @param line   the line that states it
 */
record StatedCounts(double counts, int line) {

    private static final Pattern AFTER = Pattern.compile("(?i)(\\d+)\\s*counts?\\s*(?:/|per)\\s*rev(?:olution)?\\b");
    private static final Pattern BEFORE = Pattern.compile("(?i)counts?[ _]per[ _]rev(?:olution)?\\s*[:=]?\\s*(\\d+)");

    /**
     * Looks for a statement in a comment line.
     *
     * @param line   the line
     * @param number its number
     * @return the statement, or null when the line makes none
     */
    static StatedCounts find(String line, int number) {
        for (Pattern p : List.of(AFTER, BEFORE)) {
            Matcher m = p.matcher(line);
            if (m.find()) {
                double n = Double.parseDouble(m.group(1));
                if (n >= 4 && n <= 1e9) {
                    return new StatedCounts(n, number);
                }
            }
        }
        return null;
    }

    /**
     * The options with the stated counts when none were given, saying so.
     *
     * @param stated      the statement, or null
     * @param options     what the user said
     * @param assumptions where what was taken from the record is said
     * @return the options to read the record with
     */
    static SwingImportOptions apply(StatedCounts stated, SwingImportOptions options, List<String> assumptions) {
        if (stated == null) {
            return options;
        }
        if (Double.isNaN(options.countsPerRevolution())) {
            assumptions.add(String.format(Locale.ROOT, "%.0f encoder counts per revolution, as the record's line %d says",
                    stated.counts(), stated.line()));
            return options.withCountsPerRevolution(stated.counts());
        }
        if (options.countsPerRevolution() != stated.counts()) {
            assumptions.add(String.format(Locale.ROOT, "the record's line %d says %.0f counts per revolution; the %.0f given"
                    + " is used", stated.line(), stated.counts(), options.countsPerRevolution()));
        }
        return options;
    }
}
