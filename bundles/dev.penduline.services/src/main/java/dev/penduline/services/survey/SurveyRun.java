package dev.penduline.services.survey;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Collectors;

import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FitWarning;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.FrictionVerdict;
import dev.penduline.physics.identify.Goodness;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.services.FitWording;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.FrictionIdentification.SessionInput;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;

/**
 * Fits the units of a survey, several at once, each fit on one thread (so that {@code jobs}
 * fits use {@code jobs} cores, not more), every unit with the same settings and seed: the rows
 * do not depend on how many run at once or in which order they finish. A unit whose records and
 * settings match a row of the journal is not fitted again; its row is reused. One unit's failure
 * (a record that cannot be read, a fit that does not converge, even a Penduline bug) is its row's
 * error, never the survey's end.
 */
public final class SurveyRun {

    /**
     * What every unit is fitted with.
     *
     * @param mechanism   the design (its parts, inertia and gravity)
     * @param options     how the records are read
     * @param terms       the terms to fit, or empty to compare the candidates and keep the best
     * @param fixInertia  whether the pivot inertia is held at the calculated value
     * @param fit         the fit's settings; they are made single-threaded here
     * @param fingerprint what identifies these settings in the journal (see {@link SurveyFingerprint})
     */
    public record Settings(MechanismSource mechanism, SwingImportOptions options, Optional<Set<FrictionTerm>> terms,
            boolean fixInertia, FitSettings fit, String fingerprint) {
    }

    /** Told after each unit. */
    @FunctionalInterface
    public interface Progress {
        /**
         * A unit is done (fitted, reused or failed).
         *
         * @param done  how many units are done
         * @param total how many there are
         */
        void unitDone(int done, int total);
    }

    /**
     * The survey's rows, in unit order, and what was done.
     *
     * @param rows    one row a unit, in the units' order
     * @param fitted  how many units were fitted in this run
     * @param skipped how many rows were reused from an earlier run
     * @param failed  how many units failed
     */
    public record Result(List<SurveyRow> rows, int fitted, int skipped, int failed) {

        /** Copies the list. */
        public Result {
            rows = List.copyOf(rows);
        }
    }

    /** The fit of one unit's prepared records ({@link FrictionIdentification#identify}; a test's stand-in). */
    @FunctionalInterface
    interface Fitter {
        /**
         * Fits a unit.
         *
         * @param s        the survey's settings
         * @param sessions the unit's prepared records
         * @return the outcome
         * @throws InputException when the records cannot make a problem
         */
        Outcome fit(Settings s, List<SessionInput> sessions) throws InputException;
    }

    private static final Fitter IDENTIFY = (s, sessions) -> FrictionIdentification.identify(s.mechanism(), sessions,
            s.terms(), s.fixInertia(), s.fit(), FitControl.none());

    /** One unit's outcome: its row and whether it was reused. */
    private record Done(SurveyRow row, boolean reused) {
    }

    private SurveyRun() {
    }

    /**
     * Fits the units.
     *
     * @param units    the units, in order
     * @param settings how
     * @param journal  where each row goes as it completes, and the earlier rows
     * @param jobs     how many units are fitted at once (at least 1)
     * @param progress told after each unit (from the worker threads, one call at a time)
     * @return the rows, in unit order
     * @throws InputException when the journal cannot be written (the rows written so far are kept)
     */
    public static Result run(List<SurveyUnit> units, Settings settings, SurveyJournal journal, int jobs, Progress progress)
            throws InputException {
        return run(units, settings, journal, jobs, progress, IDENTIFY);
    }

