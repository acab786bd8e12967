package dev.penduline.cli.internal;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;

import dev.penduline.records.PlainText;

/**
 * Passes text on with every control character other than line feed and tab written as a visible
 * escape (the escape character ESC becomes the six characters backslash, u, 0, 0, 1, b), so that a
 * name, a note or a value echoed from a user's file can never move the cursor, recolour or clear
 * the user's terminal.
 */
public final class PrintableWriter extends FilterWriter {

    /**
     * Wraps a writer.
     *
     * @param out where the printable text goes
     */
    public PrintableWriter(Writer out) {
        super(out);
    }

    /**
     * Whether a character is shown as an escape.
     *
     * @param c the character
     * @return true for C0 and C1 controls and DEL, except line feed and tab
     */
    public static boolean isControl(char c) {
        return c != '\n' && c != '\t' && PlainText.isControl(c);
    }

    /**
     * The text with its control characters escaped.
     *
     * @param s the text
     * @return the printable text
     */
    public static String printable(String s) {
        StringBuilder b = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (isControl(c)) {
                if (b == null) {
                    b = new StringBuilder(s.length() + 8).append(s, 0, i);
                }
                b.append(String.format("\\u%04x", (int) c));
            } else if (b != null) {
                b.append(c);
            }
        }
        return b == null ? s : b.toString();
    }

    @Override
    public void write(int c) throws IOException {
        if (isControl((char) c)) {
            out.write(String.format("\\u%04x", c));
        } else {
            out.write(c);
        }
    }

    @Override
    public void write(char[] cbuf, int off, int len) throws IOException {
        out.write(printable(new String(cbuf, off, len)));
    }

    @Override
    public void write(String str, int off, int len) throws IOException {
        out.write(printable(str.substring(off, off + len)));
    }
}
