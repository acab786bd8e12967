package dev.penduline.services;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import dev.penduline.model.TestSession;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitDecimation;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionIdentifier;
import dev.penduline.physics.identify.FrictionProblem;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.ModelComparison;
import dev.penduline.physics.identify.ReleaseSession;
import dev.penduline.physics.identify.SessionGuess;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.swing.FrictionEstimates;
import dev.penduline.physics.swing.PeriodCheck;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecord;

/**
 * Identifies the friction of a mechanism from one or more release records: the use case behind
 * {@code penduline fit} and the workbench's fit action. Each record is first analysed (release,
 * offset, first estimates from the decay envelope) to start the fit; then the whole trajectory
 * is fitted, either with the terms asked for or, by default, with every candidate term set
 * compared and the best one kept.
 */
public final class FrictionIdentification {

    /**
     * One record to fit, with where it came from and its first analysis.
     *
     * @param name      the session's (or file's) name
     * @param file      the record as the user knows it
     * @param sessionId the session's identifier, null for a record given directly
     * @param record    the record as read
     * @param analysis  its first analysis
     * @param warnings  what reading and analysing it found
     * @param change    null, or that the session's record changed since it was added (its content was accepted)
     */
    public record SessionInput(String name, String file, String sessionId, SwingRecord record, SwingAnalysis analysis,
            List<String> warnings, String change) {

        /** Copies the list. */
        public SessionInput {
            warnings = List.copyOf(warnings);
        }
    }

    /** What was fitted, how, and what came out. */
    public record Outcome(MechanismSource mechanism, List<SessionInput> sessions, FrictionFit fit,
            Optional<ModelComparison> comparison, boolean automatic, List<String> warnings,
            List<FitDecimation.Thinning> decimation) {

        /** Copies the lists. */
        public Outcome {
            sessions = List.copyOf(sessions);
            warnings = List.copyOf(warnings);
            decimation = List.copyOf(decimation);
        }

        /**
         * The sessions whose samples were thinned for the fit.
         *
         * @return those thinnings, in session order (empty when every sample was fitted)
         */
        public List<FitDecimation.Thinning> thinned() {
            return decimation.stream().filter(FitDecimation.Thinning::thinned).toList();
        }
    }

    private FrictionIdentification() {
    }

    /**
     * Reads and analyses a record given on the command line.
     *
     * @param file      the record
     * @param options   how to read it
     * @param mechanism the mechanism
     * @return the prepared input
     * @throws InputException when the record cannot be read or analysed
     */
    public static SessionInput prepare(Path file, SwingImportOptions options, MechanismSource mechanism)
            throws InputException {
        SwingRecord record = SessionRecords.read(file, options);
        SwingAnalysis analysis = SwingSessionAnalysis.analyse(record, Optional.of(mechanism));
        String name = file.getFileName().toString().replaceFirst("\\.[^.]*$", "");
        return new SessionInput(name, file.toString(), null, record, analysis, record.warnings(), null);
    }

    /**
     * Reads and analyses every test session of a mechanism file; a session whose record changed
     * since it was added is refused.
     *
     * @param mechanismFile the mechanism file
     * @param mechanism     the mechanism loaded from it
     * @return the prepared inputs, in the file's order
     * @throws InputException when the file has no sessions, a record cannot be read or has changed
     */
    public static List<SessionInput> sessionsOf(Path mechanismFile, MechanismSource mechanism) throws InputException {
        return sessionsOf(mechanismFile, mechanism, false);
    }

    /**
     * Reads and analyses every test session of a mechanism file. Every record is read (and
     * checked against its stored hash) before any is analysed, so that changed records are named
     * all at once and first.
     *
     * @param mechanismFile  the mechanism file
     * @param mechanism      the mechanism loaded from it
     * @param acceptChanged  true to fit a record whose content changed since its session was added (its
     *                       {@link SessionInput#change()} says so; storing the fit stores the new hash), false to refuse it
     * @return the prepared inputs, in the file's order
     * @throws InputException when the file has no sessions, a record is missing, outside the project or
     *                        unreadable, or has changed and that is not accepted
     */
    public static List<SessionInput> sessionsOf(Path mechanismFile, MechanismSource mechanism, boolean acceptChanged)
            throws InputException {
        return sessionsOf(mechanismFile, MechanismLoader.readMechanism(mechanismFile).getSessions(), mechanism,
                acceptChanged);
    }

