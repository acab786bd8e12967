package dev.penduline.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.records.parts.PartsList;
import dev.penduline.records.parts.PartsListReader;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.records.swing.SwingRecordReader;

/**
 * What the fuzzers of the two readers found (releng/fuzz; the inputs are also in the hostile
 * corpus, hostile/files/fuzz/): files that are not UTF-8, a comma as both delimiter and decimal
 * separator, and control characters echoed from the file into messages and warnings.
 */
class ReaderInputRefusalTest {

    private static final String PARTS_HEADER = "name,shape,mass_kg,x_m,y_m,z_m\n";

    @TempDir
    Path dir;

    private static byte[] bytes(Object... pieces) {
        final ByteArrayOutputStream b = new ByteArrayOutputStream();
        for (Object p : pieces) {
            final byte[] chunk = p instanceof byte[] raw ? raw : p.toString().getBytes(StandardCharsets.UTF_8);
            b.writeBytes(chunk);
        }
        return b.toByteArray();
    }

    private RecordFormatException partsFailure(byte[] content) throws IOException {
        final Path file = Files.write(dir.resolve("parts.csv"), content);
        return assertThrows(RecordFormatException.class, () -> new PartsListReader().read(file));
    }

    private static SwingRecord swing(byte[] content, SwingImportOptions options) throws Exception {
        return new SwingRecordReader().read(new ByteArrayInputStream(content), "record.csv", options);
    }

    private static RecordFormatException swingFailure(byte[] content, SwingImportOptions options) {
        return assertThrows(RecordFormatException.class, () -> swing(content, options));
    }

    /** A 10° swing at 100 Hz, decaying, with the given delimiter and decimal separator. */
    private static String swingRows(char delimiter, char decimal) {
        final StringBuilder b = new StringBuilder();
        for (int i = 0; i < 100; i++) {
            final double t = i * 0.01;
            b.append(String.format(Locale.ROOT, "%.2f%c%.4f\n", t, delimiter, 10 * Math.exp(-t) * Math.cos(6 * t))
                    .replace('.', decimal));
        }
        return b.toString();
    }

    @Test
    void aPartsListInLatin1IsRefusedAtItsLineAsNotUtf8() throws Exception {
        // "Türgriff" in ISO-8859-1: the byte 0xFC never appears in UTF-8 (RFC 3629, §1: "The octet values C0, C1,
        // F5 to FF never appear")
        final RecordFormatException e = partsFailure(bytes(PARTS_HEADER, "lid,point,1,0,-0.2,0\n",
                "T", new byte[] {(byte) 0xFC}, "rgriff,point,0.1,0,-0.3,0\n"));
        assertEquals(3, e.getLineNumber(), e.getMessage());
        assertTrue(e.getMessage().startsWith(dir.resolve("parts.csv") + ":3: not UTF-8 text at character 2"),
                e.getMessage());
    }

    @Test
    void aCommentInAnotherEncodingIsSkippedLikeAnyComment() throws Exception {
        final Path file = Files.write(dir.resolve("parts.csv"), bytes("# Messung Gr", new byte[] {(byte) 0xFC},
                "n\n", PARTS_HEADER, "lid,point,1,0,-0.2,0\n"));
        final PartsList list = new PartsListReader().read(file);
        assertEquals(1, list.parts().size());
    }

    @Test
    void validUtf8OutsideTheBasicPlaneIsNotTakenForAnEncodingError() throws Exception {
        // U+10FFFF encodes as F4 8F BF BF and decodes to the pair DBFF DFFF (RFC 3629 §3, Unicode §3.9):
        // its low half is the char the decoder uses as its mark, but here it is paired
        final Path file = Files.write(dir.resolve("parts.csv"), bytes(PARTS_HEADER, "lid\uDBFF\uDFFF,point,1,0,-0.2,0\n"));
        assertEquals("lid\uDBFF\uDFFF", new PartsListReader().read(file).parts().get(0).name());
    }

    @Test
    void utf16AndBinaryFilesAreNamedAsSuchAtLineOne() throws Exception {
        final byte[] utf16 = bytes(new byte[] {(byte) 0xFF, (byte) 0xFE},
                "time_s,angle_deg\n0,1\n".getBytes(StandardCharsets.UTF_16LE));
        final byte[] utf16WithoutMark = "time_s,angle_deg\n0,1\n".getBytes(StandardCharsets.UTF_16BE);
        final byte[] binary = {0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12};
        for (byte[] b : new byte[][] {utf16, utf16WithoutMark}) {
            final RecordFormatException s = swingFailure(b, SwingImportOptions.defaults());
            assertEquals("record.csv:1: not UTF-8 text (looks like UTF-16): save the file as UTF-8", s.getMessage());
            final RecordFormatException p = partsFailure(b);
            assertEquals(1, p.getLineNumber());
            assertTrue(p.getProblem().startsWith("not UTF-8 text (looks like UTF-16)"), p.getMessage());
        }
        final RecordFormatException s = swingFailure(binary, SwingImportOptions.defaults());
        assertEquals("record.csv:1: not UTF-8 text (looks like binary data): is it the right file?", s.getMessage());
        assertTrue(partsFailure(binary).getProblem().startsWith("not UTF-8 text (looks like binary data)"));
    }

