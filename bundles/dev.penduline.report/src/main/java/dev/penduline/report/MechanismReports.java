package dev.penduline.report;

import java.io.IOException;
import java.nio.file.Path;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.SessionFit;
import dev.penduline.model.TestSession;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.PartContribution;
import dev.penduline.physics.inertia.ToleranceSpread;
import dev.penduline.physics.motion.EllipticSwing;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;
import dev.penduline.physics.swing.DecayEnvelope;
import dev.penduline.physics.swing.MeasuredTurningPoint;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.swing.SwingCycle;
import dev.penduline.physics.units.Unit;
import dev.penduline.report.ReportDocument.Caution;
import dev.penduline.report.ReportDocument.Cell;
import dev.penduline.report.ReportDocument.Figure;
import dev.penduline.report.ReportDocument.Format;
import dev.penduline.report.ReportDocument.Heading;
import dev.penduline.report.ReportDocument.Items;
import dev.penduline.report.ReportDocument.Paragraph;
import dev.penduline.report.ReportDocument.Table;
import dev.penduline.report.plot.Curve;
import dev.penduline.report.plot.Plots;
import dev.penduline.services.Cautions;
import dev.penduline.services.FitCurves;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.StoredFit;
import dev.penduline.services.StoredFitText;
import dev.penduline.services.SwingSessionAnalysis;
import dev.penduline.services.present.Figures;

/**
 * Builds the report of a mechanism file: the mechanism from its parts, each test session with
 * its record and the stored fit's model over it, the stored fit, the predictions when asked, the
 * provenance and the caution. Nothing is fitted again: the fit is read from the file as
 * {@code penduline fit} stored it (in well under a second for the sample, where a fit takes
 * seconds), and every figure is written by the same rules as the command line's
 * ({@link Figures}, {@link StoredFitText}).
 */
public final class MechanismReports {

    private static final double DEFAULT_TOLERANCE = 1e-9;

    /** How far above the largest measured amplitude an envelope is still drawn. */
    private static final double ENVELOPE_HEADROOM = 1.25;

    private final ReportRequest request;
    private final ReportDocument.Builder doc = new ReportDocument.Builder();
    private int pictures;

    private MechanismReports(ReportRequest request) {
        this.request = request;
    }

    /**
     * Builds the report.
     *
     * @param request what to report
     * @return the document
     * @throws InputException when the mechanism file, a record or the stored fit cannot be read
     */
    public static ReportDocument build(ReportRequest request) throws InputException {
        return new MechanismReports(request).document();
    }

    private ReportDocument document() throws InputException {
        Path file = request.mechanismFile();
        Mechanism m = MechanismLoader.readMechanism(file);
        MechanismSource source = new MechanismLoader().withDefaultGravity(request.defaultGravity())
                .loadMechanism(m, file.toString());
        Optional<FitResult> fit = chosenFit(m);
        Optional<StoredFitText> text = fit.map(r -> StoredFitText.of(r, m.getSessions()));
        caution(request.predictions().isPresent());
        summary(m, source, fit, text);
        mechanism(m, source);
        List<String> hashes = sessions(file, m, source, fit);
        if (fit.isPresent()) {
            fitSection(fit.get(), text.get());
        }
        request.predictions().ifPresent(this::predictions);
        provenance(file, fit, text, hashes);
        doc.add(new Heading(1, "caution", "Caution"));
        caution(true);
        String title = m.getName() == null || m.getName().isBlank() ? file.getFileName().toString() : m.getName();
        return doc.build(title, "Report of " + file.getFileName() + ", written "
                + request.time().truncatedTo(ChronoUnit.SECONDS) + " by Penduline " + request.version());
    }

    private Optional<FitResult> chosenFit(Mechanism m) throws InputException {
        if (request.fitId().isPresent()) {
            StoredFit.byId(m, request.fitId().get());
            return m.getFitResults().stream().filter(r -> r.getId().equals(request.fitId().get())).findFirst();
        }
        List<FitResult> fits = m.getFitResults();
        return fits.isEmpty() ? Optional.empty() : Optional.of(fits.get(fits.size() - 1));
    }

