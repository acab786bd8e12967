package dev.penduline.cli.commands;

import static dev.penduline.cli.JsonTree.at;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Map;

import org.junit.jupiter.api.Test;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;

class PredictCommandTest {

    private static final Path HATCH = Path.of("..", "..", "samples", "inspection-hatch", "hatch.penduline");

    private final CommandHarness cli = new CommandHarness();

    private ExitCode run(String... args) {
        return cli.run(args);
    }

    @Test
    void undampedPassageSpeedFollowsTheEnergyBalance() {
        // point mass on 1 m in standard gravity, no friction, released at 60°: passing the bottom,
        // ½ m L² ω² = m g L (1 − cos 60°), so ω = sqrt(g) = 3.13156 rad/s and the bob moves at
        // 3.13156 m/s (conservation of energy)
        assertEquals(ExitCode.OK, run("predict", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
                "--viscous", "0", "--theta0-deg", "60", "--at-deg", "0", "--radius-m", "1", "--json"), cli.err());
        String json = cli.out();
        Object tree = JsonTree.parse(json);
        assertEquals("options", at(tree, "fit"), json);
        assertEquals(-Math.sqrt(9.80665), JsonTree.requiredNumber(json, "at_angle", "angular_velocity_rad_s", "value"), 1e-6);
        assertEquals(Math.sqrt(9.80665), JsonTree.requiredNumber(json, "at_angle", "tip_speed_m_s", "value"), 1e-4);
        assertEquals(0.5 * 9.80665, JsonTree.requiredNumber(json, "at_angle", "kinetic_energy_J", "value"), 1e-3);
        assertEquals(Boolean.FALSE, at(tree, "settled"), json);
    }

    @Test
    void theStoredFitIsUsedAndEveryFigureHasABand() {
        assertEquals(ExitCode.OK, run("predict", HATCH.toString(), "--theta0-deg", "40", "--at-deg", "0",
                "--draws", "20", "--json"), cli.err());
        String json = cli.out();
        Object tree = JsonTree.parse(json);
        assertTrue(at(tree, "fit") instanceof String id && id.startsWith("fit-"), json);
        for (String[] key : new String[][] {{"settle_time_s"}, {"half_swings"}, {"peak_angular_velocity_rad_s"},
            {"peak_time_s"}, {"max_overshoot_deg"}, {"at_angle", "kinetic_energy_J"}}) {
            double value = JsonTree.requiredNumber(json, (Object[]) concat(key, new String[] {"value"}));
            double low = JsonTree.requiredNumber(json, (Object[]) concat(key, new String[] {"low"}));
            double high = JsonTree.requiredNumber(json, (Object[]) concat(key, new String[] {"high"}));
            assertTrue(low <= high, Arrays.toString(key) + ": " + low + " > " + high);
            assertTrue(Double.isFinite(value), Arrays.toString(key));
        }
        assertTrue(at(tree, "band_definition") instanceof String d
                && d.startsWith("low and high are the 5th and 95th percentiles"), json);
        assertTrue(at(tree, "rest_band_deg") instanceof Map, json);
    }

    @Test
    void theReportCarriesTheHazardCaution() {
        assertEquals(ExitCode.OK, run("predict", HATCH.toString(), "--theta0-deg", "30", "--draws", "0"), cli.err());
        String text = cli.out();
        assertTrue(text.contains("friction: stored fit fit-"), text);
        assertTrue(text.contains("settles inside the band after"), text);
        assertTrue(text.contains("never shows that a mechanism is safe"), text);
    }

    @Test
    void withoutAStoredFitOrFrictionTheUserIsToldWhatToGive() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("predict", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "1", "--theta0-deg", "20"));
        assertTrue(cli.err().contains("no stored fit to use"), cli.err());
    }

    @Test
    void aRadiusNeedsAnAngle() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("predict", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "1", "--coulomb", "0.1", "--theta0-deg", "20", "--radius-m", "0.3"));
        assertTrue(cli.err().contains("--at-deg"), cli.err());
    }

    @Test
    void anUnknownFitIsNamedWithTheOnesThereAre() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("predict", HATCH.toString(), "--theta0-deg", "20", "--fit", "nope"));
        assertTrue(cli.err().contains("no stored fit 'nope'"), cli.err());
    }

    @Test
    void aDesignAnswerIsCheckedBySimulatingWithTheFoundDamping() {
        String[] arm = {"--mass", "2", "--centroid-distance", "0.4", "--pivot-inertia", "0.5"};
        String[] args = concat(concat(new String[] {"predict"}, arm), new String[] {"--viscous", "0.01", "--theta0-deg",
            "17", "--band-deg", "0.5", "--settle-within-s", "8", "--json"});
        assertEquals(ExitCode.OK, run(args), cli.err());
        String json = cli.out();
        assertEquals(Boolean.TRUE, at(JsonTree.parse(json), "design", "meets"), json);
        double total = JsonTree.requiredNumber(json, "design", "total");
        assertTrue(total > 0.01, json);
        cli.clear();
        // the simulate command, told the found damping, settles inside ±0.5° within the 8 s asked for
        assertEquals(ExitCode.OK, run(concat(concat(new String[] {"simulate"}, arm), new String[] {"--viscous",
            Double.toString(total), "--theta0-deg", "17", "--band-deg", "0.5", "--duration", "20", "--json"})), cli.err());
        double settle = JsonTree.requiredNumber(cli.out(), "settle_time_s");
        // (to the root finder's accuracy: the answer is the smallest damping that meets the spec)
        assertTrue(settle <= 8 + 1e-6 && settle > 7, "settles after " + settle);
    }

    @Test
    void aSpeedSpecMustBeAnAngleAndASpeed() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("predict", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
                "--coulomb", "0.1", "--theta0-deg", "20", "--max-speed-at-deg", "fast"));
        assertTrue(cli.err().contains("ANGLE:RAD_S"), cli.err());
    }

    @Test
    void aWhatIfGivesTheChangedPeriodBesideTheBaseline(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        // a point mass on r: T0 = 2π sqrt(r/g) (simple pendulum, the classic result); moving the bob
        // from 1 m to 0.5 m shortens the period by the factor √2
        Path parts = java.nio.file.Files.writeString(dir.resolve("bob.csv"), "name,shape,mass_kg,x_m,y_m,z_m\nbob,point,2,0,-1,0\n");
        assertEquals(ExitCode.OK, run("predict", parts.toString(), "--viscous", "0.05", "--theta0-deg", "5",
                "--set", "bob.y=-500mm", "--json"), cli.err());
        String json = cli.out();
        double g = 9.80665;
        assertEquals(2 * Math.PI * Math.sqrt(1 / g), JsonTree.requiredNumber(json, "what_if", "baseline", "small_angle_period_s"), 1e-9);
        assertEquals(2 * Math.PI * Math.sqrt(0.5 / g), JsonTree.requiredNumber(json, "what_if", "changed", "small_angle_period_s"), 1e-9);
        assertEquals(2 * 0.25, JsonTree.requiredNumber(json, "what_if", "changed", "pivot_inertia_kg_m2"), 1e-12);
        cli.clear();
        assertEquals(ExitCode.OK, run("predict", parts.toString(), "--viscous", "0.05", "--theta0-deg", "5",
                "--set", "bob.y=-500mm"), cli.err());
        assertTrue(cli.out().contains("What-if: bob.y=-500mm"), cli.out());
    }

    private static String[] concat(String[] a, String[] b) {
        String[] all = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }
}
