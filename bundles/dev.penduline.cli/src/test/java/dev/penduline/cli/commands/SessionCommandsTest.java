package dev.penduline.cli.commands;

import static dev.penduline.cli.JsonTree.at;
import static dev.penduline.cli.JsonTree.has;
import static dev.penduline.cli.JsonTree.number;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.util.HexFormat;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;
import dev.penduline.physics.swing.LossVerdict;

/**
 * The record commands end to end on records made by {@code demo-record}, whose truth is the
 * simulator's settings (the simulator itself is checked against closed forms in
 * dev.penduline.physics.motion), and {@code analyze}'s stop on an invented record made outside the
 * project (SciPy solve_ivp reference, releng/reference/make_stop_records.py).
 */
class SessionCommandsTest {

    @TempDir
    Path dir;

    private final CommandHarness cli = new CommandHarness();

    private static final String[] ROD = {"--mass", "2", "--centroid-distance", "0.4", "--pivot-inertia", "0.48"};

    /**
     * Invented records made outside the project (SciPy solve_ivp reference,
     * releng/reference/make_stop_records.py), with their truth, in the physics bundle's test resources.
     */
    private static final Path STOP_RECORDS = Path.of("..", "dev.penduline.physics", "src", "test", "resources",
            "stop-records");
    /** The inspection-hatch sample, made by Penduline's own simulator: self-consistency only. */
    private static final Path HATCH = Path.of("..", "..", "samples", "inspection-hatch");

    @BeforeEach
    void clear() {
        cli.clear();
    }

    private ExitCode run(String... args) {
        return cli.run(args);
    }