    private void caution(boolean hazard) {
        List<String> lines = new ArrayList<>();
        lines.add(Cautions.TEXT);
        if (hazard) {
            lines.add(Cautions.HAZARD);
        }
        lines.add("The figures describe the records and the parts list this report names, and hold for that mechanism as"
                + " it was tested; a changed part, a worn hinge or another temperature calls for new tests.");
        doc.add(new Caution("Caution", lines));
    }

    private void summary(Mechanism m, MechanismSource source, Optional<FitResult> fit, Optional<StoredFitText> text) {
        doc.add(new Heading(1, "summary", "Summary"));
        if (m.getDescription() != null && !m.getDescription().isBlank()) {
            doc.add(new Paragraph(m.getDescription(), false));
        }
        if (fit.isPresent()) {
            StoredFitText t = text.get();
            doc.add(new Paragraph(t.verdict(), true));
            List<String> items = new ArrayList<>();
            items.add("Friction " + t.model() + "; fit " + t.id() + " of " + t.computedAt() + " from "
                    + fit.get().getSessionIds().size() + " test session(s).");
            items.addAll(FitTables.estimateLines(t));
            t.warnings().stream().filter(w -> w.startsWith("STALE")).forEach(items::add);
            doc.add(new Items(items));
        } else {
            doc.add(new Paragraph("No friction fit is stored in this file: run penduline fit on it first for the verdict,"
                    + " the friction terms and their uncertainties.", true));
        }
        source.inertia().ifPresent(s -> doc.add(new Paragraph("From the parts: mass " + Figures.significant(s.totalMass())
                + " kg, pivot inertia J0 " + Figures.significant(s.pivotInertia()) + " kg·m², small-angle period T0 "
                + Figures.significant(s.smallAnglePeriod()) + " s.", false)));
    }

    private void mechanism(Mechanism m, MechanismSource source) throws InputException {
        doc.add(new Heading(1, "mechanism", "Mechanism"));
        Optional<InertiaSummary> inertia = source.inertia();
        if (inertia.isEmpty()) {
            doc.add(new Paragraph("The file gives the mechanism as lumped properties: there is no parts list to break down.",
                    false));
            return;
        }
        InertiaSummary s = inertia.get();
        List<List<Cell>> rows = new ArrayList<>();
        List<String> names = new ArrayList<>();
        double[] shares = new double[s.contributions().size()];
        for (int i = 0; i < s.contributions().size(); i++) {
            PartContribution p = s.contributions().get(i);
            String k = "inertia.parts[" + i + "].";
            rows.add(List.of(Cell.of(p.name()), sig(p.mass(), k + "mass_kg"), sig(p.axisDistance(), k + "distance_m"),
                    sig(p.pivotInertia(), k + "pivot_inertia_kg_m2"), Cell.figure(Figures.percent(p.share()), k + "share",
                            Format.PERCENT)));
            names.add(p.name());
            shares[i] = 100 * p.share();
        }
        doc.add(new Table("Parts and their share of the pivot inertia J0 (a cut-out's share is negative)",
                List.of("part", "mass (kg)", "distance from the axis (m)", "J about the pivot (kg·m²)", "share of J0"), rows));
        doc.add(new Figure(Plots.partShares(id("parts"), "Share of J0 by part", names, shares),
                "Each part's share of the pivot inertia J0; the shares add up to 100 %."));
        List<List<Cell>> totals = new ArrayList<>();
        totals.add(List.of(Cell.of("total mass m"), sig(s.totalMass(), "inertia.mass_kg"), Cell.of("kg")));
        totals.add(List.of(Cell.of("centroid (x, y, z)"), Cell.of("(" + Figures.significant(s.centroid().getX()) + ", "
                + Figures.significant(s.centroid().getY()) + ", " + Figures.significant(s.centroid().getZ()) + ")"), Cell.of("m")));
        totals.add(List.of(Cell.of("centroid distance Lc"), sig(s.centroidDistance(), "inertia.centroid_distance_m"),
                Cell.of("m")));
        totals.add(List.of(Cell.of("inertia about the pivot J0"), sig(s.pivotInertia(), "inertia.pivot_inertia_kg_m2"),
                Cell.of("kg·m²")));
        totals.add(List.of(Cell.of("inertia about the centroid"), sig(s.centroidalInertia(), "inertia.centroid_inertia_kg_m2"),
                Cell.of("kg·m²")));
        totals.add(List.of(Cell.of("radius of gyration"), sig(s.radiusOfGyration(), "inertia.radius_of_gyration_m"),
                Cell.of("m")));
        totals.add(List.of(Cell.of("equivalent pendulum length J0/(m·Lc)"), sig(s.equivalentLength(),
                "inertia.equivalent_length_m"), Cell.of("m")));
        totals.add(List.of(Cell.of("small-angle period T0"), sig(s.smallAnglePeriod(), "inertia.small_angle_period_s"),
                Cell.of("s")));
        totals.add(List.of(Cell.of("period error of a point mass at the centroid"), Cell.figure(
                Figures.percent(s.simplePendulumPeriodError(), 2), "inertia.simple_pendulum_period_error", Format.PERCENT2),
                Cell.of("")));
        doc.add(new Table("The mechanism from its parts (gravity " + Figures.significant(s.gravity()) + " m/s²)",
                List.of("quantity", "value", "unit"), totals));
        doc.add(new Paragraph("Point-mass comparison: a simple pendulum of length Lc, the body's mass gathered at its"
                + " centroid, would swing with a period " + Figures.percent(s.simplePendulumPeriodError(), 2) + " off the"
                + " compound pendulum's, because it leaves out the inertia about the centroid (parallel-axis theorem:"
                + " J0 = Jc + m·Lc²).", false));
        if (source.hasTolerances()) {
            tolerances(source);
        }
    }

