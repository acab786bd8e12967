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
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.model.FitResult;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.services.Defaults;

/**
 * The sample project's committed report ({@code samples/inspection-hatch/hatch-report.html}, linked
 * from the sample's README) is made again here, dated as its stored fit and with the bundle's
 * version, and must say what the committed file says, line by line (the plots compared by the
 * series they draw: their layout follows the machine's fonts): a change of the code, the sample or
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
        List<String> was = words(Files.readString(committed));
        List<String> now = words(today);
        for (int i = 0; i < Math.min(was.size(), now.size()); i++) {
            assertEquals(was.get(i), now.get(i), "the committed sample report is stale from line " + (i + 1)
                    + ": make it again with -Dsample.report=true and commit it");
        }
        assertEquals(was.size(), now.size(), "the committed sample report is stale (its length): make it again with"
                + " -Dsample.report=true and commit it");
    }

    /**
     * The report's text line by line, each plot reduced to its series and the words of its title and
     * legend: where a plot's labels and ticks sit depends on the machine's fonts (the SVG is laid out
     * with the font's metrics), what it shows and says does not.
     */
    private static List<String> words(String html) {
        Matcher svg = Pattern.compile("<svg[\\s\\S]*?</svg>").matcher(html);
        StringBuilder b = new StringBuilder();
        int at = 0;
        while (svg.find()) {
            b.append(html, at, svg.start());
            Matcher series = Pattern.compile("data-series='([^']*)'").matcher(svg.group());
            java.util.TreeSet<String> names = new java.util.TreeSet<>();
            while (series.find()) {
                names.add(series.group(1));
            }
            b.append("<svg series=").append(names).append("/>");
            at = svg.end();
        }
        b.append(html.substring(at));
        return b.toString().lines().toList();
    }
}
