package dev.penduline.ui.internal.chart;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;

import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ISeries;
import org.eclipse.swtchart.LineStyle;
import org.eclipse.swtchart.Range;

import dev.penduline.services.present.PlotThinning;

/**
 * A chart drawn as SVG from its own data, not from its pixels: the title, both axes with their
 * ticks, tick labels and titles (which carry the units), a grid, one {@code polyline} per series
 * (markers on its vertices when the series is drawn as symbols) and a legend. What is drawn is
 * what the chart shows now: its axes' current ranges; long series are cut to the visible span
 * and thinned to the first, lowest, highest and last sample of each pixel column
 * ({@link PlotThinning#perColumn}), so the file stays small and no peak is lost. Taken from the chart on the UI thread
 * ({@link #of(Chart)}), written anywhere ({@link #writeTo(OutputStream)}).
 */
public final class ChartSvg {

    private static final String SVG = "http://www.w3.org/2000/svg";
    private static final int LEFT = 72;
    private static final int RIGHT = 20;
    private static final int TOP = 36;
    private static final int BOTTOM = 70;
    private static final int TICK = 5;
    /** Roughly one tick label per this many pixels. */
    private static final int TICK_SPACING = 90;

    /** One series as drawn: its points (thinned), colour and style. */
    private record Line(String id, String name, double[] x, double[] y, String color, boolean dashed,
            boolean symbols, String symbolColor, int symbolSize, boolean inLegend) {
    }

    /** One axis as drawn. */
    private record Axis(String title, double lower, double upper) {
    }

    private final int width;
    private final int height;
    private final String title;
    private final Axis xAxis;
    private final Axis yAxis;
    private final List<Line> lines;

    private ChartSvg(int width, int height, String title, Axis xAxis, Axis yAxis, List<Line> lines) {
        this.width = width;
        this.height = height;
        this.title = title;
        this.xAxis = xAxis;
        this.yAxis = yAxis;
        this.lines = List.copyOf(lines);
    }

    /**
     * Takes what a chart shows now (on the UI thread).
     *
     * @param chart the chart
     * @return the picture, ready to write
     */
    public static ChartSvg of(Chart chart) {
        Point size = chart.getSize();
        int w = Math.max(LEFT + RIGHT + 100, size.x);
        int h = Math.max(TOP + BOTTOM + 100, size.y);
        IAxis xa = chart.getAxisSet().getXAxis(0);
        IAxis ya = chart.getAxisSet().getYAxis(0);
        Range xr = xa.getRange();
        int columns = w - LEFT - RIGHT;
        List<Line> lines = new ArrayList<>();
        for (ISeries<?> s : chart.getSeriesSet().getSeries()) {
            if (!s.isVisible()) {
                continue;
            }
            PlotThinning.Points points = visible(s.getXSeries(), s.getYSeries(), xr.lower, xr.upper, columns);
            String color = "#000000";
            boolean dashed = false;
            boolean symbols = false;
            String symbolColor = color;
            int symbolSize = 0;
            if (s instanceof ILineSeries<?> line) {
                color = hex(line.getLineColor());
                dashed = line.getLineStyle() != LineStyle.SOLID && line.getLineStyle() != LineStyle.NONE;
                symbols = line.getLineStyle() == LineStyle.NONE;
                symbolColor = hex(line.getSymbolColor());
                symbolSize = Math.max(1, line.getSymbolSize());
            }
            String name = s.getDescription() == null || s.getDescription().isBlank() ? s.getId() : s.getDescription();
            lines.add(new Line(s.getId(), name, points.x(), points.y(), color, dashed, symbols, symbolColor, symbolSize,
                    s.isVisibleInLegend()));
        }
        return new ChartSvg(w, h, text(chart.getTitle().getText()), axis(xa), axis(ya), lines);
    }

    private static Axis axis(IAxis a) {
        Range r = a.getRange();
        return new Axis(text(a.getTitle().getText()), r.lower, r.upper);
    }

    private static String text(String s) {
        return s == null ? "" : s;
    }

