package dev.penduline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.model.persistence.SaveLock;

/**
 * Fault tests of saving, with real processes: a save killed (SIGKILL) at random moments leaves
 * the old or the new file, byte for byte, and the next save removes what it left; writers in
 * several processes at once lose no session and no fit (a fit of content another writer changed
 * meanwhile is refused, not stored over it); a writer that cannot get the lock gives up without
 * writing. Full disks and read-only folders are in the model's AtomicFileWriteTest (a
 * file-system seam: a test machine cannot offer them, and root ignores permissions).
 */
class SaveFaultTest {

    /** Kill trials; a few hundred in the suite, more with -Dpenduline.kill-trials=N. */
    private static final int KILL_TRIALS = Integer.getInteger("penduline.kill-trials", 200);
    /** Kill trials run side by side, each on its own file. */
    private static final int KILL_WORKERS = 2;
    /** A hang guard for every child process, not a timed assertion. */
    private static final int LIMIT_S = 180;
    private static final Path HATCH = HostileCorpusTest.repositoryRoot().resolve("samples").resolve("inspection-hatch");

    @TempDir
    Path dir;

    private static ProcessBuilder child(Path cwd, String... args) {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Djava.awt.headless=true"));
        command.addAll(List.of("-cp", System.getProperty("surefire.test.class.path", System.getProperty("java.class.path")),
                SaveFaultChild.class.getName()));
        command.addAll(Arrays.asList(args));
        return new ProcessBuilder(command).directory(cwd.toFile()).redirectErrorStream(true)
                .redirectOutput(cwd.resolve("child-" + System.nanoTime() + ".out").toFile())
                .redirectInput(ProcessBuilder.Redirect.from(Path.of("/dev/null").toFile()));
    }

    private static void await(Path marker, Process p) throws InterruptedException {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(LIMIT_S);
        while (!Files.exists(marker)) {
            if (!p.isAlive()) {
                fail("the child ended (exit " + p.exitValue() + ") before creating " + marker);
            }
            if (System.nanoTime() > end) {
                p.destroyForcibly();
                fail("the child did not create " + marker + " within " + LIMIT_S + " s");
            }
            Thread.sleep(1);
        }
    }

