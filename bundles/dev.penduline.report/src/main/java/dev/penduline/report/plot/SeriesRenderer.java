package dev.penduline.report.plot;

import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRendererState;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYDataset;

/**
 * Lines and markers in black and greys, each series' drawing of a pass wrapped in its own
 * {@code <g class='series' data-series='NAME'>} group (the series' key). Lines are drawn as one
 * path a series.
 */
final class SeriesRenderer extends XYLineAndShapeRenderer {

    private static final long serialVersionUID = 1L;

    SeriesRenderer() {
        super(true, false);
        setDrawSeriesLineAsPath(true);
        setUseFillPaint(true);
        setUseOutlinePaint(true);
        setDrawOutlines(true);
        setDefaultFillPaint(PlotStyle.WHITE);
        setDefaultOutlinePaint(PlotStyle.BLACK);
        setDefaultPaint(PlotStyle.BLACK);
        setAutoPopulateSeriesPaint(false);
        setAutoPopulateSeriesStroke(false);
        setAutoPopulateSeriesShape(false);
        setAutoPopulateSeriesFillPaint(false);
        setAutoPopulateSeriesOutlinePaint(false);
        setLegendLine(new Line2D.Double(-16, 0, 16, 0));
    }

    /**
     * Makes series {@code s} a line.
     *
     * @param s     the series
     * @param k     its place among the picture's line series (chooses the dash pattern)
     * @param paint black or a grey
     */
    void line(int s, int k, Paint paint) {
        setSeriesLinesVisible(s, true);
        setSeriesShapesVisible(s, false);
        setSeriesPaint(s, paint);
        setSeriesStroke(s, PlotStyle.line(k));
    }

    /**
     * Makes series {@code s} open markers without a line.
     *
     * @param s the series
     * @param k its place among the picture's marker series (chooses the shape)
     */
    void markers(int s, int k) {
        setSeriesLinesVisible(s, false);
        setSeriesShapesVisible(s, true);
        setSeriesShape(s, PlotStyle.marker(k));
        setSeriesPaint(s, PlotStyle.BLACK);
        setSeriesOutlinePaint(s, PlotStyle.BLACK);
        setSeriesFillPaint(s, PlotStyle.WHITE);
        setSeriesOutlineStroke(s, PlotStyle.stroke(1f));
    }

    @Override
    public void drawItem(Graphics2D g2, XYItemRendererState state, Rectangle2D dataArea, PlotRenderingInfo info,
            XYPlot plot, ValueAxis domainAxis, ValueAxis rangeAxis, XYDataset dataset, int series, int item,
            CrosshairState crosshairState, int pass) {
        SvgCanvas.inSeries(g2, state, dataset, series, item, () -> super.drawItem(g2, state, dataArea, info, plot,
                domainAxis, rangeAxis, dataset, series, item, crosshairState, pass));
    }
}