    private static String[] concat(String[] a, String... b) {
        String[] all = new String[a.length + b.length];
        System.arraycopy(a, 0, all, 0, a.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }

    private Path demo(String name, String theta0, String... friction) {
        Path file = dir.resolve(name);
        String[] args = concat(concat(new String[] {"demo-record"}, ROD), "--theta0-deg", theta0, "--offset-deg",
                "1.5", "--duration", "30", "--rate", "200", "--still-s", "1", "--out", file.toString());
        assertEquals(ExitCode.OK, run(concat(args, friction)), cli.err());
        return file;
    }

    @Test
    void analyzeRecoversReleaseOffsetAndTheDryFrictionVerdict() throws Exception {
        // Truth: released at 1 s + 0.37 sample = 1.00185 s, offset 1.5°, pure Coulomb friction.
        Path record = demo("dry.csv", "20", "--coulomb", "0.05");
        cli.clearOut();
        assertEquals(ExitCode.OK, run(concat(concat(new String[] {"analyze", record.toString(), "--counts-per-rev",
                "4096", "--json"}, ROD))), cli.err());
        Object json = JsonTree.parse(cli.out());
        // the release within 2 of its own standard uncertainties (a 95 % coverage factor, JCGM
        // 100:2008 §6.3) and within one 5 ms sample step
        assertEquals(1.00185, number(json, "release_time_s"), 2 * number(json, "release_time_uncertainty_s"));
        assertEquals(1.00185, number(json, "release_time_s"), 0.005);
        assertEquals(1.5, number(json, "offset_deg"), 0.02);
        assertEquals(20, number(json, "theta0_deg"), 0.1);
        assertEquals(200, number(json, "sample_rate_hz"), 1e-6);
        assertEquals("coulomb", at(json, "dominant"), cli.out());
        // Linear Coulomb decay, Den Hartog: 4 Tc/(m g Lc) per cycle = 4·0.05/(2·9.80665·0.4) rad = 1.4608°
        // at small angles; gravity's K sin x instead of K x makes a swing of amplitude A lose
        // A/sin A times that (energy balance, cos A2 − cos A1 = 2 sin Ā sin(ΔA/2)), 1.021 at 20°:
        // up to 0.031° more per cycle.
        assertEquals(1.4608, number(json, "envelope", "linear", "decrement_deg_per_cycle"), 0.031);
        // the first estimate of Tc: Coulomb's work Tc (A1 + A2) per half-swing is exact at any
        // amplitude, so only its own scatter remains: within 3 of its σ
        assertEquals(0.05, number(json, "estimates", "coulomb"), 3 * number(json, "estimates_sigma", "coulomb"));
    }

    @Test
    void addSessionCopiesTheRecordIntoTheProjectAndNeverChangesIt() throws Exception {
        Path record = demo("release.csv", "15", "--viscous", "0.01");
        byte[] bytes = Files.readAllBytes(record);
        FileTime modified = Files.getLastModifiedTime(record);
        Path project = Files.createDirectories(dir.resolve("project"));
        Path parts = Files.writeString(project.resolve("parts.csv"),
                "name,shape,mass_kg,x_m,y_m,z_m,length_m,axis\narm,rod,2,0,-0.4,0,0.8,y\n");
        Path mechanism = project.resolve("arm.penduline");
        assertEquals(ExitCode.OK, run("import-parts", parts.toString(), "--to", mechanism.toString()), cli.err());
        assertEquals(ExitCode.OK, run("add-session", mechanism.toString(), record.toString(), "--counts-per-rev",
                "4096", "--name", "First release"), cli.err());
        assertArrayEquals(bytes, Files.readAllBytes(record));
        assertEquals(modified, Files.getLastModifiedTime(record));
        assertArrayEquals(bytes, Files.readAllBytes(project.resolve("records/release.csv")));
        String file = Files.readString(mechanism);
        assertTrue(file.contains("<recordPath>records/release.csv</recordPath>"), file);
        assertTrue(file.contains("<countsPerRevolution>4096</countsPerRevolution>"), file);
        // The stored mapping reads the record again without any option.
        cli.clearOut();
        assertEquals(ExitCode.OK, run("analyze", project.resolve("records/release.csv").toString(), "--mechanism",
                mechanism.toString(), "--json"), cli.err());
        assertEquals("viscous", at(JsonTree.parse(cli.out()), "dominant"), cli.out());

        // A different file of the same name is refused and nothing changes.
        Path other = Files.createDirectories(dir.resolve("other"));
        Path clash = demo("other/release.csv", "30", "--viscous", "0.01");
        byte[] before = Files.readAllBytes(mechanism);
        assertEquals(ExitCode.USAGE_OR_INPUT, run("add-session", mechanism.toString(), clash.toString(),
                "--counts-per-rev", "4096"));
        assertTrue(cli.err().contains("already in the project"), cli.err());
        assertArrayEquals(before, Files.readAllBytes(mechanism));
        assertTrue(Files.exists(other));
    }

    @Test
    void aChangedRecordIsToldFirstAndFitRefusesItUntilAccepted() throws Exception {
        Path record = demo("release.csv", "15", "--viscous", "0.01");
        Path project = Files.createDirectories(dir.resolve("rig"));
        Path parts = Files.writeString(project.resolve("parts.csv"),
                "name,shape,mass_kg,x_m,y_m,z_m,length_m,axis\narm,rod,2,0,-0.4,0,0.8,y\n");
        Path mechanism = project.resolve("arm.penduline");
        assertEquals(ExitCode.OK, run("import-parts", parts.toString(), "--to", mechanism.toString()), cli.err());
        assertEquals(ExitCode.OK, run("add-session", mechanism.toString(), record.toString(), "--counts-per-rev", "4096"),
                cli.err());
        String added = Files.readString(mechanism);
        Path copy = project.resolve("records/release.csv");
        Files.writeString(copy, "# edited by hand\n", StandardOpenOption.APPEND);

        clear();
        assertEquals(ExitCode.USAGE_OR_INPUT, run("fit", mechanism.toString(), "--terms", "viscous", "--resamples", "0"));
        assertTrue(cli.err().contains("session 'release': records/release.csv has changed since it was added")
                && cli.err().contains("--accept-changed-records"), cli.err());
        assertEquals("", cli.out(), "no result before the refusal");
        assertEquals(added, Files.readString(mechanism));

        clear();
        assertEquals(ExitCode.OK, run("analyze", copy.toString(), "--mechanism", mechanism.toString()), cli.err());
        assertTrue(cli.err().startsWith("warning: session 'release': records/release.csv has changed"), cli.err());

        clear();
        assertEquals(ExitCode.OK, run("fit", mechanism.toString(), "--terms", "viscous", "--resamples", "0",
                "--accept-changed-records"), cli.err());
        assertTrue(cli.err().startsWith("note: session 'release': records/release.csv has changed"), cli.err());
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(copy)));
        String stored = Files.readString(mechanism);
        assertTrue(stored.contains("<contentHash>" + sha + "</contentHash>"), stored);
        assertTrue(stored.contains("<fitResult>"), stored);

