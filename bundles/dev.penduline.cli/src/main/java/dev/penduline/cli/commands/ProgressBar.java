package dev.penduline.cli.commands;

import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.Locale;

import dev.penduline.services.survey.SurveyRun;

/**
 * The survey's progress on the error stream: on a terminal one line redrawn in place (units
 * done of all, the rate, the time left); otherwise nothing until one line at the end.
 */
final class ProgressBar implements SurveyRun.Progress {

    private static final int WIDTH = 30;
    private static final long REDRAW_NANOS = 100_000_000L;

    private final PrintWriter err;
    private final PrintWriter bar;
    private final boolean terminal;
    private final long start = System.nanoTime();
    private long drawn;

    /**
     * A progress display.
     *
     * @param err      the command's error stream (its control characters escaped): the last line
     * @param terminal whether the error stream is a terminal; the bar is drawn only then, straight on
     *                 the process' standard error, since its carriage return must reach the terminal
     *                 unescaped (the bar holds only our digits and marks, never a user's text)
     */
    ProgressBar(PrintWriter err, boolean terminal) {
        this.err = err;
        this.terminal = terminal;
        this.bar = terminal ? new PrintWriter(new OutputStreamWriter(new FileOutputStream(FileDescriptor.err),
                StandardCharsets.UTF_8), false) : null;
    }

    @Override
    public void unitDone(int done, int total) {
        if (!terminal) {
            return;
        }
        long now = System.nanoTime();
        if (done < total && now - drawn < REDRAW_NANOS) {
            return;
        }
        drawn = now;
        double seconds = (now - start) / 1e9;
        double rate = done / Math.max(seconds, 1e-9);
        int filled = total == 0 ? WIDTH : (int) ((long) WIDTH * done / total);
        String left = done == 0 ? "?" : String.format(Locale.ROOT, "%.0f s", (total - done) / rate);
        err.flush();
        bar.print(String.format(Locale.ROOT, "\r[%s%s] %d/%d units  %.2f units/s  %s left   ", "#".repeat(filled),
                "-".repeat(WIDTH - filled), done, total, rate, left));
        bar.flush();
    }

    /**
     * Ends the bar (a line end on a terminal), then says how long the survey took.
     *
     * @param r what was done
     */
    void finish(SurveyRun.Result r) {
        double seconds = (System.nanoTime() - start) / 1e9;
        if (terminal) {
            bar.println();
            bar.flush();
        }
        err.println(String.format(Locale.ROOT, "survey: %d units in %.1f s (%d fitted, %d reused, %d failed)", r.rows().size(),
                seconds, r.fitted(), r.skipped(), r.failed()));
    }
}
