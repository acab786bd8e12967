package dev.penduline.records;

import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

import dev.penduline.physics.InputMessage;

/**
 * Decoding of the text files Penduline reads (UTF-8), so that a file in another encoding is
 * refused with its line instead of a decoder's exception or silently garbled text.
 *
 * <p>{@link #reader} decodes leniently and marks every byte sequence that is not UTF-8 with a
 * lone low surrogate, a char that no UTF-8 text can decode to (a valid four-byte sequence gives
 * a whole surrogate pair), so a reader can tell, line by line, where the file stops being UTF-8.
 * {@link #check} then refuses a line the reader uses that holds such a mark; a comment line may
 * hold anything, since it is skipped. The first line is also looked at as a whole: UTF-16 text
 * (with or without a byte-order mark) and binary data (a NUL character) are named as what they
 * look like, rather than being reported as a strange header.
 */
public final class Utf8Text {

    /** What each byte sequence that is not UTF-8 becomes: a lone low surrogate. */
    static final char NOT_UTF8 = '\uDFFF';

    /** How many characters of the first line are looked at for the pattern of UTF-16. */
    private static final int SNIFF = 64;

    private Utf8Text() {
    }

    /**
     * A reader that decodes UTF-8 and marks what is not UTF-8 instead of failing on it.
     *
     * @param in the bytes; closed when the reader is closed
     * @return the characters, unbuffered
     */
    public static Reader reader(InputStream in) {
        final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPLACE)
                .onUnmappableCharacter(CodingErrorAction.REPLACE)
                .replaceWith(String.valueOf(NOT_UTF8));
        return new InputStreamReader(in, decoder);
    }

    /**
     * Checks one line read through {@link #reader}.
     *
     * @param line       the line, without its terminator (and without a byte-order mark on line 1)
     * @param lineNumber its 1-based number
     * @param used       whether the reader uses the line (false for a comment or blank line)
     * @param file       the file name for the message
     * @throws RecordFormatException when the file does not look like UTF-8 text (line 1), or when a
     *                               used line holds bytes that are not UTF-8
     */
    public static void check(String line, int lineNumber, boolean used, String file) throws RecordFormatException {
        if (lineNumber == 1 && looksLikeUtf16(line)) {
            throw new RecordFormatException(file, lineNumber, null,
                    InputMessage.LOOKS_LIKE_UTF16.format());
        }
        if (lineNumber == 1 && line.indexOf('\0') >= 0) {
            throw new RecordFormatException(file, lineNumber, null,
                    InputMessage.LOOKS_LIKE_BINARY.format());
        }
        if (!used) {
            return;
        }
        for (int i = line.indexOf(NOT_UTF8); i >= 0; i = line.indexOf(NOT_UTF8, i + 1)) {
            if (PlainText.isLoneSurrogate(line, i)) {
                throw new RecordFormatException(file, lineNumber, null, InputMessage.NOT_UTF8_AT.format(i + 1));
            }
        }
    }

    /**
     * UTF-16 read as UTF-8: a byte-order mark (FF FE or FE FF, two bytes that are not UTF-8) then
     * NULs, or plain ASCII-range text with a NUL in every other place.
     */
    private static boolean looksLikeUtf16(String line) {
        final int n = Math.min(line.length(), SNIFF);
        if (n >= 3 && line.charAt(0) == NOT_UTF8 && line.charAt(1) == NOT_UTF8
                && (line.charAt(2) == '\0' || n >= 4 && line.charAt(3) == '\0')) {
            return true;
        }
        if (n < 4) {
            return false;
        }
        final int parity = line.charAt(0) == '\0' ? 0 : 1;
        for (int i = 0; i < n; i++) {
            if ((line.charAt(i) == '\0') != (i % 2 == parity)) {
                return false;
            }
        }
        return true;
    }
}
