package dev.penduline.cli.commands;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.regex.PatternSyntaxException;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.Version;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.population.PopulationStatistics;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.report.SurveyReport;
import dev.penduline.services.Cautions;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.OutputFiles;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.present.Figures;
import dev.penduline.services.survey.SurveyFailure;
import dev.penduline.services.survey.SurveyFingerprint;
import dev.penduline.services.survey.SurveyGrouping;
import dev.penduline.services.survey.SurveyJournal;
import dev.penduline.services.survey.SurveyRow;
import dev.penduline.services.survey.SurveyRun;
import dev.penduline.services.survey.SurveySummary;

/** {@code penduline survey}: fit every record of a production line against one design, and its population's statistics. */
public final class SurveyCommand implements Command {

    private static final Set<String> OPTIONS = Set.of(RecordOptions.with("mechanism", "group", "manifest", "unit-column",
            "jobs", "out", "terms", "resamples", "seed"));

    /** The manifest's default column of the units' keys. */
    static final String UNIT_COLUMN = "unit";

    /** The files a survey writes into its output folder, besides the journal. */
    static final List<String> OUTPUTS = List.of("units.csv", "units.json", "summary.json", "survey.html");

    @Override
    public String name() {
        return "survey";
    }

    @Override
    public String summary() {
        return "fit every record of a production line against one design; the population's statistics and control chart";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline survey FOLDER|RECORD.csv ... --mechanism FILE.penduline [options]
                       penduline survey --manifest LIST.csv [--unit-column NAME] --mechanism FILE.penduline [options]

                Fits every record (*.csv directly in each FOLDER, or each RECORD.csv given) against one
                mechanism design: its parts, inertia and gravity from the mechanism file, which is only
                read. One unit a record, or the records of a unit fitted together as sessions of one
                fit. Units run in parallel, each fit on one thread; the rows come in key order and do
                not depend on --jobs. A record that cannot be fitted is listed with its error; the
                others are fitted. Statistics per term over the fitted units: median, MAD, p05, p95,
                outliers by the modified z-score, an individuals control chart (README, "survey").

                  --mechanism FILE.penduline  the design (required)
                  --group REGEX            units by the file name: the first capture group of the first
                                           match (or the whole match) is the unit's key; a record whose
                                           name does not match is listed as failed
                  --manifest LIST.csv      units as listed: a CSV with a header, a column 'file' naming
                                           each record relative to LIST.csv and a column of unit keys
                  --unit-column NAME       the manifest's column of unit keys (default: unit)
                  --jobs N                 units fitted at once (default: the number of processors)
                  --out DIR                the output folder (default: FOLDER-survey beside the first
                                           FOLDER, or LIST-survey beside the manifest; required when
                                           only records are given): units.csv, units.json, summary.json,
                                           survey.html, and the journal that a later run resumes from:
                                           a unit whose records and settings are unchanged is not
                                           fitted again
                  --terms auto|LIST        as in fit (default auto: compare the candidate sets)
                  --fix-inertia            hold the pivot inertia at the calculated value
                  --resamples N            bootstrap refits a unit (default 40, as fit)
                  --seed N                 seed of the bootstrap, the same for every unit
                  --json                   print summary.json instead of the summary
                """ + RecordOptions.USAGE + """

                Exit codes: 0 every unit fitted; 3 some records or units failed, the others were
                fitted; 2 a usage or input error, or no unit could be fitted.""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("json", "fix-inertia"));
        if (!a.has("mechanism")) {
            throw new UsageException("--mechanism FILE.penduline is required: the design every record is fitted against");
        }
        String mechanismFile = a.value("mechanism");
        if (!mechanismFile.toLowerCase(Locale.ROOT).endsWith(".penduline")) {
            throw new UsageException("--mechanism: '" + mechanismFile + "' is not a mechanism file (.penduline)");
        }
        if (a.has("group") && a.has("manifest")) {
            throw new UsageException("give either --group REGEX or --manifest LIST.csv, not both");
        }
        if (a.has("unit-column") && !a.has("manifest")) {
            throw new UsageException("--unit-column goes with --manifest LIST.csv");
        }
        if (a.has("manifest") && !a.positional().isEmpty()) {
            throw new UsageException("with --manifest the manifest lists the records; give no FOLDER or RECORD.csv too ("
                    + a.positional() + ")");
        }
        if (!a.has("manifest") && a.positional().isEmpty()) {
            throw new UsageException("which records? Give one or more FOLDERs or RECORD.csv files, or --manifest LIST.csv");
        }
        int jobs = (int) a.whole("jobs", Runtime.getRuntime().availableProcessors());
        Optional<Set<FrictionTerm>> terms = FitCommand.terms(a.value("terms"));
        FitSettings settings = defaults.applyTo(FitSettings.defaults());
        settings = settings.withResampling((int) a.whole("resamples", settings.resamples()), a.whole("seed", settings.seed()),
                false);
        SwingImportOptions options = RecordOptions.from(a);
        MechanismSource mechanism = MechanismOptions.resolve(a, mechanismFile, defaults);
        try {
            SurveyGrouping.Grouping grouping = grouping(a);
            if (grouping.units().isEmpty() && grouping.unassigned().isEmpty()) {
                throw new UsageException("no records to survey: " + (a.has("manifest") ? a.value("manifest") + " lists none"
                        : "no *.csv file in " + String.join(", ", a.positional())));
            }
            Path outDir = outDir(a);
            refuseRecordsFolder(outDir, grouping);
            String fingerprint = SurveyFingerprint.of(sha256(Path.of(mechanismFile)), terms, a.flag("fix-inertia"), settings,
                    options, Version.current());
            SurveyRun.Settings run = new SurveyRun.Settings(mechanism, options, terms, a.flag("fix-inertia"), settings,
                    fingerprint);
            SurveyRun.Result result;
            ProgressBar bar = new ProgressBar(err, System.console() != null);
            bar.unitDone(0, grouping.units().size());
            try (SurveyJournal journal = SurveyJournal.open(outDir)) {
                result = SurveyRun.run(grouping.units(), run, journal, jobs, bar);
            } catch (IOException e) {
                throw new InputException(outDir.resolve(SurveyJournal.FILE_NAME) + ": " + e.getMessage(), e);
            }
            bar.finish(result);
            List<SurveyFailure> failed = new ArrayList<>(grouping.unassigned());
            for (SurveyRow r : result.rows()) {
                if (!r.fitted()) {
                    failed.add(new SurveyFailure(r.key(), r.failedFile(), r.error()));
                }
            }
            SurveySummary summary = SurveySummary.of(result.rows());
            int units = (int) result.rows().stream().filter(SurveyRow::fitted).count();
            write(outDir, mechanismFile, result, failed, summary, units, err);
            if (a.flag("json")) {
                SurveyJson.summary(mechanismFile, units, result.skipped(), failed, summary, new JsonWriter(out));
            } else {
                print(out, mechanismFile, result, failed, summary, units, outDir);
            }
            if (failed.isEmpty()) {
                return ExitCode.OK;
            }
            return units > 0 ? ExitCode.PARTIAL_FAILURE : ExitCode.USAGE_OR_INPUT;
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static SurveyGrouping.Grouping grouping(Arguments a) throws InputException, UsageException {
        if (a.has("manifest")) {
            return SurveyGrouping.byManifest(Path.of(a.value("manifest")), a.has("unit-column") ? a.value("unit-column")
                    : UNIT_COLUMN);
        }
        List<Path> records = SurveyGrouping.records(a.positional().stream().map(Path::of).toList());
        if (!a.has("group")) {
            return SurveyGrouping.perRecord(records);
        }
        try {
            return SurveyGrouping.byPattern(records, Pattern.compile(a.value("group")));
        } catch (PatternSyntaxException e) {
            throw new UsageException("--group: '" + a.value("group") + "' is not a regular expression: "
                    + e.getDescription() + " near index " + e.getIndex());
        }
    }

    private static Path outDir(Arguments a) throws UsageException {
        if (a.has("out")) {
            return Path.of(a.value("out"));
        }
        if (a.has("manifest")) {
            Path m = Path.of(a.value("manifest")).toAbsolutePath();
            return m.resolveSibling(m.getFileName().toString().replaceFirst("\\.[^.]*$", "") + "-survey");
        }
        Path first = Path.of(a.positional().get(0)).toAbsolutePath().normalize();
        if (!Files.isDirectory(first) || first.getParent() == null) {
            throw new UsageException("--out DIR is required when the first input is not a folder (the default is "
                    + "FOLDER-survey beside the first FOLDER)");
        }
        return first.resolveSibling(first.getFileName() + "-survey");
    }

    /** The output folder is never a folder of the survey's records: nothing is written beside a record. */
    private static void refuseRecordsFolder(Path outDir, SurveyGrouping.Grouping g) throws InputException {
        if (Files.exists(outDir) && !Files.isDirectory(outDir)) {
            throw new InputException(outDir + ": is not a folder; --out names the survey's output folder");
        }
        Path out = outDir.toAbsolutePath().normalize();
        List<Path> records = new ArrayList<>();
        g.units().forEach(u -> records.addAll(u.files()));
        g.unassigned().forEach(f -> records.add(Path.of(f.file())));
        for (Path p : records) {
            if (out.equals(p.toAbsolutePath().normalize().getParent())) {
                throw new InputException(outDir + ": holds the survey's records (" + p.getFileName() + "); the output "
                        + "goes to a folder of its own: choose another --out");
            }
        }
    }

    private static String sha256(Path file) throws InputException {
        try {
            return SessionRecords.sha256(file);
        } catch (IOException e) {
            throw new InputException(file + ": cannot be read (" + e.getMessage() + ")", e);
        }
    }

    private static void write(Path dir, String mechanism, SurveyRun.Result result, List<SurveyFailure> failed,
            SurveySummary summary, int units, PrintWriter err) throws InputException {
        List<String> notes = new ArrayList<>();
        notes.addAll(OutputFiles.write(dir.resolve("units.csv"), true, w -> SurveyCsv.write(result.rows(), summary, w)));
        notes.addAll(OutputFiles.write(dir.resolve("units.json"), true, w -> SurveyJson.units(result.rows(), json(w))));
        notes.addAll(OutputFiles.write(dir.resolve("summary.json"), true,
                w -> SurveyJson.summary(mechanism, units, result.skipped(), failed, summary, json(w))));
        String name = Path.of(mechanism).getFileName().toString();
        notes.addAll(OutputFiles.write(dir.resolve("survey.html"), true, w -> SurveyReport.write(
                SurveyReport.document(name, result.rows(), failed, result.skipped(), summary), Version.current(), w)));
        notes.forEach(n -> err.println("note: " + n));
    }

    private static JsonWriter json(Writer w) {
        return new JsonWriter(new PrintWriter(w));
    }

    private static void print(PrintWriter out, String mechanism, SurveyRun.Result result, List<SurveyFailure> failed,
            SurveySummary summary, int units, Path outDir) {
        out.printf(Locale.ROOT, "Survey against %s: %d units fitted (%d of them reused from an earlier run), failed: %d%n",
                mechanism, units, result.skipped(), failed.size());
        for (Map.Entry<String, PopulationStatistics> e : summary.terms().entrySet()) {
            PopulationStatistics s = e.getValue();
            // the limits as center ± half-width: a narrow spread reads better than two equal-looking limits
            out.printf(Locale.ROOT, "  %-14s n %d  median %s  MAD %s  p05 %s  p95 %s  center %s, limits ± %s%n",
                    e.getKey(), s.count(), Figures.significant(s.median()), Figures.significant(s.mad()),
                    Figures.significant(s.p05()), Figures.significant(s.p95()), Figures.significant(s.center()),
                    Figures.significant(s.ucl() - s.center()));
        }
        for (SurveySummary.Flagged f : summary.outliers()) {
            out.printf(Locale.ROOT, "outlier: %s %s %s (modified z-score %s)%n", f.unit(), f.term(),
                    Figures.significant(f.value()), Figures.fixed(f.score(), 2));
        }
        for (SurveySummary.Flagged f : summary.beyondLimits()) {
            out.printf(Locale.ROOT, "beyond the control limits: %s %s %s%n", f.unit(), f.term(), Figures.significant(f.value()));
        }
        for (SurveyFailure f : failed) {
            out.println("failed: " + f.error());
        }
        out.println("wrote " + String.join(", ", OUTPUTS) + " into " + outDir);
        out.println("The limits are statistical, not acceptance criteria. " + Cautions.TEXT);
    }
}
