package dev.penduline.services.present;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * How Penduline writes a number for a person to read: a report line, a table cell, a status
 * message. One rule for the command line and the workbench, so a figure read off a view and off a
 * report agree digit for digit. Machine output ({@code --json}, CSV) never goes through here: it
 * keeps the full precision of a {@code double}.
 *
 * <h2>A value with its standard uncertainty</h2>
 * {@link #measured(double, double)} follows JCGM 100:2008 (the GUM) §7.2.6: the uncertainty is
 * quoted to two significant digits and the value is rounded to the same decimal place, so that
 * y = 10.057 62 Ω with u = 27 mΩ reads {@code 10.058 ± 0.027}. The uncertainty is rounded to the
 * nearest digit, never up (the GUM allows rounding up for final results; our uncertainties are
 * estimates themselves, and the nearest digit is the honest figure). The reports say next to the
 * figures that ± means one standard uncertainty, because the GUM (§7.2.2) warns that a bare ± is
 * often read as a confidence interval.
 *
 * <h2>Notation</h2>
 * Let m be the larger magnitude of what is printed (|value| or u after rounding). The figure is
 * written in plain decimal notation when 0.001 ≤ m &lt; 1000, and also when m ≥ 1000 as long as
 * its last digit sits at the units place or to the right of it (no zero stands in for a digit that
 * was rounded away). Otherwise a power of ten that is a multiple of three is factored out, chosen
 * so that the mantissa of m lies in [1, 1000): the exponent then names an SI prefix (e-3 milli,
 * e-6 micro, e3 kilo), the way an engineer's calculator shows it. With an uncertainty the factor
 * is common to both numbers and the pair is put in parentheses, so the unit after it applies to
 * both:
 * <pre>
 *   measured(0.0119584, 3.83297e-6)  → 0.0119584 ± 0.0000038
 *   measured(5.0e-4, 3.83297e-6)     → (500.0 ± 3.8)e-6
 *   measured(123456.0, 350.0)        → (123.46 ± 0.35)e3
 *   measured(9.96, 0.0996)           → 9.96 ± 0.10      (the uncertainty carries to 0.10)
 *   significant(3.83297e-6)          → 3.833e-6
 *   significant(0.000383297)         → 383.3e-6
 *   significant(12345.0)             → 12.35e3
 *   significant(2.0)                 → 2.000
 * </pre>
 * Trailing zeros are significant and kept ({@code 2.000}, {@code 0.10}): the number of digits
 * says how well the figure is known.
 *
 * <h2>Rounding and special values</h2>
 * Rounding is half-up on the shortest decimal that reads back as the same {@code double} (what
 * {@link Double#toString(double)} prints), so 0.125 rounds to 0.13 as on paper; the binary
 * representation's tail never decides a tie. A value that is not finite prints {@value #NOT_AVAILABLE};
 * a value whose uncertainty is unknown (NaN) or zero prints alone, to {@link #digits()}
 * significant digits; an infinite uncertainty (the data do not determine the value) prints as
 * {@code ± ∞}. A value that rounds to zero prints without a sign. Everything is independent of
 * the default locale.
 *
 * <h2>Display precision</h2>
 * A figure without an uncertainty has {@value #DEFAULT_DIGITS} significant digits unless the
 * user's defaults ({@code significant_digits} in {@link dev.penduline.services.Defaults}) ask for
 * another number: the workbench applies them at start and on every change of its preferences, the
 * command line with {@code --use-preferences} for the duration of one command
 * ({@link #useDigits(int)}). Uncertainties keep their two digits.
 */
public final class Figures {

    /** What a figure that is not a finite number prints as. */
    public static final String NOT_AVAILABLE = "n/a";

    /** Significant digits of a figure without an uncertainty. */
    public static final int DEFAULT_DIGITS = 4;

    /** Significant digits of an uncertainty (GUM §7.2.6). */
    public static final int UNCERTAINTY_DIGITS = 2;

    private static final BigDecimal PLAIN_FROM = new BigDecimal("0.001");

    private static final BigDecimal PLAIN_BELOW = new BigDecimal("1000");

    /** The digits of {@link #significant(double)}: one setting for the process (one user's display). */
    private static volatile int digits = DEFAULT_DIGITS;

    private Figures() {
    }

    /**
     * The significant digits a figure without an uncertainty is written with now.
     *
     * @return {@value #DEFAULT_DIGITS} unless {@link #useDigits(int)} set another number
     */
    public static int digits() {
        return digits;
    }

    /**
     * Sets the significant digits of {@link #significant(double)} for the whole process (the
     * user's display precision); a caller that sets it for a while restores the value it returns.
     *
     * @param count significant digits, 1 to 17
     * @return the number used before
     * @throws IllegalArgumentException when {@code count} is outside 1 to 17
     */
    public static int useDigits(int count) {
        if (count < 1 || count > 17) {
            throw new IllegalArgumentException("significant digits must be 1 to 17, not " + count);
        }
        int before = digits;
        digits = count;
        return before;
    }

    /**
     * A figure without an uncertainty, to {@link #digits()} significant digits
     * ({@value #DEFAULT_DIGITS} unless the user's defaults say otherwise).
     *
     * @param v the value (any unit)
     * @return the text; {@value #NOT_AVAILABLE} when {@code v} is not finite
     */
    public static String significant(double v) {
        return significant(v, digits);
    }

    /**
     * A figure without an uncertainty, to a given number of significant digits.
     *
     * @param v      the value (any unit)
     * @param digits significant digits, 1 to 17
     * @return the text; {@value #NOT_AVAILABLE} when {@code v} is not finite; {@code 0} for zero
     */
    public static String significant(double v, int digits) {
        if (digits < 1 || digits > 17) {
            throw new IllegalArgumentException("significant digits must be 1 to 17, not " + digits);
        }
        if (!Double.isFinite(v)) {
            return NOT_AVAILABLE;
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal r = roundSignificant(BigDecimal.valueOf(v), digits);
        int k = exponent(r.abs(), r.scale());
        return mantissa(r, k) + suffix(k);
    }

    /**
     * A value with its standard uncertainty: {@code value ± u}, the uncertainty to two significant
     * digits and the value to the same decimal place; {@code (value ± u)eK} when a power of ten is
     * factored out (see the class comment).
     *
     * @param value the estimate (any unit)
     * @param u     its standard uncertainty (same unit, ≥ 0); NaN or 0 when unknown
     * @return the text; {@value #NOT_AVAILABLE} when the value is not finite
     * @throws IllegalArgumentException when {@code u} is negative
     */
    public static String measured(double value, double u) {
        checkUncertainty(u);
        if (!Double.isFinite(value)) {
            return NOT_AVAILABLE;
        }
        if (u == Double.POSITIVE_INFINITY) {
            return significant(value) + " ± ∞";
        }
        if (Double.isNaN(u) || u == 0) {
            return significant(value);
        }
        BigDecimal ru = roundSignificant(BigDecimal.valueOf(u), UNCERTAINTY_DIGITS);
        BigDecimal rv = BigDecimal.valueOf(value).setScale(ru.scale(), RoundingMode.HALF_UP);
        int k = exponent(rv.abs().max(ru), ru.scale());
        String pair = mantissa(rv, k) + " ± " + mantissa(ru, k);
        return k == 0 ? pair : "(" + pair + ")" + suffix(k);
    }

    /**
     * The value alone, rounded to the decimal place of its uncertainty as {@link #measured} would
     * print it, for a table whose uncertainty stands in a column of its own
     * ({@link #uncertainty(double)}). Its notation is chosen for the value alone.
     *
     * @param value the estimate (any unit)
     * @param u     its standard uncertainty (same unit, ≥ 0); NaN, 0 or infinite when unusable
     * @return the text; {@value #NOT_AVAILABLE} when the value is not finite
     * @throws IllegalArgumentException when {@code u} is negative
     */
    public static String value(double value, double u) {
        checkUncertainty(u);
        if (!Double.isFinite(value)) {
            return NOT_AVAILABLE;
        }
        if (!Double.isFinite(u) || u == 0) {
            return significant(value);
        }
        BigDecimal ru = roundSignificant(BigDecimal.valueOf(u), UNCERTAINTY_DIGITS);
        BigDecimal rv = BigDecimal.valueOf(value).setScale(ru.scale(), RoundingMode.HALF_UP);
        // a value that rounds to zero takes the uncertainty's notation: 0.0e-6, not 0.0000000
        int k = exponent(rv.signum() == 0 ? ru : rv.abs(), rv.scale());
        return mantissa(rv, k) + suffix(k);
    }

    /**
     * An uncertainty on its own, to two significant digits (GUM §7.2.6).
     *
     * @param u the standard uncertainty (any unit, ≥ 0)
     * @return the text; {@code ∞} when {@code u} is infinite, {@value #NOT_AVAILABLE} when it is NaN
     * @throws IllegalArgumentException when {@code u} is negative
     */
    public static String uncertainty(double u) {
        checkUncertainty(u);
        return u == Double.POSITIVE_INFINITY ? "∞" : significant(u, UNCERTAINTY_DIGITS);
    }

    /**
     * A fixed number of decimals, plain notation, rounded half-up: for figures whose resolution is
     * set by what they mean rather than by their size (AIC differences, a share of a whole).
     *
     * @param v        the value (any unit)
     * @param decimals digits after the point, ≥ 0
     * @return the text; {@value #NOT_AVAILABLE} when {@code v} is not finite
     */
    public static String fixed(double v, int decimals) {
        if (decimals < 0) {
            throw new IllegalArgumentException("decimals must be zero or more, not " + decimals);
        }
        if (!Double.isFinite(v)) {
            return NOT_AVAILABLE;
        }
        return BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
    }

    /**
     * A ratio as a percentage with one decimal: {@code 0.1234 → "12.3 %"}.
     *
     * @param ratio the ratio (dimensionless, 1 = 100 %)
     * @return the text; {@value #NOT_AVAILABLE} when {@code ratio} is not finite
     */
    public static String percent(double ratio) {
        return percent(ratio, 1);
    }

    /**
     * A ratio as a percentage with a given number of decimals, a space before the sign as SI
     * writing has it: {@code percent(0.1234, 0) → "12 %"}.
     *
     * @param ratio    the ratio (dimensionless, 1 = 100 %)
     * @param decimals digits after the point, ≥ 0
     * @return the text; {@value #NOT_AVAILABLE} when {@code ratio} is not finite
     */
    public static String percent(double ratio, int decimals) {
        String f = fixed(100 * ratio, decimals);
        return Double.isFinite(ratio) ? f + " %" : f;
    }

    private static void checkUncertainty(double u) {
        if (u < 0) {
            throw new IllegalArgumentException("a standard uncertainty is never negative, got " + u);
        }
    }

    /**
     * Rounds a non-zero decimal to a number of significant digits, half-up, keeping trailing zeros
     * (0.0996 → 0.10, not 0.1).
     */
    private static BigDecimal roundSignificant(BigDecimal x, int digits) {
        // x = unscaled · 10^-scale with precision() digits: its leading digit sits at 10^lead.
        int lead = x.precision() - x.scale() - 1;
        BigDecimal r = x.setScale(digits - 1 - lead, RoundingMode.HALF_UP);
        if (r.precision() > digits) {
            // 9.96 → 10.0: the carry added a digit in front; drop the last one (a zero).
            r = r.setScale(r.scale() - 1, RoundingMode.UNNECESSARY);
        }
        return r;
    }

    /**
     * The power of ten to factor out: 0 for plain notation, else a multiple of three that puts
     * the mantissa of {@code m} in [1, 1000).
     *
     * @param m     the larger magnitude printed, ≥ 0
     * @param scale the decimal place of the last printed digit, as {@link BigDecimal#scale()}
     */
    private static int exponent(BigDecimal m, int scale) {
        if (m.signum() == 0) {
            return 0;
        }
        boolean plain = m.compareTo(PLAIN_FROM) >= 0 && (m.compareTo(PLAIN_BELOW) < 0 || scale >= 0);
        if (plain) {
            return 0;
        }
        int lead = m.precision() - m.scale() - 1;
        return Math.floorDiv(lead, 3) * 3;
    }

    private static String mantissa(BigDecimal x, int k) {
        // BigDecimal has no negative zero: a negative value rounded to zero prints as "0.00"
        return x.movePointLeft(k).toPlainString();
    }

    private static String suffix(int k) {
        return k == 0 ? "" : "e" + k;
    }
}
