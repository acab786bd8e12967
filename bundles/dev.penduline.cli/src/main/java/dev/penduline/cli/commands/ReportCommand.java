package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.Supplier;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.Version;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.report.MechanismReports;
import dev.penduline.report.ReportDocument;
import dev.penduline.report.ReportFiles;
import dev.penduline.report.ReportPredictions;
import dev.penduline.report.ReportRequest;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;

/** {@code penduline report}: one document to hand on, from a mechanism file and its stored fit. */
public final class ReportCommand implements Command {

    /** The option after which the rest of the line is predict's options. */
    static final String PREDICT = "--predict";

    private final Supplier<Instant> clock;
    private final Supplier<String> version;

    /** The command as the command line runs it: the time now, the installed version. */
    public ReportCommand() {
        this(Instant::now, Version::current);
    }

    /**
     * The command with a given clock and version, so that a report can be made again word for word
     * (the committed report of the sample is checked that way).
     *
     * @param clock   when the report is written
     * @param version Penduline's version
     */
    ReportCommand(Supplier<Instant> clock, Supplier<String> version) {
        this.clock = clock;
        this.version = version;
    }

    @Override
    public String name() {
        return "report";
    }

    @Override
    public String summary() {
        return "write one self-contained report (HTML or Markdown with SVG plots) of a mechanism file and its stored fit";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline report FILE.penduline [--out REPORT] [--format html|md] [--fit ID] [--force]
                                        [--predict PREDICT-OPTIONS...]

                Writes the document an engineer hands on: the mechanism from its parts (each part's share
                of J0, mass, centroid, J0 with its tolerance bands, the small-angle period, the point-mass
                comparison), every test session (the record with the stored fit's model and the residuals,
                the amplitude decay with its three envelopes, period against amplitude beside the
                elliptic-integral curve), the stored fit (the verdict first, the estimates with ± one
                standard uncertainty, correlations, the term sets compared, energy shares, warnings), the
                predictions when asked, the provenance (version, SHA-256 of the file and of every record,
                the settings, the time) and the caution. Nothing is fitted again: run penduline fit first.
                The plots are vector graphics (SVG), readable in black-and-white print.

                  --out REPORT       where to write it (default: beside FILE, NAME-report.html or .md); an
                                     earlier report is replaced, any other existing file only with --force;
                                     never a mechanism file or a record
                  --format html|md   html (default): one file, no external resources, prints to PDF from a
                                     browser; md: Markdown, the plots as SVG files in REPORT-figures/ beside it
                  --fit ID           report this stored fit instead of the latest
                  --force            replace an existing file that is not an earlier report
                  --predict ...      the rest of the line: penduline predict's options (for example
                                     --theta0-deg 60 --at-deg 0); the report includes what predict says""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        int split = args.indexOf(PREDICT);
        List<String> own = split < 0 ? args : args.subList(0, split);
        Optional<List<String>> predict = split < 0 ? Optional.empty() : Optional.of(args.subList(split + 1, args.size()));
        Arguments a = Arguments.parse(own, Set.of("out", "format", "fit"), Set.of("force"));
        if (a.positional().size() != 1) {
            throw new UsageException("give exactly one mechanism file (.penduline). " + usage());
        }
        Path file = Path.of(a.positional().get(0));
        if (!file.getFileName().toString().endsWith("." + MechanismFormat.FILE_EXTENSION)) {
            throw new UsageException(file + ": a report is of a mechanism file (." + MechanismFormat.FILE_EXTENSION
                    + "), which holds the sessions and the stored fit; make one with import-parts and add-session");
        }
        if (!Files.isRegularFile(file)) {
            throw new UsageException(file + ": no such mechanism file");
        }
        ReportFiles.Kind kind = switch (a.has("format") ? a.value("format") : "html") {
            case "html" -> ReportFiles.Kind.HTML;
            case "md", "markdown" -> ReportFiles.Kind.MARKDOWN;
            default -> throw new UsageException("option --format: '" + a.value("format") + "' is not html or md");
        };
        Path target = a.has("out") ? Path.of(a.value("out")) : ReportFiles.defaultTarget(file, kind);
        String version = this.version.get();
        try {
            ReportFiles.check(target, a.flag("force"));
            Optional<ReportPredictions> predictions = Optional.empty();
            if (predict.isPresent()) {
                List<String> options = new ArrayList<>(predict.get());
                if (a.has("fit") && !options.contains("--fit") && !options.contains("--no-fit")) {
                    options.addAll(List.of("--fit", a.value("fit")));
                }
                List<String> call = new ArrayList<>(List.of(file.toString()));
                call.addAll(options);
                PredictCommand.Prediction p = PredictCommand.compute(call, defaults, err);
                predictions = Optional.of(ReportPredictions.of(String.join(" ", options), p.lines(), p.outcome(), file));
            }
            ReportDocument doc = MechanismReports.build(ReportRequest.of(file, Optional.ofNullable(a.value("fit")),
                    predictions, version, clock.get(), defaults.gravity()));
            for (String note : ReportFiles.write(doc, target, kind, version, a.flag("force"))) {
                err.println("note: " + note);
            }
            out.println("Wrote the report of " + file + " to " + target + " (" + doc.pictures().size() + " plots"
                    + (kind == ReportFiles.Kind.MARKDOWN ? ", as SVG files beside it" : ", inline") + ").");
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
        return ExitCode.OK;
    }
}
