package dev.penduline.records.swing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class NumberCellTest {

    @Test
    void agreesBitForBitWithTheJdkParser() {
        // reference: java.lang.Double.parseDouble, the JDK's correctly rounded decimal parser
        final SplittableRandom random = new SplittableRandom(99);
        for (int i = 0; i < 20_000; i++) {
            final double v = (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(-8, 9));
            final String text = switch (i % 4) {
                case 0 -> Double.toString(v);
                case 1 -> String.format(Locale.ROOT, "%.6f", v);
                case 2 -> String.format(Locale.ROOT, "%.17e", v);
                default -> String.format(Locale.ROOT, "%.3f", v);
            };
            assertEquals(Double.parseDouble(text), NumberCell.parse(text, 0, text.length(), '.'), text);
            final String comma = text.replace('.', ',');
            assertEquals(Double.parseDouble(text), NumberCell.parse(comma, 0, comma.length(), ','), comma);
        }
    }

    @Test
    void refusesWhatIsNotAPlainDecimal() {
        for (String bad : new String[] {"", "-", "abc", "1.2.3", "NaN", "Infinity", "0x10", "1d", "1e", "1,5"}) {
            assertTrue(Double.isNaN(NumberCell.parse(bad, 0, bad.length(), '.')), bad);
        }
        assertTrue(NumberCell.namesNonFinite("-inf"));
        assertTrue(NumberCell.namesNonFinite("NaN"));
    }
}
