package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.records.swing.SwingImportOptions;

/**
 * Where session records may lie and what a session's record must still be: inside the project
 * (also through symbolic links), present, a regular file, added once, and unchanged unless the
 * change is accepted. The records are invented damped cosines.
 */
class SessionRecordsTest {

    @TempDir
    Path dir;

    private Path project;
    private Path mechanism;
    private Path outside;

    /** An invented decaying swing, 400 samples at 100 Hz. */
    private static String swing(double amplitude) {
        StringBuilder b = new StringBuilder("# invented test record\ntime_s,angle_deg\n");
        for (int i = 0; i < 400; i++) {
            double t = i * 0.01;
            b.append(String.format(Locale.ROOT, "%.2f,%.5f%n", t, amplitude * Math.exp(-0.2 * t) * Math.cos(5 * t)));
        }
        return b.toString();
    }

    @BeforeEach
    void project() throws Exception {
        project = Files.createDirectories(dir.resolve("project"));
        outside = Files.createDirectories(dir.resolve("elsewhere"));
        mechanism = project.resolve("arm.penduline");
        Path parts = Files.writeString(project.resolve("parts.csv"),
                "name,shape,mass_kg,x_m,y_m,z_m,length_m,axis\narm,rod,2,0,-0.4,0,0.8,y\n");
        PartsImport.importFile(parts, mechanism, "Arm");
    }

    private SessionRecords.Added add(Path record) throws InputException {
        return SessionRecords.addSession(mechanism, record, SwingImportOptions.defaults(), null, Double.NaN, null);
    }

    private TestSession session(int i) throws InputException {
        return MechanismLoader.readMechanism(mechanism).getSessions().get(i);
    }

    @Test
    void theSameRecordIsAddedOnceByPathOrByContent() throws Exception {
        Path record = Files.writeString(outside.resolve("release.csv"), swing(10));
        add(record);
        byte[] before = Files.readAllBytes(mechanism);
        InputException again = assertThrows(InputException.class, () -> add(record));
        // the record from elsewhere again: its copy would be the session's record, by content
        assertTrue(again.getMessage().contains("has the same content (SHA-256 ")
                && again.getMessage().contains("as the record of session 'release'"), again.getMessage());
        InputException inside = assertThrows(InputException.class, () -> add(project.resolve("records/release.csv")));
        assertTrue(inside.getMessage().contains("is already the record of session 'release'"), inside.getMessage());
        Path copy = Files.copy(record, outside.resolve("copy.csv"));
        InputException sameContent = assertThrows(InputException.class, () -> add(copy));
        assertTrue(sameContent.getMessage().contains("has the same content (SHA-256 ")
                && sameContent.getMessage().contains("as the record of session 'release' (records/release.csv)"),
                sameContent.getMessage());
        assertArrayEquals(before, Files.readAllBytes(mechanism), "a refused record changes nothing");
        assertFalse(Files.exists(project.resolve("records/copy.csv")), "nor is it copied");
        add(Files.writeString(outside.resolve("other.csv"), swing(12)));
        assertEquals(2, MechanismLoader.readMechanism(mechanism).getSessions().size());
    }

    @Test
    void aRecordsStateFollowsItsFileAndTheStoredHash() throws Exception {
        add(Files.writeString(outside.resolve("release.csv"), swing(10)));
        TestSession s = session(0);
        Path copy = project.resolve(s.getRecordPath());
        assertEquals(SessionRecords.RecordState.UNCHANGED, SessionRecords.recordState(mechanism, s, SessionRecords::sha256));
        Files.writeString(copy, swing(11));
        assertEquals(SessionRecords.RecordState.CHANGED, SessionRecords.recordState(mechanism, s, SessionRecords::sha256));
        s.setContentHash(null);
        assertEquals(SessionRecords.RecordState.NO_HASH, SessionRecords.recordState(mechanism, s, SessionRecords::sha256));
        assertEquals(SessionRecords.RecordState.UNREADABLE, SessionRecords.recordState(mechanism, s, f -> {
            throw new java.io.IOException("refused by the test");
        }));
        Files.delete(copy);
        assertEquals(SessionRecords.RecordState.MISSING, SessionRecords.recordState(mechanism, s, SessionRecords::sha256));
    }

