package dev.penduline.records.swing;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Times the import of a 300 000-line record (1 kHz for 5 minutes, time in s and angle in degrees). Run as a
 * plain program; its name keeps it out of the unit-test run. Prints each read and the best of eight.
 */
public final class SwingRecordReaderBenchmark {

    private SwingRecordReaderBenchmark() {
    }

    /**
     * Writes the record to a temporary file, reads it repeatedly and prints the timings.
     *
     * @param args ignored
     * @throws Exception when the file cannot be written or read
     */
    public static void main(String[] args) throws Exception {
        final Path file = Files.createTempFile("swing-bench", ".csv");
        try {
            try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
                w.write("time_s,angle_deg\n");
                for (int i = 0; i < 300_000; i++) {
                    final double t = i * 1e-3;
                    w.write(String.format(Locale.ROOT, "%.4f,%.5f%n", t, 20 * Math.exp(-0.02 * t) * Math.cos(4 * t)));
                }
            }
            final SwingRecordReader reader = new SwingRecordReader();
            double best = Double.POSITIVE_INFINITY;
            for (int k = 0; k < 8; k++) {
                final long start = System.nanoTime();
                final SwingRecord r = reader.read(file, SwingImportOptions.defaults());
                final double ms = (System.nanoTime() - start) / 1e6;
                best = Math.min(best, ms);
                System.out.printf(Locale.ROOT, "read %d: %d samples, %d bytes in %.1f ms%n", k, r.size(),
                        r.byteCount(), ms);
            }
            System.out.printf(Locale.ROOT, "best of 8: %.1f ms for 300 000 lines (%d bytes)%n", best, Files.size(file));
        } finally {
            Files.delete(file);
        }
    }
}
