package dev.penduline.cli.commands;

import java.math.BigDecimal;
import java.math.MathContext;

/** Number formatting for readable reports: six significant digits, no trailing zeros. */
final class Numbers {

    private static final MathContext SIX = new MathContext(6);

    private Numbers() {
    }

    /**
     * Formats a value with six significant digits, plain notation between 1e-4 and 1e7.
     *
     * @param v the value
     * @return the text, "n/a" for non-finite values
     */
    static String significant(double v) {
        if (!Double.isFinite(v)) {
            return "n/a";
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(SIX).stripTrailingZeros();
        double a = Math.abs(v);
        return a >= 1e-4 && a < 1e7 ? d.toPlainString() : d.toString();
    }
}