    /**
     * The points of a series inside an x span, thinned per pixel column
     * ({@link PlotThinning#perColumn}), with the sample just beyond each end so the line runs to
     * the plot's edge; a series whose x is not ascending keeps the extremes of equal runs.
     */
    static PlotThinning.Points visible(double[] x, double[] y, double lower, double upper, int columns) {
        int n = Math.min(x.length, y.length);
        double[] xn = x.length == n ? x : Arrays.copyOf(x, n);
        double[] yn = y.length == n ? y : Arrays.copyOf(y, n);
        if (!ascending(xn, n) || !(upper > lower) || !Double.isFinite(upper - lower)) {
            double[] xs = new double[n];
            double[] ys = new double[n];
            int k = 0;
            for (int i = 0; i < n; i++) {
                if (Double.isFinite(xn[i]) && Double.isFinite(yn[i])) {
                    xs[k] = xn[i];
                    ys[k] = yn[i];
                    k++;
                }
            }
            return PlotThinning.keepExtremes(Arrays.copyOf(xs, k), Arrays.copyOf(ys, k), Math.max(4, 2 * columns + 2));
        }
        PlotThinning.Points inside = PlotThinning.perColumn(xn, yn, lower, upper, Math.max(1, columns));
        int before = -1;
        for (int i = 0; i < n && xn[i] < lower; i++) {
            before = Double.isFinite(yn[i]) ? i : before;
        }
        int after = -1;
        for (int i = n - 1; i >= 0 && xn[i] > upper; i--) {
            after = Double.isFinite(yn[i]) ? i : after;
        }
        int m = inside.size() + (before >= 0 ? 1 : 0) + (after >= 0 ? 1 : 0);
        double[] xs = new double[m];
        double[] ys = new double[m];
        int k = 0;
        if (before >= 0) {
            xs[k] = xn[before];
            ys[k] = yn[before];
            k++;
        }
        System.arraycopy(inside.x(), 0, xs, k, inside.size());
        System.arraycopy(inside.y(), 0, ys, k, inside.size());
        k += inside.size();
        if (after >= 0) {
            xs[k] = xn[after];
            ys[k] = yn[after];
        }
        return new PlotThinning.Points(xs, ys);
    }

    private static boolean ascending(double[] x, int n) {
        for (int i = 1; i < n; i++) {
            if (!(x[i] >= x[i - 1])) {
                return false;
            }
        }
        return true;
    }

    /**
     * How many series the picture draws (one polyline each).
     *
     * @return the count
     */
    public int series() {
        return lines.size();
    }

    /**
     * Writes the SVG document (UTF-8).
     *
     * @param out the stream; not closed
     * @throws IOException when writing fails
     */
    public void writeTo(OutputStream out) throws IOException {
        try {
            XMLStreamWriter w = XMLOutputFactory.newDefaultFactory().createXMLStreamWriter(out,
                    StandardCharsets.UTF_8.name());
            w.writeStartDocument(StandardCharsets.UTF_8.name(), "1.0");
            w.writeCharacters("\n");
            w.setDefaultNamespace(SVG);
            w.writeStartElement(SVG, "svg");
            w.writeDefaultNamespace(SVG);
            w.writeAttribute("width", Integer.toString(width));
            w.writeAttribute("height", Integer.toString(height));
            w.writeAttribute("viewBox", "0 0 " + width + " " + height);
            w.writeAttribute("font-family", "sans-serif");
            w.writeAttribute("font-size", "12");
            element(w, "title", title);
            empty(w, "rect", "x", "0", "y", "0", "width", Integer.toString(width), "height", Integer.toString(height),
                    "fill", "#ffffff");
            writeDefs(w);
            element(w, "text", title, "class", "chart-title", "x", num(width / 2.0), "y", "22", "text-anchor", "middle",
                    "font-size", "14", "font-weight", "bold");
            writeXAxis(w);
            writeYAxis(w);
            writeSeries(w);
            writeLegend(w);
            w.writeCharacters("\n");
            w.writeEndElement();
            w.writeEndDocument();
            w.writeCharacters("\n");
            w.flush();
            w.close();
        } catch (XMLStreamException e) {
            throw new IOException("the SVG could not be written: " + e.getMessage(), e);
        }
    }

    private int plotWidth() {
        return width - LEFT - RIGHT;
    }

    private int plotHeight() {
        return height - TOP - BOTTOM;
    }

    private double px(double x) {
        return LEFT + (x - xAxis.lower()) / (xAxis.upper() - xAxis.lower()) * plotWidth();
    }

    private double py(double y) {
        return TOP + (1 - (y - yAxis.lower()) / (yAxis.upper() - yAxis.lower())) * plotHeight();
    }

