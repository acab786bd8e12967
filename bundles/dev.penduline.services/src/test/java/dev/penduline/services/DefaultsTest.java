package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.physics.identify.FitSettings;

/** The per-user defaults file: where it is, what it accepts, how it is saved. */
class DefaultsTest {

    @TempDir
    Path dir;

    private Path file(String text) throws IOException {
        return Files.writeString(dir.resolve(Defaults.FILE_NAME), text);
    }

    private InputException refused(String text) throws IOException {
        Path f = file(text);
        return assertThrows(InputException.class, () -> Defaults.read(f));
    }

    @Test
    void theBuiltInValuesAreTheOnesTheProgramUsesWithoutTheFile() {
        // standard gravity: 9.80665 m/s², as the 3rd CGPM (1901) defined it
        assertEquals(9.80665, Defaults.BUILT_IN.gravity());
        assertEquals(100 * FitSettings.defaults().verdictMargin(), Defaults.BUILT_IN.verdictMargin(), 1e-12);
        assertEquals(15, Defaults.BUILT_IN.verdictMargin(), 1e-12);
        assertEquals(FitSettings.defaults().resamples(), Defaults.BUILT_IN.resamples());
        assertEquals(1, Defaults.BUILT_IN.settleBand());
        assertEquals(dev.penduline.services.present.Figures.DEFAULT_DIGITS, Defaults.BUILT_IN.significantDigits());
        assertEquals(Defaults.BUILT_IN.applyTo(FitSettings.defaults()), FitSettings.defaults());
    }

    @Test
    void aMissingFileMeansTheBuiltInDefaults() throws Exception {
        assertEquals(Defaults.BUILT_IN, Defaults.read(dir.resolve("nowhere").resolve(Defaults.FILE_NAME)));
    }

    @Test
    void aFileGivesItsValuesAndTheBuiltInOnesForTheKeysItLeavesOut() throws Exception {
        Path f = file("""
                # my rig in the basement
                ! an old-style comment

                gravity_m_s2 = 9.8123\r
                resamples:120
                  significant_digits =6
                """);
        Defaults d = Defaults.read(f);
        assertEquals(new Defaults(9.8123, 15, 1, 120, 6), d);
    }

    @Test
    void aBadValueNamesTheFileTheLineAndTheKey() throws Exception {
        InputException e = refused("""
                # defaults
                gravity_m_s2 = 9.81
                resamples = 2000
                """);
        String m = e.getMessage();
        assertTrue(m.startsWith(dir.resolve(Defaults.FILE_NAME) + ":3: resamples: '2000' is out of range"), m);
        assertTrue(m.contains("from 0 and at most 1000"), m);

        m = refused("gravity_m_s2 = 0\n").getMessage();
        assertTrue(m.contains(":1: gravity_m_s2: '0' is out of range: give a value above 0 and at most 100 m/s²"), m);
        m = refused("\n\nsignificant_digits = 4.5\n").getMessage();
        assertTrue(m.contains(":3: significant_digits: '4.5' is not a whole number"), m);
        m = refused("settle_band_deg = one\n").getMessage();
        assertTrue(m.contains(":1: settle_band_deg: 'one' is not a number"), m);
        m = refused("verdict_margin_pp = 100\n").getMessage();
        assertTrue(m.contains(":1: verdict_margin_pp: '100' is out of range: give a value from 0 and below 100"), m);
        m = refused("verdict_margin_pp = NaN\n").getMessage();
        assertTrue(m.contains(":1: verdict_margin_pp: 'NaN' is not a number"), m);
    }

    @Test
    void unknownRepeatedAndShapelessLinesAreRefusedWithTheirLine() throws Exception {
        String m = refused("gravity = 9.81\n").getMessage();
        assertTrue(m.contains(":1: unknown key 'gravity'; keys: gravity_m_s2, verdict_margin_pp, settle_band_deg,"
                + " resamples, significant_digits"), m);
        m = refused("resamples = 10\n\nresamples = 20\n").getMessage();
        assertTrue(m.contains(":3: resamples: given again (first on line 1)"), m);
        m = refused("resamples 10\n").getMessage();
        assertTrue(m.contains(":1: 'resamples 10' is not a 'key = value' line"), m);
        m = refused("resamples = \u001b[31m\n").getMessage();
        assertFalse(m.contains("\u001b"), "a control character reached the message: " + m);
    }

