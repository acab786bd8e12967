package dev.penduline.cli.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.jar.Manifest;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.model.FitResult;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.services.Defaults;

/**
 * The sample project's committed report ({@code samples/inspection-hatch/hatch-report.html}, linked
 * from the sample's README) is made again here, dated as its stored fit and with the bundle's
 * version, and must equal the committed file byte for byte: a change of the code, the sample or
 * the wording that changes the report fails this test until the report is made again with
 * {@code -Dsample.report=true} (which writes it) and committed. So the committed report never goes
 * stale.
 */
class SampleReportTest {

    private static final Path SAMPLE = Path.of("../../samples/inspection-hatch/hatch.penduline");

    /** The predictions of the sample README's example, in the report. */
    static final List<String> PREDICT = List.of("--theta0-deg", "60", "--at-deg", "0", "--radius-m", "0.5");

    @TempDir
    Path dir;

    @Test
    void theCommittedReportOfTheSampleIsTheOneTheCodeWritesToday() throws Exception {
        assertTrue(Files.isRegularFile(SAMPLE), SAMPLE.toAbsolutePath().toString());
        List<FitResult> fits = MechanismFiles.load(SAMPLE).getFitResults();
        Instant dated = Instant.parse(fits.get(fits.size() - 1).getComputedAt());
        String version;
        try (var in = Files.newInputStream(Path.of("META-INF/MANIFEST.MF"))) {
            version = new Manifest(in).getMainAttributes().getValue("Bundle-Version").replace(".qualifier", "");
        }
        Path made = dir.resolve("hatch-report.html");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        List<String> args = new java.util.ArrayList<>(List.of(SAMPLE.toString(), "--out", made.toString(), "--predict"));
        args.addAll(PREDICT);
        ExitCode code = new ReportCommand(() -> dated, () -> version).run(args, Defaults.BUILT_IN, new PrintWriter(out, true),
                new PrintWriter(err, true));
        assertEquals(ExitCode.OK, code, out + "\n" + err);
        Path committed = SAMPLE.resolveSibling("hatch-report.html");
        String today = Files.readString(made);
        if (Boolean.getBoolean("sample.report")) {
            Files.writeString(committed, today);
        }
        assertTrue(Files.isRegularFile(committed), "no committed report: make it with -Dsample.report=true");
        assertEquals(Files.readString(committed), today, "the committed sample report is stale: make it again with"
                + " -Dsample.report=true and commit it");
    }
}
