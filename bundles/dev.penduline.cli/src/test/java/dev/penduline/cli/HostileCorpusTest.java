package dev.penduline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * Runs every entry of the hostile-input corpus ({@code src/test/resources/hostile/entries-*.txt},
 * format in DEVELOPERS.md) through the real command-line entry point in a child JVM with a heap
 * limit and a time limit, and checks the exit code, the message fragments, and that no Java
 * internals (stack traces, exception class names, identity hash codes) or raw control characters
 * reach the user.
 */
class HostileCorpusTest {

    private static final Path CORPUS = Path.of("src/test/resources/hostile");
    private static final Pattern HEADER = Pattern.compile("\\[([a-z]+)/([A-Za-z0-9._-]+)]");
    private static final List<String> CLASSES = List.of("encoding", "structure", "numbers", "physics", "paths", "options", "sizes",
            "concurrency");
    /** What only a Java program's internals print: traces, exception class names, identity hash codes. */
    static final Pattern INTERNALS = Pattern.compile(
            "\tat |Exception in thread|Caused by:|\\bjava\\.[a-z]+\\.|\\b[A-Z]\\w+(Exception|Error)\\b|\\b[A-Za-z]\\w*@[0-9a-f]{5,}\\b");
    private static final int DEFAULT_LIMIT_S = 60;
    private static final int DEFAULT_HEAP_MB = 768;

    /** One corpus entry. */
    record Entry(String file, String kind, String name, String setup, List<String> args, int exit, List<String> says, String after,
            int limitSeconds, int heapMb) {
    }

    @TestFactory
    Stream<DynamicTest> everyHostileInputGetsItsAnswer() throws IOException {
        List<Entry> entries = entries();
        assertTrue(entries.size() >= 80, "the corpus holds at least 80 entries, has " + entries.size());
        return entries.stream().map(e -> DynamicTest.dynamicTest(e.kind() + "/" + e.name(), () -> run(e)));
    }

    /** The check of every answer must itself be able to fail: it catches what only Java prints, and nothing else. */
    @Test
    void theInternalsCheckCatchesTracesClassNamesAndIdentityHashesButNotMessages() {
        for (String javaOnly : List.of("\tat dev.penduline.x.Y.run(Y.java:3)", "Exception in thread \"main\" boom",
                "java.lang.IllegalStateException: x", "saw dev.penduline.model.impl.MechanismImpl@44ebcd03", "a NullPointerException",
                "Caused by: x", "OutOfMemoryError")) {
            assertTrue(INTERNALS.matcher(javaOnly).find(), javaOnly);
        }
        for (String message : List.of("penduline inertia: parts.csv:2: column 'mass_kg': 'abc' is not a number",
                "warning: the centroid lies on the pivot axis (Lc = 0)", "Error: see the log at /tmp/x@host.log", "exceptions")) {
            assertFalse(INTERNALS.matcher(message).find(), message);
        }
    }

    static List<Entry> entries() throws IOException {
        List<Entry> all = new ArrayList<>();
        try (Stream<Path> files = Files.list(CORPUS)) {
            for (Path f : files.filter(p -> p.getFileName().toString().matches("entries-.*\\.txt")).sorted().toList()) {
                all.addAll(parse(f));
            }
        }
        List<String> names = all.stream().map(e -> e.kind() + "/" + e.name()).toList();
        assertEquals(names.size(), names.stream().distinct().count(), "entry names are unique: " + names);
        return all;
    }

