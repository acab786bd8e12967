package dev.penduline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Errors by kind: input the user got wrong leaves with exit code 2 and one message, never a
 * trace, even when only the physics could tell it was wrong; a defect of Penduline leaves with
 * the internal-error exit code, its stack trace and a request to report it, never as bad input.
 */
class ErrorKindsTest {

    private static final int LIMIT_S = 60;

    @TempDir
    Path dir;

    record Result(int exit, String output) {
    }

    private Result child(String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-cp",
                System.getProperty("surefire.test.class.path", System.getProperty("java.class.path")),
                ErrorKindsChild.class.getName()));
        command.addAll(List.of(args));
        Path log = dir.resolve("child.out");
        ProcessBuilder pb = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(log.toFile()).redirectInput(ProcessBuilder.Redirect.from(Path.of("/dev/null").toFile()));
        pb.environment().put("PENDULINE_LOG_DIR", dir.resolve("logs").toString());
        Process p = pb.start();
        assertTrue(p.waitFor(LIMIT_S, TimeUnit.SECONDS), "the child finished");
        return new Result(p.exitValue(), Files.readString(log, StandardCharsets.UTF_8));
    }

    private List<Path> logs() throws IOException {
        if (!Files.isDirectory(dir.resolve("logs"))) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir.resolve("logs"))) {
            return s.toList();
        }
    }

    @Test
    void anInjectedIllegalStateIsAnInternalErrorWithItsTrace() throws Exception {
        Result r = child("broken-state");
        assertEquals(ExitCode.INTERNAL_ERROR.code(), r.exit(), r.output());
        assertEquals(4, r.exit(), "the code the README's table gives");
        assertTrue(r.output().startsWith("penduline broken-state: internal error: a defect of Penduline, not of your input."),
                r.output());
        assertTrue(r.output().contains("java.lang.IllegalStateException: an injected defect: the state is broken"), r.output());
        assertTrue(r.output().contains("\tat dev.penduline.cli.ErrorKindsChild"), "the trace names the failing code: " + r.output());
        assertTrue(r.output().contains("Please report it"), r.output());
        assertEquals(1, logs().size(), "the details are also in one log: " + logs());
        assertTrue(r.output().contains(logs().get(0).toString()), "the request names the log: " + r.output());
    }

    @Test
    void anInjectedNullPointerIsAnInternalErrorNotBadInput() throws Exception {
        Result r = child("broken-null");
        assertEquals(ExitCode.INTERNAL_ERROR.code(), r.exit(), r.output());
        assertTrue(r.output().contains("java.lang.NullPointerException"), r.output());
        assertTrue(r.output().contains("\tat "), r.output());
        assertFalse(r.output().contains("usage or input"), r.output());
    }

    @Test
    void aUserValueRefusedOnlyByThePhysicsIsAUsageErrorWithoutTrace() throws Exception {
        Result r = child("negative-mass");
        assertEquals(ExitCode.USAGE_OR_INPUT.code(), r.exit(), r.output());
        assertEquals("penduline negative-mass: mass must be positive, got -2.0 kg\n", r.output());
        assertEquals(List.of(), logs(), "a user error writes no fault log");
    }

    /**
     * A user error deep in the physics, from a real file: a stored fit whose correlation table was
     * edited into one no set of parameters has (the correlations of b with Tc and c near +1, of Tc
     * with c near −1: no positive semi-definite matrix holds them; Hipparchus' Cholesky refuses it).
     * Before, it left as "a defect of Penduline" with exit code 1.
     */
    @Test
    void aStoredFitsImpossibleCorrelationsAreAnInputErrorNamingTheFile() throws Exception {
        Path hatch = HostileCorpusTest.repositoryRoot().resolve("samples/inspection-hatch");
        Path file = dir.resolve("hatch.penduline");
        String text = Files.readString(hatch.resolve("hatch.penduline"), StandardCharsets.UTF_8);
        Matcher m = Pattern.compile("<correlation>([^<]*)</correlation>").matcher(text);
        StringBuilder b = new StringBuilder();
        int i = 0;
        int n = (int) Pattern.compile("<correlationParameter>").matcher(text).results().count();
        // b, Tc, c are the first three parameters of the stored table
        List<Integer> plus = List.of(1, n, 2, 2 * n);
        List<Integer> minus = List.of(n + 2, 2 * n + 1);
        while (m.find()) {
            String v = plus.contains(i) ? "0.99" : minus.contains(i) ? "-0.99" : m.group(1);
            m.appendReplacement(b, "<correlation>" + v + "</correlation>");
            i++;
        }
        m.appendTail(b);
        assertEquals(n * n, i, "the stored table is square");
        Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        ExitCode code = new PendulineCommandLine().run(new String[] {"predict", file.toString(), "--theta0-deg", "30"},
                new PrintWriter(out), new PrintWriter(err));
        assertEquals(ExitCode.USAGE_OR_INPUT, code, err.toString());
        assertTrue(err.toString().contains(file.toString()), err.toString());
        assertTrue(err.toString().contains("not positive semi-definite"), err.toString());
        assertFalse(HostileCorpusTest.INTERNALS.matcher(err.toString()).find(), err.toString());
    }
}
