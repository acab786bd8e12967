package dev.penduline.cli.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

class JsonWriterTest {

    private final StringWriter text = new StringWriter();
    private final JsonWriter json = new JsonWriter(new PrintWriter(text));

    @Test
    void escapesStringsAsRfc8259Requires() {
        // RFC 8259 §7: quotation mark, reverse solidus and control characters must be escaped.
        json.beginObject().field("k", "a\"b\\c\nd\u0001").endObject().finish();
        assertEquals("{\n  \"k\": \"a\\\"b\\\\c\\nd\\u0001\"\n}\n", text.toString().replace("\r\n", "\n"));
    }

    @Test
    void nonFiniteNumbersBecomeNullBecauseJsonHasNoNaN() {
        // RFC 8259 §6: "Numeric values that cannot be represented ... (such as Infinity and NaN) are not permitted."
        json.beginArray().value(Double.NaN).value(Double.POSITIVE_INFINITY).value(2.5).value(3.0).endArray().finish();
        assertEquals("[\n  null,\n  null,\n  2.5,\n  3\n]\n", text.toString().replace("\r\n", "\n"));
    }

    @Test
    void doublesRoundTripExactly() {
        double v = 0.1 + 0.2;
        json.beginArray().value(v).endArray().finish();
        String number = text.toString().replace("[", "").replace("]", "").trim();
        assertEquals(v, Double.parseDouble(number));
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