    /**
     * Why a mechanism file cannot be fitted from its own sessions when it has none.
     *
     * @param mechanismFile the mechanism file
     * @return the message, naming the file and what to do
     */
    public static String noSessions(Path mechanismFile) {
        return mechanismFile + ": has no test sessions; add records with 'penduline add-session'"
                + " or give them with --session";
    }

    /**
     * Reads and analyses chosen test sessions of a mechanism (the workbench's fit of some of a
     * file's sessions, or of the sessions of an open editor's model), as
     * {@link #sessionsOf(Path, MechanismSource, boolean)} does for all of a file's sessions.
     *
     * @param mechanismFile the mechanism file (the records' paths are relative to it)
     * @param chosen        the sessions to read, in the order to fit them
     * @param mechanism     the mechanism
     * @param acceptChanged true to fit a record whose content changed since its session was added
     * @return the prepared inputs
     * @throws InputException when no session is chosen, a record cannot be read, or has changed and that is
     *                        not accepted
     */
    public static List<SessionInput> sessionsOf(Path mechanismFile, List<TestSession> chosen, MechanismSource mechanism,
            boolean acceptChanged) throws InputException {
        if (chosen.isEmpty()) {
            throw new InputException(noSessions(mechanismFile));
        }
        List<SessionRecords.SessionRecord> read = new ArrayList<>();
        List<String> changed = new ArrayList<>();
        for (TestSession s : chosen) {
            SessionRecords.SessionRecord sr = SessionRecords.readSession(mechanismFile, s);
            SessionRecords.changeOf(s, sr.record()).ifPresent(changed::add);
            read.add(sr);
        }
        if (!changed.isEmpty() && !acceptChanged) {
            throw new InputException(mechanismFile + ": not fitted, " + String.join("; ", changed) + "; a raw record should"
                    + " never change: restore it (from version control or the rig's copy), or, if the new content is right,"
                    + " accept it with --accept-changed-records (the fit then uses it and stores its hash)");
        }
        List<SessionInput> inputs = new ArrayList<>();
        for (SessionRecords.SessionRecord sr : read) {
            TestSession s = sr.session();
            SwingAnalysis analysis = SwingSessionAnalysis.analyse(sr.record(), Optional.of(mechanism));
            List<String> warnings = new ArrayList<>(sr.warnings());
            warnings.addAll(sr.record().warnings());
            inputs.add(new SessionInput(s.getName(), s.getRecordPath(), s.getId(), sr.record(), analysis, warnings,
                    SessionRecords.changeOf(s, sr.record()).orElse(null)));
        }
        return inputs;
    }