    private void tolerances(MechanismSource source) throws InputException {
        ToleranceSpread.Result r;
        try {
            r = ToleranceSpread.of(source.frame(), source.parts(), request.toleranceDraws(), request.toleranceSeed());
        } catch (InvalidValueException e) {
            throw new InputException(source.label() + ": " + e.getMessage(), e);
        }
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(spreadRow("total mass (kg)", "mass_kg", r.mass()));
        rows.add(spreadRow("centroid distance Lc (m)", "centroid_distance_m", r.centroidDistance()));
        rows.add(spreadRow("J0 (kg·m²)", "pivot_inertia_kg_m2", r.pivotInertia()));
        rows.add(spreadRow("period T0 (s)", "small_angle_period_s", r.period()));
        doc.add(new Table(String.format(Locale.ROOT, "Within the parts' tolerances: %d Monte Carlo draws over %d toleranced"
                + " inputs (seed %d), as penduline inertia computes them", r.samples(), r.inputs(), r.seed()),
                List.of("quantity", "nominal", "σ", "σ linearised", "5 %", "95 %"), rows));
        if (r.failed() > 0) {
            doc.add(new Paragraph(r.failed() + " draws were left out: their parts list could not be computed.", false));
        }
    }

    private static List<Cell> spreadRow(String label, String key, ToleranceSpread.Spread s) {
        String k = "inertia.tolerance_spread." + key + ".";
        return List.of(Cell.of(label), sig(s.nominal(), k + "nominal"), Cell.figure(Figures.significant(s.sigma(), 2), k
                + "sigma", Format.SIGNIFICANT2), Cell.figure(Figures.significant(s.linearSigma(), 2), k + "linear_sigma",
                        Format.SIGNIFICANT2), sig(s.p5(), k + "p5"), sig(s.p95(), k + "p95"));
    }

    private static Cell sig(double v, String key) {
        return Cell.figure(Figures.significant(v), key, Format.SIGNIFICANT);
    }

    private String id(String what) {
        pictures++;
        return String.format(Locale.ROOT, "fig%02d-%s", pictures, what);
    }