    @Test
    void aDifferentRecordUnderASessionRecordsNameIsAClashOfNamesNotADuplicate() throws Exception {
        add(Files.writeString(outside.resolve("release.csv"), swing(10)));
        Path other = Files.createDirectories(dir.resolve("other"));
        Path clash = Files.writeString(other.resolve("release.csv"), swing(14));
        InputException e = assertThrows(InputException.class, () -> add(clash));
        assertTrue(e.getMessage().contains("a different file of that name is already in the project"), e.getMessage());
    }

    @Test
    void aLinkInsideRecordsThatLeadsOutOfTheProjectIsRefusedWhenAddedAndWhenRead() throws Exception {
        Path target = Files.writeString(outside.resolve("release.csv"), swing(10));
        Path records = Files.createDirectories(project.resolve("records"));
        Path link = Files.createSymbolicLink(records.resolve("release.csv"), target);
        InputException added = assertThrows(InputException.class, () -> add(link));
        assertEquals("records/release.csv is a symbolic link to " + target.toRealPath() + ", outside the project folder "
                + project + "; copy the record into records/ instead", added.getMessage());

        // a session whose record became such a link (the file replaced by hand) is not followed either
        Files.delete(link);
        Files.copy(target, link);
        add(link);
        Files.delete(link);
        Files.createSymbolicLink(link, target);
        TestSession s = session(0);
        InputException read = assertThrows(InputException.class, () -> SessionRecords.readSession(mechanism, s));
        assertTrue(read.getMessage().startsWith("session 'release': records/release.csv is a symbolic link to "),
                read.getMessage());
    }

    @Test
    void aRecordsFolderThatIsALinkOutOfTheProjectIsNamed() throws Exception {
        Files.writeString(outside.resolve("release.csv"), swing(10));
        Files.createSymbolicLink(project.resolve("records"), outside);
        InputException e = assertThrows(InputException.class, () -> add(project.resolve("records/release.csv")));
        assertEquals("records/release.csv: records is a symbolic link to " + outside.toRealPath() + ", outside the project"
                + " folder " + project + "; copy the record into records/ instead", e.getMessage());
        // nor is a record from elsewhere copied through it
        Path other = Files.writeString(dir.resolve("other.csv"), swing(8));
        assertThrows(InputException.class, () -> add(other));
        assertFalse(Files.exists(outside.resolve("other.csv")), "nothing written outside the project");
    }

    @Test
    void aLinkThatStaysInsideTheProjectIsFine() throws Exception {
        Path data = Files.createDirectories(project.resolve("data"));
        Files.writeString(data.resolve("release.csv"), swing(10));
        Files.createSymbolicLink(project.resolve("records"), Path.of("data"));
        SessionRecords.Added a = add(project.resolve("records/release.csv"));
        assertFalse(a.copied());
        SessionRecords.SessionRecord r = SessionRecords.readSession(mechanism, session(0));
        assertEquals(List.of(), r.warnings());
    }

    @Test
    void aMissingRecordSaysWhereItShouldBeAndWhatToDo() throws Exception {
        add(Files.writeString(outside.resolve("release.csv"), swing(10)));
        Files.delete(project.resolve("records/release.csv"));
        InputException e = assertThrows(InputException.class, () -> SessionRecords.readSession(mechanism, session(0)));
        assertEquals("session 'release': its record records/release.csv is missing (no such file in " + project
                + "); put the record back (from version control or the rig's copy), or fit other records with --session",
                e.getMessage());
    }

