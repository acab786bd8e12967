package dev.penduline.ui.internal.chart;

import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxisSet;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.ISeries;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.eclipse.swtchart.ISeriesSet;
import org.eclipse.swtchart.LineStyle;

/**
 * The SWTChart chart of the Swing Chart view: the angle curve, the turning points as markers and
 * the release as a dashed vertical line, with axis titles in the units plotted; zoom, pan, the
 * hover readout and the exports come from {@link ChartTools}.
 */
public final class SwingChart {

    /** Series id of the recorded (or predicted) angle. */
    static final String CURVE = "angle";
    /** Series id of the turning points. */
    static final String TURNING_POINTS = "turning points";
    /** Series id of the release marker. */
    static final String RELEASE = "release";
    /** Series id of the stop marker. */
    static final String STOP = "stop";

    private final Chart chart;

    /**
     * A chart of swings, with the chart tools (zoom, pan, values on hover, export).
     *
     * @param parent the parent
     */
    public SwingChart(Composite parent) {
        chart = new Chart(parent, SWT.NONE);
        chart.getTitle().setText("No mechanism selected");
        chart.getTitle().setFont(JFaceResources.getBannerFont());
        IAxisSet axes = chart.getAxisSet();
        axes.getXAxis(0).getTitle().setText("time (s)");
        axes.getYAxis(0).getTitle().setText("angle (°)");
        chart.getLegend().setPosition(SWT.BOTTOM);
        ChartTools.install(chart);
    }

    /** @return the SWTChart widget */
    public Chart control() {
        return chart;
    }

    /**
     * Draws a content, replacing what was drawn.
     *
     * @param c the content
     */
    public void draw(SwingChartContent c) {
        ISeriesSet set = chart.getSeriesSet();
        for (ISeries<?> s : set.getSeries()) {
            set.deleteSeries(s.getId());
        }
        chart.getTitle().setText(c.error().isPresent() ? c.title() + ": nothing to plot" : c.title());
        Color blue = color(SWT.COLOR_DARK_BLUE);
        if (c.curve().size() > 0) {
            ILineSeries<?> curve = line(set, CURVE, c.predicted() ? "predicted angle" : "recorded angle", blue);
            curve.setXSeries(c.curve().x());
            curve.setYSeries(c.curve().y());
            if (c.turningPoints().size() > 0) {
                ILineSeries<?> turns = line(set, TURNING_POINTS, "turning points", color(SWT.COLOR_RED));
                turns.setLineStyle(LineStyle.NONE);
                turns.setSymbolType(PlotSymbolType.CIRCLE);
                turns.setSymbolSize(3);
                turns.setSymbolColor(color(SWT.COLOR_RED));
                turns.setXSeries(c.turningPoints().x());
                turns.setYSeries(c.turningPoints().y());
            }
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double y : c.curve().y()) {
                lo = Math.min(lo, y);
                hi = Math.max(hi, y);
            }
            if (Double.isFinite(c.releaseTime())) {
                marker(set, RELEASE, "release", c.releaseTime(), lo, hi, color(SWT.COLOR_DARK_GREEN));
            }
            if (Double.isFinite(c.stopTime())) {
                marker(set, STOP, "stop (at rest)", c.stopTime(), lo, hi, color(SWT.COLOR_DARK_MAGENTA));
            }
        }
        chart.getAxisSet().adjustRange();
        chart.redraw();
    }

    /** A dashed vertical line across the curve's range at an instant. */
    private static void marker(ISeriesSet set, String id, String description, double time, double lo, double hi, Color color) {
        ILineSeries<?> m = line(set, id, description, color);
        m.setLineStyle(LineStyle.DASH);
        m.setXSeries(new double[] {time, time});
        m.setYSeries(new double[] {lo, hi});
    }

    private static ILineSeries<?> line(ISeriesSet set, String id, String description, Color color) {
        ILineSeries<?> s = (ILineSeries<?>) set.createSeries(SeriesType.LINE, id);
        s.setDescription(description);
        s.setLineColor(color);
        s.setSymbolType(PlotSymbolType.NONE);
        s.setAntialias(SWT.ON);
        return s;
    }

    private Color color(int id) {
        return chart.getDisplay().getSystemColor(id);
    }
}
