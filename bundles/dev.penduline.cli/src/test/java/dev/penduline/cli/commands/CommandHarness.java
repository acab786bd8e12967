package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.io.StringWriter;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.PendulineCommandLine;

/** Runs the command line in-process and keeps what it printed, for the command tests. */
final class CommandHarness {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    ExitCode run(String... args) {
        return new PendulineCommandLine().run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    String out() {
        return out.toString();
    }

    String err() {
        return err.toString();
    }

    /** Forgets what was printed to the output so far (the warnings stay). */
    void clearOut() {
        out.getBuffer().setLength(0);
    }

    /** Forgets what was printed so far. */
    void clear() {
        out.getBuffer().setLength(0);
        err.getBuffer().setLength(0);
    }
}
