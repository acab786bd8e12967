package dev.penduline.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import dev.penduline.cli.commands.AddSessionCommand;
import dev.penduline.cli.commands.AnalyzeCommand;
import dev.penduline.cli.commands.DemoRecordCommand;
import dev.penduline.cli.commands.FitCommand;
import dev.penduline.cli.commands.ImportPartsCommand;
import dev.penduline.cli.commands.InertiaCommand;
import dev.penduline.cli.commands.PredictCommand;
import dev.penduline.cli.commands.ReportCommand;
import dev.penduline.cli.commands.SimulateCommand;
import dev.penduline.cli.commands.SurveyCommand;
import dev.penduline.cli.internal.FaultReport;
import dev.penduline.cli.internal.PrintableWriter;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.present.Figures;

/** Dispatches {@code penduline COMMAND ...} to its {@link Command}; prints help and versions. */
public final class PendulineCommandLine {

    private static final String PROGRAM = "penduline";

    /**
     * The global option that makes commands take their defaults (gravity, verdict margin, settle
     * band, resamples, significant digits) from the user's defaults file; without it the command
     * line never reads that file.
     */
    public static final String USE_PREFERENCES = "--use-preferences";

    private final Map<String, Command> commands = new LinkedHashMap<>();

    /** Creates the command line with every built-in command. */
    public PendulineCommandLine() {
        this(List.of(new FitCommand(), new InertiaCommand(), new SimulateCommand(), new PredictCommand(), new AnalyzeCommand(),
                new ImportPartsCommand(),
                new AddSessionCommand(), new DemoRecordCommand(), new ReportCommand(), new SurveyCommand()));
    }

    /**
     * Creates the command line with the given commands (for tests and later additions).
     *
     * @param extra the commands, in the order {@code help} lists them
     */
    public PendulineCommandLine(List<Command> extra) {
        for (Command c : extra) {
            commands.put(c.name(), c);
        }
    }

    /**
     * Runs one invocation.
     *
     * @param args the program's arguments
     * @param out  where results go
     * @param err  where errors and warnings go
     * @return the exit code
     */
    public ExitCode run(String[] args, PrintWriter out, PrintWriter err) {
        PrintWriter shownOut = new PrintWriter(new PrintableWriter(out), true);
        PrintWriter shownErr = new PrintWriter(new PrintableWriter(err), true);
        try {
            return dispatch(args, shownOut, shownErr);
        } finally {
            shownOut.flush();
            shownErr.flush();
        }
    }

    private ExitCode dispatch(String[] given, PrintWriter out, PrintWriter err) {
        List<String> rest = new ArrayList<>(List.of(given));
        if (!rest.removeIf(USE_PREFERENCES::equals)) {
            return dispatch(given, Defaults.BUILT_IN, out, err);
        }
        Defaults defaults;
        try {
            defaults = Defaults.read();
        } catch (InputException e) {
            err.println(PROGRAM + ": " + e.getMessage() + " (the defaults file that " + USE_PREFERENCES
                    + " reads; fix it in the workbench's preferences or by hand, or run without " + USE_PREFERENCES + ")");
            return ExitCode.USAGE_OR_INPUT;
        }
        // the display precision holds for this command only (an in-process caller runs others after it)
        int digits = Figures.useDigits(defaults.significantDigits());
        try {
            return dispatch(rest.toArray(String[]::new), defaults, out, err);
        } finally {
            Figures.useDigits(digits);
        }
    }

    private ExitCode dispatch(String[] args, Defaults defaults, PrintWriter out, PrintWriter err) {
        if (args.length == 0) {
            printHelp(out);
            return ExitCode.USAGE_OR_INPUT;
        }
        String first = args[0];
        switch (first) {
            case "--version", "-V", "version" -> {
                out.println(PROGRAM + " " + Version.current());
                return ExitCode.OK;
            }
            case "help", "--help", "-h" -> {
                return help(Arrays.copyOfRange(args, 1, args.length), out, err);
            }
            default -> {
                Command command = commands.get(first);
                if (command == null) {
                    err.println(PROGRAM + ": unknown command '" + first + "'. Commands: " + commandNames()
                            + ". Run '" + PROGRAM + " help' for what each does.");
                    return ExitCode.USAGE_OR_INPUT;
                }
                try {
                    return command.run(new ArrayList<>(List.of(args).subList(1, args.length)), defaults, out, err);
                } catch (UsageException | InvalidValueException e) {
                    // a user error, also one the physics found in a value no layer above it translated
                    out.flush();
                    err.println(PROGRAM + " " + command.name() + ": " + e.getMessage());
                    return ExitCode.USAGE_OR_INPUT;
                } catch (OutOfMemoryError e) {
                    // an input too large for the memory budget: a diagnosis and a log, no trace
                    out.flush();
                    err.println(PROGRAM + " " + command.name() + ": " + FaultReport.diagnose(command.name(),
                            Arrays.copyOfRange(args, 1, args.length), Version.current(), e));
                    return ExitCode.COMPUTATION_FAILED;
                } catch (RuntimeException | StackOverflowError e) {
                    // a defect of Penduline, never reported as bad input: what happened, the trace, and a request to report it
                    out.flush();
                    err.println(PROGRAM + " " + command.name() + ": " + FaultReport.internalError(command.name(),
                            Arrays.copyOfRange(args, 1, args.length), Version.current(), e));
                    return ExitCode.INTERNAL_ERROR;
                }
            }
        }
    }

    private ExitCode help(String[] rest, PrintWriter out, PrintWriter err) {
        if (rest.length == 0) {
            printHelp(out);
            return ExitCode.OK;
        }
        Command command = commands.get(rest[0]);
        if (command == null) {
            err.println(PROGRAM + " help: unknown command '" + rest[0] + "'. Commands: " + commandNames() + ".");
            return ExitCode.USAGE_OR_INPUT;
        }
        out.println(command.usage());
        return ExitCode.OK;
    }

    private void printHelp(PrintWriter out) {
        out.println("Penduline " + Version.current()
                + " - pivoted mechanisms: inertia, swing tests, friction identification.");
        out.println();
        out.println("Usage: " + PROGRAM + " COMMAND [OPTIONS]");
        out.println();
        out.println("Commands:");
        List<String[]> rows = new ArrayList<>();
        for (Command c : commands.values()) {
            rows.add(new String[] {c.name(), c.summary()});
        }
        rows.add(new String[] {"gui", "open the Penduline workbench (handled by the ./penduline script)"});
        rows.add(new String[] {"help [COMMAND]", "list the commands, or show one command's options"});
        rows.add(new String[] {"--version", "print the version"});
        int width = rows.stream().mapToInt(r -> r[0].length()).max().orElse(0);
        for (String[] r : rows) {
            out.printf("  %-" + width + "s  %s%n", r[0], r[1]);
        }
        out.println();
        out.println("Global option (anywhere on the line):");
        out.println("  " + USE_PREFERENCES + "  take the defaults of gravity (parts lists, lumped properties, new files),");
        out.println("                     the fit's verdict margin and resamples, the settle band and the significant");
        out.println("                     digits of the reports from " + Defaults.location());
        out.println("                     (the workbench's preferences); options given on the line still win.");
        out.println("                     Without it that file is never read.");
        out.println();
        out.println("Exit codes: 0 ok, 1 a computation failed, 2 a usage or input error, 3 some of a survey's records failed,");
        out.println("            4 an internal error (a defect of Penduline: please report it).");
    }

    private String commandNames() {
        List<String> names = new ArrayList<>(commands.keySet());
        names.add("gui");
        names.add("help");
        return String.join(", ", names);
    }
}
