package dev.penduline.fuzz;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The properties every reader must keep on any input, shared by the fuzz tests: what a message
 * shown to the user may and may not contain (RULES: a clear error naming the file; no Java
 * internals; user text echoed without raw control characters). A violation throws an
 * {@link AssertionError}, which Jazzer reports as a finding with the input that caused it.
 */
final class InputChecks {

    /**
     * Words that only Java internals put into a message: exception class names, package names,
     * the decoder's "Input length = 1". A message may hold one only when the input itself holds
     * it, since readers echo the user's text.
     */
    private static final List<String> INTERNALS = List.of("Exception", "Error:", "java.", "javax.", "jdk.", "sun.",
            "org.xml.", "org.eclipse.", "org.hipparchus.", "dev.penduline.", "Input length =", "\tat ");

    /** Object.toString's "Foo@1a2b3c". */
    private static final Pattern HASH_TO_STRING = Pattern.compile("[A-Za-z_$][\\w$.]*@[0-9a-f]{4,8}\\b");

    /** How the readers show a control character they echo: backslash, u, four hex digits. */
    private static final Pattern ESCAPE = Pattern.compile("\\\\u[0-9a-fA-F]{4}");

    private InputChecks() {
    }

    /**
     * Checks the message of the exception a reader threw for a bad input.
     *
     * @param message  the exception's message
     * @param fileName the file name the reader was given, which the message must name
     * @param input    the bytes read
     */
    static void errorMessage(String message, String fileName, byte[] input) {
        if (message == null || message.isBlank()) {
            throw new AssertionError("the reader's error has no message");
        }
        if (!message.contains(fileName)) {
            throw new AssertionError("the message does not name the file " + fileName + ": " + visible(message));
        }
        userText("message", message, input);
    }

    /**
     * Checks a text shown to the user (an error, a warning, an assumption): no raw control
     * characters, no half surrogate pairs (bytes that were not UTF-8, passed on garbled), no Java
     * internals the input did not itself contain.
     *
     * @param what  what the text is, for the finding's description
     * @param text  the text
     * @param input the bytes read
     */
    static void userText(String what, String text, byte[] input) {
        for (int i = 0; i < text.length(); i++) {
            if (Character.isISOControl(text.charAt(i))) {
                throw new AssertionError(what + " holds the raw control character U+"
                        + String.format("%04X", (int) text.charAt(i)) + ": " + visible(text));
            }
        }
        for (int i = 0; i < text.length(); i++) {
            final char c = text.charAt(i);
            final boolean paired = Character.isHighSurrogate(c) ? i + 1 < text.length()
                    && Character.isLowSurrogate(text.charAt(i + 1))
                    : !Character.isLowSurrogate(c) || i > 0 && Character.isHighSurrogate(text.charAt(i - 1));
            if (!paired) {
                throw new AssertionError(what + " holds half a surrogate pair (garbled text) at " + i + ": " + visible(text));
            }
        }
        final String source = new String(input, StandardCharsets.UTF_8);
        final String latin = new String(input, StandardCharsets.ISO_8859_1);
        for (String word : INTERNALS) {
            if (text.contains(word) && !source.contains(word) && !latin.contains(word)) {
                throw new AssertionError(what + " shows Java internals ('" + word.strip() + "'): " + visible(text));
            }
        }
        // an escaped control character (backslash-u-0000) is the reader's rendering of an input byte: the
        // letters after it must not be taken together with the escape for a class name
        final Matcher m = HASH_TO_STRING.matcher(ESCAPE.matcher(text).replaceAll(" "));
        while (m.find()) {
            if (!source.contains(m.group()) && !latin.contains(m.group())) {
                throw new AssertionError(what + " shows an object's toString ('" + m.group() + "'): " + visible(text));
            }
        }
    }

    /**
     * The text with control characters escaped, for a finding's description.
     *
     * @param text any text
     * @return the text safe to print
     */
    static String visible(String text) {
        final StringBuilder b = new StringBuilder();
        for (int i = 0; i < text.length(); i++) {
            final char c = text.charAt(i);
            if (Character.isISOControl(c)) {
                b.append(String.format("\\u%04X", (int) c));
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }

    /**
     * A scratch file for the readers that take a path; one directory per JVM, removed at exit.
     *
     * @param name the file name
     * @return the path (not yet written)
     */
    static Path scratch(String name) {
        final Path file = Scratch.DIR.resolve(name);
        file.toFile().deleteOnExit();
        return file;
    }

    /**
     * Writes the input to a scratch file.
     *
     * @param file  the scratch file
     * @param input the bytes
     */
    static void write(Path file, byte[] input) {
        try {
            Files.write(file, input);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the scratch file (not a finding)", e);
        }
    }

    /** Holder of the scratch directory, made on first use. */
    private static final class Scratch {
        static final Path DIR = make();

        private static Path make() {
            try {
                final Path dir = Files.createTempDirectory("penduline-fuzz-");
                dir.toFile().deleteOnExit();
                return dir;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