    @Test
    void aSwingRecordLineInAnotherEncodingIsRefusedAtTheLineButACommentIsNot() throws Exception {
        final String rows = swingRows(',', '.');
        final byte[] badHeader = bytes("time_s,angle (", new byte[] {(byte) 0xB0}, ")\n", rows);
        final RecordFormatException e = swingFailure(badHeader, SwingImportOptions.defaults());
        assertEquals(1, e.getLineNumber(), e.getMessage());
        assertTrue(e.getProblem().startsWith("not UTF-8 text at character 15"), e.getMessage());
        final int cut = rows.indexOf('\n', rows.length() / 2) + 1;
        final byte[] badLate = bytes("time_s,angle_deg\n", rows.substring(0, cut), new byte[] {(byte) 0xE9}, "\n",
                rows.substring(cut));
        final RecordFormatException late = swingFailure(badLate, SwingImportOptions.defaults());
        assertEquals(2 + rows.substring(0, cut).split("\n").length, late.getLineNumber(), late.getMessage());
        final byte[] comment = bytes("# Messung Gr", new byte[] {(byte) 0xFC, (byte) 0xDF}, "e\ntime_s,angle_deg\n", rows);
        final SwingRecord r = swing(comment, SwingImportOptions.defaults());
        assertEquals(100, r.size());
        assertEquals(comment.length, r.byteCount(), "the hash and count are of the raw bytes");
    }

    @Test
    void aCommaCannotBeBothTheDelimiterAndTheDecimalSeparator() throws Exception {
        final IllegalArgumentException given = assertThrows(IllegalArgumentException.class, () -> SwingImportOptions
                .defaults().withDelimiter(',').withDecimalSeparator(','));
        assertTrue(given.getMessage().contains("cannot also be the delimiter"), given.getMessage());
        final byte[] commas = bytes("time_s,angle_deg\n", swingRows(',', '.'));
        final RecordFormatException detected = swingFailure(commas, SwingImportOptions.defaults().withDecimalSeparator(','));
        assertEquals(1, detected.getLineNumber());
        assertTrue(detected.getProblem().contains("cannot also be the delimiter"), detected.getMessage());
        assertEquals(100, swing(bytes("time_s;angle_deg\n", swingRows(';', ',')), SwingImportOptions.defaults()
                .withDecimalSeparator(',')).size(), "a decimal comma with semicolons is read");
    }

    @Test
    void controlCharactersFromTheFileAreEscapedInMessagesAndWarnings() throws Exception {
        final RecordFormatException cell = swingFailure(bytes("time_s,angle_deg\n0.00,1\n0.01,p\u001b[31mred\n"),
                SwingImportOptions.defaults());
        assertEquals("record.csv:3: column 'angle_deg': 'p\\u001b[31mred' is not a number", cell.getMessage());
        final RecordFormatException header = swingFailure(bytes("a\u0007,b\n0,1\n"), SwingImportOptions.defaults()
                .withAngleColumn(dev.penduline.records.swing.ColumnChoice.byName("angle_deg")));
        assertTrue(header.getMessage().endsWith("the header has: a\\u0007, b"), header.getMessage());
        final RecordFormatException mass = partsFailure(bytes(PARTS_HEADER, "lid,point,\"1\t\u009b2\",0,-0.2,0\n"));
        assertEquals("mass_kg", mass.getColumnName());
        assertTrue(mass.getProblem().startsWith("'1\\u0009\\u009b2' is not a number"), mass.getMessage());
        final Path file = Files.write(dir.resolve("extra.csv"), bytes("name,shape,mass_kg,x_m,y_m,z_m,\"c\u001b\"\n",
                "lid,point,1,0,-0.2,0,\n"));
        final PartsList list = new PartsListReader().read(file);
        assertEquals(1, list.warnings().size());
        assertTrue(list.warnings().get(0).contains("column 'c\\u001b' is not a parts-list column"), list.warnings().get(0));
        assertFalse(list.warnings().get(0).contains("\u001b"));
    }

    @Test
    void visibleEscapesControlsAndBrokenCharactersAndKeepsTheRest() {
        assertEquals("a\\u000ab\\u0009c\\u007f\\u0085 \\udfff ä \uD83D\uDE00", PlainText.visible(
                "a\nb\tc\u007f\u0085 \uDFFF ä \uD83D\uDE00"));
        final String plain = "plain text";
        assertTrue(plain == PlainText.visible(plain), "a clean text is returned as it is");
        assertNull(new RecordFormatException("f", 0, null, "x").getColumnName());
    }
}
