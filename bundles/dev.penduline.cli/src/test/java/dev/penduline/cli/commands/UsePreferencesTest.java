package dev.penduline.cli.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;
import dev.penduline.cli.OptionRules;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.services.Defaults;
import dev.penduline.services.present.Figures;

/**
 * The global option {@code --use-preferences}: the commands take their defaults from the user's
 * defaults file (here in a temporary folder named by the {@value Defaults#CONFIG_DIR_PROPERTY}
 * seam, never the real user's), options on the line still win, and without the option the file is
 * never read, however odd its values.
 */
class UsePreferencesTest {

    @TempDir
    Path dir;

    private final CommandHarness cli = new CommandHarness();
    private String previous;
    private Path prefs;

    @BeforeEach
    void pointAtATemporaryConfigFolder() {
        previous = System.getProperty(Defaults.CONFIG_DIR_PROPERTY);
        Path config = dir.resolve("config");
        System.setProperty(Defaults.CONFIG_DIR_PROPERTY, config.toString());
        prefs = config.resolve(Defaults.FILE_NAME);
        assertEquals(prefs, Defaults.location());
    }

    @AfterEach
    void restore() {
        if (previous == null) {
            System.clearProperty(Defaults.CONFIG_DIR_PROPERTY);
        } else {
            System.setProperty(Defaults.CONFIG_DIR_PROPERTY, previous);
        }
    }

    private void prefer(String text) throws Exception {
        Files.createDirectories(prefs.getParent());
        Files.writeString(prefs, text);
    }

    /** A number at the top level of a command's {@code --json} output. */
    private static double number(String json, String key) {
        double v = JsonTree.number(JsonTree.parse(json), key);
        assertFalse(Double.isNaN(v), key + " missing in " + json);
        return v;
    }

    /** The period line of the readable inertia report: the figure as printed. */
    private static String period(String report) {
        Matcher m = Pattern.compile("small-angle period T0 +([-0-9.e]+) s").matcher(report);
        assertTrue(m.find(), report);
        return m.group(1);
    }

    /** A point mass of 1 kg hanging 1 m below the axis: a simple pendulum of length 1 m. */
    private Path bob() throws Exception {
        return Files.writeString(dir.resolve("bob.csv"), "name,shape,mass_kg,x_m,y_m,z_m\nbob,point,1,0,-1,0\n");
    }

    @Test
    void gravityAndDigitsComeFromTheFileOnlyWithTheOption() throws Exception {
        // simple pendulum, small angles: T0 = 2π √(L/g) (any mechanics textbook); L = 1 m
        prefer("gravity_m_s2 = 3.71\nsignificant_digits = 6\n");
        Path bob = bob();
        assertEquals(ExitCode.OK, cli.run("--use-preferences", "inertia", bob.toString()), cli.err());
        String shown = period(cli.out());
        assertEquals(6, new BigDecimal(shown).precision(), shown);
        assertEquals(2 * Math.PI * Math.sqrt(1 / 3.71), Double.parseDouble(shown), 0.5e-5);
        assertEquals(Figures.DEFAULT_DIGITS, Figures.digits(), "the display precision is the command's only");

        cli.clear();
        assertEquals(ExitCode.OK, cli.run("inertia", bob.toString(), "--use-preferences", "--json"), cli.err());
        assertEquals(3.71, number(cli.out(), "gravity_m_s2"));
        assertEquals(2 * Math.PI * Math.sqrt(1 / 3.71), number(cli.out(), "small_angle_period_s"), 1e-12);

        cli.clear();
        assertEquals(ExitCode.OK, cli.run("--use-preferences", "inertia", bob.toString(), "--gravity", "9.81", "--json"),
                cli.err());
        assertEquals(9.81, number(cli.out(), "gravity_m_s2"), "an option on the line wins");

        cli.clear();
        assertEquals(ExitCode.OK, cli.run("inertia", bob.toString()), cli.err());
        shown = period(cli.out());
        assertEquals(4, new BigDecimal(shown).precision(), shown);
        assertEquals(2 * Math.PI * Math.sqrt(1 / 9.80665), Double.parseDouble(shown), 0.5e-3);
    }

    @Test
    void withoutTheOptionTheFileIsNeverRead() throws Exception {
        prefer("gravity_m_s2 = 1.62\nverdict_margin_pp = 80\nsettle_band_deg = 45\nresamples = 1\nsignificant_digits = 9\n");
        Path bob = bob();
        assertEquals(ExitCode.OK, cli.run("inertia", bob.toString(), "--json"), cli.err());
        assertEquals(9.80665, number(cli.out(), "gravity_m_s2"));
        cli.clear();
        assertEquals(ExitCode.OK, cli.run("predict", "--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1",
                "--theta0-deg", "10", "--viscous", "0.05", "--draws", "0", "--json"), cli.err());
        assertEquals(1.0, number(cli.out(), "band_deg"));

        // not even a broken file: it is not opened
        prefer("significant_digits = many\n");
        cli.clear();
        assertEquals(ExitCode.OK, cli.run("inertia", bob.toString()), cli.err());
        assertEquals(4, new BigDecimal(period(cli.out())).precision());
    }

