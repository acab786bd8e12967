package dev.penduline.cli;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.services.Defaults;

/**
 * The child process of {@link ErrorKindsTest}: the real command line with three test-only commands
 * that fail on purpose, run as {@link Main} runs it (the fault log's folder comes from the
 * environment the test sets).
 */
final class ErrorKindsChild {

    private ErrorKindsChild() {
    }

    /**
     * Runs one command line and exits with its code.
     *
     * @param args the command and its options
     */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        List<Command> commands = List.of(
                failing("broken-state", () -> {
                    throw new IllegalStateException("an injected defect: the state is broken");
                }),
                failing("broken-null", () -> {
                    Object missing = null;
                    missing.hashCode();
                }),
                // a user's value reaching the physics with no layer above it to translate the refusal
                failing("negative-mass", () -> new MechanismProperties(-2, 0.1, 0.05, 0, 9.81, 0)));
        int code = new PendulineCommandLine(commands).run(args, out, err).code();
        out.flush();
        err.flush();
        System.exit(code);
    }

    private static Command failing(String name, Runnable body) {
        return new Command() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public String summary() {
                return "fails on purpose (test only)";
            }

            @Override
            public String usage() {
                return name;
            }

            @Override
            public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) {
                body.run();
                return ExitCode.OK;
            }
        };
    }
}
