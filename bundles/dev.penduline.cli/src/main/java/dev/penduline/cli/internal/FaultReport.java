package dev.penduline.cli.internal;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

/**
 * What the user sees when a command fails in a way no check foresaw. Running out of memory (an
 * input too large for the heap) is one short diagnosis, with the Java details written to a log
 * file whose path the diagnosis gives, and no stack trace on the terminal. A defect of Penduline
 * (a {@link RuntimeException} or a stack overflow) is said to be one, with its stack trace and a
 * request to report it ({@link #internalError}); its details go to the log too.
 *
 * <p>The log folder is {@code $PENDULINE_LOG_DIR} when set, else {@code $XDG_STATE_HOME/penduline/logs},
 * else {@code ~/.local/state/penduline/logs}.
 */
public final class FaultReport {

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss", Locale.ROOT);

    private FaultReport() {
    }

    /**
     * The folder the fault logs go to.
     *
     * @return the folder (not necessarily existing yet)
     */
    public static Path logFolder() {
        String explicit = System.getenv("PENDULINE_LOG_DIR");
        if (explicit != null && !explicit.isBlank()) {
            return Path.of(explicit);
        }
        String state = System.getenv("XDG_STATE_HOME");
        Path base = state != null && !state.isBlank() ? Path.of(state) : Path.of(System.getProperty("user.home"), ".local", "state");
        return base.resolve("penduline").resolve("logs");
    }

    /**
     * The one-line diagnosis of an unexpected failure, after writing its details to a log.
     *
     * @param command the command's name
     * @param args    the arguments it was given
     * @param version Penduline's version
     * @param failure what was thrown
     * @return the text for the user (one or two lines, no trace)
     */
    public static String diagnose(String command, String[] args, String version, Throwable failure) {
        String where = writeLog(command, args, version, failure);
        String what;
        if (failure instanceof OutOfMemoryError) {
            long mb = Runtime.getRuntime().maxMemory() / (1024 * 1024);
            what = "ran out of memory: the memory budget of this run (its heap limit) is " + mb + " MB and the input needs "
                    + "more (README, \"Limits\"); try a shorter record, or raise the budget, for example "
                    + "PENDULINE_HEAP=4g ./penduline ... (or -Xmx4g in JAVA_TOOL_OPTIONS)";
        } else if (failure instanceof StackOverflowError) {
            what = "a computation nested too deeply and was stopped";
        } else {
            String message = failure.getMessage();
            what = "the computation stopped unexpectedly" + (message == null || message.isBlank() ? ""
                    : " (" + PrintableWriter.printable(firstLine(message)) + ")");
        }
        return what + ".\n  This is a defect of Penduline or an input it should have refused with a clear message; "
                + where;
    }

    /**
     * What the user sees of a defect of Penduline (a {@link RuntimeException} no check turns into
     * a user error, or a stack overflow): one line saying so, the stack trace, and a line asking to
     * report it; the details are also written to a log whose path that line gives.
     *
     * @param command the command's name
     * @param args    the arguments it was given
     * @param version Penduline's version
     * @param failure what was thrown
     * @return the text for the user, several lines ending with the request to report it
     */
    public static String internalError(String command, String[] args, String version, Throwable failure) {
        String where = writeLog(command, args, version, failure);
        StringWriter trace = new StringWriter();
        try (PrintWriter w = new PrintWriter(trace)) {
            failure.printStackTrace(w);
        }
        return "internal error: a defect of Penduline, not of your input.\n" + trace.toString().stripTrailing()
                + "\n  Please report it (penduline " + version + ", the command and the lines above); " + where;
    }

    private static String firstLine(String message) {
        int nl = message.indexOf('\n');
        String line = nl < 0 ? message : message.substring(0, nl);
        return line.length() > 200 ? line.substring(0, 197) + "..." : line;
    }

    private static String writeLog(String command, String[] args, String version, Throwable failure) {
        StringWriter trace = new StringWriter();
        try (PrintWriter w = new PrintWriter(trace)) {
            w.println("penduline " + version + " on Java " + System.getProperty("java.version") + ", "
                    + System.getProperty("os.name") + " " + System.getProperty("os.arch"));
            w.println("command: " + command);
            for (String a : args) {
                w.println("  argument: " + PrintableWriter.printable(a.length() > 500 ? a.substring(0, 500) + "..." : a));
            }
            w.println("max heap: " + Runtime.getRuntime().maxMemory() / (1024 * 1024) + " MB");
            failure.printStackTrace(w);
        }
        try {
            Path folder = logFolder();
            Files.createDirectories(folder);
            Path log = folder.resolve("penduline-" + LocalDateTime.now().format(STAMP) + "-" + ProcessHandle.current().pid()
                    + ".log");
            Files.writeString(log, trace.toString(), StandardCharsets.UTF_8, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
            return "the details are in " + log + " (please attach it to a report).";
        } catch (IOException | SecurityException e) {
            return "the details could not be written to " + logFolder() + "; set PENDULINE_LOG_DIR to a writable folder "
                    + "and run it again to keep them.";
        }
    }
}