    /** The test sessions; returns one provenance line per record (file, SHA-256, agreement with the stored hash). */
    private List<String> sessions(Path file, Mechanism m, MechanismSource source, Optional<FitResult> fit)
            throws InputException {
        doc.add(new Heading(1, "sessions", "Test sessions"));
        List<String> provenance = new ArrayList<>();
        if (m.getSessions().isEmpty()) {
            doc.add(new Paragraph("The file has no test sessions.", false));
            return provenance;
        }
        SwingSimulator simulator = null;
        MechanismProperties level = FrictionIdentification.aboutEquilibrium(source.properties());
        if (fit.isPresent()) {
            simulator = FitCurves.simulatorOf(source, StoredFit.of(fit.get()), tolerance(fit.get()));
            level = simulator.mechanism();
        }
        for (TestSession session : m.getSessions()) {
            doc.add(new Heading(2, "session-" + slug(session.getId()), session.getName()));
            SessionRecords.SessionRecord sr;
            try {
                sr = SessionRecords.readSession(file, session);
            } catch (InputException e) {
                // one unreadable record does not stop the report: it says so where the session is and
                // in the provenance
                provenance.add(session.getRecordPath() + ": CANNOT BE READ (" + e.getMessage() + ")");
                doc.add(new Paragraph("The record cannot be read, so this session is shown without it: " + e.getMessage(),
                        true));
                continue;
            }
            provenance.add(session.getRecordPath() + ": SHA-256 " + sr.record().sha256() + (sr.changed()
                    ? " (CHANGED since the session was added: the stored hash was " + session.getContentHash() + ")"
                    : session.getContentHash() == null ? "" : " (as when the session was added)"));
            Optional<SessionFit> sf = fit.flatMap(r -> r.getSessionFits().stream()
                    .filter(s -> session.getId().equals(s.getSessionId())).findFirst());
            double[] t = sr.record().times();
            double rate = (t.length - 1) / (t[t.length - 1] - t[0]);
            doc.add(new Paragraph("Record " + session.getRecordPath() + ": " + sr.record().size() + " samples at "
                    + Figures.significant(rate) + " Hz over " + Figures.significant(t[t.length - 1] - t[0]) + " s." + (sr.changed()
                            ? " The record CHANGED since the session was added; the fit below was made on other content."
                            : ""), false));
            sr.warnings().forEach(w -> doc.add(new Paragraph("Warning: " + w, false)));
            Optional<SwingAnalysis> a;
            try {
                a = Optional.of(SwingSessionAnalysis.analyse(sr.record(), Optional.of(source)));
            } catch (InputException e) {
                a = Optional.empty();
                doc.add(new Paragraph("The record cannot be analysed (no decay or period plot): " + e.getMessage(), false));
            }
            recordPlot(session, sr, sf, simulator, a);
            if (a.isPresent()) {
                decayPlot(session, a.get());
                periodPlot(session, a.get(), level);
            }
            if (sf.isEmpty() && fit.isPresent()) {
                doc.add(new Paragraph("This session is not part of the stored fit.", false));
            }
        }
        return provenance;
    }

    private static double tolerance(FitResult r) {
        try {
            return StoredFit.setting(r, "integration-tolerance").map(Double::parseDouble).orElse(DEFAULT_TOLERANCE);
        } catch (NumberFormatException e) {
            return DEFAULT_TOLERANCE;
        }
    }

    private void recordPlot(TestSession session, SessionRecords.SessionRecord sr, Optional<SessionFit> sf,
            SwingSimulator simulator, Optional<SwingAnalysis> analysis) {
        double[] t = sr.record().times();
        double[] y = sr.record().angles();
        double[] measured = degrees(y);
        double[] model = new double[t.length];
        double[] residual = new double[t.length];
        Arrays.fill(model, Double.NaN);
        Arrays.fill(residual, Double.NaN);
        double release = analysis.map(a -> a.release().time()).orElse(Double.NaN);
        String caption;
        if (sf.isPresent() && simulator != null) {
            SessionFit f = sf.get();
            FitCurves.Curve c = FitCurves.replay(simulator, session.getName(), f.getInitialAngle(), f.getReleaseTime(),
                    f.getAngleOffset(), t, y);
            model = degrees(c.modelled());
            residual = degrees(c.residuals());
            release = f.getReleaseTime();
            caption = "The record (grey) with the stored fit's model over it (black, dashed), released from rest at "
                    + Figures.significant(Unit.DEGREE.fromSi(f.getInitialAngle())) + "° at the fitted release time; below, the"
                    + " residual (measured − model) on the same time axis.";
        } else {
            caption = "The record; no stored fit covers this session, so no model is drawn.";
        }
        boolean stopped = analysis.isPresent() && analysis.get().stop().stopped();
        double stop = stopped ? analysis.get().stop().time() : Double.NaN;
        caption += stopped ? " It comes to rest at " + Figures.significant(stop) + " s." : analysis.isPresent()
                ? " It does not come to rest within the record." : "";
        doc.add(new Figure(Plots.sessionRecord(id("record-" + slug(session.getId())), session.getName() + ": record and model",
                t, measured, model, residual, release, stop), caption));
    }

