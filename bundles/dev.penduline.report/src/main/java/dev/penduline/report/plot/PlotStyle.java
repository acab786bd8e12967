package dev.penduline.report.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.AxisSpace;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.SeriesRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * The look of every picture: black, greys and white only, series told apart by dash pattern and
 * marker shape (readable in black-and-white print), plain SansSerif fonts, a white background,
 * a light dashed grid, tick labels independent of the default locale.
 */
final class PlotStyle {

    /** The width of every picture, pixels. */
    static final int WIDTH = 720;
    /** The height of a single plot, pixels. */
    static final int HEIGHT = 300;
    /** The height of the stacked record and residual plots, pixels. */
    static final int STACKED_HEIGHT = 420;

    static final Color BLACK = Color.BLACK;
    static final Color DARK_GREY = new Color(0x40, 0x40, 0x40);
    static final Color GREY = new Color(0x80, 0x80, 0x80);
    static final Color LIGHT_GREY = new Color(0xA8, 0xA8, 0xA8);
    static final Color GRID = new Color(0xD0, 0xD0, 0xD0);
    static final Color WHITE = Color.WHITE;

    static final Font TITLE_FONT = new Font(Font.SANS_SERIF, Font.BOLD, 14);
    static final Font LABEL_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    static final Font TICK_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    /** The chart's padding, pixels on each side. */
    static final int PADDING = 6;
    /** Room for the left axis (tick labels and label), pixels: fixed so the data area's width is known. */
    static final int AXIS_SPACE = 72;
    /** Room right of the data area, pixels. */
    static final int RIGHT_SPACE = 12;

    /** Dash patterns (pixels on, off, ...) of the line series in turn; null is solid. */
    private static final float[][] DASHES = {
        null,
        {7f, 4f},
        {2f, 3f},
        {10f, 3f, 2f, 3f},
        {16f, 5f},
        {6f, 2f, 2f, 2f, 2f, 2f},
    };

    private PlotStyle() {
    }

    /**
     * How many pixel columns the data area of a plot {@code width} wide has with the fixed axis
     * space of {@link #xyPlot}: the first guess of the thinning, which keeps at most four points a
     * column; the pictures then measure the width they really have.
     *
     * @param width the picture's width
     * @return the data area's width in pixels
     */
    static int dataColumns(int width) {
        return Math.max(1, width - 2 * PADDING - AXIS_SPACE - RIGHT_SPACE);
    }

