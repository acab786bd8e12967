package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingImportOptions;

/**
 * The services' side of saving: what an output may replace ({@link OutputFiles}) and changes to a
 * mechanism file from several threads at once ({@link MechanismStore#update}).
 */
class SavingServicesTest {

    @TempDir
    Path dir;

    /** A project: a mechanism file with one session whose record is {@code tests/first.csv}, and records/. */
    private Path project() throws Exception {
        Path mechanismFile = dir.resolve("gate.penduline");
        NewMechanismFile.write("Yard gate", Optional.empty(), mechanismFile);
        Files.createDirectories(dir.resolve("tests"));
        Files.writeString(dir.resolve("tests").resolve("first.csv"), "time_s,angle_deg\n");
        Files.createDirectories(dir.resolve(SessionRecords.RECORDS_FOLDER));
        Files.writeString(dir.resolve(SessionRecords.RECORDS_FOLDER).resolve("second.csv"), "time_s,angle_deg\n");
        MechanismStore.update(mechanismFile, m -> session(m, "First", "tests/first.csv"), n -> { });
        return mechanismFile;
    }

    /** Adds a session that validates (a record with named columns). */
    private static String session(Mechanism m, String name, String recordPath) {
        TestSession s = NamedElements.addSession(m, name, recordPath);
        s.setTimeColumnName("time_s");
        s.setAngleColumnName("angle_deg");
        return s.getId();
    }

    private static String refusal(Path target, boolean overwrite) {
        return assertThrows(InputException.class, () -> OutputFiles.check(target, overwrite)).getMessage();
    }

    @Test
    void anOutputNeverReplacesAMechanismFileOrARecordEvenWhenForced() throws Exception {
        Path mechanismFile = project();
        byte[] before = Files.readAllBytes(mechanismFile);
        for (boolean force : new boolean[] {false, true}) {
            assertTrue(refusal(mechanismFile, force).contains("is a mechanism file"));
            Path copy = dir.resolve("copy.csv");
            Files.copy(mechanismFile, copy, StandardCopyOption.REPLACE_EXISTING);
            assertTrue(refusal(copy, force).contains("is a mechanism file"), "a file that loads as one, whatever its name");
            String record = refusal(dir.resolve("tests").resolve("first.csv"), force);
            assertTrue(record.contains("the record of session 'First'"), record);
            String inRecords = refusal(dir.resolve(SessionRecords.RECORDS_FOLDER).resolve("second.csv"), force);
            assertTrue(inRecords.contains("inside the records folder"), inRecords);
            Path link = dir.resolve("link-" + force + ".csv");
            Files.createSymbolicLink(link, dir.resolve("tests").resolve("first.csv"));
            String linked = refusal(link, force);
            assertTrue(linked.contains("the file it links to") && linked.contains("the record of session"), linked);
        }
        assertArrayEquals(before, Files.readAllBytes(mechanismFile));
    }

    @Test
    void anExistingPlainFileIsReplacedOnlyWhenAskedAndANewOneAlways() throws Exception {
        Path out = dir.resolve("run.csv");
        OutputFiles.check(out, false);
        assertEquals(List.of(), OutputFiles.write(out, false, w -> w.write("first\n")));
        String refused = refusal(out, false);
        assertTrue(refused.contains("already exists; give --force"), refused);
        OutputFiles.write(out, true, w -> w.write("second\n"));
        assertEquals("second\n", Files.readString(out));
        Path nested = dir.resolve("new-folder").resolve("run.csv");
        OutputFiles.write(nested, false, w -> w.write("made\n"));
        assertEquals("made\n", Files.readString(nested));
        Path folder = Files.createDirectories(dir.resolve("a-folder.csv"));
        assertTrue(refusal(folder, true).contains("is a folder, not a regular file"));
    }

