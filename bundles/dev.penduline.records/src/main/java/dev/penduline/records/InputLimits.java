package dev.penduline.records;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import dev.penduline.physics.InputMessage;

/**
 * The sizes Penduline's readers accept, checked before and while reading so that an input too
 * large for the memory budget is refused at once, with the limit, the size seen and what to do,
 * instead of exhausting the heap. The README's "Limits" section states the same figures.
 *
 * <p>The figures fit the launcher's default heap of 2 GiB with room to spare ("common practice"
 * margins, measured in DEVELOPERS.md): a record of {@link #MAX_RECORD_SAMPLES} samples is read,
 * analysed and fitted (decimated) inside it.
 */
public final class InputLimits {

    /** Longest line of a parts list or a swing record, in characters (64 KiB). */
    public static final int MAX_LINE_CHARS = 64 * 1024;
    /** Most samples (data lines) of one swing record: about 2.8 h at 1 kHz. */
    public static final int MAX_RECORD_SAMPLES = 10_000_000;
    /** Largest swing-record file, in bytes (512 MiB: 10 million lines of about 50 characters). */
    public static final long MAX_RECORD_BYTES = 512L * 1024 * 1024;
    /** Largest parts-list file, in bytes (16 MiB). */
    public static final long MAX_PARTS_LIST_BYTES = 16L * 1024 * 1024;
    /**
     * Most parts (lines) of one parts list: an assembly's bill of materials has hundreds; naming
     * the parts of a new mechanism file costs time that grows with the square of their number.
     */
    public static final int MAX_PARTS = 10_000;

    private InputLimits() {
    }

    /**
     * Refuses a regular file larger than a limit, before anything of it is read. Files that are
     * not regular (devices, pipes) have no size to check here; their reader's line and sample
     * limits still stop them.
     *
     * @param file  the file
     * @param limit the largest size accepted (bytes)
     * @param what  what the file is, for the message ("swing record", "parts list")
     * @throws IOException           when its size cannot be read
     * @throws RecordFormatException when it is larger than the limit
     */
    public static void requireSize(Path file, long limit, String what) throws IOException, RecordFormatException {
        if (!Files.isRegularFile(file)) {
            return;
        }
        final long size = Files.size(file);
        if (size > limit) {
            throw new RecordFormatException(file.toString(), 0, null, InputMessage.FILE_TOO_LARGE.format(bytes(size),
                    bytes(limit), what));
        }
    }

    /**
     * A byte count for people: {@code 13.7 MB (13 752 070 bytes)} style, in binary units.
     *
     * @param size bytes
     * @return the text
     */
    public static String bytes(long size) {
        if (size < 1024) {
            return size + " bytes";
        }
        final String[] units = {"KiB", "MiB", "GiB", "TiB"};
        double v = size;
        int u = -1;
        while (v >= 1024 && u < units.length - 1) {
            v /= 1024;
            u++;
        }
        return (v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.1f", v)) + " "
                + units[u];
    }
}
