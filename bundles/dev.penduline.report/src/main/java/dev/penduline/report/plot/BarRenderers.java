package dev.penduline.report.plot;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Locale;

import org.jfree.chart.labels.ItemLabelAnchor;
import org.jfree.chart.labels.ItemLabelPosition;
import org.jfree.chart.labels.StandardCategoryItemLabelGenerator;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.ui.TextAnchor;

/** The bars' common look: flat grey fill (no gradient, no shadow), black outline, value labels. */
final class BarRenderers {

    private BarRenderers() {
    }

    /**
     * Flat bars with a black outline.
     *
     * @param r the renderer
     */
    static void flat(BarRenderer r) {
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(true);
        r.setDefaultOutlinePaint(PlotStyle.BLACK);
        r.setDefaultOutlineStroke(PlotStyle.stroke(0.75f));
        r.setAutoPopulateSeriesPaint(false);
        r.setAutoPopulateSeriesOutlinePaint(false);
        r.setAutoPopulateSeriesOutlineStroke(false);
        r.setDefaultPaint(PlotStyle.LIGHT_GREY);
        r.setMaximumBarWidth(0.12);
        r.setItemMargin(0);
    }

    /**
     * Value labels (one decimal place, locale-independent) at the bars' ends, outside.
     *
     * @param r          the renderer
     * @param horizontal whether the bars lie horizontally
     */
    static void valueLabels(BarRenderer r, boolean horizontal) {
        DecimalFormat format = new DecimalFormat("0.0", DecimalFormatSymbols.getInstance(Locale.ROOT));
        r.setDefaultItemLabelGenerator(new StandardCategoryItemLabelGenerator("{2}", format));
        r.setDefaultItemLabelsVisible(true);
        r.setDefaultItemLabelFont(PlotStyle.TICK_FONT);
        r.setDefaultItemLabelPaint(PlotStyle.BLACK);
        if (horizontal) {
            r.setDefaultPositiveItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE3, TextAnchor.CENTER_LEFT));
            r.setDefaultNegativeItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE9, TextAnchor.CENTER_RIGHT));
        } else {
            r.setDefaultPositiveItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE12,
                    TextAnchor.BOTTOM_CENTER));
            r.setDefaultNegativeItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE6, TextAnchor.TOP_CENTER));
        }
    }
}
