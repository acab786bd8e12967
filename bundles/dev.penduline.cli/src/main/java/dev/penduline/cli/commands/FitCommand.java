package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FitStatus;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.services.Defaults;
import dev.penduline.services.FitRecorder;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.FrictionIdentification.SessionInput;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismSource;

/** {@code penduline fit}: identify the friction terms from release records, compare, decide. */
public final class FitCommand implements Command {

    private static final Set<String> OPTIONS = MechanismOptions.with(RecordOptions.with("session", "terms",
            "resamples", "max-iterations", "seed", "verdict-margin"));

    /** The flag that lets a fit use a session's record whose content changed since it was added. */
    static final String ACCEPT_CHANGED = "accept-changed-records";

    @Override
    public String name() {
        return "fit";
    }

    @Override
    public String summary() {
        return "identify viscous, Coulomb, stiction and drag terms from release records, with uncertainties";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline fit (FILE | --mass KG --centroid-distance M --pivot-inertia KG_M2)
                                     [--session RECORD.csv ...] [--terms auto|LIST] [--fix-inertia] [--json]
                                     [--accept-changed-records]

                Fits the event-driven swing model to the whole measured trajectory of every record at
                once (Levenberg-Marquardt; the friction terms and the pivot inertia are shared, each
                record keeps its own release angle, release time and sensor offset), compares the
                candidate term sets by AIC and BIC, keeps the best, and says which loss dominates by
                its share of the energy dissipated. Uncertainties come from the Jacobian and from a
                block bootstrap of the residuals. A fit of a mechanism file's own sessions is stored
                back in the file (unless --no-save).

                """ + MechanismOptions.USAGE + """

                  --session RECORD.csv     a record to fit (repeatable); default: the mechanism file's
                                           test sessions
                  --terms auto|LIST        auto (default): compare viscous; coulomb; viscous+coulomb;
                                           viscous+drag; viscous+coulomb+drag, each with stiction when
                                           a record shows a stop. Or a list such as viscous,coulomb,stiction
                  --fix-inertia            hold the pivot inertia at the calculated value
                  --resamples N            bootstrap refits for the resampling uncertainty (default 40;
                                           with --use-preferences: the defaults file's)
                  --max-iterations N       iteration limit of each fit (default 100)
                  --seed N                 seed of the bootstrap (default fixed: results repeat)
                  --verdict-margin PP      lead in percentage points of the energy lost that one loss
                                           needs over the next to be called dominant (default 15);
                                           otherwise the verdict is "mixed" (--use-preferences:
                                           the defaults file's)
                  --no-save                do not store the result in the mechanism file
                  --accept-changed-records fit a session whose record changed since it was added (it is
                                           refused otherwise) and store the new content's hash with the fit
                  --json                   print a JSON object instead of the report
                """ + RecordOptions.USAGE;
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("json", "fix-inertia", "no-save", ACCEPT_CHANGED));
        if (a.positional().size() > 1) {
            throw new UsageException("at most one mechanism file; got " + a.positional());
        }
        String file = a.positional().isEmpty() ? null : a.positional().get(0);
        boolean mechanismFile = file != null && file.endsWith(".penduline");
        // a mechanism file is read once: its mechanism, its sessions and the content the fit is stored into
        MechanismOptions.ReadOnce read = mechanismFile ? MechanismOptions.readOnce(a, file, defaults) : null;
        MechanismSource mechanism = read != null ? read.mechanism() : MechanismOptions.resolve(a, file, defaults);
        Optional<Set<FrictionTerm>> terms = terms(a.value("terms"));
        FitSettings settings = defaults.applyTo(FitSettings.defaults());
        if (a.has("resamples") || a.has("seed")) {
            settings = settings.withResampling((int) a.whole("resamples", settings.resamples()),
                    a.whole("seed", settings.seed()), settings.parallel());
        }
        if (a.has("max-iterations")) {
            int it = (int) a.whole("max-iterations", settings.maxIterations());
            settings = settings.withLimits(it, Math.max(2 * it, settings.maxEvaluations()));
        }
        if (a.has("verdict-margin")) {
            double pp = a.number("verdict-margin", 100 * settings.verdictMargin());
            settings = settings.withVerdictRules(pp / 100, settings.misfitRatio());
        }
        Outcome outcome;
        String stored = null;
        try {
            List<SessionInput> sessions = new ArrayList<>();
            if (a.has("session")) {
                for (String s : a.all("session")) {
                    sessions.add(FrictionIdentification.prepare(Path.of(s), RecordOptions.from(a), mechanism));
                }
            } else if (mechanismFile) {
                sessions.addAll(FrictionIdentification.sessionsOf(read.file().file(), read.file().mechanism().getSessions(),
                        mechanism, a.flag(ACCEPT_CHANGED)));
                for (SessionInput s : sessions) {
                    if (s.change() != null) {
                        // said before any result: the fit is of content the session was not added with
                        err.println("note: " + s.change() + "; fitting the new content as --" + ACCEPT_CHANGED + " asks"
                                + (a.flag("no-save") ? "" : ", and storing its hash with the fit"));
                    }
                }
            } else {
                throw new UsageException("which records? Give --session RECORD.csv (repeatable), or a mechanism "
                        + "file that has test sessions");
            }
            outcome = FrictionIdentification.identify(mechanism, sessions, terms, a.flag("fix-inertia"), settings,
                    FitControl.none());
            if (mechanismFile && !a.has("session") && !a.flag("no-save") && outcome.fit().converged()) {
                stored = FitRecorder.store(read.file(), outcome, Instant.now(), note -> err.println("note: " + note));
            }
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        } catch (InvalidValueException e) {
            throw new UsageException(e.getMessage());
        }
        if (a.flag("json")) {
            new FitJson(outcome, stored).write(new JsonWriter(out));
        } else {
            // the report lists the records' warnings with the fit's own, in one place
            new FitReportText(outcome, stored, file).print(out);
        }
        return outcome.fit().status() == FitStatus.CONVERGED ? ExitCode.OK : ExitCode.COMPUTATION_FAILED;
    }

    static Optional<Set<FrictionTerm>> terms(String value) throws UsageException {
        if (value == null || value.equalsIgnoreCase("auto")) {
            return Optional.empty();
        }
        Set<FrictionTerm> set = EnumSet.noneOf(FrictionTerm.class);
        for (String word : value.split(",")) {
            String w = word.trim().toLowerCase(Locale.ROOT);
            switch (w) {
                case "viscous" -> set.add(FrictionTerm.VISCOUS);
                case "coulomb", "dry" -> set.add(FrictionTerm.COULOMB);
                case "stiction", "static" -> set.add(FrictionTerm.STICTION);
                case "drag", "quadratic" -> set.add(FrictionTerm.DRAG);
                default -> throw new UsageException("--terms: '" + word.trim()
                        + "' is not one of viscous, coulomb, stiction, drag (or auto)");
            }
        }
        if (set.contains(FrictionTerm.STICTION) && !set.contains(FrictionTerm.COULOMB)) {
            throw new UsageException("--terms: stiction needs coulomb too (static friction is at least the dry "
                    + "friction)");
        }
        return Optional.of(set);
    }
}
