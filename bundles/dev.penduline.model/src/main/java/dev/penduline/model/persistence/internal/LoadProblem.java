package dev.penduline.model.persistence.internal;

import java.io.CharConversionException;
import java.nio.charset.CharacterCodingException;
import java.util.Locale;
import java.util.regex.Pattern;

import org.eclipse.emf.ecore.resource.Resource;
import org.xml.sax.SAXParseException;

/**
 * Where and what went wrong while reading a mechanism file, dug out of the exception chain that
 * EMF and the SAX parser produce, and put in words a user can act on.
 *
 * @param line    1-based line, or 0 when unknown
 * @param column  1-based column, or 0 when unknown
 * @param problem the explanation
 */
public record LoadProblem(int line, int column, String problem) {

    /**
     * A Java class name as the parser and EMF put them into messages ("com.sun...FooException: ",
     * "org.xml.sax.SAXParseException; lineNumber: 3; "): an internal a user cannot act on.
     */
    private static final Pattern CLASS_NAME = Pattern.compile(
            "\\b(?:java|javax|jdk|sun|com\\.sun|org\\.xml|org\\.w3c|org\\.apache|org\\.eclipse)\\.(?:[a-zA-Z_$][\\w$]*\\.)*"
            + "[A-Z][\\w$]*(?:[:;]\\s*(?:lineNumber: \\d+; columnNumber: \\d+;\\s*)?)?");

    /** What a file that is not UTF-8 gets, whichever part of the parser noticed. */
    private static final String NOT_UTF8 = "not UTF-8 text: a mechanism file is UTF-8 (Penduline writes it so);"
            + " was it saved by another program in another encoding, or is it not a mechanism file?";

    /**
     * Describes the first located cause in the chain.
     *
     * @param failure what the load threw
     * @return the problem with its position when one was found
     */
    public static LoadProblem of(Throwable failure) {
        // The parser's own exception has the plainest message; EMF wraps it in diagnostics
        // whose messages repeat the exception's toString, so look for it first.
        for (Throwable t = failure; t != null; t = next(t)) {
            if (t instanceof SAXParseException sax) {
                return new LoadProblem(sax.getLineNumber(), sax.getColumnNumber(), explain(sax.getMessage()));
            }
        }
        final boolean notUtf8 = isNotUtf8(failure);
        for (Throwable t = failure; t != null; t = next(t)) {
            if (t instanceof Resource.Diagnostic d && d.getLine() > 0) {
                return new LoadProblem(d.getLine(), d.getColumn(), notUtf8 ? NOT_UTF8 : explain(stripLocation(d.getMessage())));
            }
        }
        return new LoadProblem(0, 0, notUtf8 ? NOT_UTF8 : explain(failure.getMessage() == null
                ? "the parser stopped without saying why" : failure.getMessage()));
    }

    /** The decoder's complaint (Xerces' MalformedByteSequenceException is a CharConversionException). */
    private static boolean isNotUtf8(Throwable failure) {
        for (Throwable t = failure; t != null; t = next(t)) {
            if (t instanceof CharConversionException || t instanceof CharacterCodingException) {
                return true;
            }
        }
        return false;
    }

    /**
     * The one of two problems that comes first in the file (a problem without a place last).
     *
     * @param other another problem
     * @return this or the other
     */
    public LoadProblem earlier(LoadProblem other) {
        if (other == null || other.line == 0) {
            return this;
        }
        if (line == 0 || other.line < line || (other.line == line && other.column < column)) {
            return other;
        }
        return this;
    }

    private static Throwable next(Throwable t) {
        final Throwable cause = t instanceof Resource.IOWrappedException w && w.getWrappedException() != null
                ? w.getWrappedException() : t.getCause();
        return cause == t ? null : cause;
    }

    /**
     * Describes a problem EMF recorded in the resource's error list.
     *
     * @param diagnostic the recorded problem
     * @return the problem with its position
     */
    public static LoadProblem of(Resource.Diagnostic diagnostic) {
        return new LoadProblem(diagnostic.getLine(), diagnostic.getColumn(), explain(stripLocation(diagnostic.getMessage())));
    }

    private static String explain(String message) {
        final String m = message == null ? "" : CLASS_NAME.matcher(message).replaceAll("").strip();
        final String lower = m.toLowerCase(Locale.ROOT);
        if (lower.contains("utf-8 sequence")) {
            return NOT_UTF8;
        }
        if (lower.contains("doctype")) {
            return "the file contains a DOCTYPE declaration, which a mechanism file never has; refused because a"
                    + " DTD can define entities that read other files or expand without bound (" + m + ")";
        }
        if (lower.contains("must start and end within the same entity")) {
            return "the file ends before its elements are closed (cut short?): " + m;
        }
        if (lower.contains("entit") && (lower.contains("expan") || lower.contains("reference")
                || lower.contains("declar"))) {
            return "the file uses an XML entity that a mechanism file never needs; refused (" + m + ")";
        }
        if (lower.startsWith("package with uri") || lower.startsWith("class '")) {
            return "not a mechanism file: its root must be penduline:Mechanism in namespace"
                    + " urn:dev.penduline:mechanism:1 (" + m + ")";
        }
        if (lower.startsWith("feature '") || lower.contains("not found")) {
            return "unknown element: " + m + " (is the file from a newer Penduline, or mistyped?)";
        }
        if (lower.startsWith("value '")) {
            return "bad value: " + m;
        }
        return "not a well-formed mechanism file: " + m;
    }

    /**
     * A message as it may be shown: control characters (echoed from the file, line feeds and tabs
     * included) written as {@code \\u000a}-style escapes. The rule is that of
     * {@code dev.penduline.records.PlainText#visible} (the JDK's ISO control characters: C0, DEL,
     * C1), which the model cannot call: the model sits below the records bundle.
     *
     * @param text the message
     * @return the message on one printable line
     */
    public static String printable(String text) {
        final StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            final char c = text.charAt(i);
            if (Character.isISOControl(c)) {
                b.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }

    /** EMF appends "(uri, line, column)" to its messages; we report the position ourselves. */
    private static String stripLocation(String message) {
        if (message == null) {
            return "";
        }
        final int open = message.lastIndexOf(" (");
        return open > 0 && message.endsWith(")") ? message.substring(0, open) : message;
    }
}
