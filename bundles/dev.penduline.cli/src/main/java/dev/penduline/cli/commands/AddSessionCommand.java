package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.PlainText;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.SessionRecords;

/** {@code penduline add-session FILE.penduline RECORD.csv}: a swing record becomes a test session. */
public final class AddSessionCommand implements Command {

    private static final Set<String> OPTIONS = Set.of(RecordOptions.with("name", "release-angle-deg", "notes"));

    @Override
    public String name() {
        return "add-session";
    }

    @Override
    public String summary() {
        return "add a swing record to a mechanism file as a test session (the raw file is kept as it is)";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline add-session FILE.penduline RECORD.csv [record options] [--name NAME]
                                             [--release-angle-deg DEG] [--notes TEXT]

                Reads the record to check it, copies it into the project's records/ folder when it
                lies outside the project (an existing different file there is never overwritten),
                and adds a test session holding its relative path, its SHA-256 and how to read it.
                The raw record itself is never modified and never copied into the mechanism file.

                """ + RecordOptions.USAGE + """

                  --name NAME              the session's name (default: the record's file name)
                  --release-angle-deg DEG  the release angle, if it was measured separately
                  --notes TEXT             free notes (who, when, conditions)""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of());
        if (a.positional().size() != 2) {
            throw new UsageException("give the mechanism file and the record file. " + usage());
        }
        Path mechanism = Path.of(a.positional().get(0));
        Path record = Path.of(a.positional().get(1));
        double release = a.has("release-angle-deg") ? Unit.DEGREE.toSi(a.number("release-angle-deg", 0)) : Double.NaN;
        SessionRecords.Added added;
        try {
            added = SessionRecords.addSession(mechanism, record, RecordOptions.from(a), a.value("name"), release,
                    a.value("notes"), note -> err.println("note: " + note));
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
        String notes = a.value("notes");
        if (notes != null && !PlainText.note(notes).equals(notes)) {
            err.println("note: control characters in --notes were replaced by U+FFFD (a mechanism file cannot hold them)");
        }
        for (String s : added.record().assumptions()) {
            err.println("assumed: " + s);
        }
        for (String w : added.record().warnings()) {
            err.println("warning: " + w);
        }
        out.printf("added session '%s' (%s, %d samples)%s to %s%n", added.session().getName(),
                added.session().getRecordPath(), added.record().size(),
                added.copied() ? ", record copied into the project" : "", mechanism);
        return ExitCode.OK;
    }
}