    private static List<Entry> parse(Path file) throws IOException {
        List<Entry> entries = new ArrayList<>();
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        String kind = null;
        String name = null;
        Map<String, String> keys = new LinkedHashMap<>();
        int lineNo = 0;
        for (String raw : lines) {
            lineNo++;
            String line = raw.strip();
            if (line.startsWith("#")) {
                continue;
            }
            Matcher h = HEADER.matcher(line);
            if (h.matches() || line.isEmpty()) {
                if (name != null && (h.matches() || !keys.isEmpty())) {
                    entries.add(entry(file, kind, name, keys));
                    name = null;
                    keys.clear();
                }
                if (h.matches()) {
                    kind = h.group(1);
                    name = h.group(2);
                    assertTrue(CLASSES.contains(kind), file + ":" + lineNo + ": unknown class '" + kind + "'");
                }
                continue;
            }
            int eq = line.indexOf(" = ");
            if (name == null || eq < 0) {
                fail(file + ":" + lineNo + ": expected '[class/name]' or 'key = value', got '" + line + "'");
            }
            keys.put(line.substring(0, eq).strip(), line.substring(eq + 3).strip());
        }
        if (name != null) {
            entries.add(entry(file, kind, name, keys));
        }
        return entries;
    }

    private static Entry entry(Path file, String kind, String name, Map<String, String> keys) {
        String where = file.getFileName() + " [" + kind + "/" + name + "]";
        for (String k : keys.keySet()) {
            assertTrue(List.of("setup", "args", "exit", "says", "after", "limit_s", "heap_mb").contains(k), where + ": unknown key " + k);
        }
        assertTrue(keys.containsKey("args") && keys.containsKey("exit") && keys.containsKey("says"), where + ": needs args, exit, says");
        List<String> says = Stream.of(keys.get("says").split(" \\| ")).map(String::strip).filter(s -> !s.isEmpty()).toList();
        assertFalse(says.isEmpty(), where + ": says names at least one fragment");
        return new Entry(file.getFileName().toString(), kind, name, keys.get("setup"), split(keys.get("args")),
                Integer.parseInt(keys.get("exit")), says, keys.get("after"),
                Integer.parseInt(keys.getOrDefault("limit_s", String.valueOf(DEFAULT_LIMIT_S))),
                Integer.parseInt(keys.getOrDefault("heap_mb", String.valueOf(DEFAULT_HEAP_MB))));
    }

