package dev.penduline.records.swing;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;

import dev.penduline.records.BoundedLines;
import dev.penduline.records.DelimitedLine;
import dev.penduline.records.InputFiles;
import dev.penduline.records.InputLimits;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.Utf8Text;
import dev.penduline.records.swing.LayoutSniffer.SampleLine;

/**
 * Reads a swing-test record (time and angle columns of delimited text) into SI arrays, in one
 * streaming pass that also hashes the raw bytes.
 *
 * <p><b>Layout.</b> Comma, semicolon or tab delimited; '.' or ',' decimals (a decimal comma
 * needs another delimiter); an optional header row; blank lines and lines starting with
 * {@code #} are skipped anywhere. Columns are chosen by header name or 1-based position, or
 * detected from the header ({@code time_s}, {@code t_ms}, {@code time (us)}, {@code angle_deg},
 * {@code theta_rad}, {@code counts}, ...). Units: s, ms, µs ({@code us}); rad, deg, encoder
 * counts (which need the counts per revolution). Whatever was detected rather than told is
 * listed in {@link SwingRecord#assumptions()}.
 *
 * <p><b>Checks.</b> Errors ({@link RecordFormatException} with file, line and column): a cell
 * that is not a number, NaN or infinite values, a missing cell, a time equal to or earlier than
 * the previous one, fewer samples than the minimum, an angle that never moves. Warnings (file
 * and line): a gap longer than the gap factor times the median step. Irregular sampling is
 * allowed.
 *
 * <p><b>Speed.</b> Lines are split by {@link dev.penduline.records.DelimitedLine#fieldBounds}
 * and numbers parsed straight from the line, into growable primitive arrays: a 300 000-line
 * file loads in a fraction of a second (see the benchmark beside the tests). The file is opened
 * for reading only and never written.
 */
public final class SwingRecordReader {

    private static final int SNIFF_LINES = 20;

    /** Creates a reader. */
    public SwingRecordReader() {
        // settings travel in SwingImportOptions, so one reader serves every file
    }

    /**
     * Reads a record file (UTF-8).
     *
     * @param file    the file; opened for reading only, and only when it is a regular file (a named pipe, a
     *                device or a folder is refused unopened, see {@link InputFiles})
     * @param options what the user said; the rest is detected
     * @return the record, with its path, hash, mapping, assumptions and warnings
     * @throws IOException           when the file cannot be read
     * @throws RecordFormatException naming file, line and column of the first problem
     */
    public SwingRecord read(Path file, SwingImportOptions options) throws IOException, RecordFormatException {
        InputFiles.requireRegularFile(file, "a swing record (a .csv file)");
        InputLimits.requireSize(file, InputLimits.MAX_RECORD_BYTES, "swing record");
        try (InputStream in = Files.newInputStream(file, StandardOpenOption.READ)) {
            return read(in, file.toString(), options);
        }
    }

    /**
     * Reads a record from a byte stream (UTF-8; a used line in another encoding is refused with its
     * number, see {@link Utf8Text}) to its end.
     *
     * @param in       the bytes; not closed by this method
     * @param fileName the name to use in messages and as the record's source
     * @param options  what the user said; the rest is detected
     * @return the record
     * @throws IOException           when the stream fails
     * @throws RecordFormatException naming file, line and column of the first problem
     */
    public SwingRecord read(InputStream in, String fileName, SwingImportOptions options)
            throws IOException, RecordFormatException {
        final MessageDigest digest = sha256();
        final CountingDigestStream hashed = new CountingDigestStream(in, digest);
        final BufferedReader lines = new BufferedReader(Utf8Text.reader(hashed), 1 << 16);
        final BoundedLines bounded = new BoundedLines(lines, fileName, InputLimits.MAX_LINE_CHARS);
        final List<SampleLine> sniffed = new ArrayList<>();
        StatedCounts stated = null;
        int lineNumber = 0;
        String line;
        while (sniffed.size() < SNIFF_LINES && (line = bounded.next()) != null) {
            lineNumber++;
            if (lineNumber == 1 && line.startsWith("\uFEFF")) {
                line = line.substring(1);
            }
            final boolean skipped = isSkipped(line);
            Utf8Text.check(line, lineNumber, !skipped, fileName);
            if (!skipped) {
                sniffed.add(new SampleLine(line, lineNumber));
            } else if (stated == null && sniffed.isEmpty()) {
                stated = StatedCounts.find(line, lineNumber);
            }
        }
        final List<String> assumptions = new ArrayList<>();
        final SwingImportOptions withStated = StatedCounts.apply(stated, options, assumptions);
        final SwingRecordMapping mapping = LayoutSniffer.decide(sniffed, withStated, fileName, assumptions);
        final int headerWidth = mapping.header()
                ? DelimitedLine.split(sniffed.get(0).text(), mapping.delimiter(), fileName, sniffed.get(0).number()).size()
                : 0;
        final RowParser parser = new RowParser(mapping, fileName, headerWidth);
        final SampleSeries series = new SampleSeries();
        for (int k = mapping.header() ? 1 : 0; k < sniffed.size(); k++) {
            parser.parse(sniffed.get(k).text(), sniffed.get(k).number(), series);
        }
        while ((line = bounded.next()) != null) {
            lineNumber++;
            if (!isSkipped(line)) {
                Utf8Text.check(line, lineNumber, true, fileName);
                parser.parse(line, lineNumber, series);
            }
        }
        final List<String> warnings = new ArrayList<>();
        RecordChecks.check(series, options, mapping, fileName, assumptions, warnings);
        return new SwingRecord(fileName, HexFormat.of().formatHex(digest.digest()), hashed.count(), mapping,
                series.times(), series.angles(), assumptions, warnings);
    }

    private static boolean isSkipped(String line) {
        for (int i = 0; i < line.length(); i++) {
            final char c = line.charAt(i);
            if (!Character.isWhitespace(c)) {
                return c == '#';
            }
        }
        return true;
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform must provide SHA-256", e);
        }
    }

    /** Hashes and counts the bytes as they are read. */
    private static final class CountingDigestStream extends DigestInputStream {
        private long count;

        CountingDigestStream(InputStream in, MessageDigest digest) {
            super(in, digest);
        }

        @Override
        public int read() throws IOException {
            final int b = super.read();
            if (b >= 0) {
                count++;
            }
            return b;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            final int n = super.read(b, off, len);
            if (n > 0) {
                count += n;
            }
            return n;
        }

        long count() {
            return count;
        }
    }

    static String format(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
