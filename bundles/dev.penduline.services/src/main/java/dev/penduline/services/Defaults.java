package dev.penduline.services;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.math.BigDecimal;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.records.PlainText;

/**
 * The defaults a user sets once, shared by the workbench and the command line: local gravity,
 * the verdict margin of a fit, the settle band of predictions, the number of resampling refits
 * and the significant digits of a displayed figure. They live in one plain file per user,
 * {@link #location()} ({@code ${XDG_CONFIG_HOME:-~/.config}/penduline/defaults.properties}),
 * written by the workbench's preference page and read by the workbench always and by the
 * command line only with {@code --use-preferences}. Headless: no SWT, no OSGi preference
 * service, so the command line reads it as it is.
 *
 * <p>The file is a plain subset of a Java properties file: one {@code key = value} per line
 * ({@code :} may stand for {@code =}), {@code #} or {@code !} comment lines, blank lines; no line
 * continuations or escapes. A key that is missing takes its built-in value; an unknown or repeated
 * key, or a value outside its range, is an error naming the file, the line and the key. A file
 * that does not exist means the built-in defaults. Saving replaces the whole file atomically
 * ({@link AtomicFileWrite}), comments included.
 *
 * @param gravity           local gravitational acceleration for mechanisms that do not state
 *                          their own (parts lists, lumped properties, new mechanism files), m/s²
 * @param verdictMargin     lead in percentage points of the energy lost that one loss needs over
 *                          the next for the fit to call it dominant
 * @param settleBand        half-width of the settle band about the hanging equilibrium, degrees
 * @param resamples         block-bootstrap refits of a fit (0 turns the resampling off)
 * @param significantDigits significant digits of a displayed figure without an uncertainty
 */
public record Defaults(double gravity, double verdictMargin, double settleBand, int resamples, int significantDigits) {

    /** The file's name inside the configuration folder. */
    public static final String FILE_NAME = "defaults.properties";

    /** The system property that names another configuration folder (tests, portable setups). */
    public static final String CONFIG_DIR_PROPERTY = "penduline.config.dir";

    /** The largest file read (a defaults file is a few hundred bytes). */
    public static final int MAX_FILE_BYTES = 64 * 1024;

    /**
     * The built-in defaults: standard gravity 9.80665 m/s², the fit's verdict margin of 15
     * percentage points and its 40 resamples ({@link FitSettings#defaults()}), a settle band of
     * ±1°, and four significant digits.
     */
    public static final Defaults BUILT_IN = new Defaults(MechanismProperties.STANDARD_GRAVITY,
            100 * FitSettings.defaults().verdictMargin(), 1, FitSettings.defaults().resamples(), 4);

    /** One setting: its key in the file and the values it accepts. */
    public enum Key {
        /** Local gravity, above 0 and at most 100 m/s² (standard gravity is 9.80665 m/s²). */
        GRAVITY("gravity_m_s2", 0, true, 100, false, false, "m/s²"),
        /** The verdict margin, from 0 to below 100 percentage points. */
        VERDICT_MARGIN("verdict_margin_pp", 0, false, 100, true, false, "percentage points"),
        /** The settle band's half-width, above 0 and at most 90°. */
        SETTLE_BAND("settle_band_deg", 0, true, 90, false, false, "°"),
        /** Resampling refits, a whole number from 0 to 1000. */
        RESAMPLES("resamples", 0, false, 1000, false, true, ""),
        /** Significant digits, a whole number from 2 to 10 (an uncertainty keeps its two, GUM §7.2.6). */
        SIGNIFICANT_DIGITS("significant_digits", 2, false, 10, false, true, "");

        private final String key;
        private final ValueRange range;
        private final String unit;

        Key(String key, double low, boolean lowOpen, double high, boolean highOpen, boolean whole, String unit) {
            this.key = key;
            this.range = new ValueRange(low, lowOpen, high, highOpen, whole);
            this.unit = unit;
        }

        /**
         * The key as written in the file.
         *
         * @return the key, e.g. {@code gravity_m_s2}
         */
        public String key() {
            return key;
        }

        /**
         * The values accepted.
         *
         * @return the range
         */
        public ValueRange range() {
            return range;
        }

        /**
         * The unit as a user reads it.
         *
         * @return the unit, empty when dimensionless
         */
        public String unit() {
            return unit;
        }

        /**
         * The range in words, e.g. {@code "a value above 0 and at most 100 m/s²"}.
         *
         * @return the description
         */
        public String describe() {
            return range.describe(unit);
        }

        /**
         * Reads a value as a user typed it.
         *
         * @param text the text
         * @return the value
         * @throws IllegalArgumentException naming the key, what was typed and what is accepted
         */
        public double parse(String text) {
            String t = text.strip();
            double v;
            try {
                v = t.isEmpty() ? Double.NaN : Double.parseDouble(t);
            } catch (NumberFormatException e) {
                v = Double.NaN;
            }
            if (!Double.isFinite(v)) {
                throw new InvalidValueException(key + ": '" + shown(t) + "' is not a number: give " + describe());
            }
            check(v, t);
            return v;
        }

