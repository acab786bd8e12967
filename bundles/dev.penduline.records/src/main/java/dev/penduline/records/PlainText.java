package dev.penduline.records;

import java.util.Locale;
import java.util.Optional;

import dev.penduline.physics.UserInputException;

/**
 * Rules for text a user gives as a name or a note. A mechanism file is XML 1.0, which cannot hold
 * most control characters at all, not even escaped; a name with one would also garble every
 * terminal and table that shows it. So names refuse them, and notes keep line feeds and tabs and
 * have the other control characters replaced (the caller says so).
 */
public final class PlainText {

    /** What replaces a control character in a note. */
    public static final char REPLACEMENT = '\uFFFD';

    private PlainText() {
    }

    /**
     * Whether a character is a control character (C0, DEL or C1).
     *
     * @param c the character
     * @return true for a control character
     */
    public static boolean isControl(char c) {
        return c < 0x20 || c == 0x7f || c >= 0x80 && c < 0xa0;
    }

    /** Half of a surrogate pair without its other half: no character at all, and not writable as UTF-8. */
    static boolean isLoneSurrogate(String s, int i) {
        char c = s.charAt(i);
        if (Character.isHighSurrogate(c)) {
            return i + 1 >= s.length() || !Character.isLowSurrogate(s.charAt(i + 1));
        }
        return Character.isLowSurrogate(c) && (i == 0 || !Character.isHighSurrogate(s.charAt(i - 1)));
    }

    /**
     * Why a text cannot be a name, if it cannot.
     *
     * @param name the text
     * @return the problem in words (with the character's code and position), empty when it is fine
     */
    public static Optional<String> nameProblem(String name) {
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (isControl(c)) {
                return Optional.of(String.format(Locale.ROOT, "holds a control character (U+%04X) at position %d; names are plain text on "
                        + "one line", (int) c, i + 1));
            }
            if (isLoneSurrogate(name, i)) {
                return Optional.of(String.format(Locale.ROOT, "holds a broken character (U+%04X) at position %d", (int) c, i + 1));
            }
        }
        return Optional.empty();
    }

    /**
     * A text as it may be shown inside a message: every control character (line feed and tab
     * included, since a message is one line) and every broken character written as a visible
     * escape, {@code \\u001b} for ESC, so that text echoed from a user's file can never drive a
     * terminal or break a message's line.
     *
     * @param text the text, e.g. a cell or a header name from a file
     * @return the text with those characters escaped (the same string when there are none)
     */
    public static String visible(String text) {
        return UserInputException.visible(text);
    }

    /**
     * A note with its control characters other than line feed and tab replaced by
     * {@value #REPLACEMENT}; a carriage return before a line feed is dropped.
     *
     * @param note the text
     * @return the text a mechanism file can hold
     */
    public static String note(String note) {
        StringBuilder b = new StringBuilder(note.length());
        for (int i = 0; i < note.length(); i++) {
            char c = note.charAt(i);
            if (c == '\r' && i + 1 < note.length() && note.charAt(i + 1) == '\n') {
                continue;
            }
            b.append(c != '\n' && c != '\t' && isControl(c) || isLoneSurrogate(note, i) ? REPLACEMENT : c);
        }
        return b.toString();
    }
}
