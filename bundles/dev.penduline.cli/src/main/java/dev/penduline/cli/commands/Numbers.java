package dev.penduline.cli.commands;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

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
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e7) {
            return new BigDecimal(v).round(SIX).stripTrailingZeros().toPlainString();
        }
        // 3.83297e-06 rather than 0.00000383297 or 3.83297E-6
        String[] parts = String.format(Locale.ROOT, "%.5e", v).split("e");
        String mantissa = parts[0].contains(".") ? parts[0].replaceAll("0+$", "").replaceAll("\\.$", "") : parts[0];
        return mantissa + "e" + parts[1];
    }
}
