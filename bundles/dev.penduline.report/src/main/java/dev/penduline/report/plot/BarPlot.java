package dev.penduline.report.plot;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CategoryCrosshairState;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.renderer.category.CategoryItemRenderer;
import org.jfree.data.category.CategoryDataset;

/**
 * A bar chart of one series whose bars (and their labels and error bars) are drawn inside one
 * {@code <g class='series' data-series='NAME'>} group, the series' row key.
 */
final class BarPlot extends CategoryPlot {

    private static final long serialVersionUID = 1L;

    BarPlot(CategoryDataset data, CategoryAxis categories, ValueAxis values, CategoryItemRenderer renderer) {
        super(data, categories, values, renderer);
        if (data.getRowCount() != 1) {
            throw new IllegalArgumentException("a bar plot here draws one series, not " + data.getRowCount());
        }
        PlotStyle.categoryPlot(this);
    }

    @Override
    public boolean render(Graphics2D g2, Rectangle2D dataArea, int index, PlotRenderingInfo info,
            CategoryCrosshairState crosshairState) {
        CategoryDataset data = getDataset(index);
        if (data == null || data.getRowCount() == 0) {
            return super.render(g2, dataArea, index, info, crosshairState);
        }
        SvgCanvas.beginSeries(g2, String.valueOf(data.getRowKey(0)));
        boolean drawn = super.render(g2, dataArea, index, info, crosshairState);
        SvgCanvas.endSeries(g2);
        return drawn;
    }
}