    /**
     * Fits the units with the given fitter (a test's, to see one unit fail as a bug would).
     *
     * @param units    the units, in order
     * @param settings how
     * @param journal  where each row goes
     * @param jobs     how many at once
     * @param progress told after each unit
     * @param fitter   fits one unit's prepared records
     * @return the rows, in unit order
     * @throws InputException when the journal cannot be written
     */
    static Result run(List<SurveyUnit> units, Settings settings, SurveyJournal journal, int jobs, Progress progress,
            Fitter fitter) throws InputException {
        FitSettings fit = settings.fit().withResampling(settings.fit().resamples(), settings.fit().seed(), false);
        Settings single = new Settings(settings.mechanism(), settings.options(), settings.terms(), settings.fixInertia(), fit,
                settings.fingerprint());
        AtomicInteger done = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(jobs, Math.max(1, units.size()))),
                r -> {
                    Thread t = new Thread(r, "penduline-survey");
                    t.setDaemon(true);
                    return t;
                });
        try {
            List<Future<Done>> futures = new ArrayList<>();
            for (SurveyUnit u : units) {
                futures.add(pool.submit(() -> {
                    Done d = unit(u, single, journal, fitter);
                    journal.append(single.fingerprint(), d.row());
                    synchronized (progress) {
                        progress.unitDone(done.incrementAndGet(), units.size());
                    }
                    return d;
                }));
            }
            List<SurveyRow> rows = new ArrayList<>();
            int fitted = 0;
            int skipped = 0;
            int failed = 0;
            for (Future<Done> f : futures) {
                Done d = f.get();
                rows.add(d.row());
                if (d.reused()) {
                    skipped++;
                } else if (d.row().fitted()) {
                    fitted++;
                } else {
                    failed++;
                }
            }
            return new Result(rows, fitted, skipped, failed);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof IOException io) {
                throw new InputException(journal.file() + ": " + AtomicFileWrite.reason(io), io);
            }
            throw new IllegalStateException("a survey task failed", e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InputException("the survey was interrupted; the units done so far are in " + journal.file(), e);
        } finally {
            pool.shutdownNow();
        }
    }

    private static Done unit(SurveyUnit u, Settings s, SurveyJournal journal, Fitter fitter) {
        List<String> hashes = new ArrayList<>();
        for (Path p : u.files()) {
            try {
                hashes.add(SessionRecords.sha256(p));
            } catch (IOException e) {
                return new Done(SurveyRow.failed(u, hashes, p.toString(), p + ": cannot be read ("
                        + AtomicFileWrite.reason(e) + ")"), false);
            }
        }
        Optional<SurveyRow> earlier = journal.earlier(s.fingerprint(), u.key(), hashes);
        if (earlier.isPresent()) {
            return new Done(earlier.get(), true);
        }
        String current = u.files().stream().map(Path::toString).collect(Collectors.joining("; "));
        try {
            List<SessionInput> sessions = new ArrayList<>();
            for (Path p : u.files()) {
                current = p.toString();
                sessions.add(FrictionIdentification.prepare(p, s.options(), s.mechanism()));
            }
            current = u.files().stream().map(Path::toString).collect(Collectors.joining("; "));
            Outcome o = fitter.fit(s, sessions);
            FrictionFit fit = o.fit();
            if (!fit.converged()) {
                return new Done(SurveyRow.failed(u, hashes, current, current + ": not fitted, the fit ended "
                        + fit.status().name().toLowerCase(Locale.ROOT).replace('_', ' ') + ": " + fit.message()), false);
            }
            return new Done(row(u, hashes, o), false);
        } catch (InputException e) {
            return new Done(SurveyRow.failed(u, hashes, current, e.getMessage()), false);
        } catch (InvalidValueException e) {
            return new Done(SurveyRow.failed(u, hashes, current, current + ": " + e.getMessage()), false);
        } catch (RuntimeException | StackOverflowError e) {
            return new Done(SurveyRow.failed(u, hashes, current, "a Penduline bug, please report it: " + e.getClass().getName()
                    + ": " + e.getMessage() + " (while fitting " + current + ")"), false);
        }
    }

    private static SurveyRow row(SurveyUnit u, List<String> hashes, Outcome o) {
        FrictionFit fit = o.fit();
        List<String> terms = new ArrayList<>();
        List<SurveyRow.Estimate> estimates = new ArrayList<>();
        for (FrictionTerm t : fit.terms()) {
            String word = FitWording.word(t);
            terms.add(word);
            Optional<ParameterEstimate> p = fit.parameter(t.symbol());
            if (t == FrictionTerm.STICTION && fit.stiction() != null) {
                // the stop band's middle and its σ, as fit's JSON gives them
                estimates.add(new SurveyRow.Estimate(word, fit.stiction().middle(), fit.stiction().sigma()));
            } else if (p.isPresent()) {
                estimates.add(new SurveyRow.Estimate(word, p.get().value(), p.get().sigma()));
            }
        }
        FrictionVerdict v = fit.verdict();
        String verdict = switch (v.kind()) {
            case DOMINANT -> FitWording.word(v.dominant());
            case MIXED -> "mixed";
            case WITHHELD -> "withheld";
        };
        List<Double> ratios = new ArrayList<>();
        Goodness g = fit.goodness();
        for (int k = 0; k < u.files().size(); k++) {
            ratios.add(g == null ? Double.NaN : g.sessions().get(k).ratio());
        }
        List<String> warnings = new ArrayList<>();
        fit.warnings().stream().map(FitWarning::message).forEach(warnings::add);
        warnings.addAll(o.warnings());
        return new SurveyRow(u.key(), u.files().stream().map(Path::toString).toList(), hashes, SurveyRow.FITTED, terms,
                estimates, verdict, fit.inertia().fitted(), fit.inertia().sigma(), ratios, warnings, "", "");
    }
}
