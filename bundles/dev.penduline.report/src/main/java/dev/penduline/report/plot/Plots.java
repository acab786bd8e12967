package dev.penduline.report.plot;

import java.awt.Stroke;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.statistics.DefaultStatisticalCategoryDataset;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;

/**
 * The report's plots, drawn from plain arrays in the units of their axes (the caller converts):
 * JFreeChart on a JFreeSVG canvas, headless. Every picture is a standalone {@code <svg>} to
 * inline in HTML (see {@link SvgPicture}); it is readable in black-and-white print (black, greys,
 * dash patterns and marker shapes tell the series apart), every axis label carries its unit, a
 * legend appears where there is more than one series. Long series are thinned per pixel column
 * ({@link dev.penduline.services.present.PlotThinning#perColumn}), so a 300 000-sample record
 * makes a picture of about a hundred kilobytes that looks like the full one.
 *
 * <p>Loading this class sets {@code java.awt.headless=true} unless the property is already set,
 * and tells JFreeChart to draw rotated text (the vertical axes' labels) as text, not as glyph
 * outlines ({@code TextUtils.setUseDrawRotatedStringWorkaround(false)}, a JVM-wide setting of
 * JFreeChart), so every label stays a searchable {@code <text>}.
 */
public final class Plots {

    static {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private static final String TIME = "time (s)";
    private static final String ANGLE = "angle (°)";
    private static final String RESIDUAL = "residual (°)";
    private static final String AMPLITUDE = "amplitude (°)";
    private static final String PERIOD = "period (s)";
    private static final String SHARE_OF_J0 = "share of J0 (%)";
    private static final String UNIT_ORDER = "unit (in key order)";
    private static final String COUNT = "units (count)";
    private static final String SHARE_OF_ENERGY = "share of the energy dissipated (%)";
    /** Room a bar of the part shares takes, pixels, once the parts no longer fit the plain height. */
    private static final int PIXELS_A_PART = 20;

    private Plots() {
    }

    /**
     * Horizontal bar chart: each part's share of the pivot inertia J0 in %, negative for
     * cut-outs (drawn white, the others grey), with each value at its bar's end. Axis label
     * "share of J0 (%)". 720 px wide, 300 px high or taller when there are many parts.
     *
     * @param id           the picture's id (a letter, then letters, digits, '-' or '_')
     * @param title        the title
     * @param parts        the parts' names, in the order to draw them (top first)
     * @param sharePercent each part's share of J0 (%); a non-finite share draws no bar
     * @return the picture (one series)
     * @throws IllegalArgumentException when the id is not valid or the lists differ in length
     */
    public static SvgPicture partShares(String id, String title, List<String> parts, double[] sharePercent) {
        SvgCanvas.checkId(id);
        sameLength("parts", parts.size(), "shares", sharePercent.length);
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        boolean any = false;
        for (int i = 0; i < parts.size(); i++) {
            Double v = Double.isFinite(sharePercent[i]) ? sharePercent[i] : null;
            any |= v != null;
            data.addValue(v, "share of J0", new CategoryLabel(i, parts.get(i)));
        }
        NumberAxis axis = PlotStyle.numberAxis(SHARE_OF_J0);
        axis.setAutoRangeIncludesZero(true);
        axis.setLowerMargin(0.1);
        axis.setUpperMargin(0.1);
        CategoryPlot plot = new BarPlot(data, PlotStyle.categoryAxis(true), axis, new ShareBarRenderer(true));
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        int height = Math.max(PlotStyle.HEIGHT, 110 + PIXELS_A_PART * parts.size());
        return picture(id, title, PlotStyle.chart(title, plot, false), List.of(), any ? 1 : 0, List.of(SHARE_OF_J0),
                PlotStyle.WIDTH, height);
    }

    /**
     * Record with model and residuals: two stacked plots on one shared time axis "time (s)"; top
     * "angle (°)" with measured (grey) and model (black dashed), vertical markers at release and
     * stop (labelled "release", "stop"; NaN = none); bottom "residual (°)". Each series is thinned
     * with {@link dev.penduline.services.present.PlotThinning#perColumn} to the plot's pixel
     * width. 720 × 420 px.
     *
     * @param id          the picture's id
     * @param title       the title
     * @param timeS       the sample times (s), ascending
     * @param measuredDeg the measured angle (°)
     * @param modelDeg    the model's angle (°); NaN where it has none
     * @param residualDeg measured minus model (°); NaN where there is none
     * @param releaseS    the release (s), NaN when unknown
     * @param stopS       the stop (s), NaN when the body did not stop or it is unknown
     * @return the picture (series: measured, model, residual; one without a finite value is left out)
     * @throws IllegalArgumentException when the id is not valid, the arrays differ in length or the
     *                                  times are not ascending
     */
    public static SvgPicture sessionRecord(String id, String title, double[] timeS, double[] measuredDeg,
            double[] modelDeg, double[] residualDeg, double releaseS, double stopS) {
        SvgCanvas.checkId(id);
        sameLength("times", timeS.length, "measured angles", measuredDeg.length);
        sameLength("times", timeS.length, "model angles", modelDeg.length);
        sameLength("times", timeS.length, "residuals", residualDeg.length);
        int columns = PlotStyle.dataColumns(PlotStyle.WIDTH);
        Set<String> names = new HashSet<>();
        SeriesSet top = new SeriesSet(names);
        top.line("measured", timeS, measuredDeg, PlotStyle.GREY, columns);
        top.line("model", timeS, modelDeg, PlotStyle.BLACK, columns);
        SeriesSet bottom = new SeriesSet(names);
        bottom.line("residual", timeS, residualDeg, PlotStyle.BLACK, columns);
        NumberAxis time = PlotStyle.numberAxis(TIME);
        int n = timeS.length;
        if (n > 1 && timeS[n - 1] > timeS[0]) {
            time.setRange(timeS[0], timeS[n - 1]);
        }
        XYPlot angle = top.plot(null, PlotStyle.numberAxis(ANGLE));
        XYPlot residual = bottom.plot(null, PlotStyle.numberAxis(RESIDUAL));
        ValueMarker zero = new ValueMarker(0, PlotStyle.LIGHT_GREY, PlotStyle.stroke(0.75f));
        residual.addRangeMarker(zero, Layer.BACKGROUND);
        mark(angle, residual, releaseS, "release", PlotStyle.stroke(1f, 5f, 2f, 1f, 2f));
        mark(angle, residual, stopS, "stop", PlotStyle.stroke(1f, 1f, 2f));
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(time);
        plot.setGap(12);
        plot.add(angle, 2);
        plot.add(residual, 1);
        PlotStyle.xyPlot(plot);
        int series = top.drawn() + bottom.drawn();
        return picture(id, title, PlotStyle.chart(title, plot, series > 1), List.of(top, bottom), series,
                List.of(TIME, ANGLE, RESIDUAL), PlotStyle.WIDTH, PlotStyle.STACKED_HEIGHT);
    }

    /**
     * Amplitude decay: measured peak amplitudes as markers against x as given (with its label,
     * e.g. "time since release (s)" or "cycle (1)"), and any number of named envelope curves as
     * lines, each its own dash pattern; legend. y "amplitude (°)". 720 × 300 px.
     *
     * @param id           the picture's id
     * @param title        the title
     * @param xLabel       the horizontal axis' label, with its unit
     * @param x            the abscissae of the measured amplitudes
     * @param amplitudeDeg the measured amplitudes (°)
     * @param envelopes    envelope curves (x ascending, in the unit of {@code xLabel}; amplitude in °)
     * @return the picture (series: "measured" and each envelope)
     * @throws IllegalArgumentException when the id is not valid, the arrays differ in length or two
     *                                  series share a name
     */
    public static SvgPicture amplitudeDecay(String id, String title, String xLabel, double[] x, double[] amplitudeDeg,
            List<Curve> envelopes) {
        SvgCanvas.checkId(id);
        Objects.requireNonNull(xLabel, "xLabel");
        int columns = PlotStyle.dataColumns(PlotStyle.WIDTH);
        SeriesSet set = new SeriesSet();
        set.markers("measured", x, amplitudeDeg);
        for (Curve c : envelopes) {
            set.line(c.name(), c.x(), c.y(), PlotStyle.BLACK, columns);
        }
        NumberAxis amplitude = PlotStyle.numberAxis(AMPLITUDE);
        amplitude.setAutoRangeIncludesZero(true);
        XYPlot plot = set.plot(PlotStyle.numberAxis(xLabel), amplitude);
        return xyPicture(id, title, plot, set, List.of(xLabel, AMPLITUDE));
    }

    /**
     * Period against amplitude: measured periods as markers, a reference curve (e.g. the
     * large-amplitude pendulum period from the complete elliptic integral) as a line; x
     * "amplitude (°)", y "period (s)". 720 × 300 px.
     *
     * @param id           the picture's id
     * @param title        the title
     * @param amplitudeDeg the amplitudes of the measured periods (°)
     * @param periodS      the measured periods (s)
     * @param reference    the reference curve (amplitude in °, ascending; period in s)
     * @return the picture (series: "measured" and the reference)
     * @throws IllegalArgumentException when the id is not valid, the arrays differ in length or the
     *                                  reference is called "measured"
     */
    public static SvgPicture periodAmplitude(String id, String title, double[] amplitudeDeg, double[] periodS,
            Curve reference) {
        SvgCanvas.checkId(id);
        SeriesSet set = new SeriesSet();
        set.markers("measured", amplitudeDeg, periodS);
        set.line(reference.name(), reference.x(), reference.y(), PlotStyle.BLACK, PlotStyle.dataColumns(PlotStyle.WIDTH));
        XYPlot plot = set.plot(PlotStyle.numberAxis(AMPLITUDE), PlotStyle.numberAxis(PERIOD));
        return xyPicture(id, title, plot, set, List.of(AMPLITUDE, PERIOD));
    }

    /**
     * Energy shares as grey bars with black ±1σ error bars; y "share of the energy dissipated
     * (%)". 720 × 300 px.
     *
     * @param id           the picture's id
     * @param title        the title
     * @param losses       the losses' names, in the order to draw them
     * @param sharePercent each loss' share of the energy dissipated (%); non-finite draws no bar
     * @param sigmaPercent each share's standard uncertainty (%); NaN = no error bar
     * @return the picture (one series)
     * @throws IllegalArgumentException when the id is not valid or the lists differ in length
     */
    public static SvgPicture energyShares(String id, String title, List<String> losses, double[] sharePercent,
            double[] sigmaPercent) {
        SvgCanvas.checkId(id);
        sameLength("losses", losses.size(), "shares", sharePercent.length);
        sameLength("losses", losses.size(), "uncertainties", sigmaPercent.length);
        DefaultStatisticalCategoryDataset data = new DefaultStatisticalCategoryDataset();
        boolean any = false;
        for (int i = 0; i < losses.size(); i++) {
            Double v = Double.isFinite(sharePercent[i]) ? sharePercent[i] : null;
            Double s = v != null && Double.isFinite(sigmaPercent[i]) ? Math.abs(sigmaPercent[i]) : null;
            any |= v != null;
            data.add(v, s, "share of the energy dissipated", new CategoryLabel(i, losses.get(i)));
        }
        NumberAxis axis = PlotStyle.numberAxis(SHARE_OF_ENERGY);
        axis.setAutoRangeIncludesZero(true);
        axis.setUpperMargin(0.1);
        CategoryPlot plot = new BarPlot(data, PlotStyle.categoryAxis(false), axis, new ErrorBarRenderer());
        return picture(id, title, PlotStyle.chart(title, plot, false), List.of(), any ? 1 : 0,
                List.of(SHARE_OF_ENERGY), PlotStyle.WIDTH, PlotStyle.HEIGHT);
    }

    /**
     * A plain time series (e.g. a predicted swing): lines (each its own dash pattern), legend
     * when more than one; x "time (s)", y as given. 720 × 300 px.
     *
     * @param id     the picture's id
     * @param title  the title
     * @param yLabel the vertical axis' label, with its unit
     * @param curves the curves (time in s, ascending)
     * @return the picture (one series a curve with a finite point)
     * @throws IllegalArgumentException when the id is not valid or two curves share a name
     */
    public static SvgPicture timeSeries(String id, String title, String yLabel, List<Curve> curves) {
        SvgCanvas.checkId(id);
        Objects.requireNonNull(yLabel, "yLabel");
        int columns = PlotStyle.dataColumns(PlotStyle.WIDTH);
        SeriesSet set = new SeriesSet();
        for (Curve c : curves) {
            set.line(c.name(), c.x(), c.y(), PlotStyle.BLACK, columns);
        }
        XYPlot plot = set.plot(PlotStyle.numberAxis(TIME), PlotStyle.numberAxis(yLabel));
        return xyPicture(id, title, plot, set, List.of(TIME, yLabel));
    }

    /**
     * Individuals control chart: each unit's value against its place in the units' order (x
     * "unit (in key order)"), open markers within the limits, filled-looking second markers for
     * the units beyond them, joined in order by a light grey line; horizontal lines at the center
     * (solid, labelled "center") and at the UCL and LCL (dashed, labelled); y as given. NaN limits
     * draw no line. 720 × 300 px.
     *
     * @param id     the picture's id
     * @param title  the title
     * @param yLabel the vertical axis' label, with its unit
     * @param values the values, in the units' order
     * @param center the center line
     * @param lcl    the lower control limit
     * @param ucl    the upper control limit
     * @return the picture (series: "in order", "within limits", and "beyond limits" when any is)
     * @throws IllegalArgumentException when the id is not valid
     */
    public static SvgPicture controlChart(String id, String title, String yLabel, double[] values, double center, double lcl,
            double ucl) {
        SvgCanvas.checkId(id);
        Objects.requireNonNull(yLabel, "yLabel");
        int n = values.length;
        double[] x = new double[n];
        double[] within = new double[n];
        double[] beyond = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i + 1;
            boolean out = values[i] > ucl || values[i] < lcl;
            within[i] = out ? Double.NaN : values[i];
            beyond[i] = out ? values[i] : Double.NaN;
        }
        SeriesSet set = new SeriesSet();
        set.line("in order", x, values, PlotStyle.LIGHT_GREY, PlotStyle.dataColumns(PlotStyle.WIDTH));
        set.markers("within limits", x, within);
        set.markers("beyond limits", x, beyond);
        NumberAxis units = PlotStyle.numberAxis(UNIT_ORDER);
        units.setStandardTickUnits(NumberAxis.createIntegerTickUnits(Locale.ROOT));
        NumberAxis axis = PlotStyle.numberAxis(yLabel);
        // the limits stay in view even where every unit lies well inside them
        double lo = Arrays.stream(new double[] {lcl, center, ucl}).filter(Double::isFinite).min().orElse(Double.NaN);
        double hi = Arrays.stream(new double[] {lcl, center, ucl}).filter(Double::isFinite).max().orElse(Double.NaN);
        for (double v : values) {
            if (Double.isFinite(v)) {
                lo = Double.isNaN(lo) ? v : Math.min(lo, v);
                hi = Double.isNaN(hi) ? v : Math.max(hi, v);
            }
        }
        if (hi > lo) {
            double margin = 0.08 * (hi - lo);
            axis.setRange(lo - margin, hi + margin);
            enoughDecimals(axis, hi - lo);
        }
        XYPlot plot = set.plot(units, axis);
        limit(plot, center, "center", PlotStyle.stroke(1f));
        limit(plot, ucl, "UCL", PlotStyle.stroke(1f, 6f, 3f));
        limit(plot, lcl, "LCL", PlotStyle.stroke(1f, 6f, 3f));
        return xyPicture(id, title, plot, set, List.of(UNIT_ORDER, yLabel));
    }