    private void writeDefs(XMLStreamWriter w) throws XMLStreamException {
        open(w, "defs");
        open(w, "clipPath");
        w.writeAttribute("id", "plot-area");
        empty(w, "rect", "x", Integer.toString(LEFT), "y", Integer.toString(TOP), "width", Integer.toString(plotWidth()),
                "height", Integer.toString(plotHeight()));
        w.writeEndElement();
        for (int i = 0; i < lines.size(); i++) {
            Line l = lines.get(i);
            if (l.symbols()) {
                int box = 2 * l.symbolSize() + 2;
                open(w, "marker");
                w.writeAttribute("id", "symbol-" + i);
                w.writeAttribute("markerUnits", "userSpaceOnUse");
                w.writeAttribute("markerWidth", Integer.toString(box));
                w.writeAttribute("markerHeight", Integer.toString(box));
                w.writeAttribute("refX", num(box / 2.0));
                w.writeAttribute("refY", num(box / 2.0));
                empty(w, "circle", "cx", num(box / 2.0), "cy", num(box / 2.0), "r", Integer.toString(l.symbolSize()),
                        "fill", l.symbolColor());
                w.writeEndElement();
            }
        }
        w.writeEndElement();
    }

    private void writeXAxis(XMLStreamWriter w) throws XMLStreamException {
        double bottom = TOP + plotHeight();
        open(w, "g");
        w.writeAttribute("class", "axis x-axis");
        double[] ticks = ticks(xAxis.lower(), xAxis.upper(), Math.max(4, plotWidth() / TICK_SPACING));
        double step = ticks.length > 1 ? ticks[1] - ticks[0] : xAxis.upper() - xAxis.lower();
        for (double t : ticks) {
            String x = num(px(t));
            empty(w, "line", "x1", x, "y1", num(TOP), "x2", x, "y2", num(bottom), "stroke", "#dddddd",
                    "stroke-dasharray", "2,2");
            empty(w, "line", "x1", x, "y1", num(bottom), "x2", x, "y2", num(bottom + TICK), "stroke", "#000000");
            element(w, "text", label(t, step), "class", "tick-label", "x", x, "y", num(bottom + TICK + 13),
                    "text-anchor", "middle");
        }
        empty(w, "line", "x1", num(LEFT), "y1", num(bottom), "x2", num(LEFT + plotWidth()), "y2", num(bottom),
                "stroke", "#000000");
        element(w, "text", xAxis.title(), "class", "axis-title", "x", num(LEFT + plotWidth() / 2.0), "y",
                num(bottom + TICK + 32), "text-anchor", "middle");
        w.writeEndElement();
    }

    private void writeYAxis(XMLStreamWriter w) throws XMLStreamException {
        open(w, "g");
        w.writeAttribute("class", "axis y-axis");
        double[] ticks = ticks(yAxis.lower(), yAxis.upper(), Math.max(4, plotHeight() / (TICK_SPACING / 2)));
        double step = ticks.length > 1 ? ticks[1] - ticks[0] : yAxis.upper() - yAxis.lower();
        for (double t : ticks) {
            String y = num(py(t));
            empty(w, "line", "x1", num(LEFT), "y1", y, "x2", num(LEFT + plotWidth()), "y2", y, "stroke", "#dddddd",
                    "stroke-dasharray", "2,2");
            empty(w, "line", "x1", num(LEFT - TICK), "y1", y, "x2", num(LEFT), "y2", y, "stroke", "#000000");
            element(w, "text", label(t, step), "class", "tick-label", "x", num(LEFT - TICK - 3), "y", y,
                    "text-anchor", "end", "dominant-baseline", "middle");
        }
        empty(w, "line", "x1", num(LEFT), "y1", num(TOP), "x2", num(LEFT), "y2", num(TOP + plotHeight()),
                "stroke", "#000000");
        double cx = 16;
        double cy = TOP + plotHeight() / 2.0;
        // turned on a group moved to the spot: the form more renderers follow than a rotation about a point
        open(w, "g");
        w.writeAttribute("transform", "translate(" + num(cx) + " " + num(cy) + ") rotate(-90)");
        element(w, "text", yAxis.title(), "class", "axis-title", "x", "0", "y", "0", "text-anchor", "middle");
        w.writeEndElement();
        w.writeEndElement();
    }

