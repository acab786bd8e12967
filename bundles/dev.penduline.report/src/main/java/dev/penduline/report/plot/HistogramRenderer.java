package dev.penduline.report.plot;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYItemRendererState;
import org.jfree.data.xy.XYDataset;

/**
 * A histogram's bars: flat light grey with a black outline, no shadow, every bar of the series
 * inside one {@code <g class='series' data-series='NAME'>} group.
 */
final class HistogramRenderer extends XYBarRenderer {

    private static final long serialVersionUID = 1L;

    HistogramRenderer() {
        setBarPainter(new StandardXYBarPainter());
        setShadowVisible(false);
        setDrawBarOutline(true);
        setDefaultOutlinePaint(PlotStyle.BLACK);
        setDefaultOutlineStroke(PlotStyle.stroke(0.75f));
        setAutoPopulateSeriesPaint(false);
        setAutoPopulateSeriesOutlinePaint(false);
        setAutoPopulateSeriesOutlineStroke(false);
        setDefaultPaint(PlotStyle.LIGHT_GREY);
        setMargin(0);
    }

    @Override
    public void drawItem(Graphics2D g2, XYItemRendererState state, Rectangle2D dataArea, PlotRenderingInfo info,
            XYPlot plot, ValueAxis domainAxis, ValueAxis rangeAxis, XYDataset dataset, int series, int item,
            CrosshairState crosshairState, int pass) {
        SvgCanvas.inSeries(g2, state, dataset, series, item, () -> super.drawItem(g2, state, dataArea, info, plot,
                domainAxis, rangeAxis, dataset, series, item, crosshairState, pass));
    }
}