    @Test
    void aFileThatIsNotARegularUtf8FileIsRefusedByName() throws Exception {
        Path folder = Files.createDirectories(dir.resolve("folder.properties"));
        InputException e = assertThrows(InputException.class, () -> Defaults.read(folder));
        assertTrue(e.getMessage().contains(folder.toString()), e.getMessage());
        Path latin1 = Files.write(dir.resolve("latin1.properties"), "# r\u00e9glages\n".getBytes(StandardCharsets.ISO_8859_1));
        e = assertThrows(InputException.class, () -> Defaults.read(latin1));
        assertTrue(e.getMessage().startsWith(latin1 + ": not UTF-8"), e.getMessage());
    }

    @Test
    void whatIsWrittenReadsBackTheSame() throws Exception {
        Path f = dir.resolve("new").resolve("penduline").resolve(Defaults.FILE_NAME);
        Defaults d = new Defaults(9.7803253359, 12.5, 0.25, 0, 7);
        assertEquals(List.of(), d.write(f));
        assertEquals(d, Defaults.read(f));
        String text = Files.readString(f);
        assertTrue(text.contains("\ngravity_m_s2 = 9.7803253359\n"), text);
        assertTrue(text.contains("\nverdict_margin_pp = 12.5\n"), text);
        assertTrue(text.contains("\nresamples = 0\n"), text);
        assertEquals(Defaults.BUILT_IN, Defaults.read(Files.writeString(f, Defaults.BUILT_IN.text())));
        try (Stream<Path> left = Files.list(f.getParent())) {
            assertEquals(List.of(f), left.toList(), "only the file itself: no temporary file is left");
        }
    }

    @Test
    void aFailedSaveLeavesTheOldFileAsItWas() throws Exception {
        Path f = dir.resolve(Defaults.FILE_NAME);
        Defaults.BUILT_IN.write(f);
        byte[] before = Files.readAllBytes(f);
        AtomicFileWrite.Disk full = new AtomicFileWrite.Disk() {
            @Override
            public void rename(Path temporary, Path target) throws IOException {
                throw new IOException("No space left on device");
            }
        };
        IOException e = assertThrows(IOException.class, () -> new Defaults(9.81, 10, 2, 10, 3).write(f, full));
        assertTrue(e.getMessage().startsWith(f + ": cannot be saved"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(f));
        assertEquals(Defaults.BUILT_IN, Defaults.read(f));
    }

    @Test
    void oneValueChangesThroughItsKeyAndIsChecked() {
        Defaults d = Defaults.BUILT_IN.with(Defaults.Key.SETTLE_BAND, 0.5);
        assertEquals(0.5, d.settleBand());
        assertEquals(Defaults.BUILT_IN.gravity(), d.gravity());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> d.with(Defaults.Key.SIGNIFICANT_DIGITS, 11));
        assertTrue(e.getMessage().startsWith("significant_digits: '11' is out of range"), e.getMessage());
        assertEquals(6.0, Defaults.Key.SIGNIFICANT_DIGITS.parse(" 6 "));
        assertThrows(IllegalArgumentException.class, () -> new Defaults(-1, 15, 1, 40, 4));
    }

    @Test
    void theFitTakesTheResamplesAndTheMarginAndKeepsTheRest() {
        FitSettings s = new Defaults(9.81, 25, 1, 12, 4).applyTo(FitSettings.defaults());
        assertEquals(12, s.resamples());
        assertEquals(0.25, s.verdictMargin(), 1e-15);
        assertEquals(FitSettings.defaults().seed(), s.seed());
        assertEquals(FitSettings.defaults().misfitRatio(), s.misfitRatio());
        assertEquals(FitSettings.defaults().maxIterations(), s.maxIterations());
    }

    @Test
    void theFileLivesInTheConfigFolderTheEnvironmentNames() {
        assertEquals(Path.of("/t/cfg/defaults.properties"), Defaults.location("/t/cfg", "/x", "/home/u"));
        assertEquals(Path.of("/x/penduline/defaults.properties"), Defaults.location(null, "/x", "/home/u"));
        // XDG base directories: a relative XDG_CONFIG_HOME is ignored
        assertEquals(Path.of("/home/u/.config/penduline/defaults.properties"), Defaults.location(null, "rel", "/home/u"));
        assertEquals(Path.of("/home/u/.config/penduline/defaults.properties"), Defaults.location(" ", null, "/home/u"));
    }
}
