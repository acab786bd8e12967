package dev.penduline.ui.internal.whatif;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.ISchedulingRule;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.ISeries;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.eclipse.swtchart.ISeriesSet;

import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.Mechanism;
import dev.penduline.model.SessionFit;
import dev.penduline.model.TestSession;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.model.naming.StableIds;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.AnglePass;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingEnergy;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.services.EnergyLedger;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.StoredFit;
import dev.penduline.services.present.Figures;
import dev.penduline.services.present.PlotThinning;
import dev.penduline.ui.internal.FollowingPart;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.chart.ChartTools;
import dev.penduline.ui.internal.document.MechanismDocument;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.editor.MechanismEdits;

/**
 * The Swing Trial view: for the mechanism file selected (or its editor's live model), the
 * release angle, the initial speed and each friction term as a slider with a spinner, starting
 * from the latest stored fit with its ± band beside each; every change forecasts the swing again
 * through the services {@code penduline predict} uses ({@link MechanismForecast}) and plots it
 * over a chosen session's record, with the phase portrait and the energy ledger, and the
 * prediction figures written by the same formatter as the command line. Store as Hypothesis
 * adds the chosen values to the mechanism's friction hypotheses as one undoable command.
 */
public final class WhatIfPart extends FollowingPart {

    /** The settle band's half-width (°): the one {@code penduline predict} uses unless told otherwise. */
    public static final double BAND_DEG = 1;
    /** Figure keys of {@link #figure(String)}. */
    public static final String SETTLE = "settle time";
    /** The small-angle period is checked against the first swing's. */
    public static final String PERIOD = "period of the first swing";
    /** Label of the store button. */
    public static final String STORE = "Store as Hypothesis";

    private static final String[] FIGURES = {SETTLE, "half-swings before that", "rest band", "peak angular velocity",
        "speed at the angle", "largest overshoot", PERIOD, "J0 used", "energy"};
    private static final int DRAWN = 4000;
    private static final ISchedulingRule ONE_AT_A_TIME = new ISchedulingRule() {
        @Override
        public boolean contains(ISchedulingRule rule) {
            return rule == this;
        }

        @Override
        public boolean isConflicting(ISchedulingRule rule) {
            return rule == this;
        }
    };

    private final Map<String, Label> figures = new LinkedHashMap<>();
    private ScrolledComposite scroll;
    private Label title;
    private Combo sessions;
    private TrialSlider angle;
    private TrialSlider speed;
    private TrialSlider atAngle;
    private TrialSlider viscous;
    private TrialSlider coulomb;
    private TrialSlider stiction;
    private TrialSlider drag;
    private Button store;
    private Label status;
    private Chart swing;
    private Chart phase;
    private Chart energy;
    private String shownFit;
    private Mechanism model;
    private MechanismSource mechanism;
    private StoredFit fit;
    private final Map<String, double[]> overlays = new HashMap<>();
    private volatile long generation;
    private long shownGeneration;

