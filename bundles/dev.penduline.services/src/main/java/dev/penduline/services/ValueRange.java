package dev.penduline.services;

import java.util.Locale;

/**
 * What a number a user gives may be: a range with open or closed ends, and whether it must be
 * whole. One rule, and one way of saying it, for the command line's options and the settings of
 * the user's defaults file.
 *
 * @param low      the smallest value
 * @param lowOpen  true when {@code low} itself is refused
 * @param high     the largest value
 * @param highOpen true when {@code high} itself is refused
 * @param whole    true when only whole numbers make sense (counts, iterations, seeds)
 */
public record ValueRange(double low, boolean lowOpen, double high, boolean highOpen, boolean whole) {

    /**
     * Whether a value passes.
     *
     * @param v the value
     * @return true when inside the range (and whole when required)
     */
    public boolean accepts(double v) {
        boolean lowOk = lowOpen ? v > low : v >= low;
        boolean highOk = highOpen ? v < high : v <= high;
        return lowOk && highOk && (!whole || v == Math.rint(v));
    }

    /**
     * Why a value that does not pass is refused.
     *
     * @param v the value
     * @return {@code "is not a whole number"} or {@code "is out of range"}
     */
    public String refusal(double v) {
        return whole && v != Math.rint(v) ? "is not a whole number" : "is out of range";
    }

    /**
     * The range in words, e.g. {@code "a value above 0 and at most 100 m/s²"}.
     *
     * @param unit the unit as the user sees it, empty when dimensionless
     * @return the description
     */
    public String describe(String unit) {
        String u = unit.isEmpty() ? "" : unit.startsWith("°") ? unit : " " + unit;
        String lo = (lowOpen ? "above " : "from ") + number(low);
        String hi = (highOpen ? "below " : "at most ") + number(high);
        String kind = whole ? "a whole number " : "a value ";
        if (low == -high && lowOpen == highOpen) {
            return kind + (highOpen ? "strictly between " : "between ") + number(low) + " and " + number(high) + u;
        }
        return kind + lo + " and " + hi + u;
    }

    private static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e7) {
            return String.valueOf((long) v);
        }
        String e = String.format(Locale.ROOT, "%.0e", v);
        if (Double.parseDouble(e) == v) {
            return e.replace("e+0", "e").replace("e+", "e");
        }
        return String.format(Locale.ROOT, "%.3g", v);
    }
}
