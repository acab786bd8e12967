package dev.penduline.physics;

import java.util.Locale;

import org.hipparchus.exception.Localizable;

/**
 * The texts of the user errors the readers and the command line's option checks give, in one
 * place so they can be reviewed and translated, as Hipparchus keeps its own in
 * {@code LocalizedCoreFormats}. Each key holds a {@link java.util.Formatter} pattern (English, the
 * source text); {@link #format(Object...)} fills it with {@link Locale#ROOT} numbers. A translation
 * is a UTF-8 properties file {@code assets/dev/penduline/physics/InputMessage_LANG.utf8} beside the
 * class, a key per line (Hipparchus' {@link Localizable} finds it; without one the source text is
 * used).
 *
 * <p>The place (file, line, column) is not part of these texts: the exception that carries one
 * ({@link UserInputException}) writes it in front.
 */
public enum InputMessage implements Localizable {

    // files as a whole
    NOT_A_REGULAR_FILE("not a regular file: %s; give the path of %s"),
    FILE_TOO_LARGE("the file is %s, more than the %s a %s may have (README, \"Limits\"); is it the right file? Split a longer "
            + "record into several, or record at a lower rate"),
    LOOKS_LIKE_UTF16("not UTF-8 text (looks like UTF-16): save the file as UTF-8"),
    LOOKS_LIKE_BINARY("not UTF-8 text (looks like binary data): is it the right file?"),
    NOT_UTF8_AT("not UTF-8 text at character %d (another encoding, e.g. Latin-1 or Windows-1252?): save the file as UTF-8"),
    LINE_TOO_LONG("the line is longer than %d characters, the limit for a line (README, \"Limits\"); it was not read further."
            + " Is this a binary file, or a file whose line breaks were lost?"),

    // delimited lines
    QUOTE_INSIDE_FIELD("a quote in the middle of field %d: quote the whole field and double any quote inside it"),
    TEXT_AFTER_QUOTE("text after the closing quote of field %d"),
    UNCLOSED_QUOTE("field %d opens a quote that is not closed on this line"),

    // parts lists
    COLUMN_NEEDED("column '%s' is needed %s, but the file has no such column"),
    EMPTY_BUT_NEEDED("empty, but it is needed %s"),
    CELL_NOT_A_NUMBER("'%s' is not a number"),
    CELL_TOO_LARGE("'%s' is out of range: at most %s %s in size (is the unit right?)"),
    CELL_NOT_POSITIVE("'%s' must be greater than zero"),
    CELL_NEGATIVE("'%s' must not be negative"),
    SAME_VALUE_AS_COLUMN("gives the same value as column '%s'; keep only one of them"),
    NEEDS_UNIT_SUFFIX("needs a unit suffix, e.g. '%s'"),
    UNIT_OF_OTHER_QUANTITY("%s is a unit of %s but %s is a %s; write e.g. '%s'"),
    NOT_A_PARTS_COLUMN("is not a parts-list column; did you mean '%s'?"),
    MISSING_COLUMNS("missing required column%s %s"),
    TOO_MANY_PARTS("the list has more than %d parts, the most a parts list may have (README, \"Limits\"); give identical parts"
            + " one line with a quantity, or lump small parts into one"),
    NO_HEADER_ROW("the file has no header row (and no parts)"),
    MORE_FIELDS_THAN_HEADER("the line has more fields than the header; quote fields that contain commas"),
    EMPTY_PART_NAME("empty: every part needs a name"),
    EMPTY_SHAPE("empty: use one of %s"),
    NOT_A_SHAPE("'%s' is not a shape: use one of %s"),
    EMPTY_AXIS("empty, but it is needed %s (x, y or z)"),
    INNER_RADIUS_TOO_LARGE("inner radius '%s' must be less than the radius '%s'"),
    MASS_AND_DENSITY("give either the mass or the density ('%s'), not both"),
    EMPTY_MASS("empty: give the part's mass (or its density)"),
    NO_VOLUME_FOR_DENSITY("a %s has no volume, so its mass cannot come from a density; give '%s' instead"),
    NOT_TRUE_OR_FALSE("'%s' is not true or false"),
    NOT_A_QUANTITY("'%s' is not a whole number from 1 to %d"),
    TENSOR_NOT_PHYSICAL("the inertia tensor is not physical: %s"),