    @Override
    protected void build(Composite parent) {
        GridLayoutFactory.swtDefaults().numColumns(2).margins(6, 4).applyTo(parent);
        // the controls and figures scroll when the view is shorter than they are
        scroll = new ScrolledComposite(parent, SWT.V_SCROLL);
        scroll.setExpandHorizontal(true);
        scroll.setExpandVertical(true);
        GridDataFactory.fillDefaults().grab(false, true).applyTo(scroll);
        Composite left = new Composite(scroll, SWT.NONE);
        scroll.setContent(left);
        GridLayoutFactory.fillDefaults().numColumns(5).applyTo(left);
        title = new Label(left, SWT.WRAP);
        title.setText("Select a mechanism file in Project Files to try swings with it.");
        GridDataFactory.fillDefaults().span(5, 1).hint(560, SWT.DEFAULT).applyTo(title);
        new Label(left, SWT.NONE).setText("Record shown:");
        sessions = new Combo(left, SWT.READ_ONLY | SWT.DROP_DOWN);
        GridDataFactory.fillDefaults().span(4, 1).grab(true, false).applyTo(sessions);
        sessions.addListener(SWT.Selection, e -> sessionChosen());
        angle = new TrialSlider(left, "Release angle", "°", this::retry);
        speed = new TrialSlider(left, "Initial speed", "°/s", this::retry);
        atAngle = new TrialSlider(left, "Speed asked at", "°", this::retry);
        viscous = new TrialSlider(left, "Viscous b", Unit.N_M_S_PER_RAD.symbol(), this::retry);
        coulomb = new TrialSlider(left, "Coulomb Tc", Unit.NEWTON_METRE.symbol(), this::retry);
        stiction = new TrialSlider(left, "Stiction Ts", Unit.NEWTON_METRE.symbol(), this::retry);
        drag = new TrialSlider(left, "Drag c", Unit.N_M_S2_PER_RAD2.symbol(), this::retry);
        Composite shown = new Composite(left, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).margins(0, 6).applyTo(shown);
        GridDataFactory.fillDefaults().span(5, 1).grab(true, false).applyTo(shown);
        for (String f : FIGURES) {
            new Label(shown, SWT.NONE).setText(f + ":");
            Label value = new Label(shown, SWT.WRAP);
            GridDataFactory.fillDefaults().grab(true, false).hint(420, SWT.DEFAULT).applyTo(value);
            figures.put(f, value);
        }
        store = new Button(left, SWT.PUSH);
        store.setText(STORE);
        store.setToolTipText("Adds the friction chosen here to the mechanism's friction hypotheses (one command: Edit › Undo"
                + " takes it back while the file is open in its editor)");
        store.addListener(SWT.Selection, e -> storeHypothesis());
        status = new Label(left, SWT.WRAP);
        GridDataFactory.fillDefaults().span(4, 1).grab(true, false).hint(400, SWT.DEFAULT).applyTo(status);
        Composite charts = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).equalWidth(true).applyTo(charts);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(charts);
        scroll.setMinSize(left.computeSize(SWT.DEFAULT, SWT.DEFAULT));
        swing = chart(charts, "Trial swing", "time (s)", "angle (°)");
        GridDataFactory.fillDefaults().span(2, 1).grab(true, true).hint(300, 150).applyTo(swing);
        phase = chart(charts, "Phase portrait", "angle (°)", "angular velocity (°/s)");
        energy = chart(charts, "Energy ledger", "time (s)", "energy (J)");
        enable(false);
    }

    /** Only mechanism files: a parts list has no friction to try. */
    @Override
    protected boolean accepts(IFile file) {
        return MechanismSelection.isMechanismFile(file);
    }

    /** The view reads the file when it is selected, and again only when the editor's model changes. */
    @Override
    protected boolean followsDisk() {
        return false;
    }

    private static Chart chart(Composite parent, String name, String x, String y) {
        Chart c = new Chart(parent, SWT.NONE);
        c.getTitle().setText(name);
        c.getAxisSet().getXAxis(0).getTitle().setText(x);
        c.getAxisSet().getYAxis(0).getTitle().setText(y);
        c.getLegend().setPosition(SWT.BOTTOM);
        GridDataFactory.fillDefaults().grab(true, true).hint(200, 150).applyTo(c);
        ChartTools.install(c);
        return c;
    }

    /**
     * Shows a mechanism file (its editor's live model when it is open): the sliders start from its
     * latest stored fit unless the same file and fit are shown already.
     *
     * @param file the mechanism file
     */
    @Override
    public void show(IFile file) {
        Path path = MechanismSelection.pathOf(file);
        Optional<MechanismDocument> open = openDocument(file);
        try {
            Mechanism m = open.isPresent() ? EcoreUtil.copy(open.get().mechanism()) : MechanismLoader.readMechanism(path);
            MechanismSource source = new MechanismLoader().loadMechanism(m, path.toString());
            Optional<StoredFit> latest = StoredFit.latest(m);
            boolean same = file.equals(shownFile()) && java.util.Objects.equals(shownFit, latest.map(StoredFit::id).orElse(""));
            if (!file.equals(shownFile())) {
                overlays.clear();
            }
            shown(file);
            shownFit = latest.map(StoredFit::id).orElse("");
            model = m;
            mechanism = source;
            fit = latest.orElse(null);
            title.setText(source.label() + ": " + latest.map(f -> "friction from " + f.name() + f.stale().map(s -> " (STALE: "
                    + s + ")").orElse("")).orElse("no stored fit; the friction starts at zero"));
            if (!same) {
                fillSessions(m);
                configure(source.properties());
            }
            enable(true);
            retry();
        } catch (InputException e) {
            mechanism = null;
            title.setText(e.getMessage());
            enable(false);
        }
        relayout();
    }

    private void fillSessions(Mechanism m) {
        sessions.removeAll();
        sessions.add("(no record)");
        for (TestSession s : m.getSessions()) {
            sessions.add(s.getName() + "  (" + s.getRecordPath() + ")");
        }
        sessions.select(m.getSessions().isEmpty() ? 0 : 1);
    }

    /** The sliders' ranges and starting values: the fit's estimates with their bands, the chosen session's release. */
    private void configure(MechanismProperties p) {
        double k = p.gravityStiffness();
        double j0 = p.pivotInertia();
        double wn = Math.sqrt(k / j0);
        double release = releaseOf(sessions.getSelectionIndex() - 1).map(r -> Unit.DEGREE.fromSi(r[2])).orElse(30.0);
        angle.configure(-170, 170, release, Double.NaN, Double.NaN, "from the hanging equilibrium");
        speed.configure(-360, 360, 0, Double.NaN, Double.NaN, "0: released from rest");
        atAngle.configure(-170, 170, 0, Double.NaN, Double.NaN, "0: passing the equilibrium");
        FrictionTorques f = fit == null ? FrictionTorques.none() : fit.friction();
        // without a fit: up to a damping ratio of ½, a rest band of ±3°, drag comparable to gravity at the natural speed
        term(viscous, "b", f.viscous(), j0 * wn);
        term(coulomb, "Tc", f.coulomb(), 0.05 * k);
        term(stiction, "Ts", f.staticTorque(), 0.05 * k);
        term(drag, "c", f.drag(), 0.5 * j0);
    }

    private void term(TrialSlider slider, String symbol, double value, double fallbackTop) {
        int i = fit == null ? -1 : fit.parameters().indexOf(symbol);
        double sigma = i >= 0 ? fit.sigmas()[i] : Double.NaN;
        double top = value > 0 ? Math.max(3 * value, value + 5 * (Double.isNaN(sigma) ? 0 : sigma)) : fallbackTop;
        String text = i >= 0 ? TrialSlider.fitText(value, sigma) : "Ts".equals(symbol) && fit != null
                ? "fit: " + (Double.isFinite(fit.stictionLower()) ? "middle of the stops' band " + Figures.significant(
                        fit.stictionLower()) + " to " + Figures.significant(fit.stictionUpper()) : "same as Coulomb")
                : fit == null ? "" : "not in the fit";
        slider.configure(0, top, value, i >= 0 ? value : Double.NaN, sigma, text);
    }

    /** {releaseTime, offset, initialAngle} of a session in the fit, empty when the fit has none for it. */
    private Optional<double[]> releaseOf(int session) {
        if (model == null || session < 0 || session >= model.getSessions().size() || model.getFitResults().isEmpty()) {
            return Optional.empty();
        }
        String id = model.getSessions().get(session).getId();
        FitResult r = model.getFitResults().get(model.getFitResults().size() - 1);
        for (SessionFit s : r.getSessionFits()) {
            if (id.equals(s.getSessionId())) {
                return Optional.of(new double[] {s.getReleaseTime(), s.getAngleOffset(), s.getInitialAngle()});
            }
        }
        return Optional.empty();
    }

    private void sessionChosen() {
        releaseOf(sessions.getSelectionIndex() - 1).ifPresent(r -> angle.configure(-170, 170, Unit.DEGREE.fromSi(r[2]),
                Double.NaN, Double.NaN, "the fit's release of this record"));
        retry();
    }

    /** The chosen record, shifted to the fit's release and offset (time, degrees interleaved), or null. */
    private double[][] overlay() {
        int index = sessions.getSelectionIndex() - 1;
        if (model == null || index < 0 || index >= model.getSessions().size()) {
            return null;
        }
        TestSession session = model.getSessions().get(index);
        double[] shift = releaseOf(index).orElse(new double[] {Double.NaN, 0, 0});
        try {
            SwingRecord record = SessionRecords.readSession(MechanismSelection.pathOf(shownFile()), session).record();
            double[] t = record.times();
            double[] a = record.angles();
            double t0 = Double.isNaN(shift[0]) ? t[0] : shift[0];
            List<double[]> kept = new ArrayList<>();
            for (int i = 0; i < t.length; i++) {
                if (t[i] >= t0) {
                    kept.add(new double[] {t[i] - t0, Unit.DEGREE.fromSi(a[i] - shift[1])});
                }
            }
            double[][] out = new double[2][kept.size()];
            for (int i = 0; i < kept.size(); i++) {
                out[0][i] = kept.get(i)[0];
                out[1][i] = kept.get(i)[1];
            }
            return out;
        } catch (InputException e) {
            status.setText(e.getMessage());
            return null;
        }
    }

    /** What one trial asks. */
    private record Trial(long ticket, MechanismSource mechanism, StoredFit fit, FrictionTorques friction, String note,
            ForecastRequest request, double[][] record) {
    }

    /** What one trial gives. */
    private record Result(Trial trial, MechanismForecast.Outcome outcome, MechanismProperties properties, SwingRun run,
            EnergyLedger ledger, String error) {
    }

    /**
     * The friction the sliders say: a static torque below the Coulomb torque is taken as the
     * Coulomb torque (a body that slides against a torque also stays put against a smaller one).
     *
     * @return the torques (SI)
     */
    public FrictionTorques friction() {
        double tc = coulomb.value();
        double ts = stiction.value();
        return new FrictionTorques(viscous.value(), tc, ts > tc ? ts : 0, drag.value());
    }

    /**
     * The release, speed and question the sliders say, as {@code predict} would be asked.
     *
     * @return the request (SI)
     */
    public ForecastRequest request() {
        return new ForecastRequest(Unit.DEGREE.toSi(angle.value()), Unit.DEG_PER_S.toSi(speed.value()),
                Unit.DEGREE.toSi(BAND_DEG), Unit.DEGREE.toSi(atAngle.value()), Double.NaN);
    }

    /**
     * The friction source a trial forecasts with: the stored fit's (for its J0 and name) with the
     * chosen torques.
     *
     * @param fit      the stored fit, or null
     * @param friction the chosen torques
     * @return the source
     */
    public static MechanismForecast.FrictionSource sourceOf(StoredFit fit, FrictionTorques friction) {
        return fit == null ? MechanismForecast.FrictionSource.given(friction, "swing trial (no stored fit)")
                : new MechanismForecast.FrictionSource(fit, friction, "swing trial from stored fit " + fit.id());
    }

    /** Forecasts again with what the widgets say now; the newest trial wins. */
    private void retry() {
        if (mechanism == null || title.isDisposed()) {
            return;
        }
        String key = shownFile().getFullPath() + "#" + sessions.getSelectionIndex();
        double[] cached = overlays.get(key);
        double[][] record;
        if (cached == null) {
            record = overlay();
            if (record != null) {
                overlays.put(key, interleave(record));
            }
        } else {
            record = new double[][] {java.util.Arrays.copyOfRange(cached, 0, cached.length / 2),
                java.util.Arrays.copyOfRange(cached, cached.length / 2, cached.length)};
        }
        Trial trial = new Trial(++generation, mechanism, fit, friction(), coulomb.value() > stiction.value()
                ? "static torque below Coulomb: taken as the Coulomb torque" : "", request(), record);
        Job job = new Job("Swing trial") {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                if (trial.ticket() != generation) {
                    return Status.CANCEL_STATUS;
                }
                Result r = compute(trial);
                onUiThread(() -> apply(r));
                return Status.OK_STATUS;
            }
        };
        job.setRule(ONE_AT_A_TIME);
        job.setSystem(true);
        job.schedule();
    }

    private static double[] interleave(double[][] r) {
        double[] out = new double[2 * r[0].length];
        System.arraycopy(r[0], 0, out, 0, r[0].length);
        System.arraycopy(r[1], 0, out, r[0].length, r[1].length);
        return out;
    }

    private static Result compute(Trial t) {
        MechanismForecast.FrictionSource source = sourceOf(t.fit(), t.friction());
        try {
            MechanismForecast.Outcome o = MechanismForecast.forecast(t.mechanism(), source, t.request(), 0,
                    MechanismForecast.DEFAULT_SEED);
            MechanismProperties p = MechanismForecast.properties(t.mechanism(), source);
            double period = p.smallAnglePeriod();
            double span = o.nominal().settled() ? Math.max(4 * period, 1.15 * o.nominal().settleTime()) : 30 * period;
            if (t.record() != null && t.record()[0].length > 0) {
                span = t.record()[0][t.record()[0].length - 1];
            }
            span = Math.min(span, 200 * period);
            double rate = Math.max(DRAWN / span, 64 / period);
            SwingRun run = new SwingSimulator(p, t.friction()).simulate(t.request().releaseAngle(),
                    t.request().releaseVelocity(), span, rate);
            return new Result(t, o, p, run, EnergyLedger.of(p, t.friction(), run), null);
        } catch (InputException | IllegalArgumentException e) {
            return new Result(t, null, null, null, null, e.getMessage());
        }
    }

    private void apply(Result r) {
        if (title.isDisposed() || r.trial().ticket() != generation) {
            return;
        }
        shownGeneration = r.trial().ticket();
        if (r.error() != null) {
            figures.values().forEach(l -> l.setText("–"));
            figures.get(SETTLE).setText("no trial: " + r.error());
            clear(swing);
            clear(phase);
            clear(energy);
            relayout();
            return;
        }
        writeFigures(r);
        draw(r);
        relayout();
    }

    private void writeFigures(Result r) {
        SwingForecast n = r.outcome().nominal();
        double deg = Unit.DEGREE.fromSi(1);
        set(SETTLE, n.settled() ? Figures.significant(n.settleTime()) + " s (inside ±" + Figures.significant(BAND_DEG) + "°)"
                : "does not settle inside the band: " + n.note());
        set("half-swings before that", n.settled() ? String.valueOf(n.halfSwings()) : "–");
        set("rest band", n.restBand().anywhere() ? "static friction can hold it at any angle"
                : Figures.significant(n.restBand().lower() * deg) + "° to " + Figures.significant(n.restBand().upper() * deg)
                        + "°");
        set("peak angular velocity", Figures.significant(n.peakAngularVelocity()) + " rad/s at "
                + Figures.significant(n.peakTime()) + " s, at " + Figures.significant(n.peakAngle() * deg) + "°");
        double at = r.trial().request().passAngle() * deg;
        Optional<AnglePass> pass = n.pass();
        set("speed at the angle", pass.map(p -> "first passes " + Figures.significant(at) + "° at " + Figures.significant(
                p.time()) + " s: " + Figures.significant(p.angularVelocity()) + " rad/s, kinetic energy "
                + Figures.significant(p.kineticEnergy()) + " J").orElse("never passes " + Figures.significant(at) + "°"));
        set("largest overshoot", Figures.significant(n.maxOvershoot() * deg) + "°");
        double[] periods = r.run().periods();
        set(PERIOD, (periods.length > 0 ? Figures.significant(periods[0]) + " s" : "n/a") + " (small-angle T0 "
                + Figures.significant(r.properties().smallAnglePeriod()) + " s)");
        set("J0 used", Figures.significant(r.outcome().pivotInertia()) + " kg·m² (" + r.outcome().inertiaSource() + ")");
        SwingEnergy e = n.energy();
        set("energy", "released with " + Figures.significant(e.initial()) + " J; taken by viscous " + Figures.significant(
                e.viscous()) + " J, Coulomb " + Figures.significant(e.coulomb()) + " J, drag " + Figures.significant(e.drag())
                + " J; " + Figures.significant(e.remaining()) + " J left after " + Figures.significant(n.simulatedTime()) + " s"
                + (r.trial().note().isEmpty() ? "" : " (" + r.trial().note() + ")"));
    }

    private void relayout() {
        Composite left = title.getParent();
        left.layout(true, true);
        scroll.setMinSize(left.computeSize(SWT.DEFAULT, SWT.DEFAULT));
    }

    private void set(String key, String text) {
        figures.get(key).setText(text);
    }

    private void draw(Result r) {
        double[] t = r.run().times();
        double[] a = degrees(r.run().angles());
        double[] w = degrees(r.run().velocities());
        clear(swing);
        if (r.trial().record() != null) {
            PlotThinning.Points rec = PlotThinning.keepExtremes(r.trial().record()[0], r.trial().record()[1], DRAWN);
            line(swing, "record", "recorded angle", SWT.COLOR_GRAY, rec.x(), rec.y());
        }
        PlotThinning.Points sim = PlotThinning.keepExtremes(t, a, DRAWN);
        line(swing, "trial", "trial swing", SWT.COLOR_DARK_BLUE, sim.x(), sim.y());
        finish(swing);
        clear(phase);
        int step = Math.max(1, t.length / DRAWN);
        line(phase, "phase", "trial swing", SWT.COLOR_DARK_BLUE, every(a, step), every(w, step));
        finish(phase);
        clear(energy);
        EnergyLedger l = r.ledger();
        line(energy, "kinetic", "kinetic", SWT.COLOR_DARK_BLUE, every(t, step), every(l.kinetic(), step));
        line(energy, "potential", "potential", SWT.COLOR_DARK_GREEN, every(t, step), every(l.potential(), step));
        line(energy, "viscous", "dissipated: viscous", SWT.COLOR_RED, every(t, step), every(l.viscous(), step));
        line(energy, "coulomb", "dissipated: Coulomb", SWT.COLOR_DARK_MAGENTA, every(t, step), every(l.coulomb(), step));
        line(energy, "drag", "dissipated: drag", SWT.COLOR_DARK_YELLOW, every(t, step), every(l.drag(), step));
        finish(energy);
    }

    private static double[] degrees(double[] radians) {
        double[] d = new double[radians.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = Unit.DEGREE.fromSi(radians[i]);
        }
        return d;
    }

    private static double[] every(double[] v, int step) {
        double[] out = new double[(v.length + step - 1) / step];
        for (int i = 0; i < out.length; i++) {
            out[i] = v[i * step];
        }
        return out;
    }

    private static void clear(Chart c) {
        ISeriesSet set = c.getSeriesSet();
        for (ISeries<?> s : set.getSeries()) {
            set.deleteSeries(s.getId());
        }
    }

    private static void line(Chart c, String id, String description, int color, double[] x, double[] y) {
        ILineSeries<?> s = (ILineSeries<?>) c.getSeriesSet().createSeries(SeriesType.LINE, id);
        s.setDescription(description);
        Color rgb = c.getDisplay().getSystemColor(color);
        s.setLineColor(rgb);
        s.setSymbolType(PlotSymbolType.NONE);
        s.setAntialias(SWT.ON);
        s.setXSeries(x);
        s.setYSeries(y);
    }

    private static void finish(Chart c) {
        c.getAxisSet().adjustRange();
        c.redraw();
    }

    private void enable(boolean on) {
        for (TrialSlider s : new TrialSlider[] {angle, speed, atAngle, viscous, coulomb, stiction, drag}) {
            s.setEnabled(on);
        }
        store.setEnabled(on);
        sessions.setEnabled(on);
    }

    /**
     * Adds the chosen friction to the mechanism's hypotheses as one command: on the editor's
     * document when the file is open, else on the file read, then saved.
     */
    private void storeHypothesis() {
        if (shownFile() == null || model == null) {
            return;
        }
        FrictionTorques f = friction();
        Map<FrictionKind, Double> values = new LinkedHashMap<>();
        values.put(FrictionKind.VISCOUS, f.viscous());
        values.put(FrictionKind.COULOMB, f.coulomb());
        values.put(FrictionKind.STICTION, f.stiction());
        values.put(FrictionKind.DRAG, f.drag());
        String from = fit == null ? "no stored fit" : "stored fit " + fit.id();
        try {
            Optional<MechanismDocument> open = MechanismDocuments.of(shownFile());
            MechanismDocument document = open.isPresent() ? open.get() : MechanismDocument.read(shownFile());
            Mechanism m = document.mechanism();
            String name = StableIds.unique("swing trial", m.getFrictionHypotheses().stream().map(FrictionHypothesis::getName)
                    .collect(Collectors.toSet()));
            String description = String.format(Locale.ROOT, "Chosen in the Swing Trial view, starting from %s: %s.", from,
                    values.entrySet().stream().filter(e -> e.getValue() > 0).map(e -> e.getKey().getLiteral() + " "
                            + Figures.significant(e.getValue())).collect(Collectors.joining(", ")));
            boolean done = MechanismEdits.run(document, "Store hypothesis " + name, () -> {
                FrictionHypothesis h = NamedElements.addHypothesis(m, name);
                h.setDescription(description);
                for (Map.Entry<FrictionKind, Double> e : values.entrySet()) {
                    if (e.getValue() > 0) {
                        FrictionTerm term = NamedElements.addTerm(h, e.getKey());
                        term.setValue(e.getValue());
                    }
                }
            });
            if (!done) {
                status.setText("The hypothesis could not be added.");
                return;
            }
            if (open.isEmpty()) {
                List<String> notes = new ArrayList<>();
                document.save(false, notes::add);
            }
            status.setText("Stored hypothesis '" + name + "'" + (open.isPresent() ? " in the open editor (unsaved; Edit › "
                    + "Undo takes it back)" : " in " + shownFile().getName()) + ".");
        } catch (InputException e) {
            status.setText("Not stored: " + e.getMessage());
        }
        relayout();
        scroll.showControl(status);
    }

    /**
     * A prediction figure as shown, for tests.
     *
     * @param key one of the figure names ({@link #SETTLE}, {@link #PERIOD}, ...)
     * @return its text
     */
    public String figure(String key) {
        return figures.get(key).getText();
    }

    /**
     * Whether the figures shown are those of the latest change, for tests.
     *
     * @return true once the newest trial is shown
     */
    public boolean upToDate() {
        return generation > 0 && shownGeneration == generation;
    }

    /**
     * The slider and spinner of a value, for tests: "angle", "speed", "at", "b", "Tc", "Ts", "c".
     *
     * @param name which value
     * @return its slider's spinner and scale holder
     */
    public Object[] control(String name) {
        TrialSlider s = switch (name) {
            case "angle" -> angle;
            case "speed" -> speed;
            case "at" -> atAngle;
            case "b" -> viscous;
            case "Tc" -> coulomb;
            case "Ts" -> stiction;
            case "c" -> drag;
            default -> throw new IllegalArgumentException("no control " + name);
        };
        return new Object[] {s.scale(), s.spinner(), s.bandText()};
    }

    /**
     * The mechanism and stored fit the view forecasts with, for tests.
     *
     * @return the mechanism (null before one is shown)
     */
    public MechanismSource mechanism() {
        return mechanism;
    }

    /** @return the stored fit the sliders started from, or null */
    public StoredFit fit() {
        return fit;
    }

    /** @return the status line (what Store as Hypothesis did) */
    public String status() {
        return status.getText();
    }

    /** @return the store button */
    public Button storeButton() {
        return store;
    }

    /** @return the three charts: swing, phase portrait, energy ledger */
    public Chart[] charts() {
        return new Chart[] {swing, phase, energy};
    }
}
