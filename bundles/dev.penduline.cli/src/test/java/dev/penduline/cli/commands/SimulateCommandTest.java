package dev.penduline.cli.commands;

import static dev.penduline.cli.JsonTree.at;
import static dev.penduline.cli.JsonTree.number;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;

class SimulateCommandTest {

    @TempDir
    Path dir;

    private final CommandHarness cli = new CommandHarness();

    private ExitCode run(String... args) {
        return cli.run(args);
    }

    @Test
    void simplePendulumSwingsWithTheTextbookPeriod() throws Exception {
        // Point mass on 1 m in standard gravity, released at 2°: T ≈ 2π sqrt(L/g)(1 + θ0²/16)
        // (Halliday, Resnick & Walker; the first correction term of the large-amplitude series)
        // = 2.006409 × 1.0000761 = 2.006562 s.
        Path csv = dir.resolve("swing.csv");
        assertEquals(ExitCode.OK, run("simulate", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
                "--theta0-deg", "2", "--duration", "5", "--rate", "100", "--out", csv.toString(), "--json"),
                cli.err());
        Object json = JsonTree.parse(cli.out());
        assertEquals(2.006562, number(json, "periods_s", 0), 2e-6, cli.out());
        assertEquals(Boolean.FALSE, at(json, "stopped"), cli.out());
        List<String> lines = Files.readAllLines(csv);
        assertEquals("time_s,angle_deg,velocity_deg_s", lines.get(0));
        assertEquals(501 + 1, lines.size());
        assertTrue(lines.get(1).startsWith("0.0,2.0,"), lines.get(1));
    }

    @Test
    void dryFrictionStopsTheSwingAndTheSummarySaysWhere() {
        // Linear Coulomb decay: amplitude falls by 4 Tc/(m g Lc) per cycle (Den Hartog,
        // Mechanical Vibrations, Coulomb damping): with Tc = 0.05 m g Lc the 10° (0.1745 rad)
        // release loses 0.2 rad per cycle, so it stops within the first cycle. Where exactly, by
        // the energy balance of each half-swing between reversals x1 and x2 (gravity's potential
        // K(1 − cos x), Coulomb's work Tc|x1 − x2|, K = m g Lc): cos x2 − cos x1 = 0.05 |x1 − x2|.
        // From 10° that gives −4.2532° and then −1.4793°, where K sin|x| = 0.0255 K is below
        // Ts = Tc (Coulomb's law of static friction), so the swing rests there.
        double mgl = 9.80665;
        double x1 = reversal(Math.toRadians(10));
        double x2 = reversal(x1);
        assertTrue(Math.sin(Math.abs(x2)) < 0.05, "at rest inside the static band");
        String[] args = {"simulate", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
            "--theta0-deg", "10", "--coulomb", String.valueOf(0.05 * mgl), "--duration", "5"};
        assertEquals(ExitCode.OK, run(args), cli.err());
        String text = cli.out();
        assertTrue(text.contains(String.format(Locale.ROOT, ", %.3f° from the hanging equilibrium", Math.toDegrees(x2))),
                "the rest angle by the energy balance, " + Math.toDegrees(x2) + "°: " + text);
        assertTrue(text.contains("Caution"), text);
        cli.clearOut();
        assertEquals(ExitCode.OK, run(append(args, "--json")), cli.err());
        Object json = JsonTree.parse(cli.out());
        assertEquals(Boolean.TRUE, at(json, "stopped"), cli.out());
        assertEquals(Math.toDegrees(x2), number(json, "rest_angle_deg"), 1e-6);
        // two half-swings, each within the large-amplitude correction θ0²/16 of half the
        // small-angle period 2π sqrt(J0/(m g Lc)) (Halliday, Resnick & Walker, as above)
        double t0 = 2 * Math.PI * Math.sqrt(1 / mgl);
        double theta0 = Math.toRadians(10);
        double stop = number(json, "stop_time_s");
        assertTrue(stop >= t0 && stop <= t0 * (1 + theta0 * theta0 / 16), "stop at " + stop + " s");
    }

    /**
     * The reversal after x1 (rad, outside the static band) with Coulomb friction Tc = 0.05 K: the
     * root of the half-swing's energy balance between x1 and its mirror −x1, by bisection.
     */
    private static double reversal(double x1) {
        DoubleUnaryOperator balance = x -> Math.cos(x) - Math.cos(x1) - 0.05 * Math.abs(x1 - x);
        double moving = x1 - Math.signum(x1) * 1e-9; // just past x1 the balance is still positive
        double mirror = -x1; // there it is negative: friction has taken energy on the way
        for (int i = 0; i < 100; i++) {
            double mid = 0.5 * (moving + mirror);
            if (balance.applyAsDouble(mid) > 0) {
                moving = mid;
            } else {
                mirror = mid;
            }
        }
        return 0.5 * (moving + mirror);
    }

    private static String[] append(String[] args, String more) {
        String[] all = Arrays.copyOf(args, args.length + 1);
        all[args.length] = more;
        return all;
    }

    @Test
    void badFrictionAndMissingMechanismAreUsageErrors() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("simulate", "--theta0-deg", "10"));
        assertTrue(cli.err().contains("which mechanism?"), cli.err());
        assertEquals(ExitCode.USAGE_OR_INPUT, run("simulate", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "1", "--theta0-deg", "10", "--coulomb", "0.5", "--stiction", "0.1"));
        assertTrue(cli.err().contains("stiction"), cli.err());
        assertEquals(ExitCode.USAGE_OR_INPUT, run("simulate", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "0.5", "--theta0-deg", "10"));
        assertTrue(cli.err().contains("pivotInertia"), cli.err());
    }

    @Test
    void aMechanismFileIsSimulatedWithItsStoredFitUnlessToldOtherwise() {
        Path hatch = Path.of("..", "..", "samples", "inspection-hatch", "hatch.penduline");
        assertEquals(ExitCode.OK, run("simulate", hatch.toString(), "--theta0-deg", "20", "--json"), cli.err());
        String withFit = cli.out();
        Object fitted = JsonTree.parse(withFit);
        assertTrue(at(fitted, "fit") instanceof String id && id.startsWith("fit-"), withFit);
        double viscous = number(fitted, "friction", "viscous_N_m_s_rad");
        assertTrue(viscous > 0 && viscous < 1, "the stored fit's viscous term is used: " + withFit);
        cli.clearOut();
        assertEquals(ExitCode.OK, run("simulate", hatch.toString(), "--theta0-deg", "20", "--no-fit", "--json"),
                cli.err());
        String without = cli.out();
        Object unfitted = JsonTree.parse(without);
        assertEquals("none", at(unfitted, "fit"), without);
        assertEquals(0.0, number(unfitted, "friction", "viscous_N_m_s_rad"), without);
        assertEquals(Boolean.FALSE, at(unfitted, "settled"), "no friction: it never settles; " + without);
    }
}
