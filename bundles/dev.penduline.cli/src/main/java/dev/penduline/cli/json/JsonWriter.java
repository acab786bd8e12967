package dev.penduline.cli.json;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;

/**
 * The command line's {@code --json} output, written by Gson's streaming writer
 * ({@link com.google.gson.stream.JsonWriter}): objects, arrays, strings, numbers and booleans,
 * indented by two spaces, keys in the order written, strings escaped by Gson. This class adds
 * only what Gson does not do the CLI's way: the fluent {@code field(key, value)} shorthand, no
 * checked exceptions (the output is a {@link PrintWriter}, which reports no I/O errors), and the
 * numbers: an integral double below 10<sup>15</sup> in magnitude is written as an integer
 * ({@code 3}, not Gson's {@code 3.0}), any other finite double with the shortest digits that read
 * back the same value ({@link Double#toString(double)}), and a non-finite one as {@code null}
 * (JSON has no NaN, RFC 8259 §6, where Gson would throw). Misuse (a value where a key is due,
 * unbalanced ends) is a programming error and throws {@link IllegalStateException}.
 */
public final class JsonWriter {

    /** Integral doubles below this magnitude are written without a fraction (all are exact longs). */
    private static final double INTEGRAL_LIMIT = 1e15;

    private final PrintWriter out;
    private final com.google.gson.stream.JsonWriter gson;

    /**
     * Creates a writer.
     *
     * @param out where the JSON text goes (not closed by {@link #finish()})
     */
    public JsonWriter(PrintWriter out) {
        this.out = out;
        this.gson = new com.google.gson.stream.JsonWriter(new Unclosed(out));
        gson.setIndent("  ");
        gson.setSerializeNulls(true);
    }

    /**
     * Opens an object (as a value or at the top level).
     *
     * @return this writer
     */
    public JsonWriter beginObject() {
        return io(gson::beginObject);
    }

    /**
     * Closes the current object.
     *
     * @return this writer
     */
    public JsonWriter endObject() {
        return io(gson::endObject);
    }

    /**
     * Opens an array.
     *
     * @return this writer
     */
    public JsonWriter beginArray() {
        return io(gson::beginArray);
    }

    /**
     * Closes the current array.
     *
     * @return this writer
     */
    public JsonWriter endArray() {
        return io(gson::endArray);
    }

    /**
     * Writes a key inside an object; the next call writes its value.
     *
     * @param key the key
     * @return this writer
     */
    public JsonWriter name(String key) {
        return io(() -> gson.name(key));
    }

    /**
     * Writes a string value ({@code null} writes JSON null).
     *
     * @param value the string
     * @return this writer
     */
    public JsonWriter value(String value) {
        return io(() -> gson.value(value));
    }

    /**
     * Writes a number: integral below 10<sup>15</sup> as an integer, else the shortest digits that
     * read back the same double; non-finite as null.
     *
     * @param value the number
     * @return this writer
     */
    public JsonWriter value(double value) {
        if (!Double.isFinite(value)) {
            return io(gson::nullValue);
        }
        if (value == Math.rint(value) && Math.abs(value) < INTEGRAL_LIMIT) {
            return io(() -> gson.value((long) value));
        }
        return io(() -> gson.value(value));
    }

    /**
     * Writes an integer.
     *
     * @param value the number
     * @return this writer
     */
    public JsonWriter value(long value) {
        return io(() -> gson.value(value));
    }

    /**
     * Writes a boolean.
     *
     * @param value the flag
     * @return this writer
     */
    public JsonWriter value(boolean value) {
        return io(() -> gson.value(value));
    }

    /**
     * Writes {@code "key": value} for a number.
     *
     * @param key   the key
     * @param value the number
     * @return this writer
     */
    public JsonWriter field(String key, double value) {
        return name(key).value(value);
    }

    /**
     * Writes {@code "key": value} for a string.
     *
     * @param key   the key
     * @param value the string
     * @return this writer
     */
    public JsonWriter field(String key, String value) {
        return name(key).value(value);
    }

    /**
     * Writes {@code "key": value} for a boolean.
     *
     * @param key   the key
     * @param value the flag
     * @return this writer
     */
    public JsonWriter field(String key, boolean value) {
        return name(key).value(value);
    }

    /**
     * Writes {@code "key": value} for an integer.
     *
     * @param key   the key
     * @param value the number
     * @return this writer
     */
    public JsonWriter field(String key, long value) {
        return name(key).value(value);
    }

    /**
     * Writes an array of numbers under a key.
     *
     * @param key    the key
     * @param values the numbers
     * @return this writer
     */
    public JsonWriter field(String key, double[] values) {
        name(key).beginArray();
        for (double v : values) {
            value(v);
        }
        return endArray();
    }

    /** Ends the document with a newline and flushes; every scope must be closed. */
    public void finish() {
        try {
            gson.close(); // refuses an incomplete document; closes only the Unclosed wrapper
        } catch (IOException e) {
            throw new IllegalStateException("unclosed JSON: " + e.getMessage(), e);
        }
        out.println();
        out.flush();
    }

    private JsonWriter io(Step step) {
        try {
            step.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a PrintWriter reports none; kept for the contract
        }
        return this;
    }

    /** One call of Gson's writer. */
    @FunctionalInterface
    private interface Step {
        void run() throws IOException;
    }

    /** The output as Gson sees it: closing it leaves the caller's writer open. */
    private static final class Unclosed extends FilterWriter {

        Unclosed(Writer out) {
            super(out);
        }

        @Override
        public void close() {
            // the caller owns the stream (standard output, or a file it closes itself)
        }
    }
}
