package dev.penduline.benchmarks;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.Instant;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import dev.penduline.report.MechanismReports;
import dev.penduline.report.ReportDocument;
import dev.penduline.report.ReportFiles;
import dev.penduline.report.ReportRequest;
import dev.penduline.services.InputException;

/**
 * The report of the sample hatch (three 30 000-sample records and a stored fit; no predictions):
 * reading the file and its records, the inertia with its 2 000 tolerance draws, each session's
 * analysis and its model replayed from the stored fit, eleven SVG plots, and the HTML written.
 * The goal is under 2 s warm. Run from the repository root (the sample is read from
 * {@code samples/inspection-hatch}).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class ReportBenchmark {

    private Path project;
    private Path mechanism;

    /**
     * Copies the sample project to a temporary folder, so the report is written beside it there.
     *
     * @throws IOException when the sample cannot be copied
     */
    @Setup
    public void copySample() throws IOException {
        Path sample = Paths.get("samples/inspection-hatch").toAbsolutePath();
        if (!Files.isDirectory(sample)) {
            throw new IOException(sample + " not found: run the benchmark from the repository root");
        }
        project = Files.createTempDirectory("penduline-report-benchmark");
        try (Stream<Path> files = Files.walk(sample)) {
            for (Path f : (Iterable<Path>) files::iterator) {
                Path to = project.resolve(sample.relativize(f).toString());
                if (Files.isDirectory(f)) {
                    Files.createDirectories(to);
                } else if (!f.getFileName().toString().endsWith("-report.html")) {
                    Files.copy(f, to);
                }
            }
        }
        mechanism = project.resolve("hatch.penduline");
    }

    /**
     * Removes the copy.
     *
     * @throws IOException when it cannot be deleted
     */
    @TearDown
    public void delete() throws IOException {
        try (Stream<Path> files = Files.walk(project)) {
            for (Path f : files.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(f);
            }
        }
    }

    /**
     * Builds and writes the report.
     *
     * @return the notes of the write, so the work is not optimised away
     * @throws InputException never, for the sample
     */
    @Benchmark
    public List<String> reportOfTheSample() throws InputException {
        ReportDocument doc = MechanismReports.build(ReportRequest.of(mechanism, Optional.empty(), Optional.empty(),
                "benchmark", Instant.parse("2026-12-03T00:00:00Z"), 9.80665));
        Path target = ReportFiles.defaultTarget(mechanism, ReportFiles.Kind.HTML);
        return ReportFiles.write(doc, target, ReportFiles.Kind.HTML, "benchmark", true);
    }
}
