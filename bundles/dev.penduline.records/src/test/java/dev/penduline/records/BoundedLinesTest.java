package dev.penduline.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/** Lines split as java.io.BufferedReader splits them, and a line beyond the cap refused early. */
class BoundedLinesTest {

    /** The reference: the JDK's own BufferedReader.readLine (an independent implementation). */
    private static List<String> reference(String text) throws IOException {
        List<String> lines = new ArrayList<>();
        BufferedReader r = new BufferedReader(new StringReader(text));
        for (String l = r.readLine(); l != null; l = r.readLine()) {
            lines.add(l);
        }
        return lines;
    }

    private static List<String> bounded(Reader in, int cap) throws IOException, RecordFormatException {
        List<String> lines = new ArrayList<>();
        BoundedLines b = new BoundedLines(in, "f.csv", cap);
        for (String l = b.next(); l != null; l = b.next()) {
            lines.add(l);
        }
        return lines;
    }

    @Test
    void splitsLikeTheJdkReaderForEveryTerminator() throws Exception {
        String[] texts = {"", "a", "a\n", "a\nb", "a\r\nb\r\n", "a\rb\r", "\n\n", "\r\n\r\n", "x\r\r\ny\n\rz",
            "time_s,angle_deg\n0,1\n0.1,2"};
        for (String t : texts) {
            assertEquals(reference(t), bounded(new StringReader(t), 100), "text " + t.replace("\r", "\\r").replace("\n", "\\n"));
        }
    }

    @Test
    void splitsLikeTheJdkReaderAcrossBufferBoundaries() throws Exception {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < 5000; i++) {
            b.append("line ").append(i).append(i % 3 == 0 ? "\r\n" : i % 3 == 1 ? "\n" : "\r");
        }
        // a reader that hands out one to seven characters at a time puts every terminator on a boundary
        Reader dribble = new StringReader(b.toString()) {
            private int n;

            @Override
            public int read(char[] cbuf, int off, int len) throws IOException {
                return super.read(cbuf, off, Math.min(len, 1 + n++ % 7));
            }
        };
        assertEquals(reference(b.toString()), bounded(dribble, 100));
    }

    @Test
    void aLineAtTheCapPassesAndOneBeyondIsRefusedWithFileAndLine() throws Exception {
        String ok = "a".repeat(64);
        assertEquals(List.of("h", ok), bounded(new StringReader("h\n" + ok + "\n"), 64));
        RecordFormatException e = assertThrows(RecordFormatException.class,
                () -> bounded(new StringReader("h\n" + ok + "b\nrest"), 64));
        assertEquals(2, e.getLineNumber());
        assertTrue(e.getMessage().startsWith("f.csv:2: "), e.getMessage());
        assertTrue(e.getMessage().contains("longer than 64 characters"), e.getMessage());
    }

    @Test
    void aLineWithoutEndIsRefusedAfterReadingLittleMoreThanTheCap() {
        // an endless source of one character: the reader must stop on its own, soon after the cap
        final long[] handed = {0};
        Reader endless = new Reader() {
            @Override
            public int read(char[] cbuf, int off, int len) {
                java.util.Arrays.fill(cbuf, off, off + len, 'x');
                handed[0] += len;
                return len;
            }

            @Override
            public void close() {
            }
        };
        assertThrows(RecordFormatException.class, () -> bounded(endless, 1000));
        assertTrue(handed[0] < 1000 + (1 << 15), "read " + handed[0] + " characters");
    }
}