        /**
         * This setting's value in a set of defaults.
         *
         * @param d the defaults
         * @return the value
         */
        public double of(Defaults d) {
            return switch (this) {
                case GRAVITY -> d.gravity();
                case VERDICT_MARGIN -> d.verdictMargin();
                case SETTLE_BAND -> d.settleBand();
                case RESAMPLES -> d.resamples();
                case SIGNIFICANT_DIGITS -> d.significantDigits();
            };
        }

        /**
         * The value as the file writes it: the shortest decimal that reads back the same.
         *
         * @param d the defaults
         * @return the text, e.g. {@code 9.80665}, {@code 15}, {@code 40}
         */
        public String text(Defaults d) {
            return plain(of(d));
        }

        private void check(double v, String typed) {
            if (!range.accepts(v)) {
                throw new InvalidValueException(key + ": '" + shown(typed) + "' " + range.refusal(v) + ": give " + describe());
            }
        }

        /**
         * The setting of a key as written in the file.
         *
         * @param key the key
         * @return the setting, or empty for an unknown key
         */
        public static Optional<Key> named(String key) {
            for (Key k : values()) {
                if (k.key.equals(key)) {
                    return Optional.of(k);
                }
            }
            return Optional.empty();
        }
    }

    /**
     * Checks every value.
     *
     * @throws IllegalArgumentException naming the key of the first value outside its range
     */
    public Defaults {
        Key.GRAVITY.check(gravity, plain(gravity));
        Key.VERDICT_MARGIN.check(verdictMargin, plain(verdictMargin));
        Key.SETTLE_BAND.check(settleBand, plain(settleBand));
        Key.RESAMPLES.check(resamples, plain(resamples));
        Key.SIGNIFICANT_DIGITS.check(significantDigits, plain(significantDigits));
    }

    /**
     * A copy with one setting changed.
     *
     * @param key   the setting
     * @param value its new value (checked)
     * @return the copy
     * @throws IllegalArgumentException naming the key when the value is outside its range
     */
    public Defaults with(Key key, double value) {
        Map<Key, Double> v = values();
        key.check(value, plain(value));
        v.put(key, value);
        return of(v);
    }

    /**
     * The fit's settings with these defaults' resampling count and verdict margin; every other
     * setting (seed, parallelism, misfit ratio, limits) is kept.
     *
     * @param base the settings to start from, usually {@link FitSettings#defaults()}
     * @return the settings
     */
    public FitSettings applyTo(FitSettings base) {
        return base.withResampling(resamples, base.seed(), base.parallel())
                .withVerdictRules(verdictMargin / 100, base.misfitRatio());
    }

    /**
     * The per-user file: {@code DIR/defaults.properties} where DIR is the system property
     * {@value #CONFIG_DIR_PROPERTY} when set, else {@code $XDG_CONFIG_HOME/penduline} when that
     * is an absolute path, else {@code ~/.config/penduline}.
     *
     * @return the file (it need not exist)
     */
    public static Path location() {
        return location(System.getProperty(CONFIG_DIR_PROPERTY), System.getenv("XDG_CONFIG_HOME"),
                System.getProperty("user.home"));
    }

    /**
     * The per-user file for given settings of the environment (for tests of the rule).
     *
     * @param configDir     the value of {@value #CONFIG_DIR_PROPERTY}, or null
     * @param xdgConfigHome the value of {@code XDG_CONFIG_HOME}, or null
     * @param home          the user's home folder
     * @return the file
     */
    public static Path location(String configDir, String xdgConfigHome, String home) {
        if (configDir != null && !configDir.isBlank()) {
            return Path.of(configDir).resolve(FILE_NAME);
        }
        // the XDG base directory rule: a relative XDG_CONFIG_HOME is invalid and ignored
        Path base = xdgConfigHome != null && !xdgConfigHome.isBlank() && Path.of(xdgConfigHome).isAbsolute()
                ? Path.of(xdgConfigHome)
                : Path.of(home, ".config");
        return base.resolve("penduline").resolve(FILE_NAME);
    }

    /**
     * Reads the per-user file, {@link #location()}.
     *
     * @return the defaults; {@link #BUILT_IN} when there is no file
     * @throws InputException naming the file, line and key of a bad entry
     */
    public static Defaults read() throws InputException {
        return read(location());
    }

