package dev.penduline.cli;

import java.util.Map;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.services.ValueRange;

/**
 * The one table of what every numeric option accepts: its range, whether it must be a whole
 * number, its unit, and a hint that helps a user who typed something outside it. Every number read
 * through {@link Arguments} is checked here, so a value that would only fail deep inside a
 * computation (gravity 0, a negative resample count, a release beyond the upright) is refused at
 * the edge with the option's name.
 *
 * <p>The ranges are what a pivoted mechanism on a test rig can physically be, with generous
 * margins; they are not engineering limits of any product.
 */
public final class OptionRules {

    /**
     * What one option accepts.
     *
     * @param low       the smallest value
     * @param lowOpen   true when {@code low} itself is refused
     * @param high      the largest value
     * @param highOpen  true when {@code high} itself is refused
     * @param whole     true when only whole numbers make sense (counts, iterations, seeds)
     * @param unit      the unit as the user sees it, empty when dimensionless
     * @param hint      what helps a user who typed something outside the range, or empty
     */
    public record Rule(double low, boolean lowOpen, double high, boolean highOpen, boolean whole, String unit, String hint) {

        /**
         * Whether a value passes.
         *
         * @param v the value
         * @return true when inside the range (and whole when required)
         */
        public boolean accepts(double v) {
            return range().accepts(v);
        }

        /**
         * The range in words, e.g. {@code "above 0 and at most 100 m/s²"}.
         *
         * @return the description
         */
        public String describe() {
            return range().describe(unit);
        }

        /**
         * The range alone, as the user's defaults file checks its settings too.
         *
         * @return the range
         */
        public ValueRange range() {
            return new ValueRange(low, lowOpen, high, highOpen, whole);
        }
    }

    private static final String FRICTION_HINT = "friction coefficients are zero or positive, in SI units";

    private static final Map<String, Rule> RULES = Map.ofEntries(
            Map.entry("gravity", open(0, 100, "m/s²", "standard gravity is 9.80665 m/s²")),
            Map.entry("mass", open(0, 1e6, "kg", "")),
            Map.entry("centroid-distance", open(0, 1e3, "m", "the distance from the pivot axis to the centroid")),
            Map.entry("pivot-inertia", open(0, 1e9, "kg·m²", "the inertia about the pivot axis")),
            Map.entry("theta0-deg", symmetricOpen(180, "°", "angles are measured from the hanging equilibrium; 180° is the upright")),
            Map.entry("release-angle-deg", symmetricOpen(180, "°",
                    "angles are measured from the hanging equilibrium; 180° is the upright")),
            Map.entry("omega0-deg-s", closed(-1e5, 1e5, "°/s", "")),
            Map.entry(FrictionTerm.VISCOUS.word(), closed(0, 1e9, FrictionTerm.VISCOUS.unit(), FRICTION_HINT)),
            Map.entry(FrictionTerm.COULOMB.word(), closed(0, 1e9, FrictionTerm.COULOMB.unit(), FRICTION_HINT)),
            Map.entry(FrictionTerm.STICTION.word(), closed(0, 1e9, FrictionTerm.STICTION.unit(), FRICTION_HINT)),
            Map.entry(FrictionTerm.DRAG.word(), closed(0, 1e9, FrictionTerm.DRAG.unit(), FRICTION_HINT)),
            Map.entry("band-deg", new Rule(0, true, 90, false, false, "°", "the half-width of the settle band about the hanging"
                    + " equilibrium")),
            Map.entry("at-deg", symmetricOpen(180, "°", "angles are measured from the hanging equilibrium; 180° is the upright")),
            Map.entry("radius-m", closed(0, 1e3, "m", "the distance of the point of interest from the pivot axis")),
            Map.entry("settle-within-s", new Rule(0, true, 1e5, false, false, "s", "the time within which the swing must settle"
                    + " inside --band-deg")),
            Map.entry("draws", new Rule(0, false, 10_000, false, true, "", "how many sets are drawn; in predict 0 turns the bands off")),
            Map.entry("duration", new Rule(0, true, 1e5, false, false, "s", "")),
            Map.entry("rate", new Rule(0, true, 1e6, false, false, "Hz", "")),
            Map.entry("offset-deg", closed(-360, 360, "°", "")),
            Map.entry("noise-deg", closed(0, 90, "°", "the standard deviation of the sensor noise")),
            Map.entry("still-s", closed(0, 3600, "s", "")),
            Map.entry("counts-per-rev", new Rule(0, false, 1e9, false, true, "counts per revolution",
                    "an encoder's counts per revolution, after any quadrature multiplication; 0 in demo-record: no encoder")),
            Map.entry("seed", new Rule(-9.007199254740992e15, false, 9.007199254740992e15, false, true, "", "")),
            Map.entry("resamples", new Rule(0, false, 1_000, false, true, "", "0 turns the resampling off; above 200 adds little")),
            Map.entry("max-iterations", new Rule(1, false, 10_000, false, true, "", "")),
            Map.entry("count", new Rule(1, false, 100_000, false, true, "", "how many records to make")),
            Map.entry("spread", closed(0, 1000, "%", "the spread of the drawn friction about the values given")),
            Map.entry("jobs", new Rule(1, false, 1024, false, true, "", "how many units are fitted at once")),
            Map.entry("verdict-margin", new Rule(0, false, 100, true, false, "percentage points", "")));

    private OptionRules() {
    }

    private static Rule open(double low, double high, String unit, String hint) {
        return new Rule(low, true, high, false, false, unit, hint);
    }

    private static Rule closed(double low, double high, String unit, String hint) {
        return new Rule(low, false, high, false, false, unit, hint);
    }

    private static Rule symmetricOpen(double bound, String unit, String hint) {
        return new Rule(-bound, true, bound, true, false, unit, hint);
    }

    /**
     * The rule of an option.
     *
     * @param option the option without dashes
     * @return the rule
     * @throws IllegalStateException when the option has no rule (a programming error: every
     *                               numeric option is listed here)
     */
    public static Rule of(String option) {
        Rule r = RULES.get(option);
        if (r == null) {
            throw new IllegalStateException("no rule for the numeric option --" + option);
        }
        return r;
    }

    /**
     * Checks a value against its option's rule.
     *
     * @param option the option without dashes
     * @param raw    what the user typed
     * @param value  the parsed value
     * @return the value
     * @throws UsageException naming the option, what was typed and what is accepted
     */
    public static double check(String option, String raw, double value) throws UsageException {
        Rule r = of(option);
        if (!r.accepts(value)) {
            throw new UsageException(InputMessage.OPTION_OUT_OF_RANGE, option, shown(raw), r.range().refusal(value),
                    r.describe(), r.hint().isEmpty() ? "" : " (" + r.hint() + ")");
        }
        return value;
    }

    /**
     * What the user typed, fit to be echoed in a message: stripped, at most 40 characters.
     *
     * @param raw the text as typed
     * @return the text to show
     */
    public static String shown(String raw) {
        String s = raw.strip();
        return s.length() > 40 ? s.substring(0, 37) + "..." : s;
    }
}
