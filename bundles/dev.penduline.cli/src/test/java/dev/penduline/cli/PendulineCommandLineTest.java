package dev.penduline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.services.Defaults;

class PendulineCommandLineTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private ExitCode run(PendulineCommandLine cli, String... args) {
        return cli.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void unknownCommandIsAUsageErrorThatListsTheCommands() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run(new PendulineCommandLine(), "swingz"));
        assertTrue(err.toString().contains("unknown command 'swingz'"), err.toString());
        assertTrue(err.toString().contains("help"), err.toString());
        assertEquals("", out.toString());
    }

    @Test
    void helpListsEveryCommandWithItsSummary() {
        Command echo = new Command() {
            @Override
            public String name() {
                return "echo";
            }

            @Override
            public String summary() {
                return "repeat the arguments";
            }

            @Override
            public String usage() {
                return "Usage: penduline echo WORDS";
            }

            @Override
            public ExitCode run(List<String> args, Defaults defaults, PrintWriter o, PrintWriter e) throws UsageException {
                if (args.isEmpty()) {
                    throw new UsageException("nothing to echo");
                }
                o.println(String.join(" ", args));
                return ExitCode.OK;
            }
        };
        PendulineCommandLine cli = new PendulineCommandLine(List.of(echo));
        assertEquals(ExitCode.OK, run(cli, "help"));
        assertTrue(out.toString().contains("echo") && out.toString().contains("repeat the arguments"), out.toString());
        assertEquals(ExitCode.OK, run(cli, "echo", "a", "b"));
        assertTrue(out.toString().contains("a b"));
        assertEquals(ExitCode.USAGE_OR_INPUT, run(cli, "echo"));
        assertTrue(err.toString().contains("penduline echo: nothing to echo"), err.toString());
    }

    @Test
    void versionIsPrintedWithTheProgramName() {
        assertEquals(ExitCode.OK, run(new PendulineCommandLine(), "--version"));
        assertTrue(out.toString().startsWith("penduline "), out.toString());
    }

    @Test
    void noArgumentsPrintsHelpAndAUsageCode() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run(new PendulineCommandLine()));
        assertTrue(out.toString().contains("Usage: penduline COMMAND"), out.toString());
    }
}