    /**
     * Reads a defaults file.
     *
     * @param file the file
     * @return the defaults; the built-in value for every key the file leaves out, and
     *         {@link #BUILT_IN} when the file does not exist
     * @throws InputException naming the file, line and key of a bad entry, or why the file
     *                        cannot be read (not a regular file, too large, not UTF-8)
     */
    public static Defaults read(Path file) throws InputException {
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS) && !Files.exists(file)) {
            return BUILT_IN;
        }
        ReadableFiles.require(file, "a defaults file (key = value lines)");
        String text;
        try {
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                throw new InputException(file + ": " + size + " bytes is too large for a defaults file (at most "
                        + MAX_FILE_BYTES + ")");
            }
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(Files.readAllBytes(file)))
                    .toString();
        } catch (CharacterCodingException e) {
            throw new InputException(file + ": not UTF-8 text: save it as UTF-8", e);
        } catch (IOException e) {
            throw ReadableFiles.problem(file, e);
        }
        return parse(file, text);
    }

    private static Defaults parse(Path file, String text) throws InputException {
        Map<Key, Double> v = BUILT_IN.values();
        Map<Key, Integer> seen = new EnumMap<>(Key.class);
        String[] lines = text.split("\r?\n|\r", -1);
        for (int i = 0; i < lines.length; i++) {
            int lineNumber = i + 1;
            String line = lines[i].strip();
            if (i == 0 && line.startsWith("\uFEFF")) {
                line = line.substring(1).strip();
            }
            if (line.isEmpty() || line.startsWith("#") || line.startsWith("!")) {
                continue;
            }
            String where = file + ":" + lineNumber + ": ";
            int sep = separator(line);
            if (sep < 0) {
                throw new InputException(where + "'" + shown(line) + "' is not a 'key = value' line; keys: " + keyList());
            }
            String name = line.substring(0, sep).strip();
            Optional<Key> key = Key.named(name);
            if (key.isEmpty()) {
                throw new InputException(where + "unknown key '" + shown(name) + "'; keys: " + keyList());
            }
            Integer earlier = seen.put(key.get(), lineNumber);
            if (earlier != null) {
                throw new InputException(where + name + ": given again (first on line " + earlier + ")");
            }
            try {
                v.put(key.get(), key.get().parse(line.substring(sep + 1)));
            } catch (InvalidValueException e) {
                throw new InputException(where + e.getMessage(), e);
            }
        }
        return of(v);
    }

    private static int separator(String line) {
        int eq = line.indexOf('=');
        int colon = line.indexOf(':');
        if (eq < 0) {
            return colon;
        }
        return colon < 0 ? eq : Math.min(eq, colon);
    }

    /**
     * Writes these defaults to a file, atomically: the old file stays whole until the new one
     * replaces it. Missing folders are created.
     *
     * @param file the file
     * @return notes for the user (a temporary file of an interrupted save removed), possibly empty
     * @throws IOException naming the file and the reason; the old file is then unchanged
     */
    public List<String> write(Path file) throws IOException {
        return write(file, AtomicFileWrite.REAL);
    }

    /**
     * Writes these defaults to a file through the given file system (a test's seam: a full disk,
     * a failed rename).
     *
     * @param file the file
     * @param disk the file-system steps
     * @return notes for the user, possibly empty
     * @throws IOException naming the file and the reason; the old file is then unchanged
     */
    public List<String> write(Path file, AtomicFileWrite.Disk disk) throws IOException {
        try {
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            return AtomicFileWrite.write(file, out -> {
                Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
                w.write(text());
                w.flush();
            }, disk);
        } catch (IOException e) {
            throw new IOException(file + ": cannot be saved (" + AtomicFileWrite.reason(e) + ")", e);
        }
    }

    /**
     * The file's content for these defaults: a comment saying what the file is, then every key.
     *
     * @return the text, LF line ends
     */
    public String text() {
        StringBuilder b = new StringBuilder();
        b.append("# Penduline defaults: read by the workbench, and by the command line with --use-preferences.\n");
        b.append("# One 'key = value' a line; a key left out takes its built-in value. Saving rewrites this file.\n");
        for (Key k : Key.values()) {
            b.append(k.key()).append(" = ").append(k.text(this)).append('\n');
        }
        return b.toString();
    }

    private Map<Key, Double> values() {
        Map<Key, Double> v = new EnumMap<>(Key.class);
        for (Key k : Key.values()) {
            v.put(k, k.of(this));
        }
        return v;
    }

    private static Defaults of(Map<Key, Double> v) {
        return new Defaults(v.get(Key.GRAVITY), v.get(Key.VERDICT_MARGIN), v.get(Key.SETTLE_BAND),
                (int) Math.rint(v.get(Key.RESAMPLES)), (int) Math.rint(v.get(Key.SIGNIFICANT_DIGITS)));
    }

    private static String keyList() {
        List<String> names = new ArrayList<>();
        for (Key k : Key.values()) {
            names.add(k.key());
        }
        return String.join(", ", names);
    }

    private static String plain(double v) {
        if (!Double.isFinite(v)) {
            return String.valueOf(v).toLowerCase(Locale.ROOT);
        }
        String s = BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    private static String shown(String raw) {
        String s = PlainText.visible(raw.strip());
        return s.length() > 40 ? s.substring(0, 37) + "..." : s;
    }
}
