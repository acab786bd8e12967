package dev.penduline.records.swing;

import java.util.List;

/**
 * A swing-test record as imported: the samples in SI, where they came from, a hash of the raw
 * bytes (so a project can tell when the file changed behind its back) and the mapping that read
 * it. Arrays are copied out; the raw file is never modified.
 */
public final class SwingRecord {

    private final String source;
    private final String sha256;
    private final long byteCount;
    private final SwingRecordMapping mapping;
    private final double[] times;
    private final double[] angles;
    private final List<String> assumptions;
    private final List<String> warnings;

    SwingRecord(String source, String sha256, long byteCount, SwingRecordMapping mapping, double[] times,
            double[] angles, List<String> assumptions, List<String> warnings) {
        this.source = source;
        this.sha256 = sha256;
        this.byteCount = byteCount;
        this.mapping = mapping;
        this.times = times;
        this.angles = angles;
        this.assumptions = List.copyOf(assumptions);
        this.warnings = List.copyOf(warnings);
    }

    /**
     * Where the record was read from.
     *
     * @return the path (or stream name) as given to the reader
     */
    public String source() {
        return source;
    }

    /**
     * SHA-256 of the raw bytes, in lower-case hexadecimal.
     *
     * @return 64 hexadecimal digits
     */
    public String sha256() {
        return sha256;
    }

    /**
     * Length of the raw file.
     *
     * @return bytes read
     */
    public long byteCount() {
        return byteCount;
    }

    /**
     * How the text was read.
     *
     * @return the mapping, ready to store
     */
    public SwingRecordMapping mapping() {
        return mapping;
    }

    /**
     * Sample times in the record's own time base.
     *
     * @return times (s), strictly increasing
     */
    public double[] times() {
        return times.clone();
    }

    /**
     * Angles as the sensor read them.
     *
     * @return angles (rad)
     */
    public double[] angles() {
        return angles.clone();
    }

    /**
     * Number of samples.
     *
     * @return the count
     */
    public int size() {
        return times.length;
    }

    /**
     * What the reader detected rather than was told, one sentence each, for the user to check.
     *
     * @return the assumptions (unmodifiable)
     */
    public List<String> assumptions() {
        return assumptions;
    }

    /**
     * Things in the data the user should know (gaps, unusual sampling), each starting with
     * {@code file:line:} where a line is concerned.
     *
     * @return the warnings (unmodifiable)
     */
    public List<String> warnings() {
        return warnings;
    }
}
