package dev.penduline.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

class DelimitedLineTest {

    @Test
    void quotedFieldsFollowRfc4180() throws RecordFormatException {
        // RFC 4180 §2, rules 5–7: quoted fields may hold the delimiter; a doubled quote is one quote
        assertEquals(List.of("a", "b;c", "say \"hi\"", ""),
                DelimitedLine.split("a;\"b;c\";\"say \"\"hi\"\"\";", ';', "f", 1));
    }

    @Test
    void boundsAgreeWithSplitOnUnquotedLines() throws RecordFormatException {
        final int[] bounds = new int[8];
        for (String line : List.of("1.5,2.5", " 3 ;\t4 ; 5", "7\t8\t\t9", "", "x,,y")) {
            final char d = line.contains(";") ? ';' : line.contains("\t") ? '\t' : ',';
            final List<String> fields = DelimitedLine.split(line, d, "f", 1);
            final int count = DelimitedLine.fieldBounds(line, d, bounds);
            assertEquals(fields.size(), count, line);
            for (int k = 0; k < Math.min(count, 4); k++) {
                assertEquals(fields.get(k), line.substring(bounds[2 * k], bounds[2 * k + 1]), line + " field " + k);
            }
        }
    }

    @Test
    void anUnclosedQuoteNamesTheLine() {
        final RecordFormatException e = assertThrows(RecordFormatException.class,
                () -> DelimitedLine.split("1,\"2", ',', "rec.csv", 9));
        assertEquals(9, e.getLineNumber());
    }
}
