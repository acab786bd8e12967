package dev.penduline.services.present;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

/**
 * The figures against the GUM's own worked examples (JCGM 100:2008) and, over many random values,
 * against {@link BigDecimal}'s rounding with a {@link MathContext}, which knows nothing of our
 * notation rule.
 */
class FiguresTest {

    private static final Pattern PAIR = Pattern.compile("^\\(?(-?[0-9.]+) ± ([0-9.]+)\\)?(?:e(-?[0-9]+))?$");

    private static final Pattern SINGLE = Pattern.compile("^(-?[0-9.]+)(?:e(-?[0-9]+))?$");

    @Test
    void theDisplayPrecisionChangesFiguresWithoutAnUncertaintyOnly() {
        int before = Figures.useDigits(6);
        try {
            assertEquals(6, Figures.digits());
            // pi to six significant digits, from memory: 3.14159
            assertEquals("3.14159", Figures.significant(Math.PI));
            assertEquals("2.00000", Figures.significant(2.0));
            assertEquals("3.14159", Figures.measured(Math.PI, Double.NaN));
            // the uncertainty keeps its two digits (JCGM 100:2008 §7.2.6)
            assertEquals("10.058 ± 0.027", Figures.measured(10.05762, 0.027));
            assertThrows(IllegalArgumentException.class, () -> Figures.useDigits(0));
        } finally {
            Figures.useDigits(before);
        }
        assertEquals(Figures.DEFAULT_DIGITS, Figures.digits());
        assertEquals("3.142", Figures.significant(Math.PI));
    }

    @Test
    void theGumRoundsTheEstimateToItsUncertainty() {
        // JCGM 100:2008 §7.2.6 (text checked against a published quotation): "if y = 10,057 62 Ω
        // with uc(y) = 27 mΩ, y should be rounded to 10,058 Ω".
        assertEquals("10.058 ± 0.027", Figures.measured(10.05762, 0.027));
        // §7.2.6: "u(xi) = 28,05 kHz should be rounded down to 28 kHz".
        assertEquals("28", Figures.uncertainty(28.05));
        // §7.2.6: "uc(y) = 10,47 mΩ might be rounded up to 11 mΩ" — the GUM allows it, we round to
        // the nearest digit (see the class comment), which gives 10 mΩ.
        assertEquals("10", Figures.uncertainty(10.47));
    }

    @Test
    void theGumsStandardWeightIsWrittenInTheValuePlusMinusForm() {
        // JCGM 100:2008 §7.2.2, from memory: "ms = 100,021 47 g with uc = 0,35 mg" may be written
        // "ms = 100,021 47(35) g"; our form is value ± u in one unit (grams here).
        assertEquals("100.02147 ± 0.00035", Figures.measured(100.02147, 0.00035));
        assertEquals("100.02147", Figures.value(100.02147, 0.00035));
    }

    @Test
    void smallMagnitudesTakeACommonPowerOfTenThatNamesAnSiPrefix() {
        // the fit report's viscous coefficient: the larger magnitude is 0.012, plain notation
        assertEquals("0.0119584 ± 0.0000038", Figures.measured(0.0119584, 3.83297e-6));
        assertEquals("-0.0119584 ± 0.0000038", Figures.measured(-0.0119584, 3.83297e-6));
        // below 0.001 a multiple-of-three exponent is factored out of both numbers
        assertEquals("(500.0 ± 3.8)e-6", Figures.measured(5.0e-4, 3.83297e-6));
        assertEquals("(602.214076 ± 0.000012)e21", Figures.measured(6.02214076e23, 1.2e16));
        // above 1000 only when a zero would stand in for a digit rounded away
        assertEquals("(123.46 ± 0.35)e3", Figures.measured(123456, 350));
        assertEquals("12345.6 ± 2.3", Figures.measured(12345.6, 2.3));
    }

    @Test
    void roundingCarriesOverIntoANewDigit() {
        // 0.0996 carries to 0.10: still two significant digits, now ending at the hundredths
        assertEquals("9.96 ± 0.10", Figures.measured(9.96, 0.0996));
        // 0.099 already has two significant digits: the value keeps three decimals
        assertEquals("9.960 ± 0.099", Figures.measured(9.96, 0.099));
        assertEquals("0.10", Figures.uncertainty(0.0995));
        // the value's carry: 9.99996 at the thousandths is 10.000
        assertEquals("10.000 ± 0.012", Figures.measured(9.99996, 0.012));
        // a carry across the plain threshold changes the notation
        assertEquals("0.001000", Figures.significant(0.00099996));
        assertEquals("999.9e-6", Figures.significant(0.00099994));
        assertEquals("10.00e3", Figures.significant(9999.6));
    }

    @Test
    void tiesRoundHalfUpOnTheDecimalThatWasWritten() {
        // common practice on paper; the double nearest 0.125 is exact, the one nearest 0.0985 is not,
        // and both round as written
        assertEquals("0.13", Figures.uncertainty(0.125));
        assertEquals("0.099", Figures.uncertainty(0.0985));
        assertEquals("2.346", Figures.significant(2.3455));
    }