    private void decayPlot(TestSession session, SwingAnalysis a) {
        List<MeasuredTurningPoint> tps = a.turningPoints();
        if (tps.size() < 3) {
            return;
        }
        double[] n = new double[tps.size()];
        double[] amp = new double[tps.size()];
        for (int i = 0; i < tps.size(); i++) {
            n[i] = 0.5 * i;
            amp[i] = Unit.DEGREE.fromSi(tps.get(i).amplitude());
        }
        double top = 0;
        for (double v : amp) {
            top = Math.max(top, v);
        }
        List<Curve> envelopes = new ArrayList<>();
        List<String> fits = new ArrayList<>();
        boolean clipped = false;
        for (DecayEnvelope e : a.envelopes()) {
            double[] x = new double[201];
            double[] yv = new double[201];
            for (int i = 0; i <= 200; i++) {
                x[i] = n[n.length - 1] * i / 200.0;
                double v = Unit.DEGREE.fromSi(e.amplitudeAfter(x[i]));
                // an envelope that fits badly (a pole of the reciprocal one, say) is drawn only where it
                // stays within the plot of the measured amplitudes, so it cannot squash them flat
                boolean inside = v >= 0 && v <= ENVELOPE_HEADROOM * top;
                clipped |= !inside;
                yv[i] = inside ? v : Double.NaN;
            }
            String name = switch (e.model()) {
                case LINEAR -> "linear (dry friction)";
                case GEOMETRIC -> "geometric (viscous)";
                case RECIPROCAL -> "reciprocal (drag)";
            };
            envelopes.add(new Curve(name, x, yv));
            fits.add(name + " r² = " + Figures.fixed(e.rSquared(), 5));
        }
        doc.add(new Figure(Plots.amplitudeDecay(id("decay-" + slug(session.getId())), session.getName() + ": amplitude decay",
                "cycles since release (cycles)", n, amp, envelopes), "Amplitude of each turning point against the cycles since the"
                        + " release, with the three envelopes fitted to them: a straight line is the signature of dry friction,"
                        + " a geometric decay of viscous damping, a reciprocal one of air drag (" + String.join(", ", fits)
                        + "; r² in amplitude space, below 0 when the shape fits worse than a constant)." + (clipped
                                ? " An envelope is drawn only where it stays between 0 and " + Figures.fixed(100
                                        * ENVELOPE_HEADROOM, 0) + " % of the largest amplitude." : "")));
    }

    private void periodPlot(TestSession session, SwingAnalysis a, MechanismProperties level) {
        List<SwingCycle> cycles = a.cycles();
        if (cycles.size() < 2) {
            return;
        }
        double[] amp = new double[cycles.size()];
        double[] period = new double[cycles.size()];
        double top = 0;
        for (int i = 0; i < cycles.size(); i++) {
            amp[i] = Unit.DEGREE.fromSi(cycles.get(i).amplitude());
            period[i] = cycles.get(i).period();
            top = Math.max(top, amp[i]);
        }
        int k = 80;
        double[] x = new double[k + 1];
        double[] p = new double[k + 1];
        for (int i = 0; i <= k; i++) {
            x[i] = top * 1.05 * i / k;
            p[i] = new EllipticSwing(level, Unit.DEGREE.toSi(Math.max(x[i], 1e-6))).period();
        }
        doc.add(new Figure(Plots.periodAmplitude(id("period-" + slug(session.getId())), session.getName()
                + ": period against amplitude", amp, period, new Curve("4·√(J0/(m·g·Lc))·K(sin(A/2))", x, p)),
                "Each measured cycle's period against its amplitude, and the undamped large-amplitude period from the complete"
                        + " elliptic integral of the first kind with J0 = " + Figures.significant(level.pivotInertia())
                        + " kg·m² (T0 = " + Figures.significant(level.smallAnglePeriod()) + " s at small amplitude)."));
    }