    @Test
    void aBrokenFileIsAnInputErrorNamingItsLineAndKey() throws Exception {
        prefer("# mine\nresamples = -3\n");
        assertEquals(ExitCode.USAGE_OR_INPUT, cli.run("--use-preferences", "inertia", bob().toString()));
        assertTrue(cli.err().contains(prefs + ":2: resamples: '-3' is out of range"), cli.err());
        assertTrue(cli.err().contains("run without --use-preferences"), cli.err());
        assertEquals("", cli.out());
    }

    @Test
    void aMissingFileMeansTheBuiltInDefaults() throws Exception {
        assertEquals(ExitCode.OK, cli.run("--use-preferences", "inertia", bob().toString(), "--json"), cli.err());
        assertEquals(9.80665, number(cli.out(), "gravity_m_s2"));
    }

    @Test
    void theFitTakesItsResamplesAndVerdictMarginFromTheFile() throws Exception {
        Path record = dir.resolve("release.csv");
        String[] arm = {"--mass", "2", "--centroid-distance", "0.4", "--pivot-inertia", "0.5"};
        assertEquals(ExitCode.OK, cli.run(join(new String[] {"demo-record", "--theta0-deg", "20", "--viscous", "0.01",
            "--duration", "8", "--rate", "100", "--counts-per-rev", "0", "--noise-deg", "0.02", "--out", record.toString()},
                arm)), cli.err());
        prefer("resamples = 3\nverdict_margin_pp = 30\n");
        String[] fit = join(new String[] {"fit", "--session", record.toString(), "--terms", "viscous", "--json"}, arm);

        cli.clear();
        assertEquals(ExitCode.OK, cli.run(join(new String[] {"--use-preferences"}, fit)), cli.err());
        assertEquals(3, number(cli.out(), "resamples"));
        assertEquals(0.30, number(cli.out(), "verdict_margin"), 1e-12);

        cli.clear();
        assertEquals(ExitCode.OK, cli.run(join(fit, new String[] {"--use-preferences", "--resamples", "2"})), cli.err());
        assertEquals(2, number(cli.out(), "resamples"), "an option on the line wins");
        assertEquals(0.30, number(cli.out(), "verdict_margin"), 1e-12);

        cli.clear();
        assertEquals(ExitCode.OK, cli.run(fit), cli.err());
        assertEquals(Defaults.BUILT_IN.resamples(), number(cli.out(), "resamples"));
        assertEquals(0.15, number(cli.out(), "verdict_margin"), 1e-12);
    }

    @Test
    void predictAndSimulateTakeTheSettleBandAndImportPartsTheGravity() throws Exception {
        prefer("settle_band_deg = 2.5\ngravity_m_s2 = 9.7803\n");
        String[] lumped = {"--mass", "1", "--centroid-distance", "1", "--pivot-inertia", "1", "--theta0-deg", "10",
            "--viscous", "0.05", "--json"};
        assertEquals(ExitCode.OK, cli.run(join(new String[] {"--use-preferences", "predict", "--draws", "0"}, lumped)),
                cli.err());
        assertEquals(2.5, number(cli.out(), "band_deg"));
        cli.clear();
        assertEquals(ExitCode.OK, cli.run(join(new String[] {"--use-preferences", "simulate", "--band-deg", "0.5"}, lumped)),
                cli.err());
        assertEquals(0.5, number(cli.out(), "band_deg"), "an option on the line wins");

        Path target = dir.resolve("bob.penduline");
        cli.clear();
        assertEquals(ExitCode.OK, cli.run("--use-preferences", "import-parts", bob().toString(), "--to", target.toString()),
                cli.err());
        assertEquals(9.7803, MechanismFiles.load(target).getGravity());
        Path plain = dir.resolve("plain.penduline");
        assertEquals(ExitCode.OK, cli.run("import-parts", bob().toString(), "--to", plain.toString()), cli.err());
        assertEquals(9.80665, MechanismFiles.load(plain).getGravity());
        assertTrue(!Files.readString(plain).contains("gravity"), "standard gravity is the format's default: not written");
    }

    @Test
    void theHelpNamesTheOptionAndTheFile() {
        assertEquals(ExitCode.OK, cli.run("help"));
        assertTrue(cli.out().contains("--use-preferences"), cli.out());
        assertTrue(cli.out().contains(prefs.toString()), cli.out());
    }

    @Test
    void theFileAcceptsWhatTheOptionsAccept() {
        // one range for a setting, whether typed as an option or kept in the defaults file
        String[][] pairs = {{"gravity", "GRAVITY"}, {"verdict-margin", "VERDICT_MARGIN"}, {"band-deg", "SETTLE_BAND"},
            {"resamples", "RESAMPLES"}};
        for (String[] p : pairs) {
            assertEquals(OptionRules.of(p[0]).range(), Defaults.Key.valueOf(p[1]).range(), p[0]);
        }
    }

    private static String[] join(String[] a, String[] b) {
        String[] all = new String[a.length + b.length];
        System.arraycopy(a, 0, all, 0, a.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }
}