    @Test
    void aSessionRecordReplacedByAFolderOrAPipeIsRefusedUnopened() throws Exception {
        add(Files.writeString(outside.resolve("release.csv"), swing(10)));
        Path record = project.resolve("records/release.csv");
        Files.delete(record);
        Files.createDirectory(record);
        InputException folder = assertThrows(InputException.class, () -> SessionRecords.readSession(mechanism, session(0)));
        assertTrue(folder.getMessage().contains("not a regular file: a folder"), folder.getMessage());
        Files.delete(record);
        Process p = new ProcessBuilder("mkfifo", record.toString()).start();
        assumeTrue(p.waitFor() == 0, "mkfifo is not available here");
        InputException pipe = assertThrows(InputException.class, () -> SessionRecords.readSession(mechanism, session(0)));
        assertTrue(pipe.getMessage().contains("not a regular file: a named pipe"), pipe.getMessage());
    }

    @Test
    void aChangedRecordIsToldWithBothHashesAndTheFitRefusesItUnlessAccepted() throws Exception {
        add(Files.writeString(outside.resolve("release.csv"), swing(10)));
        Path record = project.resolve("records/release.csv");
        String stored = session(0).getContentHash();
        assertFalse(SessionRecords.readSession(mechanism, session(0)).changed());
        Files.writeString(record, "# edited by hand\n", StandardOpenOption.APPEND);

        SessionRecords.SessionRecord r = SessionRecords.readSession(mechanism, session(0));
        assertTrue(r.changed());
        String now = r.record().sha256();
        assertEquals(List.of("session 'release': records/release.csv has changed since it was added: its SHA-256 is now "
                + now.substring(0, 12) + "…, the mechanism file holds " + stored.substring(0, 12) + "…"), r.warnings());

        MechanismSource lumped = MechanismLoader.lumped(2, 0.4, 0.43, 9.80665);
        InputException refused = assertThrows(InputException.class,
                () -> FrictionIdentification.sessionsOf(mechanism, lumped));
        assertTrue(refused.getMessage().startsWith(mechanism + ": not fitted, session 'release': records/release.csv has"
                + " changed"), refused.getMessage());
        assertTrue(refused.getMessage().contains("--accept-changed-records"), refused.getMessage());

        FrictionIdentification.SessionInput accepted = FrictionIdentification.sessionsOf(mechanism, lumped, true).get(0);
        assertNotNull(accepted.change());
        assertEquals(now, accepted.record().sha256());
        Mechanism m = MechanismLoader.readMechanism(mechanism);
        assertEquals(stored, m.getSessions().get(0).getContentHash(), "reading never changes the stored hash");
    }

    @Test
    void theRecordChecksWithoutReadingTellEveryProblemAsAWarning() throws Exception {
        add(Files.writeString(outside.resolve("release.csv"), swing(10)));
        add(Files.writeString(outside.resolve("second.csv"), swing(12)));
        add(Files.writeString(outside.resolve("third.csv"), swing(14)));
        assertEquals(List.of(), SessionRecords.recordWarnings(mechanism));
        Path records = project.resolve("records");
        Files.writeString(records.resolve("release.csv"), "# edited\n", StandardOpenOption.APPEND);
        Files.delete(records.resolve("second.csv"));
        Files.delete(records.resolve("third.csv"));
        Files.createSymbolicLink(records.resolve("third.csv"), outside.resolve("third.csv"));
        List<String> w = SessionRecords.recordWarnings(mechanism);
        assertEquals(3, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("session 'release': records/release.csv has changed since it was added"), w.get(0));
        assertTrue(w.get(1).startsWith("session 'second': its record records/second.csv is missing"), w.get(1));
        assertTrue(w.get(2).startsWith("session 'third': records/third.csv is a symbolic link to "), w.get(2));
    }

    @Test
    void anUnchangedRecordHasNoChange() throws Exception {
        add(Files.writeString(outside.resolve("release.csv"), swing(10)));
        MechanismSource lumped = MechanismLoader.lumped(2, 0.4, 0.43, 9.80665);
        assertNull(FrictionIdentification.sessionsOf(mechanism, lumped).get(0).change());
    }
}