    private static double[] degrees(double[] rad) {
        double[] d = new double[rad.length];
        for (int i = 0; i < rad.length; i++) {
            d[i] = Unit.DEGREE.fromSi(rad[i]);
        }
        return d;
    }

    private static String slug(String id) {
        String s = String.valueOf(id).toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        return s.isEmpty() ? "x" : s;
    }

    private void fitSection(FitResult r, StoredFitText t) {
        doc.add(new Heading(1, "fit", "Friction fit"));
        doc.add(new Paragraph(t.verdict(), true));
        doc.add(new Paragraph(t.shares().isEmpty() ? "Energy shares: " + StoredFitText.NOT_STORED : t.shares(), false));
        doc.add(new Paragraph(t.model().substring(0, 1).toUpperCase(Locale.ROOT) + t.model().substring(1) + "; fit " + t.id()
                + " computed " + t.computedAt() + ", status " + t.status() + ".", false));
        FitTables.estimates(doc, t);
        FitTables.energy(doc, r, id("energy"));
        FitTables.sessions(doc, t);
        FitTables.correlations(doc, r);
        FitTables.comparison(doc, t);
        if (!t.noise().isEmpty()) {
            doc.add(new Paragraph(t.noise(), false));
        }
        if (!t.stopBand().isEmpty()) {
            doc.add(new Paragraph(t.stopBand(), false));
        }
        if (!t.totals().isEmpty()) {
            doc.add(new Paragraph(t.totals(), false));
        }
        doc.add(new Heading(2, "warnings", "Warnings"));
        doc.add(t.warnings().isEmpty() ? new Paragraph("The fit gave no warnings.", false) : new Items(t.warnings()));
    }

    private void predictions(ReportPredictions p) {
        doc.add(new Heading(1, "predictions", "Predictions"));
        doc.add(new Paragraph("As penduline predict computes them with the options: " + p.options(), false));
        doc.add(new Items(p.lines().stream().map(String::strip).filter(l -> !l.isEmpty()).toList()));
        FitTables.predictions(doc, p.outcome());
        MechanismForecast.Outcome o = p.outcome();
        double end = o.nominal().simulatedTime();
        if (end > 0 && Double.isFinite(end)) {
            int n = 8001;
            double[] times = new double[n];
            for (int i = 0; i < n; i++) {
                times[i] = end * i / (n - 1);
            }
            SwingRun run = new SwingSimulator(o.properties(), o.source().friction()).simulate(o.request().releaseAngle(),
                    o.request().releaseVelocity(), times);
            doc.add(new Figure(Plots.timeSeries(id("prediction"), "Predicted swing", "angle from the hanging position (°)",
                    List.of(new Curve("nominal prediction", run.times(), degrees(run.angles())))),
                    "The nominal predicted swing (the fit's values, no draws) from the release to the end of the simulated"
                            + " time; the bands above give the spread over the fit's uncertainty."));
        }
    }

    private void provenance(Path file, Optional<FitResult> fit, Optional<StoredFitText> text, List<String> records)
            throws InputException {
        doc.add(new Heading(1, "provenance", "Provenance"));
        List<String> items = new ArrayList<>();
        items.add("Penduline " + request.version() + ", report written " + request.time().truncatedTo(ChronoUnit.SECONDS));
        try {
            items.add("Mechanism file " + file.getFileName() + ": SHA-256 " + SessionRecords.sha256(file));
        } catch (IOException e) {
            throw new InputException(file + ": cannot be read for its SHA-256: " + e.getMessage(), e);
        }
        items.addAll(records.stream().map(r -> "Record " + r).toList());
        fit.ifPresent(r -> items.add("Stored fit " + r.getId() + ", computed " + r.getComputedAt()));
        request.predictions().ifPresent(p -> items.add("Predictions: penduline predict " + file.getFileName() + " "
                + p.options() + " (draws " + p.outcome().draws() + ", seed " + p.outcome().seed() + ")"));
        doc.add(new Items(items));
        text.ifPresent(t -> {
            List<List<Cell>> rows = new ArrayList<>();
            for (Map.Entry<String, String> e : t.settings()) {
                rows.add(List.of(Cell.of(e.getKey()), Cell.of(e.getValue())));
            }
            doc.add(new Table("The settings the fit was made with, as stored", List.of("setting", "value"), rows));
        });
    }
}