    private void writeSeries(XMLStreamWriter w) throws XMLStreamException {
        open(w, "g");
        w.writeAttribute("class", "series");
        w.writeAttribute("clip-path", "url(#plot-area)");
        for (int i = 0; i < lines.size(); i++) {
            Line l = lines.get(i);
            StringBuilder points = new StringBuilder(l.x().length * 16);
            for (int k = 0; k < l.x().length; k++) {
                if (k > 0) {
                    points.append(' ');
                }
                points.append(num(px(l.x()[k]))).append(',').append(num(py(l.y()[k])));
            }
            open(w, "polyline");
            w.writeAttribute("id", "series-" + i);
            w.writeAttribute("data-series", l.id());
            w.writeAttribute("points", points.toString());
            w.writeAttribute("fill", "none");
            if (l.symbols()) {
                w.writeAttribute("stroke", "none");
                String marker = "url(#symbol-" + i + ")";
                w.writeAttribute("marker-start", marker);
                w.writeAttribute("marker-mid", marker);
                w.writeAttribute("marker-end", marker);
            } else {
                w.writeAttribute("stroke", l.color());
                w.writeAttribute("stroke-width", "1");
                w.writeAttribute("stroke-linejoin", "round");
                if (l.dashed()) {
                    w.writeAttribute("stroke-dasharray", "6,4");
                }
            }
            element(w, "title", l.name());
            w.writeEndElement();
        }
        w.writeEndElement();
    }

    private void writeLegend(XMLStreamWriter w) throws XMLStreamException {
        open(w, "g");
        w.writeAttribute("class", "legend");
        double x = LEFT;
        double y = height - 12;
        for (Line l : lines) {
            if (!l.inLegend()) {
                continue;
            }
            if (l.symbols()) {
                empty(w, "circle", "cx", num(x + 10), "cy", num(y - 4), "r", Integer.toString(l.symbolSize()), "fill",
                        l.symbolColor());
            } else {
                List<String> a = new ArrayList<>(List.of("x1", num(x), "y1", num(y - 4), "x2", num(x + 20), "y2",
                        num(y - 4), "stroke", l.color(), "stroke-width", "2"));
                if (l.dashed()) {
                    a.addAll(List.of("stroke-dasharray", "6,4"));
                }
                empty(w, "line", a.toArray(String[]::new));
            }
            element(w, "text", l.name(), "x", num(x + 26), "y", num(y));
            // about 6.5 px a character at 12 px: enough room, no font metrics needed
            x += 26 + 6.5 * l.name().length() + 20;
        }
        w.writeEndElement();
    }

    /**
     * Round tick values (1, 2 or 5 times a power of ten apart) inside a range.
     *
     * @param lower the range's lower end
     * @param upper its upper end
     * @param about about how many ticks are wanted
     * @return the ticks, ascending; empty for an empty or non-finite range
     */
    static double[] ticks(double lower, double upper, int about) {
        double span = upper - lower;
        if (!(span > 0) || !Double.isFinite(span)) {
            return new double[0];
        }
        double raw = span / Math.max(1, about);
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = power;
        for (double m : new double[] {1, 2, 5, 10}) {
            step = m * power;
            if (step >= raw) {
                break;
            }
        }
        long first = (long) Math.ceil(lower / step - 1e-9);
        long last = (long) Math.floor(upper / step + 1e-9);
        double[] out = new double[(int) Math.max(0, last - first + 1)];
        for (int i = 0; i < out.length; i++) {
            out[i] = (first + i) * step;
        }
        return out;
    }

    private static String label(double value, double step) {
        int places = (int) Math.max(0, Math.ceil(-Math.log10(step) - 1e-9));
        String s = String.format(Locale.ROOT, "%." + Math.min(places, 12) + "f", value);
        return s.matches("-0(\\.0*)?") ? s.substring(1) : s;
    }

    private static String num(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.endsWith(".00") ? s.substring(0, s.length() - 3) : s;
    }

    private static String hex(Color c) {
        return c == null ? "#000000" : String.format(Locale.ROOT, "#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }

    /** Starts an element on a line of its own, so the file reads well in a text editor too. */
    private static void open(XMLStreamWriter w, String name) throws XMLStreamException {
        w.writeCharacters("\n");
        w.writeStartElement(name);
    }

    private static void element(XMLStreamWriter w, String name, String content, String... attributes)
            throws XMLStreamException {
        open(w, name);
        for (int i = 0; i + 1 < attributes.length; i += 2) {
            w.writeAttribute(attributes[i], attributes[i + 1]);
        }
        w.writeCharacters(content);
        w.writeEndElement();
    }

    private static void empty(XMLStreamWriter w, String name, String... attributes) throws XMLStreamException {
        w.writeCharacters("\n");
        w.writeEmptyElement(name);
        for (int i = 0; i + 1 < attributes.length; i += 2) {
            w.writeAttribute(attributes[i], attributes[i + 1]);
        }
    }
}
