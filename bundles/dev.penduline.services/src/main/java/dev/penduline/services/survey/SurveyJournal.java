package dev.penduline.services.survey;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.services.InputException;

/**
 * The survey's append-only journal in its output folder ({@value #FILE_NAME}): one line a unit
 * as it completes, with the fingerprint of the settings it was fitted with, written and forced to
 * the disk before the next, so that a run stopped at any moment (a crash, Ctrl-C, a power cut)
 * keeps every unit it finished. A half-written last line (no line end) and any line that does
 * not read back are ignored.
 *
 * <p>Opening a journal rewrites it atomically with only its readable lines (the latest of each
 * unit and fingerprint), so that an append never joins a half-written line.
 */
public final class SurveyJournal implements AutoCloseable {

    /** The journal's file name in the output folder. */
    public static final String FILE_NAME = "units.journal";

    private static final String HEADER = "# penduline survey journal 1: fingerprint, then the unit's row; tab-separated";
    private static final String ROW = "row";
    private static final String END = ".";

    private final Path file;
    private final Map<String, SurveyRow> earlier;
    private FileChannel channel;

    private SurveyJournal(Path file, Map<String, SurveyRow> earlier, FileChannel channel) {
        this.file = file;
        this.earlier = earlier;
        this.channel = channel;
    }

    /**
     * Opens (or starts) the journal of an output folder.
     *
     * @param folder the output folder (created when missing)
     * @return the journal, with the rows of earlier runs
     * @throws InputException naming the file when it cannot be read or written
     */
    public static SurveyJournal open(Path folder) throws InputException {
        Path file = folder.resolve(FILE_NAME);
        try {
            Files.createDirectories(folder);
            Map<String, String> lines = new LinkedHashMap<>();
            Map<String, SurveyRow> rows = new LinkedHashMap<>();
            if (Files.exists(file)) {
                String text = Files.readString(file, StandardCharsets.UTF_8);
                int end = text.lastIndexOf('\n');
                for (String line : (end < 0 ? "" : text.substring(0, end)).split("\n", -1)) {
                    parse(line).ifPresent(e -> {
                        String id = id(e.fingerprint(), e.row().key());
                        lines.remove(id);
                        lines.put(id, line);
                        rows.put(id, e.row());
                    });
                }
            }
            StringBuilder kept = new StringBuilder(HEADER).append('\n');
            lines.values().forEach(l -> kept.append(l).append('\n'));
            AtomicFileWrite.write(file, out -> out.write(kept.toString().getBytes(StandardCharsets.UTF_8)));
            FileChannel channel = FileChannel.open(file, StandardOpenOption.WRITE, StandardOpenOption.APPEND);
            return new SurveyJournal(file, rows, channel);
        } catch (IOException e) {
            throw new InputException(file + ": " + AtomicFileWrite.reason(e), e);
        }
    }

    /** One line read back. */
    private record Entry(String fingerprint, SurveyRow row) {
    }

    private static Optional<Entry> parse(String line) {
        String[] f = line.split("\t", -1);
        if (f.length != SurveyRow.FIELDS + 3 || !f[0].equals(ROW) || !f[f.length - 1].equals(END)) {
            return Optional.empty();
        }
        String[] fields = new String[SurveyRow.FIELDS];
        System.arraycopy(f, 2, fields, 0, SurveyRow.FIELDS);
        try {
            return Optional.of(new Entry(SurveyRow.unescape(f[1]), SurveyRow.decode(fields)));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    private static String id(String fingerprint, String key) {
        return fingerprint + "\t" + key;
    }

    /**
     * The row an earlier run wrote for a unit with these settings and these records, if any; only
     * fitted rows are reused (a failed unit is tried again).
     *
     * @param fingerprint the settings' fingerprint
     * @param key         the unit's key
     * @param sha256s     its records' SHA-256 now, in its files' order
     * @return the earlier row
     */
    public Optional<SurveyRow> earlier(String fingerprint, String key, List<String> sha256s) {
        SurveyRow r = earlier.get(id(fingerprint, key));
        return r != null && r.fitted() && r.sha256s().equals(sha256s) ? Optional.of(r) : Optional.empty();
    }

    /**
     * Appends a unit's row and forces it to the disk.
     *
     * @param fingerprint the settings' fingerprint
     * @param row         the row
     * @throws IOException when it cannot be written
     */
    public synchronized void append(String fingerprint, SurveyRow row) throws IOException {
        List<String> f = new ArrayList<>();
        f.add(ROW);
        f.add(SurveyRow.escape(fingerprint));
        f.add(row.encode());
        f.add(END);
        ByteBuffer bytes = ByteBuffer.wrap((String.join("\t", f) + "\n").getBytes(StandardCharsets.UTF_8));
        while (bytes.hasRemaining()) {
            channel.write(bytes);
        }
        channel.force(false);
    }

    /**
     * The journal's file.
     *
     * @return the path
     */
    public Path file() {
        return file;
    }

    @Override
    public synchronized void close() throws IOException {
        if (channel != null) {
            channel.close();
            channel = null;
        }
    }
}
