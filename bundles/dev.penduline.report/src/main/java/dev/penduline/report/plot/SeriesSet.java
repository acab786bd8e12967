package dev.penduline.report.plot;

import java.awt.Paint;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.DefaultXYDataset;

import dev.penduline.services.present.PlotThinning;

/**
 * The series of one XY plot as they will be drawn: lines thinned per pixel column, markers as
 * given, non-finite points left out, a series without a point left out altogether.
 */
final class SeriesSet {

    private final DefaultXYDataset data = new DefaultXYDataset();
    private final SeriesRenderer renderer = new SeriesRenderer();
    private final Set<String> names;
    /** The lines drawn, unthinned, so they can be thinned again to the measured data area. */
    private final List<Curve> drawnLines = new ArrayList<>();
    private int lines;
    private int markers;
    private int drawn;

    /**
     * A set whose names must differ from those of other sets of the same picture.
     *
     * @param names the names taken in the picture (shared between its plots)
     */
    SeriesSet(Set<String> names) {
        this.names = names;
    }

    /** A set for a picture of one plot. */
    SeriesSet() {
        this(new HashSet<>());
    }

    /**
     * Adds a line, thinned to {@code columns} pixel columns ({@link PlotThinning#perColumn}).
     *
     * @param name    the name
     * @param x       abscissae, ascending
     * @param y       ordinates
     * @param paint   black or a grey
     * @param columns the data area's width in pixels (as far as known; see {@link #thinTo})
     */
    void line(String name, double[] x, double[] y, Paint paint, int columns) {
        int k = lines++;
        double[][] xy = thinned(name, x, y, columns);
        if (add(name, xy)) {
            renderer.line(data.getSeriesCount() - 1, k, paint);
            drawnLines.add(new Curve(name, x, y));
        }
    }

    /**
     * Thins the lines again to the data area's width as measured on the canvas.
     *
     * @param columns the data area's width in pixels
     */
    void thinTo(int columns) {
        for (Curve c : drawnLines) {
            data.addSeries(c.name(), thinned(c.name(), c.x(), c.y(), columns));
        }
    }

    /**
     * Adds open markers without a line.
     *
     * @param name the name
     * @param x    abscissae
     * @param y    ordinates
     */
    void markers(String name, double[] x, double[] y) {
        int k = markers++;
        if (add(name, finite(name, x, y))) {
            renderer.markers(data.getSeriesCount() - 1, k);
        }
    }

    private boolean add(String name, double[][] xy) {
        if (!names.add(name)) {
            throw new IllegalArgumentException("two series of one picture are called " + name);
        }
        if (xy[0].length == 0) {
            return false;
        }
        data.addSeries(name, xy);
        drawn++;
        return true;
    }

    /**
     * How many series will be drawn.
     *
     * @return the count
     */
    int drawn() {
        return drawn;
    }

    /**
     * The plot of these series.
     *
     * @param xAxis the horizontal axis (null inside a plot that shares it)
     * @param yAxis the vertical axis
     * @return the plot
     */
    XYPlot plot(ValueAxis xAxis, ValueAxis yAxis) {
        XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
        PlotStyle.xyPlot(plot);
        return plot;
    }

    private static double[][] thinned(String name, double[] x, double[] y, int columns) {
        check(name, x, y);
        int n = x.length;
        if (n < 2 || !(x[n - 1] > x[0]) || !Double.isFinite(x[n - 1] - x[0])) {
            return finite(name, x, y);
        }
        PlotThinning.Points p = PlotThinning.perColumn(x, y, x[0], x[n - 1], columns);
        return new double[][] {p.x(), p.y()};
    }

    private static double[][] finite(String name, double[] x, double[] y) {
        check(name, x, y);
        double[] xs = new double[x.length];
        double[] ys = new double[x.length];
        int k = 0;
        for (int i = 0; i < x.length; i++) {
            if (Double.isFinite(x[i]) && Double.isFinite(y[i])) {
                xs[k] = x[i];
                ys[k] = y[i];
                k++;
            }
        }
        return new double[][] {Arrays.copyOf(xs, k), Arrays.copyOf(ys, k)};
    }

    private static void check(String name, double[] x, double[] y) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("the series " + name + " has " + x.length + " abscissae and " + y.length
                    + " ordinates");
        }
    }
}
