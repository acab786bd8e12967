package dev.penduline.cli;

import java.io.PrintWriter;
import java.util.List;

import dev.penduline.services.Defaults;

/** One subcommand of the command line. */
public interface Command {

    /**
     * The word that selects this command, e.g. {@code inertia}.
     *
     * @return the command's name
     */
    String name();

    /**
     * One line saying what the command does, shown by {@code help}.
     *
     * @return the summary
     */
    String summary();

    /**
     * The usage text shown by {@code help NAME}.
     *
     * @return the usage, several lines
     */
    String usage();

    /**
     * Runs the command with the built-in defaults.
     *
     * @param args the arguments after the command's name
     * @param out  where results go
     * @param err  where warnings go
     * @return the exit code
     * @throws UsageException when the arguments or an input file are wrong
     */
    default ExitCode run(List<String> args, PrintWriter out, PrintWriter err) throws UsageException {
        return run(args, Defaults.BUILT_IN, out, err);
    }

    /**
     * Runs the command with the defaults its options fall back to: the built-in ones, or the
     * user's defaults file with the global option {@code --use-preferences}. An option given on
     * the command line always wins. A command whose options have no such default ignores them.
     *
     * @param args     the arguments after the command's name
     * @param defaults what options that are not given fall back to
     * @param out      where results go
     * @param err      where warnings go
     * @return the exit code
     * @throws UsageException when the arguments or an input file are wrong
     */
    ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException;
}
