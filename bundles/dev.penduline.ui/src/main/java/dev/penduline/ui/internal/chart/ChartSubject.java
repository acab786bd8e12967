package dev.penduline.ui.internal.chart;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.TurningPoint;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.SwingPrediction;
import dev.penduline.services.SwingSessionAnalysis;
import dev.penduline.services.present.Figures;
import dev.penduline.services.present.PlotThinning;

/**
 * A mechanism file opened for the Swing Chart: its test sessions and, when its parts allow, the
 * mechanism the services computed. Gives the chart's content for a session (the record read
 * with the mapping stored in the file, analysed by the services) or, without sessions, for the
 * predicted free swing. Runs off the UI thread.
 *
 * @param file      the mechanism file or parts list
 * @param name      the mechanism's name
 * @param sessions  its test sessions, in file order (none for a parts list)
 * @param mechanism the mechanism, empty when its inertia could not be computed
 * @param problem   why the mechanism is empty
 */
public record ChartSubject(Path file, String name, List<TestSession> sessions, Optional<MechanismSource> mechanism,
        Optional<String> problem) {

    /** The release angle of the predicted swing shown when a mechanism has no test session. */
    public static final double PREDICTED_RELEASE_DEG = 30;

    /** Freezes the list. */
    public ChartSubject {
        sessions = List.copyOf(sessions);
    }

    /**
     * Opens a mechanism file or parts list through the services.
     *
     * @param file the file
     * @return the subject
     * @throws InputException when the mechanism file itself cannot be read (file, line, column)
     */
    public static ChartSubject open(Path file) throws InputException {
        String name = String.valueOf(file.getFileName());
        List<TestSession> sessions = List.of();
        if (name.toLowerCase(Locale.ROOT).endsWith("." + MechanismFormat.FILE_EXTENSION)) {
            Mechanism m = MechanismLoader.readMechanism(file);
            sessions = m.getSessions();
            if (m.getName() != null && !m.getName().isBlank()) {
                name = m.getName();
            }
        }
        try {
            return new ChartSubject(file, name, sessions, Optional.of(new MechanismLoader().load(file)),
                    Optional.empty());
        } catch (InputException e) {
            return new ChartSubject(file, name, sessions, Optional.empty(), Optional.of(e.getMessage()));
        }
    }

    /**
     * A subject of a mechanism in memory (a copy of an editor's live model, taken on the UI
     * thread), computed through the services as {@link #open(Path)} does for its file.
     *
     * @param m    the mechanism (not shared with the UI thread)
     * @param file its file, for the records' paths and the messages
     * @return the subject
     */
    public static ChartSubject of(Mechanism m, Path file) {
        String name = m.getName() != null && !m.getName().isBlank() ? m.getName() : String.valueOf(file.getFileName());
        try {
            return new ChartSubject(file, name, m.getSessions(), Optional.of(new MechanismLoader().loadMechanism(m,
                    file.toString())), Optional.empty());
        } catch (InputException e) {
            return new ChartSubject(file, name, m.getSessions(), Optional.empty(), Optional.of(e.getMessage()));
        }
    }

    /**
     * The content for a session: its record and what the analysis found in it.
     *
     * @param index the session's position in {@link #sessions()}
     * @return the content; a failed one naming the file when the record cannot be read
     */
    public SwingChartContent session(int index) {
        TestSession session = sessions.get(index);
        String title = name + " - " + session.getName();
        SessionRecords.SessionRecord read;
        try {
            read = SessionRecords.readSession(file, session);
        } catch (InputException e) {
            return SwingChartContent.failed(title, e.getMessage());
        }
        List<String> warnings = new ArrayList<>(read.warnings());
        problem.ifPresent(p -> warnings.add("without the mechanism (no period check, no SI estimates): " + p));
        return ofRecord(title, read.record(), mechanism, warnings);
    }

    /**
     * The content for a record: the recorded angle, its turning points, the release and the stop
     * the analysis finds, and its summary; also for a record not yet added (the import wizard).
     *
     * @param title     the chart's title
     * @param record    the record as read
     * @param mechanism the mechanism, when it could be computed (for the period check and SI estimates)
     * @param warnings  warnings to show before the record's and the analysis' own
     * @return the content
     */
    public static SwingChartContent ofRecord(String title, SwingRecord record, Optional<MechanismSource> mechanism,
            List<String> warnings) {
        double[] degrees = degrees(record.angles());
        PlotThinning.Points curve = PlotThinning.keepExtremes(record.times(), degrees, SwingChartContent.DRAWN_POINTS);
        List<String> all = new ArrayList<>(warnings);
        all.addAll(record.warnings());
        SwingAnalysis analysis;
        try {
            analysis = SwingSessionAnalysis.analyse(record, mechanism);
        } catch (InputException e) {
            return new SwingChartContent(title, curve, record.size(), new PlotThinning.Points(new double[0],
                    new double[0]), Double.NaN, Double.NaN, false, List.of("Not analysed: " + e.getMessage()), all,
                    Optional.empty());
        }
        all.addAll(analysis.warnings());
        int n = analysis.turningPoints().size();
        double[] tt = new double[n];
        double[] ta = new double[n];
        for (int i = 0; i < n; i++) {
            tt[i] = analysis.turningPoints().get(i).time();
            ta[i] = Unit.DEGREE.fromSi(analysis.turningPoints().get(i).angle());
        }
        double stop = analysis.stop().stopped() ? analysis.stop().time() : Double.NaN;
        return new SwingChartContent(title, curve, record.size(), new PlotThinning.Points(tt, ta),
                analysis.release().time(), stop, false, AnalysisSummary.lines(analysis, mechanism.isPresent()), all,
                Optional.empty());
    }

    /**
     * The content without a session: the free swing the mechanism's inertia predicts from
     * {@value #PREDICTED_RELEASE_DEG}° without friction.
     *
     * @return the content; a failed one when the mechanism could not be computed
     */
    public SwingChartContent prediction() {
        String title = "Predicted free swing from " + Figures.significant(PREDICTED_RELEASE_DEG)
                + "°, no friction (no test session yet)";
        if (mechanism.isEmpty()) {
            return SwingChartContent.failed(title, problem.orElse("the mechanism could not be computed"));
        }
        MechanismSource m = mechanism.get();
        double t0 = m.properties().smallAnglePeriod();
        // Six periods show the swing's shape; about 4000 points draw it smoothly.
        double duration = Math.min(120, Math.max(1, 6 * t0));
        SwingRun run;
        try {
            run = SwingPrediction.simulate(m, FrictionTorques.none(), Unit.DEGREE.toSi(PREDICTED_RELEASE_DEG), 0,
                    duration, 4000 / duration);
        } catch (InputException e) {
            return SwingChartContent.failed(title, e.getMessage());
        }
        List<TurningPoint> turns = run.turningPoints();
        double[] tt = new double[turns.size()];
        double[] ta = new double[turns.size()];
        for (int i = 0; i < tt.length; i++) {
            tt[i] = turns.get(i).time();
            ta[i] = Unit.DEGREE.fromSi(turns.get(i).angle());
        }
        double[] periods = run.periods();
        List<String> summary = List.of(
                name + " has no test session yet: this is the swing its inertia predicts, released from rest at "
                        + Figures.significant(PREDICTED_RELEASE_DEG) + "° with zero friction. Add a record with "
                        + "'penduline add-session' to see a measured one.",
                "Period at " + Figures.significant(PREDICTED_RELEASE_DEG) + "°: "
                        + (periods.length > 0 ? Figures.significant(periods[0]) + " s" : "n/a")
                        + "; small-angle period T0: " + Figures.significant(t0) + " s.");
        PlotThinning.Points curve = PlotThinning.keepExtremes(run.times(), degrees(run.angles()),
                SwingChartContent.DRAWN_POINTS);
        return new SwingChartContent(title, curve, run.size(), new PlotThinning.Points(tt, ta), 0, Double.NaN, true, summary,
                m.warnings(), Optional.empty());
    }

    private static double[] degrees(double[] radians) {
        double[] d = new double[radians.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = Unit.DEGREE.fromSi(radians[i]);
        }
        return d;
    }

    /**
     * The content to show first: the first session, or the prediction when there is none.
     *
     * @return the content
     */
    public SwingChartContent first() {
        return sessions.isEmpty() ? prediction() : session(0);
    }
}
