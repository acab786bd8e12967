package dev.penduline.ui.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/**
 * How the views print numbers: six significant digits without trailing zeros, as the command
 * line does, so that a value read off a view and off a report agree digit for digit.
 */
public final class Figures {

    private Figures() {
    }

    /**
     * Six significant digits, plain notation between 1e-4 and 1e7.
     *
     * @param v the value (any unit)
     * @return the text; "n/a" for a value that is not finite
     */
    public static String significant(double v) {
        return digits(v, 6);
    }

    /**
     * A given number of significant digits, plain notation between 1e-4 and 1e7.
     *
     * @param v      the value (any unit)
     * @param digits significant digits (1 to 17)
     * @return the text; "n/a" for a value that is not finite
     */
    public static String digits(double v, int digits) {
        if (!Double.isFinite(v)) {
            return "n/a";
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(digits)).stripTrailingZeros();
        double a = Math.abs(v);
        return a >= 1e-4 && a < 1e7 ? d.toPlainString() : d.toString();
    }

    /**
     * An uncertainty: two significant digits are all it carries.
     *
     * @param v the uncertainty (any unit)
     * @return the text; "n/a" for a value that is not finite
     */
    public static String uncertainty(double v) {
        return digits(v, 2);
    }

    /**
     * A fixed number of decimals.
     *
     * @param v        the value (any unit)
     * @param decimals digits after the point
     * @return the text; "n/a" for a value that is not finite
     */
    public static String fixed(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "n/a";
    }

    /**
     * A ratio as a percentage with one decimal ("12.3 %").
     *
     * @param ratio the ratio (dimensionless, 1 = 100 %)
     * @return the text; "n/a" for a value that is not finite
     */
    public static String percent(double ratio) {
        return Double.isFinite(ratio) ? String.format(Locale.ROOT, "%.1f %%", 100 * ratio) : "n/a";
    }
}