    /** Splits on spaces; a part in single quotes is one argument (it may hold spaces, or be empty). */
    static List<String> split(String args) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        boolean any = false;
        for (int i = 0; i < args.length(); i++) {
            char c = args.charAt(i);
            if (c == '\'') {
                quoted = !quoted;
                any = true;
            } else if (c == ' ' && !quoted) {
                if (any) {
                    out.add(cur.toString());
                }
                cur.setLength(0);
                any = false;
            } else {
                cur.append(c);
                any = true;
            }
        }
        if (any) {
            out.add(cur.toString());
        }
        return out;
    }

    private static void run(Entry e) throws Exception {
        Path dir = Files.createTempDirectory("penduline-hostile-");
        try {
            copyTree(CORPUS.resolve("files"), dir);
            copyTree(repositoryRoot().resolve("samples"), dir.resolve("samples"));
            String where = e.file() + " [" + e.kind() + "/" + e.name() + "]";
            if (e.setup() != null) {
                Result s = bash(e.setup(), dir, 120);
                assertEquals(0, s.exit(), where + ": setup failed: " + s.output());
            }
            List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-Xmx" + e.heapMb() + "m", "-Djava.awt.headless=true", "-cp", System.getProperty("surefire.test.class.path",
                            System.getProperty("java.class.path")), Main.class.getName()));
            command.addAll(e.args());
            ProcessBuilder pb = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true)
                    .redirectInput(ProcessBuilder.Redirect.from(Path.of("/dev/null").toFile()));
            pb.environment().put("PENDULINE_LOG_DIR", dir.resolve(".penduline-logs").toString());
            // the user's defaults file (--use-preferences) is the entry's own, never the real user's
            pb.environment().put("XDG_CONFIG_HOME", dir.resolve(".config").toString());
            Result r = start(pb, e.limitSeconds());
            assertFalse(r.timedOut(), where + ": did not finish within " + e.limitSeconds() + " s; printed: " + r.output());
            String text = r.output();
            assertEquals(e.exit(), r.exit(), where + ": exit code; printed:\n" + text);
            String lower = text.toLowerCase(Locale.ROOT);
            for (String s : e.says()) {
                assertTrue(lower.contains(s.toLowerCase(Locale.ROOT)), where + ": the answer names '" + s + "'; printed:\n" + text);
            }
            Matcher internals = INTERNALS.matcher(text);
            assertFalse(internals.find(), where + ": Java internals reach the user ('" + (internals.hitEnd() ? "" : text.substring(
                    internals.start(), Math.min(text.length(), internals.end() + 40))) + "'); printed:\n" + text);
            for (int i = 0; i < text.length(); i++) {
                char c = text.charAt(i);
                assertFalse(c < 0x20 && c != '\n' && c != '\t' || c == 0x7f || c >= 0x80 && c < 0xa0,
                        where + ": a raw control character U+" + String.format("%04X", (int) c) + " at " + i + " in:\n" + text);
            }
            if (e.after() != null) {
                Result a = bash(e.after(), dir, 60);
                assertEquals(0, a.exit(), where + ": the check after the run failed: " + a.output() + "\nthe run printed:\n" + text);
            }
        } finally {
            deleteTree(dir);
        }
    }

    record Result(int exit, String output, boolean timedOut) {
    }

    private static Result bash(String script, Path dir, int limitSeconds) throws IOException, InterruptedException {
        ProcessBuilder pb = new ProcessBuilder("/bin/bash", "-c", script).directory(dir.toFile()).redirectErrorStream(true)
                .redirectInput(ProcessBuilder.Redirect.from(Path.of("/dev/null").toFile()));
        return start(pb, limitSeconds);
    }

    private static Result start(ProcessBuilder pb, int limitSeconds) throws IOException, InterruptedException {
        Path log = Files.createTempFile("penduline-hostile-", ".out");
        try {
            pb.redirectOutput(log.toFile());
            Process p = pb.start();
            boolean done = p.waitFor(limitSeconds, TimeUnit.SECONDS);
            if (!done) {
                p.descendants().forEach(ProcessHandle::destroyForcibly);
                p.destroyForcibly();
                p.waitFor(10, TimeUnit.SECONDS);
            }
            String out = new String(Files.readAllBytes(log), StandardCharsets.UTF_8);
            return new Result(done ? p.exitValue() : -1, out.length() > 20_000 ? out.substring(0, 20_000) + "..." : out, !done);
        } finally {
            Files.deleteIfExists(log);
        }
    }

    static Path repositoryRoot() {
        Path p = Path.of("").toAbsolutePath();
        while (p != null && !Files.isDirectory(p.resolve("samples"))) {
            p = p.getParent();
        }
        if (p == null) {
            throw new IllegalStateException("the repository's samples/ folder is not above " + Path.of("").toAbsolutePath());
        }
        return p;
    }

    private static void copyTree(Path from, Path to) throws IOException {
        if (!Files.isDirectory(from)) {
            return;
        }
        try (Stream<Path> all = Files.walk(from)) {
            all.forEach(src -> {
                Path dst = to.resolve(from.relativize(src).toString());
                try {
                    if (Files.isDirectory(src)) {
                        Files.createDirectories(dst);
                    } else {
                        Files.copy(src, dst);
                    }
                } catch (IOException ex) {
                    throw new UncheckedIOException(ex);
                }
            });
        }
    }

    private static void deleteTree(Path dir) throws IOException {
        List<Path> all;
        try (Stream<Path> walk = Files.walk(dir)) {
            all = walk.sorted(Comparator.reverseOrder()).toList();
        }
        for (Path p : all) {
            if (!Files.isSymbolicLink(p) && Files.isDirectory(p)) {
                p.toFile().setWritable(true);
            }
        }
        for (Path p : all) {
            Files.deleteIfExists(p);
        }
    }
}