    /**
     * The stroke of the {@code k}-th line series: solid, dashed, dotted, dash-dot, long dash,
     * dash-dot-dot, then the same again a little thicker.
     *
     * @param k the line series' place among the lines of its picture, from 0
     * @return the stroke
     */
    static Stroke line(int k) {
        float width = 1.25f + 0.75f * (k / DASHES.length);
        float[] dash = DASHES[k % DASHES.length];
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /**
     * A solid or dashed stroke.
     *
     * @param width the width, pixels
     * @param dash  the dash pattern, null for solid
     * @return the stroke
     */
    static Stroke stroke(float width, float... dash) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                dash == null || dash.length == 0 ? null : dash, 0f);
    }

    /**
     * The marker of the {@code k}-th marker series: circle, square, triangle, diamond, downward
     * triangle, cross (drawn open: white inside, black outline).
     *
     * @param k the marker series' place among the markers of its picture, from 0
     * @return the shape, centred on the origin
     */
    static Shape marker(int k) {
        double r = 3.5;
        switch (k % 6) {
            case 0:
                return new Ellipse2D.Double(-r, -r, 2 * r, 2 * r);
            case 1:
                return new Rectangle2D.Double(-r + 0.5, -r + 0.5, 2 * r - 1, 2 * r - 1);
            case 2:
                return polygon(0, -r - 0.5, r, r - 0.5, -r, r - 0.5);
            case 3:
                return polygon(0, -r - 0.5, r + 0.5, 0, 0, r + 0.5, -r - 0.5, 0);
            case 4:
                return polygon(0, r + 0.5, r, -r + 0.5, -r, -r + 0.5);
            default:
                return polygon(-r, -1, -1, -1, -1, -r, 1, -r, 1, -1, r, -1, r, 1, 1, 1, 1, r, -1, r, -1, 1, -r, 1);
        }
    }

    private static Shape polygon(double... xy) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(xy[0], xy[1]);
        for (int i = 2; i < xy.length; i += 2) {
            p.lineTo(xy[i], xy[i + 1]);
        }
        p.closePath();
        return p;
    }

    /**
     * A number axis in this style.
     *
     * @param label the label, with its unit
     * @return the axis
     */
    static NumberAxis numberAxis(String label) {
        NumberAxis axis = new NumberAxis(label);
        axis.setStandardTickUnits(NumberAxis.createStandardTickUnits(Locale.ROOT));
        axis.setAutoRangeIncludesZero(false);
        style(axis);
        return axis;
    }

    /**
     * Axis fonts and paints.
     *
     * @param axis the axis
     */
    static void style(ValueAxis axis) {
        axis.setLabelFont(LABEL_FONT);
        axis.setLabelPaint(BLACK);
        axis.setTickLabelFont(TICK_FONT);
        axis.setTickLabelPaint(BLACK);
        axis.setAxisLinePaint(BLACK);
        axis.setTickMarkPaint(BLACK);
    }

    /**
     * A category axis in this style (no label: the categories name themselves).
     *
     * @param horizontal whether the bars lie horizontally (the names then stand left of them)
     * @return the axis
     */
    static CategoryAxis categoryAxis(boolean horizontal) {
        CategoryAxis axis = new CategoryAxis(null);
        axis.setTickLabelFont(TICK_FONT);
        axis.setTickLabelPaint(BLACK);
        axis.setAxisLinePaint(BLACK);
        axis.setTickMarksVisible(false);
        axis.setMaximumCategoryLabelWidthRatio(horizontal ? 0.4f : 0.95f);
        axis.setMaximumCategoryLabelLines(2);
        return axis;
    }

    /**
     * Background, outline and grid of an XY plot; the left axis gets a fixed space so the data
     * area is {@link #dataColumns} wide.
     *
     * @param plot the plot
     */
    static void xyPlot(XYPlot plot) {
        background(plot);
        plot.setDomainGridlinePaint(GRID);
        plot.setRangeGridlinePaint(GRID);
        plot.setDomainGridlineStroke(stroke(0.5f, 2f, 2f));
        plot.setRangeGridlineStroke(stroke(0.5f, 2f, 2f));
        AxisSpace space = new AxisSpace();
        space.setLeft(AXIS_SPACE);
        plot.setFixedRangeAxisSpace(space);
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);
    }

    /**
     * Background, outline and grid of a bar chart.
     *
     * @param plot the plot
     */
    static void categoryPlot(CategoryPlot plot) {
        background(plot);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinePaint(GRID);
        plot.setRangeGridlineStroke(stroke(0.5f, 2f, 2f));
        plot.setRangeZeroBaselineVisible(true);
        plot.setRangeZeroBaselinePaint(BLACK);
        plot.setRangeZeroBaselineStroke(stroke(1f));
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        plot.setRangeAxisLocation(AxisLocation.BOTTOM_OR_LEFT);
    }

    private static void background(Plot plot) {
        plot.setBackgroundPaint(WHITE);
        plot.setOutlinePaint(BLACK);
        plot.setOutlineStroke(stroke(0.75f));
        plot.setInsets(new RectangleInsets(4, 0, 4, RIGHT_SPACE));
    }

    /**
     * The chart around a plot: white, the title on top (none when blank), a legend below when
     * the plot draws more than one series.
     *
     * @param title  the title
     * @param plot   the plot
     * @param legend whether to show the legend
     * @return the chart
     */
    static JFreeChart chart(String title, Plot plot, boolean legend) {
        JFreeChart chart = new JFreeChart(null, TITLE_FONT, plot, legend);
        chart.setBackgroundPaint(WHITE);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(PADDING, PADDING, PADDING, PADDING));
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        if (title != null && !title.isBlank()) {
            TextTitle t = new TextTitle(title, TITLE_FONT);
            t.setPaint(BLACK);
            chart.setTitle(t);
        }
        LegendTitle l = chart.getLegend();
        if (l != null) {
            l.setItemFont(LABEL_FONT);
            l.setItemPaint(BLACK);
            l.setBackgroundPaint(WHITE);
            l.setFrame(BlockBorder.NONE);
            l.setPosition(RectangleEdge.BOTTOM);
        }
        return chart;
    }
}
