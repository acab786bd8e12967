package dev.penduline.records.swing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.physics.units.Unit;
import dev.penduline.records.RecordFormatException;

/**
 * Unit factors checked against their definitions: 1 ms = 10⁻³ s, 1 µs = 10⁻⁶ s (SI prefixes), 1° = π/180 rad
 * (NIST Special Publication 811, §B.9 and Table 6), one encoder count = 2π/CPR rad (definition of counts per
 * revolution).
 */
class SwingRecordReaderTest {

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
    }

    /** A 10° swing at 100 Hz, 300 samples, written with the given format per line. */
    private static String swing(String header, String rowFormat, double timeScale) {
        final StringBuilder b = new StringBuilder(header);
        for (int i = 0; i < 300; i++) {
            final double t = i * 0.01;
            b.append(String.format(Locale.ROOT, rowFormat, t * timeScale, 10 * Math.cos(4 * t))).append('\n');
        }
        return b.toString();
    }

    private static SwingRecord read(Path file) throws IOException, RecordFormatException {
        return new SwingRecordReader().read(file, SwingImportOptions.defaults());
    }

    @Test
    void commaSeparatedWithUnitsInTheHeader() throws Exception {
        final Path f = write("a.csv", "# rig 3, run 7\n" + swing("time_s,angle_deg\n", "%.3f,%.5f", 1));
        final SwingRecord r = read(f);
        assertEquals(300, r.size());
        assertEquals(0.01 * 17, r.times()[17], 1e-12);
        assertEquals(Math.PI / 180 * Double.parseDouble(String.format(Locale.ROOT, "%.5f", 10 * Math.cos(4 * 0.17))),
                r.angles()[17], 1e-15);
        final SwingRecordMapping m = r.mapping();
        assertEquals(',', m.delimiter());
        assertEquals('.', m.decimalSeparator());
        assertTrue(m.header());
        assertEquals(new ColumnChoice("time_s", 1), m.timeColumn());
        assertEquals(new ColumnChoice("angle_deg", 2), m.angleColumn());
        assertEquals(Unit.DEGREE, m.angleUnit());
        assertTrue(r.assumptions().stream().anyMatch(s -> s.contains("angle in °")), r.assumptions().toString());
        assertTrue(r.warnings().isEmpty(), r.warnings().toString());
    }

    @Test
    void semicolonsWithDecimalCommasAndMilliseconds() throws Exception {
        final Path f = write("b.csv", swing("t_ms;theta_rad\n", "%.1f;%.6f", 1000).replace('.', ','));
        final SwingRecord r = read(f);
        assertEquals(';', r.mapping().delimiter());
        assertEquals(',', r.mapping().decimalSeparator());
        assertTrue(r.assumptions().stream().anyMatch(s -> s.contains("decimal separator ','")));
        assertEquals(Unit.MILLISECOND, r.mapping().timeUnit());
        assertEquals(2.99, r.times()[299], 1e-12);
        assertEquals(10 * Math.cos(4 * 2.99), r.angles()[299], 1e-6);
    }

    @Test
    void tabsWithoutHeaderAreReadByPositionAndSaySo() throws Exception {
        final SwingRecord r = read(write("c.txt", swing("", "%.3f\t%.4f", 1)));
        assertFalse(r.mapping().header());
        assertEquals('\t', r.mapping().delimiter());
        assertNull(r.mapping().timeColumn().name());
        assertEquals(2, r.mapping().angleColumn().index());
        assertTrue(r.assumptions().stream().anyMatch(s -> s.contains("no header row")));
        assertTrue(r.assumptions().stream().anyMatch(s -> s.contains("angle in °: no unit")));
        assertTrue(r.assumptions().stream().anyMatch(s -> s.contains("time in s: no unit")));
    }

    @Test
    void encoderCountsNeedTheirCountsPerRevolution() throws Exception {
        final StringBuilder b = new StringBuilder("time_us,counts\n");
        for (int i = 0; i < 50; i++) {
            b.append(i * 2000).append(',').append(1000 - i * i).append('\n');
        }
        final Path f = write("d.csv", b.toString());
        final RecordFormatException e = assertThrows(RecordFormatException.class, () -> read(f));
        assertTrue(e.getProblem().contains("counts per revolution"), e.getMessage());
        final SwingRecord r = new SwingRecordReader().read(f, SwingImportOptions.defaults().withCountsPerRevolution(4096));
        assertEquals(2 * Math.PI / 4096 * (1000 - 49 * 49), r.angles()[49], 1e-12);
        assertEquals(49 * 2000e-6, r.times()[49], 1e-15);
        assertEquals(4096, r.mapping().countsPerRevolution());
    }

    @Test
    void aRecordThatStatesItsCountsPerRevolutionIsReadWithThem() throws Exception {
        final StringBuilder b = new StringBuilder("# rig 2, encoder 2048 counts/rev, quadrature decoded\ntime_us,counts\n");
        for (int i = 0; i < 50; i++) {
            b.append(i * 2000).append(',').append(1000 - i * i).append('\n');
        }
        final Path f = write("stated.csv", b.toString());
        final SwingRecord r = read(f);
        // one count is a 2048th of a turn: 2π/2048 rad
        assertEquals(2 * Math.PI / 2048 * (1000 - 49 * 49), r.angles()[49], 1e-12);
        assertTrue(String.join("\n", r.assumptions()).contains("2048 encoder counts per revolution, as the record's line 1"
                + " says"), r.assumptions().toString());
        final SwingRecord told = new SwingRecordReader().read(f, SwingImportOptions.defaults().withCountsPerRevolution(4096));
        assertEquals(4096, told.mapping().countsPerRevolution(), "what the user says wins");
        assertTrue(String.join("\n", told.assumptions()).contains("says 2048 counts per revolution; the 4096 given is used"),
                told.assumptions().toString());
        final Path other = write("other.csv", "# counts_per_rev = 1024\n" + b.substring(b.indexOf("time_us")));
        assertEquals(1024, read(other).mapping().countsPerRevolution());
    }

    @Test
    void columnsChosenByNameOrPositionAndTheMappingReadsTheSameAgain() throws Exception {
        final StringBuilder b = new StringBuilder("sample,\"Time (ms)\",temp_c,pos_deg\n");
        for (int i = 0; i < 40; i++) {
            b.append(i).append(',').append(i * 5).append(",21.5,").append(String.format(Locale.ROOT, "%.3f", 30 - i * 0.5))
                    .append('\n');
        }
        final Path f = write("e.csv", b.toString());
        final SwingRecord byName = new SwingRecordReader().read(f, SwingImportOptions.defaults()
                .withTimeColumn(ColumnChoice.byName("time (ms)")).withAngleColumn(ColumnChoice.byName("POS_DEG")));
        assertEquals(new ColumnChoice("Time (ms)", 2), byName.mapping().timeColumn());
        assertEquals(Unit.MILLISECOND, byName.mapping().timeUnit());
        assertEquals(0.195, byName.times()[39], 1e-15);
        final SwingRecord detected = read(f);
        assertEquals(4, detected.mapping().angleColumn().index());
        final SwingRecord byIndex = new SwingRecordReader().read(f, SwingImportOptions.defaults()
                .withTimeColumn(ColumnChoice.byIndex(2)).withAngleColumn(ColumnChoice.byIndex(4)));
        assertArrayEquals(byName.angles(), byIndex.angles());
        final SwingRecord again = new SwingRecordReader().read(f, byName.mapping().toOptions());
        assertArrayEquals(byName.times(), again.times());
        assertArrayEquals(byName.angles(), again.angles());
        assertTrue(again.assumptions().stream().noneMatch(s -> s.contains("detect")));
    }

    @Test
    void theRawFileIsUntouchedAndItsHashIsTheJdkSha256() throws Exception {
        final Path f = write("f.csv", swing("time_s,angle_deg\r\n", "%.3f,%.5f\r", 1));
        final FileTime past = FileTime.fromMillis(1_500_000_000_000L);
        Files.setLastModifiedTime(f, past);
        final byte[] before = Files.readAllBytes(f);
        final SwingRecord r = read(f);
        assertArrayEquals(before, Files.readAllBytes(f));
        assertEquals(past, Files.getLastModifiedTime(f));
        // reference: the JDK's MessageDigest over the whole file (FIPS 180-4 SHA-256)
        assertEquals(HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(before)), r.sha256());
        assertEquals(before.length, r.byteCount());
        assertEquals(f.toString(), r.source());
    }

    @Test
    void aGapIsAWarningNamingItsLine() throws Exception {
        final String text = swing("time_s,angle_deg\n", "%.3f,%.5f", 1);
        final String[] lines = text.split("\n");
        final StringBuilder b = new StringBuilder();
        for (int i = 0; i < lines.length; i++) {
            if (i < 120 || i > 130) {
                b.append(lines[i]).append('\n');
            }
        }
        final SwingRecord r = read(write("g.csv", b.toString()));
        assertEquals(1, r.warnings().size(), r.warnings().toString());
        assertTrue(r.warnings().get(0).startsWith(dir.resolve("g.csv") + ":121: gap of 0.12"), r.warnings().get(0));
    }

    private RecordFormatException bad(String text) throws IOException {
        final Path f = write("bad.csv", text);
        return assertThrows(RecordFormatException.class, () -> read(f));
    }

    private String withLine(int dataIndex, String replacement) {
        final String[] lines = swing("time_s,angle_deg\n", "%.3f,%.5f", 1).split("\n");
        lines[dataIndex + 1] = replacement;
        return String.join("\n", lines) + "\n";
    }

    @Test
    void everyBadInputNamesFileLineAndColumn() throws Exception {
        RecordFormatException e = bad(withLine(3, "0.030,abc"));
        assertEquals(5, e.getLineNumber());
        assertEquals("angle_deg", e.getColumnName());
        assertTrue(e.getMessage().startsWith(dir.resolve("bad.csv") + ":5: column 'angle_deg': 'abc' is not a number"),
                e.getMessage());

        e = bad(withLine(4, "0.040,NaN"));
        assertEquals(6, e.getLineNumber());
        assertTrue(e.getProblem().contains("not a finite number"), e.getMessage());

        e = bad(withLine(4, "0.040,-inf"));
        assertEquals("angle_deg", e.getColumnName());
        assertTrue(e.getProblem().contains("not a finite number"), e.getMessage());

        e = bad(withLine(10, "0.020,1.0"));
        assertEquals(12, e.getLineNumber());
        assertEquals("time_s", e.getColumnName());
        assertTrue(e.getProblem().contains("time goes backwards") && e.getProblem().contains("line 11"), e.getMessage());

        e = bad(withLine(10, "0.090,1.0"));
        assertEquals(12, e.getLineNumber());
        assertTrue(e.getProblem().contains("duplicate timestamp: the same time as line 11"), e.getMessage());

        e = bad(withLine(7, "0.070"));
        assertEquals(9, e.getLineNumber());
        assertEquals("angle_deg", e.getColumnName());
        assertTrue(e.getProblem().startsWith("missing"), e.getMessage());

        e = bad(withLine(7, "0.070,1,5"));
        assertEquals(9, e.getLineNumber());
        assertTrue(e.getProblem().contains("3 fields but the header has 2"), e.getMessage());

        e = bad("time_s,angle_deg\n0,1\n0.01,2\n0.02,3\n");
        assertEquals(0, e.getLineNumber());
        assertTrue(e.getProblem().contains("only 3 samples"), e.getMessage());

        final StringBuilder still = new StringBuilder("time_s,angle_deg\n");
        for (int i = 0; i < 100; i++) {
            still.append(i * 0.01).append(",12.5\n");
        }
        e = bad(still.toString());
        assertTrue(e.getProblem().contains("never moves"), e.getMessage());

        final Path f = write("h.csv", swing("time_s,angle_deg\n", "%.3f,%.5f", 1));
        e = assertThrows(RecordFormatException.class, () -> new SwingRecordReader().read(f,
                SwingImportOptions.defaults().withAngleColumn(ColumnChoice.byName("theta"))));
        assertEquals(1, e.getLineNumber());
        assertTrue(e.getProblem().contains("no column named 'theta'"), e.getMessage());
    }
}