    @Test
    void changesFromManyThreadsAtOnceAreAllKept() throws Exception {
        Path mechanismFile = dir.resolve("gate.penduline");
        NewMechanismFile.write("Yard gate", Optional.empty(), mechanismFile);
        int threads = 4;
        int each = 5;
        CountDownLatch start = new CountDownLatch(1);
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        List<Future<?>> done = new ArrayList<>();
        try {
            for (int t = 0; t < threads; t++) {
                int thread = t;
                done.add(pool.submit(() -> {
                    start.await();
                    for (int i = 0; i < each; i++) {
                        String suffix = thread + "-" + i;
                        MechanismStore.update(mechanismFile, m -> NamedElements.addFitResult(m, "Fit " + suffix,
                                "2026-12-02T00:00:00Z").getId(), n -> { });
                        MechanismStore.update(mechanismFile, m -> session(m, "Session " + suffix, "records/r" + suffix + ".csv"),
                                n -> { });
                    }
                    return null;
                }));
            }
            start.countDown();
            for (Future<?> f : done) {
                f.get(5, TimeUnit.MINUTES);
            }
        } finally {
            pool.shutdownNow();
        }
        Mechanism m = MechanismLoader.readMechanism(mechanismFile);
        assertEquals(threads * each, m.getFitResults().size(), "no fit lost");
        assertEquals(threads * each, new HashSet<>(m.getFitResults().stream().map(FitResult::getName).toList()).size());
        assertEquals(threads * each, m.getSessions().size(), "no session lost");
    }

    @Test
    void aFitStoredIntoAFileThatChangedSinceItWasReadIsRefusedAndTheOtherChangeKept() throws Exception {
        Path mechanismFile = project();
        // an invented fit (lumped pendulum, viscous and Coulomb friction; its values do not matter here)
        MechanismSource lumped = MechanismLoader.lumped(2, 0.4, 0.5, 9.81);
        Path record = dir.resolve("invented.csv");
        DemoRecords.write(lumped, new FrictionTorques(0.01, 0.03, 0, 0), new DemoRecords.Settings(Unit.DEGREE.toSi(25),
                Unit.DEGREE.toSi(0.5), Unit.DEGREE.toSi(0.05), 0, 0.5, 6, 100, 7), record);
        FitSettings d = FitSettings.defaults();
        FrictionIdentification.Outcome outcome = FrictionIdentification.identify(lumped,
                List.of(FrictionIdentification.prepare(record, SwingImportOptions.defaults(), lumped)),
                Optional.of(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB)), true,
                d.withResampling(0, d.seed(), d.parallel()), FitControl.none());

        MechanismSnapshot read = MechanismSnapshot.read(mechanismFile);
        // another writer changes the file while the fit runs
        MechanismStore.update(mechanismFile, m -> session(m, "Added meanwhile", "records/second.csv"), n -> { });
        byte[] theirs = Files.readAllBytes(mechanismFile);
        InputException e = assertThrows(InputException.class,
                () -> FitRecorder.store(read, outcome, Instant.parse("2026-12-04T00:00:00Z"), n -> { }));
        assertTrue(e.getMessage().startsWith(mechanismFile + ": changed since it was read"), e.getMessage());
        assertTrue(e.getMessage().contains("nothing was written") && e.getMessage().contains("fit again"), e.getMessage());
        assertArrayEquals(theirs, Files.readAllBytes(mechanismFile), "the other writer's content survives");
        try (var listing = Files.list(dir)) {
            assertEquals(List.of(), listing.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".saving")).toList(),
                    "no temporary file left");
        }

        // read again (the new content): stored, and a second change of that snapshot goes on from what it saved
        MechanismSnapshot again = MechanismSnapshot.read(mechanismFile);
        String id = FitRecorder.store(again, outcome, Instant.parse("2026-12-04T00:00:00Z"), n -> { });
        MechanismStore.update(again, m -> session(m, "After the fit", "records/third.csv"), n -> { }, "try again");
        Mechanism m = MechanismLoader.readMechanism(mechanismFile);
        assertEquals(List.of("First", "Added meanwhile", "After the fit"), m.getSessions().stream().map(TestSession::getName)
                .toList());
        assertEquals(List.of(id), m.getFitResults().stream().map(FitResult::getId).toList());
    }

    @Test
    void aNewMechanismFileNeverReplacesAnything() throws Exception {
        Path taken = dir.resolve("taken.penduline");
        Files.writeString(taken, "somebody's file\n");
        InputException e = assertThrows(InputException.class, () -> NewMechanismFile.write("Gate", Optional.empty(), taken));
        assertTrue(e.getMessage().contains("already exists"), e.getMessage());
        Path dangling = Files.createSymbolicLink(dir.resolve("dangling.penduline"), dir.resolve("nowhere.penduline"));
        e = assertThrows(InputException.class, () -> NewMechanismFile.write("Gate", Optional.empty(), dangling));
        assertTrue(e.getMessage().contains("is a symbolic link"), e.getMessage());
        assertTrue(Files.isSymbolicLink(dangling) && !Files.exists(dir.resolve("nowhere.penduline")));
        assertEquals("somebody's file\n", Files.readString(taken));
    }
}
