package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Optional;

import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.services.DemoRecords;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.NewMechanismFile;
import dev.penduline.services.PartsImport;
import dev.penduline.services.SessionRecords;

/**
 * Mechanism files with the problems a user meets, made in one folder (a project's) the way a
 * user gets them: a valid file, one with a part of negative mass (a hand edit), one whose two
 * sessions' records were then deleted and edited, and one whose XML breaks on its third line.
 */
final class ProblemFiles {

    /** The arm's mass as the mechanism file writes it. */
    static final String ARM_MASS = "<mass>2.0</mass>";
    /** The line of the broken file where the XML breaks: its name element is closed by a misspelt tag. */
    static final int BROKEN_LINE = 3;

    final Path folder;
    final Path valid;
    final Path badPart;
    final Path sessions;
    final Path broken;
    /** The session whose record was deleted, and the one whose record was edited after it was added. */
    final String missingSession = "release-at-12";
    final String changedSession = "release-at-30";
    final Path missingRecord;
    final Path changedRecord;
    final byte[] missingRecordAsAdded;
    final byte[] changedRecordAsAdded;

    /**
     * Writes the files into a folder.
     *
     * @param folder  the folder (a project's), existing
     * @param scratch where the parts list and the raw records are made before they are added
     * @throws Exception when a file cannot be written
     */
    ProblemFiles(Path folder, Path scratch) throws Exception {
        this.folder = folder;
        Path csv = Files.writeString(scratch.resolve("marker-arm-parts.csv"), TestMechanisms.ROD_AND_DISC,
                StandardCharsets.UTF_8);
        valid = folder.resolve("valid.penduline");
        NewMechanismFile.write("Valid arm (invented)", Optional.of(PartsImport.readPartsList(csv)), valid);
        String text = Files.readString(valid);
        assertTrue(text.contains(ARM_MASS), "the arm's mass as written: " + text);

        badPart = Files.writeString(folder.resolve("bad-part.penduline"), text.replace(ARM_MASS, "<mass>-2.0</mass>"));

        sessions = folder.resolve("sessions.penduline");
        NewMechanismFile.write("Tested arm (invented)", Optional.of(PartsImport.readPartsList(csv)), sessions);
        // INVENTED records: viscous 0.01 N·m·s/rad, Coulomb 0.04 N·m; 4 s at 100 Hz in degrees
        FrictionTorques truth = new FrictionTorques(0.01, 0.04, 0, 0);
        int seed = 5;
        for (int degrees : new int[] {12, 30}) {
            Path raw = scratch.resolve("release-" + degrees + "deg.csv");
            DemoRecords.write(new MechanismLoader().load(sessions), truth, new DemoRecords.Settings(Unit.DEGREE.toSi(degrees),
                    0, Unit.DEGREE.toSi(0.02), 0, 0.5, 4, 100, seed++), raw);
            SessionRecords.addSession(sessions, raw, SwingImportOptions.defaults(), "release at " + degrees,
                    Double.NaN, "INVENTED record made by the workbench test");
        }
        missingRecord = folder.resolve(SessionRecords.RECORDS_FOLDER).resolve("release-12deg.csv");
        changedRecord = folder.resolve(SessionRecords.RECORDS_FOLDER).resolve("release-30deg.csv");
        missingRecordAsAdded = Files.readAllBytes(missingRecord);
        changedRecordAsAdded = Files.readAllBytes(changedRecord);
        Files.delete(missingRecord);
        Files.writeString(changedRecord, "# edited after the session was added\n", StandardOpenOption.APPEND);

        broken = Files.writeString(folder.resolve("broken.penduline"), String.join("\n", text.lines()
                .limit(BROKEN_LINE - 1).toList()) + "\n  <name>Broken arm</nmae>\n");
    }
}