        clear();
        assertEquals(ExitCode.OK, run("fit", mechanism.toString(), "--terms", "viscous", "--resamples", "0", "--no-save"),
                cli.err());
        assertFalse(cli.err().contains("changed"), "the accepted content is the session's now: " + cli.err());
    }

    @Test
    void aBadCellNamesFileLineAndColumn() throws Exception {
        Path record = Files.writeString(dir.resolve("bad.csv"), "time_s,angle_deg\n0,1\n0.01,1\n0.02,x\n");
        assertEquals(ExitCode.USAGE_OR_INPUT, run("analyze", record.toString()));
        assertTrue(cli.err().contains("bad.csv:4") && cli.err().contains("angle_deg"), cli.err());
    }

    /** The truth.csv row of a record, split at the commas. */
    private static String[] truth(String name) throws Exception {
        return Files.readAllLines(STOP_RECORDS.resolve("truth.csv")).stream().filter(l -> l.startsWith(name + ","))
                .findFirst().orElseThrow().split(",");
    }

    @Test
    void jsonGivesTheStopAndBothEndsOfTheStictionBand() throws Exception {
        String[] truth = truth("lid-250hz");
        assertEquals(ExitCode.OK, run("analyze", STOP_RECORDS.resolve("lid-250hz.csv").toString(), "--mass", truth[1],
                "--centroid-distance", truth[2], "--pivot-inertia", truth[3], "--json"), cli.err());
        Object stop = at(JsonTree.parse(cli.out()), "stop");
        assertEquals(Boolean.TRUE, at(stop, "stopped"), cli.out());
        double period = Double.parseDouble(truth[15]);
        double stiction = Double.parseDouble(truth[6]);
        double k = Double.parseDouble(truth[1]) * 9.80665 * Double.parseDouble(truth[2]);
        // SciPy solve_ivp reference, releng/reference/make_stop_records.py: stick instant, rest, previous reversal
        assertEquals(Double.parseDouble(truth[12]), number(stop, "time_s"), 0.1 * period, String.valueOf(stop));
        assertEquals(Math.toDegrees(Double.parseDouble(truth[13])), number(stop, "rest_angle_deg"), 0.02, String.valueOf(stop));
        assertEquals(k * Math.abs(Math.sin(Double.parseDouble(truth[14]))), number(stop, "stiction_upper_bound_n_m"),
                0.05 * stiction, String.valueOf(stop));
        assertTrue(number(stop, "stiction_lower_bound_n_m") < stiction, String.valueOf(stop));
        assertTrue(number(stop, "stiction_upper_bound_n_m") > stiction, String.valueOf(stop));
    }

    @Test
    void aRestWithinTheUncertaintyShowsNoStictionAndTheDecayIsAFirstLook() {
        // release-10deg.csv comes to rest 0.015° from the equilibrium (the simulator's truth), a sixth of an
        // encoder count: the stop cannot show stiction there
        assertEquals(ExitCode.OK, run("analyze", HATCH.resolve("records/release-10deg.csv").toString(), "--mechanism",
                HATCH.resolve("hatch.penduline").toString()), cli.err());
        String report = cli.out();
        assertTrue(report.startsWith("Swing record"), report);
        assertTrue(report.contains("\n" + LossVerdict.HEADING + ": "), report);
        assertFalse(report.contains("Verdict"), report);
        assertTrue(report.contains("no evidence of stiction above what that allows (< K|sin 2σ| = "), report);
        assertFalse(report.contains("at least 0 N·m"), report);
        assertTrue(report.contains("moved on from the reversal before"), report);
    }

    @Test
    void jsonGivesNullNotZeroForALowerEndTheStopCannotShow() {
        assertEquals(ExitCode.OK, run("analyze", HATCH.resolve("records/release-10deg.csv").toString(), "--mechanism",
                HATCH.resolve("hatch.penduline").toString(), "--json"), cli.err());
        Object stop = at(JsonTree.parse(cli.out()), "stop");
        assertTrue(has(stop, "stiction_lower_bound_n_m") && at(stop, "stiction_lower_bound_n_m") == null, cli.out());
        assertTrue(number(stop, "stiction_upper_bound_n_m") > 0, String.valueOf(stop));
        assertTrue(number(stop, "stiction_resolution_n_m") > 0, String.valueOf(stop));
    }
}
