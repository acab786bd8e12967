package dev.penduline.cli.commands;

import static dev.penduline.cli.JsonTree.at;
import static dev.penduline.cli.JsonTree.has;
import static dev.penduline.cli.JsonTree.number;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;
import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.MechanismFiles;

/**
 * The fit command end to end on records made by {@code demo-record}: the truth is the
 * simulator's settings (the simulator is checked against closed forms in
 * dev.penduline.physics.motion; the fit engine's statistics are checked in
 * dev.penduline.physics.identify). Short records keep the test quick.
 */
class FitCommandTest {

    @TempDir
    Path dir;

    private final CommandHarness cli = new CommandHarness();

    @BeforeEach
    void clear() {
        cli.clear();
    }

    private ExitCode run(String... args) {
        return cli.run(args);
    }

    /** A project: a rod-and-bob arm (parts list imported) with two releases at different angles. */
    private Path project() throws Exception {
        Path parts = Files.writeString(dir.resolve("arm.csv"), """
                name,shape,mass_kg,x_m,y_m,z_m,length_m,radius_m,axis
                arm,rod,1,0,-0.3,0,0.6,,y
                bob,sphere,1.5,0,-0.6,0,,0.05,
                """);
        Path mechanism = dir.resolve("arm.penduline");
        assertEquals(ExitCode.OK, run("import-parts", parts.toString(), "--to", mechanism.toString()), cli.err());
        for (String angle : new String[] {"12", "40"}) {
            Path record = dir.resolve("release-" + angle + ".csv");
            assertEquals(ExitCode.OK, run("demo-record", mechanism.toString(), "--theta0-deg", angle, "--viscous",
                    "0.01", "--coulomb", "0.04", "--duration", "15", "--rate", "200", "--counts-per-rev", "0",
                    "--noise-deg", "0.02", "--offset-deg", "-1.2", "--seed", angle, "--out", record.toString()),
                    cli.err());
            assertEquals(ExitCode.OK, run("add-session", mechanism.toString(), record.toString()), cli.err());
        }
        return mechanism;
    }

    @Test
    void automaticFitFindsViscousPlusCoulombAndStoresTheResult() throws Exception {
        Path mechanism = project();
        cli.clearOut();
        assertEquals(ExitCode.OK, run("fit", mechanism.toString(), "--resamples", "8", "--json"), cli.err());
        String text = cli.out();
        Object json = JsonTree.parse(text);
        assertEquals("converged", at(json, "status"), text);
        assertEquals(0.01, number(json, "terms", "viscous", "value"), 0.0005, "viscous b");
        assertEquals(0.04, number(json, "terms", "coulomb", "value"), 0.001, "Coulomb Tc");
        assertFalse(has(json, "terms", "drag"), "no drag term: " + text);
        double calculated = number(json, "inertia", "calculated_kg_m2");
        assertEquals(calculated, number(json, "inertia", "fitted_kg_m2"), 0.005 * calculated);
        assertEquals(1.0, number(json, "energy_share", "viscous") + number(json, "energy_share", "coulomb")
                + number(json, "energy_share", "drag"), 1e-9);
        assertEquals(-1.2, number(json, "sessions", 0, "offset_deg"), 0.01);
        assertEquals(-1.2, number(json, "sessions", 1, "offset_deg"), 0.01);
        assertTrue(has(json, "comparison"), text);

        Mechanism m = MechanismFiles.load(mechanism);
        assertEquals(1, m.getFitResults().size());
        assertEquals(2, m.getFitResults().get(0).getSessionIds().size());
        assertTrue(m.getFitResults().get(0).getTermIds().contains("viscous"));
    }

    @Test
    void aFitThatCannotConvergeSaysSoWithExitCodeOneAndStoresNothing() throws Exception {
        Path mechanism = project();
        byte[] before = Files.readAllBytes(mechanism);
        cli.clearOut();
        assertEquals(ExitCode.COMPUTATION_FAILED, run("fit", mechanism.toString(), "--terms", "viscous,coulomb",
                "--max-iterations", "1", "--resamples", "0"));
        assertTrue(cli.out().contains("DID NOT CONVERGE"), cli.out());
        // GUM §7.2.6: the standard error to two significant digits, the estimate to the same decimal place
        Matcher b = Pattern.compile("b  = \\(?(-?[0-9.]+) ± ([0-9.]+)\\)?(e-?[0-9]+)? N·m·s/rad").matcher(cli.out());
        assertTrue(b.find(), cli.out());
        assertEquals(2, new BigDecimal(b.group(2)).precision(), b.group());
        assertEquals(new BigDecimal(b.group(2)).scale(), new BigDecimal(b.group(1)).scale(), b.group());
        assertArrayEquals(before, Files.readAllBytes(mechanism));
    }

    @Test
    void unknownTermsAndMissingRecordsAreUsageErrors() throws Exception {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("fit", "--mass", "1", "--centroid-distance", "0.5",
                "--pivot-inertia", "0.3", "--session", "x.csv", "--terms", "viscous,magnetic"));
        assertTrue(cli.err().contains("'magnetic' is not one of"), cli.err());
        assertEquals(ExitCode.USAGE_OR_INPUT, run("fit", "--mass", "1", "--centroid-distance", "0.5",
                "--pivot-inertia", "0.3"));
        assertTrue(cli.err().contains("which records?"), cli.err());
    }
}
