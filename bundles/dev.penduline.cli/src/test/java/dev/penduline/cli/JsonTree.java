package dev.penduline.cli;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonParseException;
import com.google.gson.Strictness;

/**
 * The tests' reading of JSON, by Gson: a whole text becomes maps (keys in order), lists, strings,
 * doubles, booleans and null, and fields are read by path. Strict about structure (Gson's strict
 * mode: no comments, no NaN, nothing after the value), tolerant only where the tests want it: a
 * missing field is null.
 */
public final class JsonTree {

    private static final Gson GSON = new GsonBuilder().setStrictness(Strictness.STRICT).create();

    private JsonTree() {
    }

    /**
     * Parses one JSON value that makes up the whole text (surrounding blanks allowed).
     *
     * @param text the JSON text
     * @return a Map, List, String, Double, Boolean or null
     * @throws IllegalArgumentException at the first syntax error, with Gson's account of where
     */
    public static Object parse(String text) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("JSON: a value is missing (the text is empty)");
        }
        try {
            return GSON.fromJson(text, Object.class);
        } catch (JsonParseException e) {
            throw new IllegalArgumentException("JSON: " + e.getMessage(), e);
        }
    }

    /**
     * The value at a path of object keys and array indices, e.g. {@code at(tree, "terms", "viscous", "value")}.
     *
     * @param tree  a parsed value
     * @param steps keys (String) and indices (Integer)
     * @return the value, or null when any step is missing
     */
    public static Object at(Object tree, Object... steps) {
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
    public static double number(Object tree, Object... steps) {
        return at(tree, steps) instanceof Double d ? d : Double.NaN;
    }

    /**
     * Whether an object has a key (its value may be null).
     *
     * @param tree  a parsed value
     * @param steps the path of the object, then the key
     * @return true when the key is present
     */
    public static boolean has(Object tree, Object... steps) {
        Object[] parent = Arrays.copyOf(steps, steps.length - 1);
        return at(tree, parent) instanceof Map<?, ?> m && m.containsKey(steps[steps.length - 1]);
    }

    /**
     * The number at a path of a JSON text, failing the test when it is missing.
     *
     * @param json  the text, e.g. a command's {@code --json} output
     * @param steps the path of keys and indices
     * @return the number
     */
    public static double requiredNumber(String json, Object... steps) {
        final double v = number(parse(json), steps);
        if (Double.isNaN(v)) {
            throw new AssertionError(Arrays.toString(steps) + " missing in " + json);
        }
        return v;
    }
}
