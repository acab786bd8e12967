package dev.penduline.cli;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small JSON reader for tests: parses a whole text into maps (keys in order), lists, strings,
 * doubles, booleans and null, and reads fields by path. Strict about structure (a syntax error
 * throws with the offset), tolerant only where the tests want it: a missing field is null.
 */
final class JsonTree {

    private final String text;
    private int at;

    private JsonTree(String text) {
        this.text = text;
    }

    /**
     * Parses one JSON value that makes up the whole text (surrounding blanks allowed).
     *
     * @param text the JSON text
     * @return a Map, List, String, Double, Boolean or null
     * @throws IllegalArgumentException at the first syntax error, with its offset
     */
    static Object parse(String text) {
        JsonTree p = new JsonTree(text);
        Object v = p.value();
        p.blanks();
        if (p.at != text.length()) {
            throw p.error("text after the JSON value");
        }
        return v;
    }

    /**
     * The value at a path of object keys and array indices, e.g. {@code at(tree, "terms", "viscous", "value")}.
     *
     * @param tree  a parsed value
     * @param steps keys (String) and indices (Integer)
     * @return the value, or null when any step is missing
     */
    static Object at(Object tree, Object... steps) {
        Object v = tree;
        for (Object s : steps) {
            if (v instanceof Map<?, ?> m && s instanceof String key) {
                v = m.get(key);
            } else if (v instanceof List<?> l && s instanceof Integer i && i >= 0 && i < l.size()) {
                v = l.get(i);
            } else {
                return null;
            }
        }
        return v;
    }

    /**
     * The number at a path.
     *
     * @param tree  a parsed value
     * @param steps the path
     * @return the number, or NaN when missing or not a number
     */
    static double number(Object tree, Object... steps) {
        return at(tree, steps) instanceof Double d ? d : Double.NaN;
    }

    /**
     * Whether an object has a key (its value may be null).
     *
     * @param tree  a parsed value
     * @param steps the path of the object, then the key
     * @return true when the key is present
     */
    static boolean has(Object tree, Object... steps) {
        Object[] parent = Arrays.copyOf(steps, steps.length - 1);
        return at(tree, parent) instanceof Map<?, ?> m && m.containsKey(steps[steps.length - 1]);
    }

    private Object value() {
        blanks();
        if (at >= text.length()) {
            throw error("a value is missing");
        }
        char c = text.charAt(at);
        switch (c) {
            case '{':
                return object();
            case '[':
                return array();
            case '"':
                return string();
            case 't':
                return word("true", Boolean.TRUE);
            case 'f':
                return word("false", Boolean.FALSE);
            case 'n':
                return word("null", null);
            default:
                return number();
        }
    }

    private Map<String, Object> object() {
        Map<String, Object> m = new LinkedHashMap<>();
        at++;
        blanks();
        if (peek('}')) {
            at++;
            return m;
        }
        while (true) {
            blanks();
            if (!peek('"')) {
                throw error("a key (a string) is expected");
            }
            String key = string();
            blanks();
            expect(':');
            m.put(key, value());
            blanks();
            if (peek(',')) {
                at++;
            } else {
                expect('}');
                return m;
            }
        }
    }

    private List<Object> array() {
        List<Object> l = new ArrayList<>();
        at++;
        blanks();
        if (peek(']')) {
            at++;
            return l;
        }
        while (true) {
            l.add(value());
            blanks();
            if (peek(',')) {
                at++;
            } else {
                expect(']');
                return l;
            }
        }
    }

    private String string() {
        StringBuilder b = new StringBuilder();
        at++;
        while (at < text.length()) {
            char c = text.charAt(at++);
            if (c == '"') {
                return b.toString();
            }
            if (c != '\\') {
                b.append(c);
                continue;
            }
            if (at >= text.length()) {
                break;
            }
            char e = text.charAt(at++);
            switch (e) {
                case 'n' -> b.append('\n');
                case 't' -> b.append('\t');
                case 'r' -> b.append('\r');
                case 'b' -> b.append('\b');
                case 'f' -> b.append('\f');
                case 'u' -> {
                    if (at + 4 > text.length()) {
                        throw error("a \\u escape is cut short");
                    }
                    b.append((char) Integer.parseInt(text.substring(at, at + 4), 16));
                    at += 4;
                }
                default -> b.append(e);
            }
        }
        throw error("a string is not closed");
    }

    private Double number() {
        int start = at;
        while (at < text.length() && "+-0123456789.eE".indexOf(text.charAt(at)) >= 0) {
            at++;
        }
        if (start == at) {
            throw error("unexpected character '" + text.charAt(at) + "'");
        }
        try {
            return Double.valueOf(text.substring(start, at));
        } catch (NumberFormatException e) {
            throw error("'" + text.substring(start, at) + "' is not a number");
        }
    }

    private Object word(String w, Object v) {
        if (!text.startsWith(w, at)) {
            throw error("'" + w + "' expected");
        }
        at += w.length();
        return v;
    }

    private void blanks() {
        while (at < text.length() && Character.isWhitespace(text.charAt(at))) {
            at++;
        }
    }

    private boolean peek(char c) {
        return at < text.length() && text.charAt(at) == c;
    }

    private void expect(char c) {
        if (!peek(c)) {
            throw error("'" + c + "' expected");
        }
        at++;
    }

    private IllegalArgumentException error(String what) {
        return new IllegalArgumentException("JSON: " + what + " at offset " + at);
    }
}
