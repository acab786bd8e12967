package dev.penduline.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

/** The one form of a user error, and the one place of its texts. */
class UserInputExceptionTest {

    /** A user error with every part of its place. */
    private static final class Placed extends UserInputException {
        private static final long serialVersionUID = 1L;

        Placed(String file, int line, int column, String field, String problem, String advice) {
            super(file, line, column, field, problem, advice, null);
        }
    }

    @Test
    void theMessageIsThePlaceThenTheFieldThenTheProblemThenTheAdvice() {
        Placed e = new Placed("parts.csv", 4, 7, "mass_kg", "'abc' is not a number", "give the mass in kilograms");
        assertEquals("parts.csv:4:7: column 'mass_kg': 'abc' is not a number; give the mass in kilograms", e.getMessage());
        assertEquals("parts.csv", e.fileName());
        assertEquals(4, e.line());
        assertEquals(7, e.column());
        assertEquals("mass_kg", e.field());
        assertEquals("'abc' is not a number", e.problem());
        assertEquals("give the mass in kilograms", e.advice());
    }

    @Test
    void aColumnWithoutALineIsNotWrittenAndAWholeFileHasNoLine() {
        assertEquals("r.csv: the file holds no data lines", new Placed("r.csv", 0, 5, null, "the file holds no data lines", null)
                .getMessage());
        assertEquals("<input>:2: x", new Placed(null, 2, 0, null, "x", null).getMessage());
    }

    @Test
    void controlCharactersFromTheInputAreEscapedSoTheMessageIsOneLine() {
        Placed e = new Placed("a\nb.csv", 1, 0, "m\u001b[31m", "'1\t2' is not a number", null);
        assertEquals("a\\u000ab.csv:1: column 'm\\u001b[31m': '1\\u00092' is not a number", e.getMessage());
        assertEquals("x\\ud800y", UserInputException.visible("x\ud800y"), "half a surrogate pair is escaped");
        assertEquals("\ud83d\ude00", UserInputException.visible("\ud83d\ude00"), "a whole pair is a character");
    }

    @Test
    void aCompleteMessageIsKeptAsItIsAndAHigherLayerKeepsThePlace() {
        UserInputException whole = new UserInputException("f.penduline: 2 problem(s) to fix:\n  a\n  b", null);
        assertEquals("f.penduline: 2 problem(s) to fix:\n  a\n  b", whole.getMessage());
        assertNull(whole.fileName());
        Placed found = new Placed("r.csv", 3, 0, "t", "empty", null);
        UserInputException higher = new UserInputException(found) {
            private static final long serialVersionUID = 1L;
        };
        assertEquals(found.getMessage(), higher.getMessage());
        assertEquals("r.csv", higher.fileName());
        assertEquals(3, higher.line());
        assertEquals("t", higher.field());
        assertEquals(found, higher.getCause());
    }

    /** Every key's pattern takes as many values as it has conversions, and no stray percent sign. */
    @Test
    void everyMessageKeyIsAWellFormedPatternWithoutATranslationFallingBackToItsSource() {
        Pattern conversion = Pattern.compile("%([sd])");
        for (InputMessage m : InputMessage.values()) {
            String source = m.getSourceString();
            Matcher c = conversion.matcher(source);
            int count = 0;
            while (c.find()) {
                count++;
            }
            assertEquals(count, source.length() - source.replace("%", "").length(), m + ": only %s and %d conversions");
            Object[] args = new Object[count];
            c.reset();
            for (int i = 0; c.find(); i++) {
                args[i] = c.group(1).equals("d") ? (Object) 7 : "X";
            }
            String text = m.format(args);
            assertTrue(!text.contains("%"), m + ": " + text);
            assertEquals(text, m.format(Locale.FRENCH, args), m + ": no translation yet, the source text is used");
        }
        assertEquals("option --rate needs a value", InputMessage.OPTION_NEEDS_VALUE.format("rate"));
    }
}
