package dev.penduline.records;

import java.io.IOException;
import java.io.Reader;

import dev.penduline.physics.InputMessage;

/**
 * Reads lines of text like {@link java.io.BufferedReader#readLine()} (ended by LF, CR or CR LF),
 * but refuses a line longer than a cap as soon as the cap is passed, naming the file and the
 * line, without reading the rest of it: a file without line breaks (or a binary file) is stopped
 * after a few kilobytes instead of being held whole in memory.
 *
 * <p>It only splits lines; how the bytes are decoded is up to the {@link Reader} it is given.
 */
public final class BoundedLines {

    private final Reader in;
    private final String file;
    private final int maxChars;
    private final char[] buffer = new char[1 << 14];
    private final StringBuilder line = new StringBuilder(128);
    private int position;
    private int limit;
    private int number;
    private boolean skipLineFeed;

    /**
     * Creates a line reader.
     *
     * @param in       the text; not closed by this class
     * @param file     the file name for messages
     * @param maxChars the longest line accepted, in characters (without its terminator)
     */
    public BoundedLines(Reader in, String file, int maxChars) {
        this.in = in;
        this.file = file;
        this.maxChars = maxChars;
    }

    /**
     * The next line, without its terminator.
     *
     * @return the line, or null at the end of the text
     * @throws IOException           when the reader fails
     * @throws RecordFormatException when the line is longer than the cap
     */
    public String next() throws IOException, RecordFormatException {
        line.setLength(0);
        boolean any = false;
        while (true) {
            if (position == limit) {
                limit = in.read(buffer, 0, buffer.length);
                position = 0;
                if (limit <= 0) {
                    limit = 0;
                    if (!any) {
                        return null;
                    }
                    number++;
                    return line.toString();
                }
            }
            if (skipLineFeed) {
                skipLineFeed = false;
                if (buffer[position] == '\n') {
                    position++;
                    continue;
                }
            }
            any = true;
            final int start = position;
            while (position < limit && buffer[position] != '\n' && buffer[position] != '\r') {
                position++;
            }
            if (line.length() + position - start > maxChars) {
                throw new RecordFormatException(file, number + 1, null, InputMessage.LINE_TOO_LONG.format(
                        maxChars));
            }
            line.append(buffer, start, position - start);
            if (position < limit) {
                skipLineFeed = buffer[position] == '\r';
                position++;
                number++;
                return line.toString();
            }
        }
    }

    /**
     * How many lines were returned so far.
     *
     * @return the 1-based number of the last line returned (0 before the first)
     */
    public int lineNumber() {
        return number;
    }
}