    private static void finish(Process p) throws InterruptedException {
        if (!p.waitFor(LIMIT_S, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("a child did not finish within " + LIMIT_S + " s");
        }
    }

    private List<Path> leftovers(String target) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().matches("\\." + target.replace(".", "\\.") + "\\.[0-9]+\\.saving"))
                    .toList();
        }
    }

    @Test
    void aSaveKilledAtAnyMomentLeavesTheOldOrTheNewBytesAndTheNextSaveClearsItsTemporaryFile() throws Exception {
        Path old = dir.resolve("old.penduline");
        Path changed = dir.resolve("new.penduline");
        Mechanism m = MechanismFiles.load(HATCH.resolve("hatch.penduline"));
        MechanismFiles.save(m, old);
        m.setName("Inspection hatch, renamed for the kill test");
        m.setDescription("A longer description, so that the new bytes differ in length from the old ones. ".repeat(40));
        m.getParts().remove(m.getParts().size() - 1);
        MechanismFiles.save(m, changed);
        assertFalse(Arrays.equals(Files.readAllBytes(old), Files.readAllBytes(changed)));
        ExecutorService pool = Executors.newFixedThreadPool(KILL_WORKERS);
        try {
            List<Future<int[]>> workers = new ArrayList<>();
            for (int w = 0; w < KILL_WORKERS; w++) {
                int worker = w;
                workers.add(pool.submit(() -> killTrials(worker, KILL_TRIALS / KILL_WORKERS, old, changed)));
            }
            int[] total = new int[3];
            for (Future<int[]> f : workers) {
                int[] r;
                try {
                    r = f.get(30, TimeUnit.MINUTES);
                } catch (ExecutionException e) {
                    throw e.getCause() instanceof AssertionError a ? a : new AssertionError(e.getCause());
                }
                for (int i = 0; i < 3; i++) {
                    total[i] += r[i];
                }
            }
            assertEquals(KILL_TRIALS / KILL_WORKERS * KILL_WORKERS, total[0] + total[1], "every trial ended old or new");
            // how the kills spread over the save; not a pass condition
            Files.createDirectories(Path.of("target"));
            Files.writeString(Path.of("target", "save-fault-report.txt"), (total[0] + total[1]) + " killed saves: the old file "
                    + total[0] + " times, the new one " + total[1] + " times; temporary files left and removed by the next save: "
                    + total[2] + "\n");
        } finally {
            pool.shutdownNow();
        }
    }

    /** Kill trials on a target of one worker; gives the count of old and new outcomes and of cleaned files. */
    private int[] killTrials(int worker, int trials, Path old, Path changed) throws Exception {
        byte[] oldBytes = Files.readAllBytes(old);
        byte[] newBytes = Files.readAllBytes(changed);
        String name = "target-" + worker + ".penduline";
        Path target = dir.resolve(name);
        Files.write(target, oldBytes);
        SplittableRandom random = new SplittableRandom(20261202L + worker);
        int[] counts = new int[3];
        for (int trial = 0; trial < trials; trial++) {
            String where = name + ", trial " + trial;
            Path ready = dir.resolve("ready-" + worker + "-" + trial);
            // every tenth child saves with EMF (MechanismFiles.save), the others the same bytes through the same
            // lock and writer without EMF's start-up, so that hundreds of trials fit in about a minute
            String mode = trial % 10 == 0 ? "save-loop" : "write-loop";
            Process p = child(dir, mode, target.toString(), old.toString(), changed.toString(), ready.toString(), "-1").start();
            await(ready, p);
            Thread.sleep(random.nextInt(25));
            p.destroyForcibly();
            finish(p);
            byte[] now = Files.readAllBytes(target);
            boolean isOld = Arrays.equals(now, oldBytes);
            assertTrue(isOld || Arrays.equals(now, newBytes), where + ": the file is neither the old nor the new content ("
                    + now.length + " bytes)");
            counts[isOld ? 0 : 1]++;
            MechanismFiles.load(target);
            List<Path> left = leftovers(name);
            if (!left.isEmpty()) {
                // age them past the writer's threshold rather than wait for it
                for (Path t : left) {
                    Files.setLastModifiedTime(t, FileTime.from(Instant.now().minus(AtomicFileWrite.STALE_AFTER).minusSeconds(5)));
                }
                List<String> notes = AtomicFileWrite.write(target, out -> out.write(now));
                for (Path t : left) {
                    String note = "removed a temporary file left by an interrupted save: " + dir.toRealPath().resolve(t.getFileName());
                    assertTrue(notes.contains(note), where + ": the next save says '" + note + "': " + notes);
                }
                assertEquals(List.of(), leftovers(name), where + ": the next save removed them");
                counts[2] += left.size();
            }
            Files.delete(ready);
        }
        return counts;
    }

    /** A copy of the sample project, and records to add (the sample's, each made distinct by a comment line). */
    private Path project(int children, int runs) throws IOException {
        Path project = Files.createDirectories(dir.resolve("project"));
        Files.copy(HATCH.resolve("hatch.penduline"), project.resolve("hatch.penduline"));
        Files.createDirectories(project.resolve("records"));
        try (Stream<Path> records = Files.list(HATCH.resolve("records"))) {
            for (Path r : records.toList()) {
                Files.copy(r, project.resolve("records").resolve(r.getFileName()));
            }
        }
        Path incoming = Files.createDirectories(dir.resolve("incoming"));
        List<String> lines = Files.readAllLines(HATCH.resolve("records").resolve("release-25deg.csv"), StandardCharsets.UTF_8);
        for (int c = 0; c < children; c++) {
            for (int i = 0; i < runs; i++) {
                List<String> copy = new ArrayList<>(lines);
                copy.add(1, "# copy " + c + "-" + i + " for the concurrency test (invented demo data)");
                Files.write(incoming.resolve("r" + c + "-" + i + ".csv"), copy, StandardCharsets.UTF_8);
            }
        }
        return project.resolve("hatch.penduline");
    }

    private static List<Process> startTogether(Path cwd, int children, int runs, String... args) throws Exception {
        List<Process> ps = new ArrayList<>();
        Path go = cwd.resolve("go");
        for (int c = 0; c < children; c++) {
            List<String> a = new ArrayList<>(List.of("cli", cwd.resolve("ready-" + c).toString(), go.toString(),
                    cwd.resolve("log-" + c + ".txt").toString(), String.valueOf(runs)));
            for (String arg : args) {
                a.add(arg.replace("{c}", String.valueOf(c)));
            }
            ps.add(child(cwd, a.toArray(String[]::new)).start());
        }
        for (int c = 0; c < children; c++) {
            await(cwd.resolve("ready-" + c), ps.get(c));
        }
        Files.createFile(go);
        return ps;
    }

    private static void allSucceed(Path cwd, List<Process> ps) throws Exception {
        for (int c = 0; c < ps.size(); c++) {
            finish(ps.get(c));
            assertEquals(0, ps.get(c).exitValue(), Files.readString(cwd.resolve("log-" + c + ".txt")));
        }
    }

    @Test
    void addSessionsFromSeveralProcessesAtOnceAreAllKept() throws Exception {
        int children = 3;
        int runs = 4;
        Path mechanism = project(children, runs);
        int before = MechanismFiles.load(mechanism).getSessions().size();
        List<Process> ps = startTogether(dir, children, runs, "add-session", mechanism.toString(),
                dir.resolve("incoming").resolve("r{c}-{i}.csv").toString(), "--counts-per-rev", "4096", "--name", "copy-{c}-{i}");
        allSucceed(dir, ps);
        Set<String> names = MechanismFiles.load(mechanism).getSessions().stream().map(TestSession::getName)
                .collect(Collectors.toSet());
        assertEquals(before + children * runs, names.size(), "every session is kept: " + names);
        for (int c = 0; c < children; c++) {
            for (int i = 0; i < runs; i++) {
                assertTrue(names.contains("copy-" + c + "-" + i), "session copy-" + c + "-" + i + " in " + names);
            }
        }
    }

    @Test
    void fitsOfOneFileAtOnceNeverLoseAChangeAndALateOneIsRefusedWithoutWriting() throws Exception {
        Path mechanism = project(0, 0);
        Mechanism one = MechanismFiles.load(mechanism);
        one.getSessions().subList(1, one.getSessions().size()).clear();
        one.getFitResults().clear();
        MechanismFiles.save(one, mechanism);
        int before = MechanismFiles.load(mechanism).getFitResults().size();
        int children = 2;
        int runs = 1; // a fit takes seconds; both children read the same content and store at about the same moment
        List<Process> ps = startTogether(dir, children, runs, "fit", mechanism.toString(), "--resamples", "0", "--terms",
                "viscous,coulomb,drag");
        int stored = 0;
        for (int c = 0; c < children; c++) {
            finish(ps.get(c));
            String log = Files.readString(dir.resolve("log-" + c + ".txt"));
            if (ps.get(c).exitValue() == 0) {
                stored++;
                continue;
            }
            // the one that stores second read the file before the first stored: it refuses (exit 2), writing nothing
            assertTrue(log.contains("exit " + ExitCode.USAGE_OR_INPUT.code()), log);
            assertTrue(log.contains(mechanism + ": changed since it was read") && log.contains("nothing was written"), log);
        }
        assertTrue(stored >= 1, "the first to store keeps its fit");
        List<FitResult> fits = MechanismFiles.load(mechanism).getFitResults();
        assertEquals(before + stored, fits.size(), "every fit reported stored is kept, no other");
        assertEquals(fits.size(), new HashSet<>(fits.stream().map(FitResult::getId).toList()).size(), "with its own id");
    }

    @Test
    void aWriterThatCannotGetTheLockGivesUpWithoutWriting() throws Exception {
        Path mechanism = project(1, 1);
        byte[] before = Files.readAllBytes(mechanism);
        Path ready = dir.resolve("held");
        Path release = dir.resolve("release");
        Process holder = child(dir, "hold", mechanism.toString(), ready.toString(), release.toString()).start();
        try {
            await(ready, holder);
            SaveLock.SaveLockException e = assertThrows(SaveLock.SaveLockException.class,
                    () -> SaveLock.acquire(mechanism, Duration.ofMillis(300)));
            assertTrue(e.getMessage().contains("is saving") && e.getMessage().contains("nothing was written"), e.getMessage());
            assertTrue(Arrays.equals(before, Files.readAllBytes(mechanism)));
        } finally {
            Files.createFile(release);
            finish(holder);
        }
        assertEquals(0, holder.exitValue());
        // free again: a command gets the lock and saves
        StringWriter out = new StringWriter();
        ExitCode code = new PendulineCommandLine().run(new String[] {"add-session", mechanism.toString(),
            dir.resolve("incoming").resolve("r0-0.csv").toString(), "--counts-per-rev", "4096"},
            new PrintWriter(out, true), new PrintWriter(out, true));
        assertEquals(ExitCode.OK, code, out.toString());
    }
}
