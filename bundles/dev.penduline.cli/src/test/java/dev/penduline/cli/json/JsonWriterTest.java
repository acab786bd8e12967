package dev.penduline.cli.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

import com.google.gson.JsonArray;
import com.google.gson.JsonParser;

class JsonWriterTest {

    private final StringWriter text = new StringWriter();
    private final PrintWriter print = new PrintWriter(text);
    private final JsonWriter json = new JsonWriter(print);

    private String written() {
        return text.toString().replace("\r\n", "\n");
    }

    @Test
    void escapesStringsAsRfc8259Requires() {
        // RFC 8259 §7: quotation mark, reverse solidus and control characters must be escaped.
        json.beginObject().field("k", "a\"b\\c\nd\u0001").endObject().finish();
        assertEquals("{\n  \"k\": \"a\\\"b\\\\c\\nd\\u0001\"\n}\n", written());
    }

    @Test
    void layoutIsTwoSpacesKeysInOrderAndEmptyScopesOnOneLine() {
        // The layout the CLI has always printed (README's --json examples): "key": value, two spaces a level.
        json.beginObject().field("b", 1L).field("a", true).name("none").beginArray().endArray()
                .name("empty").beginObject().endObject().field("s", (String) null).field("xs", new double[] {1, 0.5})
                .endObject().finish();
        assertEquals("{\n  \"b\": 1,\n  \"a\": true,\n  \"none\": [],\n  \"empty\": {},\n  \"s\": null,\n"
                + "  \"xs\": [\n    1,\n    0.5\n  ]\n}\n", written());
    }

    @Test
    void nonFiniteNumbersBecomeNullBecauseJsonHasNoNaN() {
        // RFC 8259 §6: "Numeric values that cannot be represented ... (such as Infinity and NaN) are not permitted."
        json.beginArray().value(Double.NaN).value(Double.POSITIVE_INFINITY).value(Double.NEGATIVE_INFINITY)
                .value(2.5).value(3.0).endArray().finish();
        assertEquals("[\n  null,\n  null,\n  null,\n  2.5,\n  3\n]\n", written());
    }

    @Test
    void integralDoublesBelowTenToTheFifteenAreIntegersOthersKeepJavasShortestDigits() {
        // Gson alone writes 3.0 and -0.0; the CLI has always written 3 and 0 (an integral double
        // below 1e15 is an exact long), and Double.toString's digits (JDK, shortest round-trip) otherwise.
        json.beginArray().value(-0.0).value(-7.0).value(999_999_999_999_999.0).value(1e15).value(1.5e-7)
                .value(Long.MAX_VALUE).endArray().finish();
        assertEquals("[\n  0,\n  -7,\n  999999999999999,\n  1.0E15,\n  1.5E-7,\n  9223372036854775807\n]\n", written());
    }

    @Test
    void doublesRoundTripExactlyThroughAnIndependentReader() {
        // Read back by Gson's parser (not by this writer's own rules): every double returns bit for bit.
        double[] values = {0.1 + 0.2, Math.PI, -Double.MIN_VALUE, Double.MAX_VALUE, 1.0 / 3, 6.02214076e23, 5e-324};
        json.beginObject().field("v", values).endObject().finish();
        JsonArray read = JsonParser.parseString(text.toString()).getAsJsonObject().getAsJsonArray("v");
        assertEquals(values.length, read.size());
        for (int i = 0; i < values.length; i++) {
            assertEquals(Double.doubleToLongBits(values[i]), Double.doubleToLongBits(read.get(i).getAsDouble()),
                    "value " + i + ": " + values[i]);
        }
    }

    @Test
    void finishLeavesTheCallersStreamOpen() {
        json.beginArray().endArray().finish();
        print.print("more");
        print.flush();
        assertFalse(print.checkError(), "the stream is still open after finish");
        assertEquals("[]\nmore", written());
    }

    @Test
    void misuseIsRefused() {
        json.beginObject();
        assertThrows(IllegalStateException.class, () -> json.value(1.0));
        json.name("a");
        assertThrows(IllegalStateException.class, () -> json.name("b"));
        json.value(1.0);
        assertThrows(IllegalStateException.class, json::endArray);
        assertThrows(IllegalStateException.class, json::finish);
    }
}