    /**
     * Histogram of values: equal-width bins from the smallest to the largest value, as many as
     * Sturges' rule gives ({@code ⌈log₂ n⌉ + 1}, at most 30; one bin when all values are equal);
     * x as given, y "units (count)". 720 × 300 px.
     *
     * @param id     the picture's id
     * @param title  the title
     * @param xLabel the horizontal axis' label, with its unit
     * @param values the values (non-finite ones are left out)
     * @return the picture (one series "units", none without a finite value)
     * @throws IllegalArgumentException when the id is not valid
     */
    public static SvgPicture histogram(String id, String title, String xLabel, double[] values) {
        SvgCanvas.checkId(id);
        Objects.requireNonNull(xLabel, "xLabel");
        double[] v = Arrays.stream(values).filter(Double::isFinite).toArray();
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        if (v.length > 0) {
            Bins bins = bins(v);
            XYIntervalSeries s = new XYIntervalSeries("units");
            for (int b = 0; b < bins.counts().length; b++) {
                double a = bins.start() + b * bins.width();
                s.add(a + bins.width() / 2, a, a + bins.width(), bins.counts()[b], 0, bins.counts()[b]);
            }
            data.addSeries(s);
        }
        NumberAxis count = PlotStyle.numberAxis(COUNT);
        count.setStandardTickUnits(NumberAxis.createIntegerTickUnits(Locale.ROOT));
        count.setAutoRangeIncludesZero(true);
        count.setUpperMargin(0.1);
        NumberAxis axis = PlotStyle.numberAxis(xLabel);
        if (v.length > 0) {
            Bins bins = bins(v);
            enoughDecimals(axis, bins.width() * bins.counts().length);
        }
        XYPlot plot = new XYPlot(data, axis, count, new HistogramRenderer());
        PlotStyle.xyPlot(plot);
        int series = v.length > 0 ? 1 : 0;
        return picture(id, title, PlotStyle.chart(title, plot, false), List.of(), series, List.of(xLabel, COUNT),
                PlotStyle.WIDTH, PlotStyle.HEIGHT);
    }

