package dev.penduline.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.services.SessionRecords;

/**
 * {@code penduline survey} end to end on short invented records made by {@code demo-record
 * --count}: resuming, a bad record among good ones, grouping by pattern and by manifest, and
 * rows that do not depend on --jobs. The fit itself is checked against the simulator's truth in
 * FitCommandTest and in dev.penduline.physics.identify; the statistics against published
 * examples in dev.penduline.physics.population.
 */
class SurveyCommandTest {

    @TempDir
    Path dir;

    private StringWriter out;
    private StringWriter err;
    private Path mechanism;

    @BeforeEach
    void design() throws Exception {
        clear();
        Path parts = Files.writeString(dir.resolve("arm-parts.csv"), """
                name,shape,mass_kg,x_m,y_m,z_m,length_m,radius_m,axis
                arm,rod,1,0,-0.3,0,0.6,,y
                bob,sphere,1.5,0,-0.6,0,,0.05,
                """);
        mechanism = dir.resolve("arm.penduline");
        assertEquals(ExitCode.OK, run("import-parts", parts.toString(), "--to", mechanism.toString()), err.toString());
    }

    private void clear() {
        out = new StringWriter();
        err = new StringWriter();
    }

    private ExitCode run(String... args) {
        return new PendulineCommandLine().run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    /** Short records (10 s at 100 Hz) of a population whose friction is drawn with a 10 % spread. */
    private Path population(String folder, int count, int seed) {
        Path into = dir.resolve(folder);
        assertEquals(ExitCode.OK, run("demo-record", mechanism.toString(), "--theta0-deg", "30", "--viscous", "0.01",
                "--coulomb", "0.04", "--duration", "10", "--rate", "100", "--counts-per-rev", "0", "--seed",
                Integer.toString(seed), "--count", Integer.toString(count), "--into", into.toString(), "--spread", "10"),
                err.toString());
        return into;
    }

    /** One short record of a unit with the given viscous friction (Coulomb 0.04 N·m). */
    private void record(Path file, String viscous, String angle, int seed) {
        assertEquals(ExitCode.OK, run("demo-record", mechanism.toString(), "--theta0-deg", angle, "--viscous", viscous,
                "--coulomb", "0.04", "--duration", "10", "--rate", "100", "--counts-per-rev", "0", "--seed",
                Integer.toString(seed), "--out", file.toString()), err.toString());
    }

    private ExitCode survey(String... more) {
        clear();
        List<String> args = new ArrayList<>(List.of("survey", "--mechanism", mechanism.toString(), "--terms", "viscous,coulomb",
                "--resamples", "0"));
        args.addAll(List.of(more));
        return run(args.toArray(String[]::new));
    }

    /** The viscous coefficient a demo record was made with, from its "# truth:" comment line. */
    private static double drawnViscous(Path record) throws Exception {
        for (String line : Files.readAllLines(record, StandardCharsets.UTF_8)) {
            Matcher m = Pattern.compile("^# truth:.* viscous ([-0-9.eE]+),").matcher(line);
            if (m.find()) {
                return Double.parseDouble(m.group(1));
            }
        }
        throw new AssertionError(record + " has no truth line");
    }

    private static Object json(Path file) throws Exception {
        return JsonTree.parse(Files.readString(file, StandardCharsets.UTF_8));
    }

    private static Map<String, Object> rowsByKey(Path outDir) throws Exception {
        Map<String, Object> rows = new LinkedHashMap<>();
        for (Object u : (List<?>) JsonTree.at(json(outDir.resolve("units.json")), "units")) {
            rows.put((String) JsonTree.at(u, "key"), u);
        }
        return rows;
    }

    @Test
    void aSecondRunReusesEveryRowAndAChangedRecordIsFittedAgain() throws Exception {
        Path records = population("line", 4, 1);
        Map<Path, String> hashes = new LinkedHashMap<>();
        try (var s = Files.list(records)) {
            for (Path p : s.sorted().toList()) {
                hashes.put(p, SessionRecords.sha256(p));
            }
        }
        Path o = dir.resolve("out");
        byte[] design = Files.readAllBytes(mechanism);
        assertEquals(ExitCode.OK, survey(records.toString(), "--out", o.toString()), err.toString());
        Object first = json(o.resolve("summary.json"));
        assertEquals(4, JsonTree.number(first, "units"));
        assertEquals(0, JsonTree.number(first, "skipped"));
        byte[] units = Files.readAllBytes(o.resolve("units.json"));
        byte[] csv = Files.readAllBytes(o.resolve("units.csv"));
        // every unit is fitted near its own drawn truth (written in its record's "# truth:" line):
        // within 3 of the fit's own standard uncertainties
        for (Map.Entry<String, Object> e : rowsByKey(o).entrySet()) {
            Object u = e.getValue();
            assertEquals("fitted", JsonTree.at(u, "status"));
            double truth = drawnViscous(records.resolve(e.getKey() + ".csv"));
            assertEquals(truth, JsonTree.number(u, "estimates", "viscous", "value"),
                    3 * JsonTree.number(u, "estimates", "viscous", "sigma"), e.getKey());
        }

        assertEquals(ExitCode.OK, survey(records.toString(), "--out", o.toString()), err.toString());
        assertEquals(4, JsonTree.number(json(o.resolve("summary.json")), "skipped"));
        assertArrayEquals(units, Files.readAllBytes(o.resolve("units.json")));
        assertArrayEquals(csv, Files.readAllBytes(o.resolve("units.csv")));
        assertTrue(err.toString().contains("0 fitted, 4 reused, 0 failed"), err.toString());

        // a record whose content changed (another record's copied over it) is the only one fitted again
        Path changed = records.resolve("unit-0002.csv");
        Files.copy(records.resolve("unit-0003.csv"), changed, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        hashes.put(changed, SessionRecords.sha256(changed));
        assertEquals(ExitCode.OK, survey(records.toString(), "--out", o.toString()), err.toString());
        assertEquals(3, JsonTree.number(json(o.resolve("summary.json")), "skipped"));
        assertTrue(err.toString().contains("1 fitted, 3 reused, 0 failed"), err.toString());
        Map<String, Object> rows = rowsByKey(o);
        assertEquals(JsonTree.at(rows.get("unit-0003"), "estimates"), JsonTree.at(rows.get("unit-0002"), "estimates"));
        // the survey never touched a record
        for (Map.Entry<Path, String> e : hashes.entrySet()) {
            assertEquals(e.getValue(), SessionRecords.sha256(e.getKey()), e.getKey().toString());
        }
        try (var s = Files.list(records)) {
            assertEquals(4, s.count(), "nothing was written into the records' folder");
        }
        assertArrayEquals(design, Files.readAllBytes(mechanism), "the mechanism file is only read");
    }

    @Test
    void aHalfWrittenJournalLineIsIgnoredAndOtherSettingsRefit() throws Exception {
        Path records = population("line", 2, 5);
        Path o = dir.resolve("out");
        assertEquals(ExitCode.OK, survey(records.toString(), "--out", o.toString()), err.toString());
        Files.writeString(o.resolve("units.journal"), "row\tabc\tunit-00", StandardOpenOption.APPEND);
        assertEquals(ExitCode.OK, survey(records.toString(), "--out", o.toString()), err.toString());
        assertEquals(2, JsonTree.number(json(o.resolve("summary.json")), "skipped"));
        assertFalse(Files.readString(o.resolve("units.journal")).contains("unit-00\n"), "the broken line is dropped");
        // another seed is another fingerprint: nothing is reused
        assertEquals(ExitCode.OK, survey(records.toString(), "--out", o.toString(), "--seed", "7"), err.toString());
        assertEquals(0, JsonTree.number(json(o.resolve("summary.json")), "skipped"));
    }

    @Test
    void aBadRecordIsListedWithItsLineAndTheOthersAreFitted() throws Exception {
        Path records = population("line", 3, 11);
        Files.writeString(records.resolve("garbage.csv"), "time_s,angle_deg\n0.00,1.0\n0.01,1.1\n0.02,abc\n0.03,1.2\n");
        Path o = dir.resolve("out");
        assertEquals(ExitCode.PARTIAL_FAILURE, survey(records.toString(), "--out", o.toString(), "--jobs", "2"),
                err.toString() + out);
        Object summary = json(o.resolve("summary.json"));
        assertEquals(3, JsonTree.number(summary, "units"));
        List<?> failed = (List<?>) JsonTree.at(summary, "failed");
        assertEquals(1, failed.size(), failed.toString());
        assertTrue(((String) JsonTree.at(failed.get(0), "file")).endsWith("garbage.csv"), failed.toString());
        String error = (String) JsonTree.at(failed.get(0), "error");
        // the reader's message names the file, the line (4) and the column
        assertTrue(error.contains("garbage.csv:4:") && error.contains("angle_deg"), error);
        assertTrue(out.toString().contains("failed: "), out.toString());
        assertEquals(3, ExitCode.PARTIAL_FAILURE.code());
    }

    @Test
    void unitsByPatternAndByManifest() throws Exception {
        // two releases of hatch A (one friction, two angles), one of hatch B, and a record that fits no unit
        Path records = Files.createDirectories(dir.resolve("line"));
        record(records.resolve("A-release1.csv"), "0.010", "30", 1);
        record(records.resolve("A-release2.csv"), "0.010", "15", 2);
        record(records.resolve("B-release1.csv"), "0.012", "30", 3);
        record(records.resolve("stray.csv"), "0.011", "30", 4);
        Path o = dir.resolve("by-pattern");
        assertEquals(ExitCode.PARTIAL_FAILURE, survey(records.toString(), "--group", "^([A-Z])-", "--out", o.toString()),
                err.toString());
        Map<String, Object> rows = rowsByKey(o);
        assertEquals(List.of("A", "B"), List.copyOf(rows.keySet()));
        List<?> files = (List<?>) JsonTree.at(rows.get("A"), "files");
        assertEquals(2, files.size());
        assertTrue(((String) files.get(0)).endsWith("A-release1.csv") && ((String) files.get(1)).endsWith("A-release2.csv"));
        assertEquals(2, ((List<?>) JsonTree.at(rows.get("A"), "residual_to_noise")).size(), "two sessions, two ratios: "
                + rows.get("A"));
        List<?> failed = (List<?>) JsonTree.at(json(o.resolve("summary.json")), "failed");
        assertEquals(1, failed.size());
        assertTrue(((String) JsonTree.at(failed.get(0), "error")).contains("does not match"), failed.toString());

        Path manifest = Files.writeString(dir.resolve("serials.csv"), """
                # which records belong to which hatch
                file,serial
                line/A-release1.csv,SN-2
                line/stray.csv,SN-1
                line/A-release2.csv,SN-2
                line/missing.csv,SN-3
                """);
        Path m = dir.resolve("by-manifest");
        assertEquals(ExitCode.PARTIAL_FAILURE, survey("--manifest", manifest.toString(), "--unit-column", "serial", "--out",
                m.toString()), err.toString());
        rows = rowsByKey(m);
        assertEquals(List.of("SN-1", "SN-2"), List.copyOf(rows.keySet()));
        files = (List<?>) JsonTree.at(rows.get("SN-2"), "files");
        assertEquals(2, files.size());
        assertTrue(((String) files.get(0)).endsWith("A-release1.csv") && ((String) files.get(1)).endsWith("A-release2.csv"),
                files.toString());
        failed = (List<?>) JsonTree.at(json(m.resolve("summary.json")), "failed");
        assertEquals(1, failed.size());
        String error = (String) JsonTree.at(failed.get(0), "error");
        assertTrue(error.contains("serials.csv: line 6") && error.contains("missing.csv"), error);
    }

    @Test
    void oneJobAndTwoJobsGiveTheSameRows() throws Exception {
        Path records = population("line", 4, 31);
        Path one = dir.resolve("one");
        Path two = dir.resolve("two");
        assertEquals(ExitCode.OK, survey(records.toString(), "--out", one.toString(), "--jobs", "1"), err.toString());
        assertEquals(ExitCode.OK, survey(records.toString(), "--out", two.toString(), "--jobs", "2"), err.toString());
        for (String f : List.of("units.json", "units.csv", "summary.json", "survey.html")) {
            assertArrayEquals(Files.readAllBytes(one.resolve(f)), Files.readAllBytes(two.resolve(f)), f);
        }
        // the summary is of the rows: the median of four viscous values is the mean of the middle two
        double[] b = rowsByKey(one).values().stream().mapToDouble(u -> JsonTree.number(u, "estimates", "viscous", "value"))
                .sorted().toArray();
        assertEquals((b[1] + b[2]) / 2, JsonTree.number(json(one.resolve("summary.json")), "terms", "viscous", "median"),
                1e-15);
        String html = Files.readString(one.resolve("survey.html"));
        assertTrue(html.contains("data-series='within limits'") && html.contains("data-series='units'"), "charts drawn");
        assertTrue(html.contains("not acceptance criteria") || html.contains("no acceptance criteria"), "the caution");
    }

    @Test
    void theDefaultOutputFolderIsBesideTheRecordsAndNeverTheirs() throws Exception {
        Path records = population("line", 2, 41);
        assertEquals(ExitCode.OK, survey(records.toString(), "--json"), err.toString());
        assertTrue(Files.isRegularFile(dir.resolve("line-survey").resolve("summary.json")));
        assertEquals(2, JsonTree.number(JsonTree.parse(out.toString()), "units"), out.toString());
        assertEquals(ExitCode.USAGE_OR_INPUT, survey(records.toString(), "--out", records.toString()));
        assertTrue(err.toString().contains("holds the survey's records"), err.toString());
        assertEquals(ExitCode.USAGE_OR_INPUT, survey(records.toString(), "--group", "(["));
        assertTrue(err.toString().contains("--group"), err.toString());
    }

    @Test
    void aBatchOfDemoRecordsRepeatsSingleRecordsOfTheSameSeeds() throws Exception {
        Path into = dir.resolve("batch");
        assertEquals(ExitCode.OK, run("demo-record", mechanism.toString(), "--theta0-deg", "30", "--viscous", "0.01",
                "--duration", "3", "--rate", "100", "--seed", "9", "--count", "2", "--into", into.toString()), err.toString());
        Path single = dir.resolve("single.csv");
        assertEquals(ExitCode.OK, run("demo-record", mechanism.toString(), "--theta0-deg", "30", "--viscous", "0.01",
                "--duration", "3", "--rate", "100", "--seed", "10", "--out", single.toString()), err.toString());
        // without --spread every record has the given friction; record 2 is the single record of seed 9 + 1
        assertArrayEquals(Files.readAllBytes(single), Files.readAllBytes(into.resolve("unit-0002.csv")));
        assertEquals(ExitCode.OK, run("demo-record", mechanism.toString(), "--theta0-deg", "30", "--viscous", "0.01",
                "--duration", "3", "--rate", "100", "--seed", "9", "--count", "2", "--into", into.toString(), "--spread", "20",
                "--force"), err.toString());
        String a = Files.readString(into.resolve("unit-0001.csv"));
        String b = Files.readString(into.resolve("unit-0002.csv"));
        assertTrue(a.startsWith("# INVENTED DEMO DATA"), a.substring(0, 80));
        assertNotEquals(a.lines().skip(1).findFirst(), b.lines().skip(1).findFirst(), "each record states its own truth");
    }
}
