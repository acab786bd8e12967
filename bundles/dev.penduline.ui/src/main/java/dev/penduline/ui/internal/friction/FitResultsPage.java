package dev.penduline.ui.internal.friction;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.ISeries;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.eclipse.swtchart.ISeriesSet;
import org.eclipse.swtchart.Range;

import dev.penduline.physics.identify.FitWarning;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.FitCurves;
import dev.penduline.services.FitWording;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.present.Figures;
import dev.penduline.services.present.PlotThinning;
import dev.penduline.ui.internal.chart.ChartTools;

/**
 * The last page of the Friction Fit wizard: the verdict (dominant, mixed, or withheld for a
 * misfit), the estimates with their ± and the comparison of term sets as {@code penduline fit}
 * words them ({@link FitWording}), the warnings, and per session the record with the fitted
 * model overlaid and the residuals below on the same time axis.
 */
public final class FitResultsPage extends WizardPage {

    /** Points per plotted series (the extremes of each bucket are kept). */
    private static final int PLOT_POINTS = 4_000;

    private Label verdict;
    private Label model;
    private Combo session;
    private Chart record;
    private Chart residuals;
    private Table estimates;
    private Table comparison;
    private Label warnings;
    private List<FitCurves.Curve> curves = List.of();

    FitResultsPage() {
        super("fitResults");
        setTitle("Friction Fit: results");
        setDescription("Finish stores this fit in the mechanism file (one undoable command when the editor has it open).");
    }

