package dev.penduline.report.plot;

import java.awt.Paint;

import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.data.category.CategoryDataset;

/**
 * Bars of shares: grey for what adds, white (outlined) for what takes away (a cut-out).
 */
final class ShareBarRenderer extends BarRenderer {

    private static final long serialVersionUID = 1L;

    ShareBarRenderer(boolean horizontal) {
        BarRenderers.flat(this);
        BarRenderers.valueLabels(this, horizontal);
    }

    @Override
    public Paint getItemPaint(int row, int column) {
        CategoryDataset data = getPlot() == null ? null : getPlot().getDataset();
        Number v = data == null ? null : data.getValue(row, column);
        return v != null && v.doubleValue() < 0 ? PlotStyle.WHITE : PlotStyle.LIGHT_GREY;
    }
}