    /**
     * Fits the friction.
     *
     * @param mechanism  the mechanism (its calculated inertia starts the fit)
     * @param sessions   the prepared records
     * @param terms      the terms to fit, or empty to compare the candidate sets and keep the best
     * @param fixInertia whether to hold the pivot inertia at the calculated value
     * @param settings   limits, tolerances and resampling
     * @param control    cancellation and progress
     * @return the outcome; its fit's status says whether it converged
     * @throws InputException when the records cannot make a problem (too short, inconsistent)
     */
    public static Outcome identify(MechanismSource mechanism, List<SessionInput> sessions,
            Optional<Set<FrictionTerm>> terms, boolean fixInertia, FitSettings settings, FitControl control)
            throws InputException {
        if (sessions.isEmpty()) {
            throw new InputException("no records to fit");
        }
        MechanismProperties p = mechanism.properties();
        Optional<String> still = SwingPrediction.noRestoringTorque(p);
        if (still.isPresent()) {
            throw new InputException(mechanism.label() + ": " + still.get());
        }
        MechanismProperties aboutEquilibrium = aboutEquilibrium(p);
        List<ReleaseSession> releases = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        List<FitDecimation.Thinning> decimation = new ArrayList<>();
        long total = 0;
        for (SessionInput s : sessions) {
            total += s.record().size();
        }
        for (SessionInput s : sessions) {
            SwingAnalysis a = s.analysis();
            requirePlausiblePeriod(s);
            double[] t = s.record().times();
            int stride = FitDecimation.stride(total, t.length, t[t.length - 1] - t[0], p.smallAnglePeriod());
            double[] kept = FitDecimation.keep(t, stride);
            decimation.add(new FitDecimation.Thinning(s.name(), t.length, kept.length, stride));
            releases.add(new ReleaseSession(s.name(), kept, FitDecimation.keep(s.record().angles(), stride),
                    new SessionGuess(a.initialAngle(), a.release().time(), a.offset().value())));
            for (String w : s.warnings()) {
                warnings.add(s.name() + ": " + w);
            }
        }
        FrictionProblem problem;
        try {
            problem = FrictionProblem.of(aboutEquilibrium, releases).withInertiaFree(!fixInertia)
                    .withStart(startingValues(sessions));
            if (terms.isPresent()) {
                problem = problem.withTerms(EnumSet.copyOf(terms.get()));
            }
        } catch (InvalidValueException e) {
            throw new InputException(e.getMessage(), e);
        }
        FrictionIdentifier identifier = new FrictionIdentifier(settings);
        if (terms.isPresent()) {
            return new Outcome(mechanism, sessions, identifier.fit(problem, control), Optional.empty(), false,
                    warnings, decimation);
        }
        ModelComparison comparison = identifier.compare(problem, control);
        return new Outcome(mechanism, sessions, comparison.best(), Optional.of(comparison), true, warnings, decimation);
    }

    /**
     * The mechanism as the fit sees it: angles from the hanging equilibrium.
     *
     * @param p the mechanism's properties
     * @return the same mechanism with its equilibrium angle at zero
     */
    public static MechanismProperties aboutEquilibrium(MechanismProperties p) {
        return new MechanismProperties(p.mass(), p.centroidDistance(), p.pivotInertia(), 0, p.gravity(), p.axisTilt());
    }

    /** How far the measured small-angle period may be from the mechanism's before a fit is pointless. */
    static final double PERIOD_RATIO_LIMIT = 3;

    /**
     * Refuses a record whose swings take a time unrelated to the mechanism's period: a fit could
     * only bend the inertia to match, so the cause is named instead (a wrong time unit, another
     * mechanism's record, or a parts list far off).
     */
    private static void requirePlausiblePeriod(SessionInput s) throws InputException {
        PeriodCheck p = s.analysis().periodCheck();
        double ratio = p.measuredSmallAnglePeriod() / p.predictedSmallAnglePeriod();
        if (Double.isFinite(ratio) && (ratio > PERIOD_RATIO_LIMIT || ratio < 1 / PERIOD_RATIO_LIMIT)) {
            throw new InputException(String.format(Locale.ROOT, "%s: its swings have a small-angle period of %.4g s, %.3g "
                    + "times the mechanism's %.4g s: check the record's time unit (--time-unit), that the record belongs to "
                    + "this mechanism, and the parts list (mass, centroid, inertia)", s.file(), p.measuredSmallAnglePeriod(),
                    ratio, p.predictedSmallAnglePeriod()));
        }
    }

    /**
     * The average of the sessions' first estimates from their decay envelopes.
     *
     * @param sessions the analysed records
     * @return starting friction torques (zero where no session shows the term)
     */
    static FrictionTorques startingValues(List<SessionInput> sessions) {
        double b = 0;
        double tc = 0;
        double c = 0;
        int n = 0;
        for (SessionInput s : sessions) {
            Optional<FrictionEstimates> e = s.analysis().estimates();
            if (e.isPresent()) {
                b += Math.max(0, e.get().viscous());
                tc += Math.max(0, e.get().coulomb());
                c += Math.max(0, e.get().drag());
                n++;
            }
        }
        return n == 0 ? FrictionTorques.none() : new FrictionTorques(b / n, tc / n, 0, c / n);
    }
}
