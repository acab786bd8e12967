package dev.penduline.model.persistence.internal;

import java.util.Locale;

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
        for (Throwable t = failure; t != null; t = next(t)) {
            if (t instanceof Resource.Diagnostic d && d.getLine() > 0) {
                return new LoadProblem(d.getLine(), d.getColumn(), explain(stripLocation(d.getMessage())));
            }
        }
        return new LoadProblem(0, 0, explain(failure.getMessage() == null ? failure.toString() : failure.getMessage()));
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
        final String m = message == null ? "" : message;
        final String lower = m.toLowerCase(Locale.ROOT);
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

    /** EMF appends "(uri, line, column)" to its messages; we report the position ourselves. */
    private static String stripLocation(String message) {
        if (message == null) {
            return "";
        }
        final int open = message.lastIndexOf(" (");
        return open > 0 && message.endsWith(")") ? message.substring(0, open) : message;
    }
}
