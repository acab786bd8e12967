package dev.penduline.report.plot;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.renderer.xy.XYItemRendererState;
import org.jfree.data.xy.XYDataset;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGHints;
import org.jfree.svg.ViewBox;

/**
 * Draws a chart onto a JFreeSVG canvas and returns a standalone {@code <svg>} element: ids
 * prefixed with the picture's id, coordinates to two decimal places, no namespace but SVG's, and
 * one {@code <g class='series' data-series='NAME'>} group around what each data series draws
 * (JFreeChart 1.5.6's element hinting marks only the chart as a whole, not its series, so the
 * renderers of this package open and close the groups through {@link #beginSeries} and
 * {@link #endSeries}).
 */
final class SvgCanvas {

    /** JFreeSVG declares these on every {@code <svg>}; nothing here uses them. */
    private static final String[] UNUSED_NAMESPACES = {
        " xmlns:xlink='http://www.w3.org/1999/xlink'",
        " xmlns:jfreesvg='http://www.jfree.org/jfreesvg/svg'",
    };
    private static final Pattern EMPTY_GROUP = Pattern.compile("<g class='series' data-series='[^']*'></g>");
    private static final Pattern SERIES = Pattern.compile("<g class='series' data-series='([^']*)'>");
    private static final Pattern ID = Pattern.compile("[A-Za-z][A-Za-z0-9_-]*");

    private SvgCanvas() {
    }

    /**
     * Checks a picture id: it is an XML id and the prefix of the ids inside the picture.
     *
     * @param id the id
     * @return the id
     * @throws IllegalArgumentException when it is not a letter followed by letters, digits, '-' or '_'
     */
    static String checkId(String id) {
        if (id == null || !ID.matcher(id).matches()) {
            throw new IllegalArgumentException("a picture id is a letter followed by letters, digits, '-' or '_': " + id);
        }
        return id;
    }

    /**
     * Draws the chart.
     *
     * @param chart  the chart
     * @param id     the picture's id
     * @param title  the picture's title, for its {@code <title>}
     * @param width  the width in pixels
     * @param height the height in pixels
     * @return the {@code <svg>} element
     */
    static String draw(JFreeChart chart, String id, String title, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(id + "-");
        g.setGeomDoubleConverter(SvgCanvas::shortNumber);
        g.setTransformDoubleConverter(SvgCanvas::shortNumber);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        String svg = g.getSVGElement(id, true, new ViewBox(0, 0, width, height), null, null);
        for (String unused : UNUSED_NAMESPACES) {
            svg = svg.replace(unused, "");
        }
        if (svg.contains("xlink:") || svg.contains("jfreesvg:")) {
            throw new IllegalStateException("the picture " + id + " uses a namespace that was taken out");
        }
        svg = EMPTY_GROUP.matcher(svg).replaceAll("");
        int open = svg.indexOf('>');
        return svg.substring(0, open + 1) + "<title id='" + id + "-title'>" + escape(title) + "</title>"
                + svg.substring(open + 1);
    }

    /**
     * The width of a chart's data area when drawn at this size (measured on a scratch canvas).
     *
     * @param chart  the chart
     * @param width  the picture's width
     * @param height the picture's height
     * @return the data area's width in whole pixels, at least 1
     */
    static int dataWidth(JFreeChart chart, int width, int height) {
        ChartRenderingInfo info = new ChartRenderingInfo(null);
        chart.draw(new SVGGraphics2D(width, height), new Rectangle2D.Double(0, 0, width, height), info);
        PlotRenderingInfo plot = info.getPlotInfo();
        double widest = plot.getDataArea().getWidth();
        for (int i = 0; i < plot.getSubplotCount(); i++) {
            widest = Math.max(widest, plot.getSubplotInfo(i).getDataArea().getWidth());
        }
        return Math.max(1, (int) Math.ceil(widest));
    }

    /**
     * The distinct series groups of a picture.
     *
     * @param svg the picture
     * @return how many distinct {@code data-series} names it holds
     */
    static int seriesIn(String svg) {
        TreeSet<String> names = new TreeSet<>();
        Matcher m = SERIES.matcher(svg);
        while (m.find()) {
            names.add(m.group(1));
        }
        return names.size();
    }

    /**
     * Opens the group of one data series (only on an SVG canvas).
     *
     * @param g2   the canvas
     * @param name the series' name
     */
    static void beginSeries(Graphics2D g2, String name) {
        if (g2 instanceof SVGGraphics2D) {
            Map<String, String> attributes = new LinkedHashMap<>();
            attributes.put("class", "series");
            attributes.put("data-series", name);
            g2.setRenderingHint(SVGHints.KEY_BEGIN_GROUP, attributes);
        }
    }

    /**
     * Draws one item of an XY series inside the series' group: the group opens before the pass's
     * first item and closes after its last (the XY renderers' shared wrapping).
     *
     * @param g2      the canvas
     * @param state   the renderer's state (first and last item of the pass)
     * @param dataset the data
     * @param series  the series
     * @param item    the item
     * @param draw    draws the item
     */
    static void inSeries(Graphics2D g2, XYItemRendererState state, XYDataset dataset, int series, int item, Runnable draw) {
        if (item == state.getFirstItemIndex()) {
            beginSeries(g2, String.valueOf(dataset.getSeriesKey(series)));
        }
        draw.run();
        if (item == state.getLastItemIndex()) {
            endSeries(g2);
        }
    }

    /**
     * Closes the group opened by {@link #beginSeries}.
     *
     * @param g2 the canvas
     */
    static void endSeries(Graphics2D g2) {
        if (g2 instanceof SVGGraphics2D) {
            g2.setRenderingHint(SVGHints.KEY_END_GROUP, "series");
        }
    }

    /**
     * A coordinate to at most two decimal places, without trailing zeros: {@code 12}, {@code 12.5},
     * {@code -0.25}.
     *
     * @param v the value
     * @return the text
     */
    static String shortNumber(double v) {
        if (!Double.isFinite(v)) {
            return "0";
        }
        long hundredths = Math.round(v * 100);
        long magnitude = Math.abs(hundredths);
        StringBuilder s = new StringBuilder(12);
        if (hundredths < 0) {
            s.append('-');
        }
        s.append(magnitude / 100);
        long fraction = magnitude % 100;
        if (fraction != 0) {
            s.append('.');
            if (fraction < 10) {
                s.append('0').append(fraction);
            } else if (fraction % 10 == 0) {
                s.append(fraction / 10);
            } else {
                s.append(fraction);
            }
        }
        return s.toString();
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("'", "&apos;")
                .replace("\"", "&quot;");
    }
}
