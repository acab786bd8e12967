package dev.penduline.cli.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.PendulineCommandLine;

class PredictCommandTest {

    private static final Path HATCH = Path.of("..", "..", "samples", "inspection-hatch", "hatch.penduline");

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private ExitCode run(String... args) {
        return new PendulineCommandLine().run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    private static double number(String json, String path) {
        Matcher m = Pattern.compile(path + "[^0-9-]*([-0-9.eE]+)", Pattern.DOTALL).matcher(json);
        assertTrue(m.find(), path + " missing in " + json);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void undampedPassageSpeedFollowsTheEnergyBalance() {
        // point mass on 1 m in standard gravity, no friction, released at 60°: passing the bottom,
        // ½ m L² ω² = m g L (1 − cos 60°), so ω = sqrt(g) = 3.13156 rad/s and the bob moves at
        // 3.13156 m/s (conservation of energy)
        assertEquals(ExitCode.OK, run("predict", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
                "--viscous", "0", "--theta0-deg", "60", "--at-deg", "0", "--radius-m", "1", "--json"), err.toString());
        String json = out.toString();
        assertEquals("options", json.replaceAll("(?s).*\"fit\": \"([^\"]*)\".*", "$1"));
        assertEquals(-Math.sqrt(9.80665), number(json, "\"angular_velocity_rad_s\": \\{\\s*\"value\""), 1e-6);
        assertEquals(Math.sqrt(9.80665), number(json, "\"tip_speed_m_s\": \\{\\s*\"value\""), 1e-4);
        assertEquals(0.5 * 9.80665, number(json, "\"kinetic_energy_J\": \\{\\s*\"value\""), 1e-3);
        assertTrue(json.contains("\"settled\": false"), json);
    }

    @Test
    void theStoredFitIsUsedAndEveryFigureHasABand() {
        assertEquals(ExitCode.OK, run("predict", HATCH.toString(), "--theta0-deg", "40", "--at-deg", "0",
                "--draws", "20", "--json"), err.toString());
        String json = out.toString();
        assertTrue(json.contains("\"fit\": \"fit-"), json);
        for (String key : new String[] {"settle_time_s", "half_swings", "peak_angular_velocity_rad_s", "peak_time_s",
                "max_overshoot_deg", "kinetic_energy_J"}) {
            double value = number(json, "\"" + key + "\": \\{\\s*\"value\"");
            double low = number(json, "\"" + key + "\": \\{[^}]*\"low\"");
            double high = number(json, "\"" + key + "\": \\{[^}]*\"high\"");
            assertTrue(low <= high, key + ": " + low + " > " + high);
            assertTrue(Double.isFinite(value), key);
        }
        assertTrue(json.contains("\"band_definition\": \"low and high are the 5th and 95th percentiles"), json);
        assertTrue(json.contains("\"rest_band_deg\": {"), json);
    }

    @Test
    void theReportCarriesTheHazardCaution() {
        assertEquals(ExitCode.OK, run("predict", HATCH.toString(), "--theta0-deg", "30", "--draws", "0"), err.toString());
        String text = out.toString();
        assertTrue(text.contains("friction: stored fit fit-"), text);
        assertTrue(text.contains("settles inside the band after"), text);
        assertTrue(text.contains("never shows that a mechanism is safe"), text);
    }

    @Test
    void withoutAStoredFitOrFrictionTheUserIsToldWhatToGive() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("predict", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "1", "--theta0-deg", "20"));
        assertTrue(err.toString().contains("no stored fit to use"), err.toString());
    }

    @Test
    void aRadiusNeedsAnAngle() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("predict", "--mass", "1", "--centroid-distance", "1",
                "--pivot-inertia", "1", "--coulomb", "0.1", "--theta0-deg", "20", "--radius-m", "0.3"));
        assertTrue(err.toString().contains("--at-deg"), err.toString());
    }

    @Test
    void anUnknownFitIsNamedWithTheOnesThereAre() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("predict", HATCH.toString(), "--theta0-deg", "20", "--fit", "nope"));
        assertTrue(err.toString().contains("no stored fit 'nope'"), err.toString());
    }
}
