package dev.penduline.cli.json;

import java.io.PrintWriter;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * A small streaming JSON writer for the command line's {@code --json} output: objects, arrays,
 * strings, numbers and booleans, indented by two spaces, keys in the order written. Non-finite
 * numbers are written as {@code null} (JSON has no NaN). Misuse (a value where a key is due,
 * unbalanced ends) is a programming error and throws {@link IllegalStateException}.
 */
public final class JsonWriter {

    private enum Scope { OBJECT, ARRAY }

    private final PrintWriter out;
    private final Deque<Scope> scopes = new ArrayDeque<>();
    private final Deque<Boolean> empty = new ArrayDeque<>();
    private boolean keyPending;

    /**
     * Creates a writer.
     *
     * @param out where the JSON text goes
     */
    public JsonWriter(PrintWriter out) {
        this.out = out;
    }

    /**
     * Opens an object (as a value or at the top level).
     *
     * @return this writer
     */
    public JsonWriter beginObject() {
        beforeValue();
        out.print('{');
        scopes.push(Scope.OBJECT);
        empty.push(Boolean.TRUE);
        return this;
    }

    /**
     * Closes the current object.
     *
     * @return this writer
     */
    public JsonWriter endObject() {
        return end(Scope.OBJECT, '}');
    }

    /**
     * Opens an array.
     *
     * @return this writer
     */
    public JsonWriter beginArray() {
        beforeValue();
        out.print('[');
        scopes.push(Scope.ARRAY);
        empty.push(Boolean.TRUE);
        return this;
    }

    /**
     * Closes the current array.
     *
     * @return this writer
     */
    public JsonWriter endArray() {
        return end(Scope.ARRAY, ']');
    }

    /**
     * Writes a key inside an object; the next call writes its value.
     *
     * @param key the key
     * @return this writer
     */
    public JsonWriter name(String key) {
        if (scopes.peek() != Scope.OBJECT || keyPending) {
            throw new IllegalStateException("a key is only allowed directly inside an object: " + key);
        }
        separate();
        out.print(quote(key));
        out.print(": ");
        keyPending = true;
        return this;
    }

    /**
     * Writes a string value ({@code null} writes JSON null).
     *
     * @param value the string
     * @return this writer
     */
    public JsonWriter value(String value) {
        beforeValue();
        out.print(value == null ? "null" : quote(value));
        return this;
    }

    /**
     * Writes a number with enough digits to read back the same double; non-finite as null.
     *
     * @param value the number
     * @return this writer
     */
    public JsonWriter value(double value) {
        beforeValue();
        out.print(format(value));
        return this;
    }

    /**
     * Writes an integer.
     *
     * @param value the number
     * @return this writer
     */
    public JsonWriter value(long value) {
        beforeValue();
        out.print(value);
        return this;
    }

    /**
     * Writes a boolean.
     *
     * @param value the flag
     * @return this writer
     */
    public JsonWriter value(boolean value) {
        beforeValue();
        out.print(value);
        return this;
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
        if (!scopes.isEmpty()) {
            throw new IllegalStateException("unclosed JSON " + scopes.peek());
        }
        out.println();
        out.flush();
    }

    private JsonWriter end(Scope scope, char close) {
        if (scopes.peek() != scope || keyPending) {
            throw new IllegalStateException("cannot close " + scope + " here");
        }
        scopes.pop();
        boolean wasEmpty = empty.pop();
        if (!wasEmpty) {
            newline();
        }
        out.print(close);
        return this;
    }

    private void beforeValue() {
        if (scopes.isEmpty()) {
            return;
        }
        if (scopes.peek() == Scope.OBJECT) {
            if (!keyPending) {
                throw new IllegalStateException("a value inside an object needs a key first");
            }
            keyPending = false;
        } else {
            separate();
        }
    }

    private void separate() {
        if (!empty.peek()) {
            out.print(',');
        }
        empty.pop();
        empty.push(Boolean.FALSE);
        newline();
    }

    private void newline() {
        out.println();
        for (int i = 0; i < scopes.size(); i++) {
            out.print("  ");
        }
    }

    static String format(double value) {
        if (!Double.isFinite(value)) {
            return "null";
        }
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        return Double.toString(value);
    }

    static String quote(String s) {
        StringBuilder b = new StringBuilder(s.length() + 2).append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20) {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }
}
