package dev.penduline.records.swing;

/**
 * Parses a plain decimal number straight from a slice of a line, with either '.' or ',' as the
 * decimal separator, without creating a String for the common case.
 *
 * <p>Grammar: {@code [+-]? (digits [sep digits?] | sep digits) ([eE] [+-]? digits)?}. Java's
 * own parser would also take "NaN", "Infinity", hexadecimal and a trailing 'd'; those are
 * refused here (NaN is returned and the caller explains why).
 *
 * <p>Exactness: when the significand has at most 15 digits and the power of ten is at most 22
 * in magnitude, both are exact doubles and one multiplication or division gives the correctly
 * rounded result (W. D. Clinger, "How to read floating point numbers accurately", PLDI 1990);
 * anything else falls back to {@link Double#parseDouble}.
 */
final class NumberCell {

    private static final double[] POWERS = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POWERS.length; i++) {
            POWERS[i] = p;
            p *= 10;
        }
    }

    private NumberCell() {
    }

    /** The number in {@code text[from, to)}, or NaN when it is not a plain decimal number. */
    static double parse(CharSequence text, int from, int to, char decimal) {
        int i = from;
        if (i >= to) {
            return Double.NaN;
        }
        boolean negative = false;
        char c = text.charAt(i);
        if (c == '+' || c == '-') {
            negative = c == '-';
            i++;
        }
        long significand = 0;
        int digits = 0;
        int exponent = 0;
        boolean any = false;
        boolean point = false;
        for (; i < to; i++) {
            c = text.charAt(i);
            if (c >= '0' && c <= '9') {
                any = true;
                if (significand == 0 && c == '0') {
                    if (point) {
                        exponent--;
                    }
                    continue;
                }
                if (digits < 18) {
                    significand = significand * 10 + (c - '0');
                    digits++;
                    if (point) {
                        exponent--;
                    }
                } else {
                    digits++;
                    if (!point) {
                        exponent++;
                    }
                }
            } else if (c == decimal && !point) {
                point = true;
            } else {
                break;
            }
        }
        if (!any) {
            return Double.NaN;
        }
        if (i < to && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
            i++;
            boolean negativeExponent = false;
            if (i < to && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
                negativeExponent = text.charAt(i) == '-';
                i++;
            }
            int e = 0;
            boolean expDigits = false;
            for (; i < to && text.charAt(i) >= '0' && text.charAt(i) <= '9'; i++) {
                expDigits = true;
                e = Math.min(100_000, e * 10 + (text.charAt(i) - '0'));
            }
            if (!expDigits) {
                return Double.NaN;
            }
            exponent += negativeExponent ? -e : e;
        }
        if (i != to) {
            return Double.NaN;
        }
        if (significand == 0) {
            return negative ? -0.0 : 0.0;
        }
        double value;
        if (digits <= 15 && Math.abs(exponent) <= 22) {
            value = exponent >= 0 ? significand * POWERS[exponent] : significand / POWERS[-exponent];
        } else {
            value = Double.parseDouble(text.subSequence(from, to).toString().replace(decimal, '.'));
            return value;
        }
        return negative ? -value : value;
    }

    /** Whether the text names a non-finite value ("NaN", "inf", "-Infinity", ...). */
    static boolean namesNonFinite(String text) {
        final String t = text.strip().toLowerCase(java.util.Locale.ROOT).replaceFirst("^[+-]", "");
        return t.equals("nan") || t.equals("inf") || t.equals("infinity") || t.equals("∞");
    }
}