    /**
     * A histogram's bins.
     *
     * @param start  the first bin's lower edge
     * @param width  each bin's width
     * @param counts how many values each bin holds (the last bin holds its upper edge too)
     */
    record Bins(double start, double width, int[] counts) {
    }

    /**
     * Equal-width bins from the smallest to the largest value, ⌈log₂ n⌉ + 1 of them (Sturges),
     * at most 30; one bin of ±2.5 % about the value when all values are equal.
     *
     * @param v finite values, at least one
     * @return the bins
     */
    static Bins bins(double[] v) {
        double lo = Arrays.stream(v).min().getAsDouble();
        double hi = Arrays.stream(v).max().getAsDouble();
        int n = hi > lo ? Math.min(30, (int) Math.ceil(Math.log(v.length) / Math.log(2)) + 1) : 1;
        double width = hi > lo ? (hi - lo) / n : Math.max(Math.abs(lo) * 0.05, 1e-12);
        double start = hi > lo ? lo : lo - width / 2;
        int[] counts = new int[n];
        for (double d : v) {
            counts[Math.min(n - 1, (int) Math.floor((d - start) / width))]++;
        }
        return new Bins(start, width, counts);
    }

    /**
     * Tick labels with enough decimals to tell the ticks of a narrow range apart (the standard
     * tick units write at most three): one more than the tick spacing's, about a tenth of the range,
     * needs; trailing zeros left out, a point as the decimal separator.
     */
    private static void enoughDecimals(NumberAxis axis, double range) {
        int decimals = Math.max(0, Math.min(12, (int) Math.ceil(-Math.log10(range / 10)) + 1));
        DecimalFormat f = new DecimalFormat("0.#", DecimalFormatSymbols.getInstance(Locale.ROOT));
        f.setMaximumFractionDigits(decimals);
        axis.setNumberFormatOverride(f);
    }