    @Test
    void anUncertaintyLargerThanTheValueSetsThePlace() {
        assertEquals("0.5 ± 3.7", Figures.measured(0.5, 3.7));
        assertEquals("10 ± 340", Figures.measured(12, 340));
        assertEquals("0.00 ± 0.25", Figures.measured(0, 0.25));
        // a negative value that rounds to zero loses its sign
        assertEquals("0.00 ± 0.25", Figures.measured(-0.004, 0.25));
        assertEquals("(0.0 ± 3.7)e-6", Figures.measured(0, 3.7e-6));
        assertEquals("0.0e-6", Figures.value(1e-9, 3.7e-6));
    }

    @Test
    void withoutAKnownUncertaintyTheValueHasFourSignificantDigits() {
        assertEquals("0.01196", Figures.measured(0.0119584, 0));
        assertEquals("0.01196", Figures.measured(0.0119584, Double.NaN));
        assertEquals("0.01196", Figures.value(0.0119584, Double.NaN));
        assertEquals("0.01196 ± ∞", Figures.measured(0.0119584, Double.POSITIVE_INFINITY));
        assertEquals("∞", Figures.uncertainty(Double.POSITIVE_INFINITY));
    }

    @Test
    void whatIsNotANumberSaysSo() {
        assertEquals("n/a", Figures.measured(Double.NaN, 0.1));
        assertEquals("n/a", Figures.measured(Double.POSITIVE_INFINITY, 0.1));
        assertEquals("n/a", Figures.value(Double.NEGATIVE_INFINITY, 0.1));
        assertEquals("n/a", Figures.significant(Double.NaN));
        assertEquals("n/a", Figures.uncertainty(Double.NaN));
        assertEquals("n/a", Figures.fixed(Double.NaN, 2));
        assertEquals("n/a", Figures.percent(Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> Figures.measured(1, -0.1));
    }

    @Test
    void plainFiguresHaveAShortMantissa() {
        assertEquals("3.833e-6", Figures.significant(3.83297e-6));
        assertEquals("383.3e-6", Figures.significant(0.000383297));
        assertEquals("0.01196", Figures.significant(0.0119584));
        assertEquals("2.000", Figures.significant(2));
        assertEquals("-1235", Figures.significant(-1234.5));
        assertEquals("12.35e3", Figures.significant(12345));
        assertEquals("100.0e18", Figures.significant(1e20));
        assertEquals("179.8e306", Figures.significant(Double.MAX_VALUE));
        assertEquals("4.900e-324", Figures.significant(Double.MIN_VALUE));
        assertEquals("350", Figures.significant(345.67, 2));
        assertEquals("0", Figures.significant(0));
        assertEquals("0", Figures.significant(-0.0));
    }

    @Test
    void percentagesAndFixedDecimals() {
        assertEquals("12.3 %", Figures.percent(0.1234));
        assertEquals("12 %", Figures.percent(0.1234, 0));
        assertEquals("-0.50 %", Figures.percent(-0.005, 2));
        assertEquals("0", Figures.fixed(-0.001, 0));
        assertEquals("-51234.6", Figures.fixed(-51234.56, 1));
    }

    @Test
    void theDefaultLocaleChangesNothing() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals("0.0119584 ± 0.0000038", Figures.measured(0.0119584, 3.83297e-6));
            assertEquals("12.3 %", Figures.percent(0.1234));
            assertEquals("3.25", Figures.fixed(3.25, 2));
        } finally {
            Locale.setDefault(before);
        }
    }

    /**
     * Over many random values and uncertainties of all magnitudes: the printed uncertainty has
     * exactly two significant digits and equals BigDecimal's rounding of it (MathContext of two
     * digits, HALF_UP); the value's last digit sits at the uncertainty's last digit and the value
     * equals BigDecimal's rounding to that place; the notation follows the documented rule.
     */
    @Test
    void randomPairsAgreeWithBigDecimal() {
        Random random = new Random(20080901L);
        MathContext two = new MathContext(2, RoundingMode.HALF_UP);
        for (int n = 0; n < 20_000; n++) {
            double value = randomFigure(random, -15, 15);
            double u = Math.abs(value) * Math.pow(10, -9 + 12 * random.nextDouble());
            if (n % 10 == 0) {
                value = 0; // the uncertainty alone sets the scale
            }
            if (u == 0 || !Double.isFinite(u)) {
                continue;
            }
            if (value == 0) {
                u = Math.abs(randomFigure(random, -12, 12));
            }
            String text = Figures.measured(value, u);
            Matcher m = PAIR.matcher(text);
            assertTrue(m.matches(), value + " ± " + u + " -> " + text);
            int k = m.group(3) == null ? 0 : Integer.parseInt(m.group(3));
            BigDecimal shownValue = new BigDecimal(m.group(1));
            BigDecimal shownU = new BigDecimal(m.group(2));

            BigDecimal refU = BigDecimal.valueOf(u).round(two);
            int refLead = refU.precision() - refU.scale() - 1;
            int refLast = refLead - 1; // decimal exponent of the uncertainty's second digit
            BigDecimal refValue = BigDecimal.valueOf(value).setScale(-refLast, RoundingMode.HALF_UP);
            String what = value + " ± " + u + " -> " + text;
            assertEquals(0, shownU.scaleByPowerOfTen(k).compareTo(refU), what);
            assertEquals(0, shownValue.scaleByPowerOfTen(k).compareTo(refValue), what);
            // the last printed digit: the uncertainty's second digit, or the mantissa's units
            // when that digit lies further left (340 in "10 ± 340")
            int lastPlace = Math.min(refLast, k);
            assertEquals(lastPlace, k - shownU.scale(), "uncertainty's last digit " + what);
            assertEquals(lastPlace, k - shownValue.scale(), "value's last digit " + what);
            if (refLast <= k) {
                assertEquals(2, shownU.precision(), "two significant digits " + what);
            }
            checkNotation(refValue.abs().max(refU), -refLast, k, what);
        }
    }

    /** The same for figures without an uncertainty, 1 to 8 significant digits. */
    @Test
    void randomFiguresAgreeWithBigDecimal() {
        Random random = new Random(7262L);
        for (int n = 0; n < 20_000; n++) {
            double v = randomFigure(random, -20, 20);
            int digits = 1 + random.nextInt(8);
            String text = Figures.significant(v, digits);
            Matcher m = SINGLE.matcher(text);
            assertTrue(m.matches(), v + " -> " + text);
            int k = m.group(2) == null ? 0 : Integer.parseInt(m.group(2));
            BigDecimal shown = new BigDecimal(m.group(1));
            BigDecimal ref = BigDecimal.valueOf(v).round(new MathContext(digits, RoundingMode.HALF_UP));
            String what = v + " to " + digits + " digits -> " + text;
            assertEquals(0, shown.scaleByPowerOfTen(k).compareTo(ref), what);
            int refLast = ref.precision() - ref.scale() - 1 - (digits - 1);
            assertEquals(Math.min(refLast, k), k - shown.scale(), "last digit " + what);
            checkNotation(ref.abs(), -refLast, k, what);
        }
    }

    /**
     * A HALF_EVEN reference differs from ours only at an exact tie: the rule we chose (half-up)
     * is the only reason two careful roundings could disagree.
     */
    @Test
    void halfEvenDiffersOnlyAtTies() {
        Random random = new Random(1993L);
        MathContext even = new MathContext(2, RoundingMode.HALF_EVEN);
        int ties = 0;
        for (int n = 0; n < 20_000; n++) {
            // few digits make ties common
            double u = Double.parseDouble((1 + random.nextInt(999)) + "e" + (random.nextInt(9) - 6));
            BigDecimal written = BigDecimal.valueOf(u);
            BigDecimal shown = new BigDecimal(Figures.uncertainty(u));
            BigDecimal halfEven = written.round(even);
            if (shown.compareTo(halfEven) != 0) {
                // the digits dropped are exactly one half of the last kept one
                BigDecimal dropped = written.subtract(halfEven).abs();
                BigDecimal unit = BigDecimal.ONE.scaleByPowerOfTen(-halfEven.scale());
                assertEquals(0, dropped.multiply(BigDecimal.valueOf(2)).compareTo(unit), u + " -> " + shown);
                ties++;
            }
        }
        assertTrue(ties > 100, "the sample must contain ties to test: " + ties);
    }

    private static void checkNotation(BigDecimal magnitude, int scale, int k, String what) {
        boolean plain = magnitude.compareTo(new BigDecimal("0.001")) >= 0
                && (magnitude.compareTo(new BigDecimal("1000")) < 0 || scale >= 0);
        if (plain || magnitude.signum() == 0) {
            assertEquals(0, k, "plain notation " + what);
        } else {
            assertEquals(0, k % 3, "a multiple of three " + what);
            BigDecimal mantissa = magnitude.scaleByPowerOfTen(-k);
            assertTrue(mantissa.compareTo(BigDecimal.ONE) >= 0 && mantissa.compareTo(new BigDecimal("1000")) < 0,
                    "mantissa in [1, 1000) " + what);
        }
    }

    private static double randomFigure(Random random, int lowestExponent, int highestExponent) {
        int e = lowestExponent + random.nextInt(highestExponent - lowestExponent + 1);
        // one to nine digits, either sign
        long digits = 1 + random.nextInt(999_999_999);
        if (random.nextInt(4) == 0) {
            digits = Math.max(1, digits / 10_000_000 * 10_000_000);
        }
        double v = new BigDecimal(BigInteger.valueOf(digits)).scaleByPowerOfTen(e - 8).doubleValue();
        return random.nextBoolean() ? v : -v;
    }
}
