package dev.penduline.cli.commands;

import static dev.penduline.cli.JsonTree.at;
import static dev.penduline.cli.JsonTree.number;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;
import dev.penduline.cli.PendulineCommandLine;

class SimulateCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private ExitCode run(String... args) {
        return new PendulineCommandLine().run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void simplePendulumSwingsWithTheTextbookPeriod() throws Exception {
        // Point mass on 1 m in standard gravity, released at 2°: T ≈ 2π sqrt(L/g)(1 + θ0²/16)
        // (Halliday, Resnick & Walker; the first correction term of the large-amplitude series)
        // = 2.006409 × 1.0000761 = 2.006562 s.
        Path csv = dir.resolve("swing.csv");
        assertEquals(ExitCode.OK, run("simulate", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
                "--theta0-deg", "2", "--duration", "5", "--rate", "100", "--out", csv.toString(), "--json"),
                err.toString());
        Object json = JsonTree.parse(out.toString());
        assertEquals(2.006562, number(json, "periods_s", 0), 2e-6, out.toString());
        assertEquals(Boolean.FALSE, at(json, "stopped"), out.toString());
        List<String> lines = Files.readAllLines(csv);
        assertEquals("time_s,angle_deg,velocity_deg_s", lines.get(0));
        assertEquals(501 + 1, lines.size());
        assertTrue(lines.get(1).startsWith("0.0,2.0,"), lines.get(1));
    }

    @Test
    void dryFrictionStopsTheSwingAndTheSummarySaysWhere() {
        // Linear Coulomb decay: amplitude falls by 4 Tc/(m g Lc) per cycle (Den Hartog,
        // Mechanical Vibrations, Coulomb damping): with Tc = 0.05 m g Lc the 10° (0.1745 rad)
        // release loses 0.2 rad per cycle, so it stops within the first cycle.
        double mgl = 9.80665;
        assertEquals(ExitCode.OK, run("simulate", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
                "--theta0-deg", "10", "--coulomb", String.valueOf(0.05 * mgl), "--duration", "5"), err.toString());
        assertTrue(out.toString().contains("came to rest at"), out.toString());
        assertTrue(out.toString().contains("Caution"), out.toString());
    }

    @Test
    void badFrictionAndMissingMechanismAreUsageErrors() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("simulate", "--theta0-deg", "10"));
        assertTrue(err.toString().contains("which mechanism?"), err.toString());
        assertEquals(ExitCode.USAGE_OR_INPUT, run("simulate", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "1", "--theta0-deg", "10", "--coulomb", "0.5", "--stiction", "0.1"));
        assertTrue(err.toString().contains("stiction"), err.toString());
        assertEquals(ExitCode.USAGE_OR_INPUT, run("simulate", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "0.5", "--theta0-deg", "10"));
        assertTrue(err.toString().contains("pivotInertia"), err.toString());
    }

    @Test
    void aMechanismFileIsSimulatedWithItsStoredFitUnlessToldOtherwise() {
        Path hatch = Path.of("..", "..", "samples", "inspection-hatch", "hatch.penduline");
        assertEquals(ExitCode.OK, run("simulate", hatch.toString(), "--theta0-deg", "20", "--json"), err.toString());
        String withFit = out.toString();
        Object fitted = JsonTree.parse(withFit);
        assertTrue(at(fitted, "fit") instanceof String id && id.startsWith("fit-"), withFit);
        double viscous = number(fitted, "friction", "viscous_N_m_s_rad");
        assertTrue(viscous > 0 && viscous < 1, "the stored fit's viscous term is used: " + withFit);
        out.getBuffer().setLength(0);
        assertEquals(ExitCode.OK, run("simulate", hatch.toString(), "--theta0-deg", "20", "--no-fit", "--json"),
                err.toString());
        String without = out.toString();
        Object unfitted = JsonTree.parse(without);
        assertEquals("none", at(unfitted, "fit"), without);
        assertEquals(0.0, number(unfitted, "friction", "viscous_N_m_s_rad"), without);
        assertEquals(Boolean.FALSE, at(unfitted, "settled"), "no friction: it never settles; " + without);
    }
}
