package dev.penduline.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.model.persistence.MechanismFileException;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.model.persistence.SaveLock;

/**
 * The child process of {@link SaveFaultTest}: saves a mechanism file over and over until it is
 * killed, runs command lines once told to go, or holds a file's save lock. It says where it is by
 * creating marker files (a test program may not print).
 */
final class SaveFaultChild {

    private static final long GUARD_MILLIS = 120_000;

    private SaveFaultChild() {
    }

    /**
     * Runs one mode.
     *
     * <ul>
     * <li>{@code save-loop TARGET A B READY N}: saves the mechanisms of files A and B to TARGET in turn,
     * N times (-1: until killed); READY is created after the first save.</li>
     * <li>{@code write-loop TARGET A B READY N}: the same with the bytes of A and B, through the same
     * lock and writer as {@link MechanismFiles#save} but without starting EMF (a child that starts in a
     * fraction of a second allows hundreds of trials).</li>
     * <li>{@code cli READY GO LOG N ARGS...}: creates READY, waits for GO, then runs the command line N
     * times ({@code {i}} in an argument becomes the run's number), its output in LOG; exit 0 when
     * every run exited 0.</li>
     * <li>{@code hold FILE READY RELEASE}: takes FILE's save lock, creates READY, waits for RELEASE.</li>
     * </ul>
     *
     * @param args the mode and its arguments
     * @throws Exception when the mode fails (the test sees the exit code)
     */
    public static void main(String[] args) throws Exception {
        switch (args[0]) {
            case "save-loop" -> saveLoop(Path.of(args[1]), Path.of(args[2]), Path.of(args[3]), Path.of(args[4]),
                    Integer.parseInt(args[5]));
            case "write-loop" -> writeLoop(Path.of(args[1]), Files.readAllBytes(Path.of(args[2])), Files.readAllBytes(Path.of(args[3])),
                    Path.of(args[4]), Integer.parseInt(args[5]));
            case "cli" -> System.exit(cli(Path.of(args[1]), Path.of(args[2]), Path.of(args[3]), Integer.parseInt(args[4]),
                    Arrays.asList(args).subList(5, args.length)));
            case "hold" -> hold(Path.of(args[1]), Path.of(args[2]), Path.of(args[3]));
            default -> throw new IllegalArgumentException("unknown mode " + args[0]);
        }
    }

    private static void saveLoop(Path target, Path a, Path b, Path ready, int times) throws MechanismFileException, IOException {
        Mechanism first = MechanismFiles.load(a);
        Mechanism second = MechanismFiles.load(b);
        MechanismFiles.save(first, target);
        Files.createFile(ready);
        long end = System.currentTimeMillis() + GUARD_MILLIS;
        for (int i = 0; i != times && System.currentTimeMillis() < end; i++) {
            MechanismFiles.save(second, target);
            MechanismFiles.save(first, target);
        }
    }

    private static void writeLoop(Path target, byte[] a, byte[] b, Path ready, int times) throws IOException {
        save(target, a);
        Files.createFile(ready);
        long end = System.currentTimeMillis() + GUARD_MILLIS;
        for (int i = 0; i != times && System.currentTimeMillis() < end; i++) {
            save(target, b);
            save(target, a);
        }
    }

    private static void save(Path target, byte[] bytes) throws IOException {
        try (SaveLock lock = SaveLock.acquire(target)) {
            AtomicFileWrite.write(target, out -> out.write(bytes));
        }
    }

    private static int cli(Path ready, Path go, Path log, int runs, List<String> args) throws IOException, InterruptedException {
        Files.createFile(ready);
        await(go);
        int failures = 0;
        try (PrintWriter out = new PrintWriter(Files.newBufferedWriter(log, StandardCharsets.UTF_8), true)) {
            for (int i = 0; i < runs; i++) {
                List<String> run = new ArrayList<>();
                for (String arg : args) {
                    run.add(arg.replace("{i}", String.valueOf(i)));
                }
                out.println("run " + i + ": " + run);
                ExitCode code = new PendulineCommandLine().run(run.toArray(String[]::new), out, out);
                out.println("exit " + code.code());
                if (code != ExitCode.OK) {
                    failures++;
                }
            }
        }
        return failures == 0 ? 0 : 3;
    }

    private static void hold(Path file, Path ready, Path release) throws IOException, InterruptedException {
        try (SaveLock lock = SaveLock.acquire(file)) {
            Files.createFile(ready);
            await(release);
        }
    }

    private static void await(Path marker) throws InterruptedException {
        long end = System.currentTimeMillis() + GUARD_MILLIS;
        while (!Files.exists(marker) && System.currentTimeMillis() < end) {
            Thread.sleep(2);
        }
    }
}
