package dev.penduline.benchmarks;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import dev.penduline.records.RecordFormatException;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.records.swing.SwingRecordReader;

/**
 * Reading a 300 000-line swing record (5 minutes at 1 kHz, {@code time_s,angle_deg}, 5 MB):
 * layout detection, parsing, the checks, and the SHA-256 of the raw bytes in the same pass.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class RecordImportBenchmark {

    private Path file;
    private final SwingRecordReader reader = new SwingRecordReader();

    /**
     * Writes the record once.
     *
     * @throws IOException when the temporary file cannot be written
     */
    @Setup
    public void write() throws IOException {
        file = Files.createTempFile("penduline-record-benchmark", ".csv");
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("time_s,angle_deg\n");
            for (int i = 0; i < 300_000; i++) {
                double t = i * 1e-3;
                w.write(String.format(Locale.ROOT, "%.4f,%.5f%n", t, 20 * Math.exp(-0.02 * t) * Math.cos(4 * t)));
            }
        }
    }

    /**
     * Removes the record.
     *
     * @throws IOException when it cannot be deleted
     */
    @TearDown
    public void delete() throws IOException {
        Files.deleteIfExists(file);
    }

    /**
     * Reads the record.
     *
     * @return the record, so that the work is not optimised away
     * @throws IOException           never, for a file written by the set-up
     * @throws RecordFormatException never, for a well-formed file
     */
    @Benchmark
    public SwingRecord read300000Lines() throws IOException, RecordFormatException {
        return reader.read(file, SwingImportOptions.defaults());
    }
}