    @Override
    public void createControl(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        GridLayoutFactory.swtDefaults().spacing(6, 6).applyTo(c);
        verdict = new Label(c, SWT.WRAP);
        verdict.setFont(JFaceResources.getBannerFont());
        GridDataFactory.fillDefaults().grab(true, false).hint(700, SWT.DEFAULT).applyTo(verdict);
        model = new Label(c, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(700, SWT.DEFAULT).applyTo(model);
        SashForm sash = new SashForm(c, SWT.HORIZONTAL);
        GridDataFactory.fillDefaults().grab(true, true).hint(900, 430).applyTo(sash);

        Composite left = new Composite(sash, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(6, 2).applyTo(left);
        new Label(left, SWT.NONE).setText("Session:");
        session = new Combo(left, SWT.READ_ONLY | SWT.DROP_DOWN);
        session.addListener(SWT.Selection, e -> plot(session.getSelectionIndex()));
        GridDataFactory.fillDefaults().grab(true, false).applyTo(session);
        record = chart(left, "angle (°)");
        record.getTitle().setText("Record and fitted model");
        residuals = chart(left, "residual (°)");
        residuals.getTitle().setText("Residuals (measured − model)");
        GridDataFactory.fillDefaults().span(2, 1).grab(true, true).applyTo(record);
        GridDataFactory.fillDefaults().span(2, 1).grab(true, false).hint(SWT.DEFAULT, 170).applyTo(residuals);
        // one time axis: the residuals follow the record's zoom and pan
        record.getPlotArea().getControl().addListener(SWT.Paint, e -> followTime());

        Composite right = new Composite(sash, SWT.NONE);
        GridLayoutFactory.fillDefaults().spacing(4, 4).applyTo(right);
        new Label(right, SWT.NONE).setText("Estimates (± one standard error):");
        estimates = table(right, "Term", "Symbol", "Estimate");
        new Label(right, SWT.NONE).setText("Term sets compared:");
        comparison = table(right, "Kept", "Terms", "AIC", "BIC", "rms (°)", "Supported");
        warnings = new Label(right, SWT.WRAP);
        warnings.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridDataFactory.fillDefaults().grab(true, false).hint(320, SWT.DEFAULT).applyTo(warnings);
        sash.setWeights(50, 50);
        setControl(c);
    }

    private static Chart chart(Composite parent, String yTitle) {
        Chart chart = new Chart(parent, SWT.NONE);
        chart.getTitle().setFont(JFaceResources.getDefaultFont());
        chart.getAxisSet().getXAxis(0).getTitle().setText("time (s)");
        chart.getAxisSet().getYAxis(0).getTitle().setText(yTitle);
        chart.getLegend().setPosition(SWT.BOTTOM);
        ChartTools.install(chart);
        return chart;
    }

    private static Table table(Composite parent, String... titles) {
        Table t = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION);
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        for (String title : titles) {
            new TableColumn(t, SWT.LEFT).setText(title);
        }
        GridDataFactory.fillDefaults().grab(true, false).applyTo(t);
        return t;
    }

    /**
     * Shows a fit.
     *
     * @param outcome the fit
     * @param fitted  its curves, one per session
     */
    void show(Outcome outcome, List<FitCurves.Curve> fitted) {
        FrictionFit fit = outcome.fit();
        verdict.setText("Verdict: " + FitWording.verdict(fit));
        model.setText("model: " + FitWording.termList(fit.terms()) + (outcome.automatic()
                ? " (chosen by BIC among the candidates)" : " (as asked)") + "; residual rms "
                + Figures.significant(Unit.DEGREE.fromSi(fit.rms())) + "° over "
                + fit.samples() + " samples, " + fit.resamplesUsed() + " bootstrap refits");
        estimates.removeAll();
        for (FitWording.EstimateLine line : FitWording.estimates(fit)) {
            new TableItem(estimates, SWT.NONE).setText(new String[] {line.word(), line.symbol(), line.text()});
        }
        comparison.removeAll();
        outcome.comparison().ifPresent(cmp -> {
            for (FitWording.CandidateLine row : FitWording.candidates(cmp)) {
                new TableItem(comparison, SWT.NONE).setText(new String[] {row.selected() ? "=>" : "", row.terms(),
                        row.aic(), row.bic(), row.rms(), row.supported() ? "yes" : "no"});
            }
        });
        if (outcome.comparison().isEmpty()) {
            new TableItem(comparison, SWT.NONE).setText(new String[] {"=>", FitWording.termList(fit.terms()),
                "", "", "", "as asked"});
        }
        for (Table t : List.of(estimates, comparison)) {
            for (TableColumn col : t.getColumns()) {
                col.pack();
            }
        }
        List<String> lines = new ArrayList<>();
        outcome.thinned().forEach(d -> lines.add("note: " + d.note()));
        for (FitWarning w : fit.warnings()) {
            lines.add(w.message());
        }
        lines.addAll(outcome.warnings());
        warnings.setText(lines.isEmpty() ? "No warnings." : "Warnings:\n- " + String.join("\n- ", lines));
        curves = List.copyOf(fitted);
        session.removeAll();
        for (FitCurves.Curve cv : curves) {
            session.add(cv.session());
        }
        if (!curves.isEmpty()) {
            session.select(0);
            plot(0);
        }
        ((Composite) getControl()).layout(true, true);
    }

    private void plot(int index) {
        if (index < 0 || index >= curves.size()) {
            return;
        }
        FitCurves.Curve cv = curves.get(index);
        double[] t = cv.times();
        clear(record.getSeriesSet());
        clear(residuals.getSeriesSet());
        line(record, "measured", "recorded angle", SWT.COLOR_DARK_BLUE, t, degrees(cv.measured()));
        line(record, "model", "fitted model", SWT.COLOR_RED, t, degrees(cv.modelled()));
        line(residuals, "residual", "residual", SWT.COLOR_DARK_GRAY, t, degrees(cv.residuals()));
        record.getAxisSet().adjustRange();
        residuals.getAxisSet().adjustRange();
        followTime();
        record.redraw();
        residuals.redraw();
    }

    private void followTime() {
        Range r = record.getAxisSet().getXAxis(0).getRange();
        Range mine = residuals.getAxisSet().getXAxis(0).getRange();
        if (r.lower != mine.lower || r.upper != mine.upper) {
            residuals.getAxisSet().getXAxis(0).setRange(new Range(r.lower, r.upper));
            residuals.redraw();
        }
    }

    private static void clear(ISeriesSet set) {
        for (ISeries<?> s : set.getSeries()) {
            set.deleteSeries(s.getId());
        }
    }

    private static void line(Chart chart, String id, String description, int color, double[] x, double[] y) {
        PlotThinning.Points p = PlotThinning.keepExtremes(x, y, PLOT_POINTS);
        ILineSeries<?> s = (ILineSeries<?>) chart.getSeriesSet().createSeries(SeriesType.LINE, id);
        s.setDescription(description);
        Color c = chart.getDisplay().getSystemColor(color);
        s.setLineColor(c);
        s.setSymbolType(PlotSymbolType.NONE);
        s.setAntialias(SWT.ON);
        s.setXSeries(p.x());
        s.setYSeries(p.y());
    }

    private static double[] degrees(double[] radians) {
        double[] d = new double[radians.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = Unit.DEGREE.fromSi(radians[i]);
        }
        return d;
    }

    /** @return the verdict line as shown */
    public String verdictText() {
        return verdict.getText();
    }

    /** @return the estimates table */
    public Table estimatesTable() {
        return estimates;
    }

    /** @return the comparison table */
    public Table comparisonTable() {
        return comparison;
    }

    /** @return the warnings as shown */
    public String warningsText() {
        return warnings.getText();
    }

    /** @return the session chooser of the charts */
    public Combo sessionCombo() {
        return session;
    }

    /** @return the chart of the record and the model */
    public Chart recordChart() {
        return record;
    }

    /** @return the chart of the residuals */
    public Chart residualsChart() {
        return residuals;
    }
}