    /** A labelled horizontal line at {@code y}; none when y is not finite. */
    private static void limit(XYPlot plot, double y, String label, Stroke stroke) {
        if (!Double.isFinite(y)) {
            return;
        }
        plot.addRangeMarker(labelled(y, label, stroke, TextAnchor.BOTTOM_RIGHT), Layer.FOREGROUND);
    }

    /** A dark grey line at {@code v} with a label at its top right, in the ticks' font on white. */
    private static ValueMarker labelled(double v, String label, Stroke stroke, TextAnchor text) {
        ValueMarker m = new ValueMarker(v, PlotStyle.DARK_GREY, stroke);
        m.setLabel(label);
        m.setLabelFont(PlotStyle.TICK_FONT);
        m.setLabelPaint(PlotStyle.BLACK);
        m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(text);
        m.setLabelBackgroundColor(PlotStyle.WHITE);
        return m;
    }

    private static SvgPicture xyPicture(String id, String title, XYPlot plot, SeriesSet set, List<String> labels) {
        return picture(id, title, PlotStyle.chart(title, plot, set.drawn() > 1), List.of(set), set.drawn(), labels,
                PlotStyle.WIDTH, PlotStyle.HEIGHT);
    }

    /** A vertical line at {@code t} on both plots, labelled on the upper one; none when t is not finite. */
    private static void mark(XYPlot upper, XYPlot lower, double t, String label, Stroke stroke) {
        if (!Double.isFinite(t)) {
            return;
        }
        ValueMarker labelled = labelled(t, label, stroke, TextAnchor.TOP_LEFT);
        labelled.setLabelOffset(new RectangleInsets(2, 3, 2, 3));
        upper.addDomainMarker(labelled, Layer.FOREGROUND);
        lower.addDomainMarker(new ValueMarker(t, PlotStyle.DARK_GREY, stroke), Layer.FOREGROUND);
    }

    /**
     * Draws the picture. The lines were thinned to the data area's width as {@link PlotStyle}
     * expects it; the chart is laid out once on a scratch canvas to measure the width it really
     * has (the stacked plots lay out their axes themselves) and the lines are thinned to that.
     */
    private static SvgPicture picture(String id, String title, JFreeChart chart, List<SeriesSet> sets, int series,
            List<String> labels, int width, int height) {
        String text = title == null ? "" : title;
        if (!sets.isEmpty()) {
            int columns = SvgCanvas.dataWidth(chart, width, height);
            for (SeriesSet s : sets) {
                s.thinTo(columns);
            }
        }
        String svg = SvgCanvas.draw(chart, id, text, width, height);
        int shown = SvgCanvas.seriesIn(svg);
        if (shown != series) {
            throw new IllegalStateException("the picture " + id + " should draw " + series + " series but shows " + shown);
        }
        return new SvgPicture(id, text, svg, series, labels, width, height);
    }

    private static void sameLength(String what, int n, String other, int m) {
        if (n != m) {
            throw new IllegalArgumentException("there are " + n + " " + what + " but " + m + " " + other);
        }
    }
}
