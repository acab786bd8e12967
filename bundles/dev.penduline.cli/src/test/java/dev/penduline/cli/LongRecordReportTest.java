package dev.penduline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report of a 300 000-sample record (5 min at 1 kHz) stays small enough to mail and to keep in
 * git: the plots are thinned per pixel column (each column's first, lowest, highest and last
 * sample), so the file's size depends on the plots' width, not on the record's length. The bound,
 * 3 MB, is the one the README states.
 */
class LongRecordReportTest {

    /** The bound the README states for a report of one 300 000-sample record. */
    static final long MAX_BYTES = 3_000_000;

    @TempDir
    Path dir;

    private String run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        ExitCode code = new PendulineCommandLine().run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(ExitCode.OK, code, String.join(" ", args) + "\n" + out + "\n" + err);
        return out.toString();
    }

    @Test
    void theReportOfA300000SampleRecordStaysBelowItsBound() throws Exception {
        Path parts = Files.writeString(dir.resolve("arm.csv"), """
                name,shape,mass_kg,x_m,y_m,z_m,length_m,radius_m,axis
                arm,rod,1,0,-0.3,0,0.6,,y
                bob,sphere,1.5,0,-0.6,0,,0.05,
                """);
        Path mechanism = dir.resolve("arm.penduline");
        run("import-parts", parts.toString(), "--to", mechanism.toString());
        Path record = dir.resolve("long.csv");
        run("demo-record", mechanism.toString(), "--theta0-deg", "30", "--viscous", "0.004", "--coulomb", "0.002",
                "--duration", "300", "--rate", "1000", "--counts-per-rev", "0", "--noise-deg", "0.02", "--seed", "5",
                "--out", record.toString());
        run("add-session", mechanism.toString(), record.toString());
        run("fit", mechanism.toString(), "--terms", "viscous,coulomb", "--resamples", "0");
        run("report", mechanism.toString());
        Path report = dir.resolve("arm-report.html");
        String html = Files.readString(report);
        Matcher samples = Pattern.compile("(\\d+) samples at").matcher(html);
        assertTrue(samples.find(), "the record's size is stated");
        assertTrue(Integer.parseInt(samples.group(1)) >= 300_000, samples.group());
        long size = Files.size(report);
        assertTrue(size <= MAX_BYTES, "the report is " + size + " bytes");
        // the record's plot is there, drawn in full: its series hold points from the start to the end
        assertTrue(html.contains("data-series='measured'") || html.contains("data-series=\"measured\""), "the record plot");
    }
}