    // swing records
    TOO_FEW_SAMPLES("only %d sample%s; a swing record needs at least %d"),
    ANGLE_NEVER_MOVES("the angle never moves: it stays within %s %s over all %d samples (is it the right column?)"),
    TIME_STEP_TOO_SHORT("the median time step is %s s, faster than any swing-test sampling (1 MHz at most, common "
            + "practice): check the time unit (--time-unit s, ms or us)"),
    NO_DATA_LINES("the file holds no data lines"),
    DECIMAL_IS_DELIMITER("the decimal separator ',' cannot also be the delimiter: a file with decimal commas separates its"
            + " fields by semicolons or tabs (delimiter semicolon or tab)"),
    BOTH_TIME_AND_ANGLE("chosen as both the time and the angle column"),
    BAD_COLUMN_NAME("the name of column %d %s: fix the header in a copy of the record, or choose the columns by position"),
    COUNTS_NEED_CPR("the angle is in encoder counts: give the counts per revolution (after quadrature decoding, e.g. 4096)"),
    UNKNOWN_DELIMITER("cannot tell the delimiter: no comma, semicolon or tab appears the same number of times on each of the"
            + " first lines; set the delimiter"),
    SAME_COLUMN_NAME("columns %d and %d have the same name: rename one in a copy of the record, or choose the columns by "
            + "position (--time-column N, --angle-column N)"),
    COLUMN_BY_NAME_NO_HEADER("the %s column is chosen by the name '%s', but the file has no header row: choose it by position"),
    NO_COLUMN_NAMED("no column named '%s'; the header has: %s"),
    COLUMN_NUMBER_TOO_HIGH("the %s column is number %d, but the header has only %d columns"),
    NOT_A_UNIT_OF("its unit '%s' is not a unit of %s"),
    VALUE_OUT_OF_RANGE("the value is out of range"),
    DUPLICATE_TIMESTAMP("duplicate timestamp: the same time as line %d (%s %s); remove the repeated sample"),
    TIME_GOES_BACKWARDS("time goes backwards: %s %s comes after %s %s on line %d; samples must be in time order"),
    TOO_MANY_SAMPLES("the record has more than %d samples, the most a record may have (README, \"Limits\"); it was not read "
            + "further. Split it into several records, or record at a lower rate"),
    FIELD_COUNT_MISMATCH("the line has %d fields but the header has %d%s"),
    FIELDS_MISSING("missing: the line has only %d field%s%s"),
    EMPTY_SAMPLE("empty: every data line needs a time and an angle"),
    NOT_A_FINITE_NUMBER("'%s' is not a finite number; remove the line or fill in the sample"),
    SAMPLE_NOT_A_NUMBER("'%s' is not a number%s"),

    // the command line's options
    OPTION_NEEDS_VALUE("option --%s needs a value"),
    UNKNOWN_OPTION("unknown option --%s%s"),
    OPTION_NOT_A_NUMBER("option --%s: '%s' is not a number: give %s"),
    OPTION_OUT_OF_RANGE("option --%s: '%s' %s: give %s%s"),
    OPTION_REQUIRED("option --%s is required");

    private final String source;

    InputMessage(String source) {
        this.source = source;
    }

    /** {@inheritDoc} */
    @Override
    public String getSourceString() {
        return source;
    }

    /** {@inheritDoc} */
    @Override
    public String getLocalizedString(Locale locale) {
        return getLocalizedString("assets/" + InputMessage.class.getName().replace('.', '/'), name(), locale);
    }

    /**
     * The source text with its values filled in.
     *
     * @param args the values, in the order of the pattern's conversions
     * @return the message
     */
    public String format(Object... args) {
        return String.format(Locale.ROOT, source, args);
    }

    /**
     * The text in a language, with its values filled in (the source text where no translation exists).
     *
     * @param locale the language
     * @param args   the values, in the order of the pattern's conversions
     * @return the message
     */
    public String format(Locale locale, Object... args) {
        return String.format(locale, getLocalizedString(locale), args);
    }
}
