package dev.penduline.services.present;

import java.util.Arrays;

/**
 * Thins a long record for drawing without losing its peaks. A screen or a report's picture has
 * far fewer pixels than a 300 000-sample record; the analysis always uses the full record, never
 * this. Two ways:
 * <ul>
 * <li>{@link #keepExtremes}: the samples are cut into equal runs and each run keeps its lowest
 * and its highest sample, in time order, so every turning point and the extremes survive;</li>
 * <li>{@link #perColumn}: the x span is cut into pixel columns of equal width and each column
 * keeps its first, lowest, highest and last sample, in time order, so the line drawn through
 * what is kept covers exactly the pixels the full line covers (the "M4" aggregation of Jugel et
 * al., "M4: A Visualization-Oriented Time Series Data Aggregation", PVLDB 7(10), 2014).</li>
 * </ul>
 * Used by the workbench's charts and the report's plots alike; plain Java.
 */
public final class PlotThinning {

    /**
     * Points to draw.
     *
     * @param x abscissae (the unit of the input)
     * @param y ordinates (the unit of the input)
     */
    public record Points(double[] x, double[] y) {

        /**
         * How many points.
         *
         * @return the count
         */
        public int size() {
            return x.length;
        }
    }

    private PlotThinning() {
    }

    /**
     * Keeps at most {@code limit} points: all of them when there are not more, else the
     * first, the last, and the minimum and maximum of each of {@code (limit − 2)/2} runs.
     *
     * @param x     abscissae, ascending
     * @param y     ordinates, as many as abscissae
     * @param limit the most points to keep (at least 4)
     * @return the points (copies; the input is not changed)
     * @throws IllegalArgumentException when the arrays differ in length or the limit is below 4
     */
    public static Points keepExtremes(double[] x, double[] y, int limit) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y differ in length: " + x.length + " and " + y.length);
        }
        if (limit < 4) {
            throw new IllegalArgumentException("limit must be at least 4, got " + limit);
        }
        int n = x.length;
        if (n <= limit) {
            return new Points(x.clone(), y.clone());
        }
        int runs = (limit - 2) / 2;
        int[] keep = new int[2 * runs + 2];
        int k = 0;
        keep[k++] = 0;
        int inner = n - 2;
        for (int r = 0; r < runs; r++) {
            int from = 1 + (int) ((long) inner * r / runs);
            int to = 1 + (int) ((long) inner * (r + 1) / runs);
            if (from >= to) {
                continue;
            }
            int lo = from;
            int hi = from;
            for (int i = from + 1; i < to; i++) {
                if (y[i] < y[lo]) {
                    lo = i;
                }
                if (y[i] > y[hi]) {
                    hi = i;
                }
            }
            keep[k++] = Math.min(lo, hi);
            if (lo != hi) {
                keep[k++] = Math.max(lo, hi);
            }
        }
        keep[k++] = n - 1;
        int[] used = Arrays.copyOf(keep, k);
        double[] xs = new double[k];
        double[] ys = new double[k];
        for (int i = 0; i < k; i++) {
            xs[i] = x[used[i]];
            ys[i] = y[used[i]];
        }
        return new Points(xs, ys);
    }

    /**
     * Keeps, of each of {@code columns} pixel columns of equal x width between {@code xMin} and
     * {@code xMax}, the first, the lowest, the highest and the last sample (each once, in time
     * order), so a line through the points kept looks exactly like the line through all of them
     * (the minimum and maximum of every column and the joins between columns are kept). Samples
     * outside {@code [xMin, xMax]} and samples whose ordinate is not finite are dropped; when
     * fewer than {@code 4 × columns} samples remain, all of them are returned. At most
     * {@code 4 × columns} points are kept.
     *
     * @param x       abscissae, ascending (equal neighbours allowed, no NaN)
     * @param y       ordinates, as many as abscissae
     * @param xMin    the left edge of the first column
     * @param xMax    the right edge of the last column (greater than {@code xMin}, both finite)
     * @param columns how many pixel columns (at least 1)
     * @return the points (copies; the input is not changed)
     * @throws IllegalArgumentException when the arrays differ in length, x is not ascending, the
     *                                  span is empty or not finite, or {@code columns < 1}
     */
    public static Points perColumn(double[] x, double[] y, double xMin, double xMax, int columns) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y differ in length: " + x.length + " and " + y.length);
        }
        if (columns < 1) {
            throw new IllegalArgumentException("columns must be at least 1, got " + columns);
        }
        if (!Double.isFinite(xMin) || !Double.isFinite(xMax) || !(xMax > xMin)) {
            throw new IllegalArgumentException("the x span must be finite and not empty: [" + xMin + ", " + xMax + "]");
        }
        for (int i = 1; i < x.length; i++) {
            if (!(x[i] >= x[i - 1])) {
                throw new IllegalArgumentException("x must be ascending; it is not at index " + i);
            }
        }
        int from = 0;
        while (from < x.length && x[from] < xMin) {
            from++;
        }
        int to = x.length;
        while (to > from && x[to - 1] > xMax) {
            to--;
        }
        int inside = 0;
        for (int i = from; i < to; i++) {
            if (Double.isFinite(y[i])) {
                inside++;
            }
        }
        long most = 4L * columns;
        double[] xs = new double[(int) Math.min(inside, most)];
        double[] ys = new double[xs.length];
        int k = 0;
        if (inside < most) {
            for (int i = from; i < to; i++) {
                if (Double.isFinite(y[i])) {
                    xs[k] = x[i];
                    ys[k] = y[i];
                    k++;
                }
            }
            return new Points(xs, ys);
        }
        double scale = columns / (xMax - xMin);
        int i = from;
        int[] four = new int[4];
        while (i < to) {
            while (i < to && !Double.isFinite(y[i])) {
                i++;
            }
            if (i >= to) {
                break;
            }
            int column = column(x[i], xMin, scale, columns);
            int first = i;
            int lo = i;
            int hi = i;
            int last = i;
            i++;
            while (i < to && column(x[i], xMin, scale, columns) == column) {
                if (Double.isFinite(y[i])) {
                    if (y[i] < y[lo]) {
                        lo = i;
                    }
                    if (y[i] > y[hi]) {
                        hi = i;
                    }
                    last = i;
                }
                i++;
            }
            four[0] = first;
            four[1] = Math.min(lo, hi);
            four[2] = Math.max(lo, hi);
            four[3] = last;
            int previous = -1;
            for (int index : four) {
                if (index != previous) {
                    xs[k] = x[index];
                    ys[k] = y[index];
                    k++;
                    previous = index;
                }
            }
        }
        return new Points(Arrays.copyOf(xs, k), Arrays.copyOf(ys, k));
    }

    /** The pixel column of an abscissa inside the span; the right edge belongs to the last column. */
    private static int column(double x, double xMin, double scale, int columns) {
        return Math.min(columns - 1, (int) ((x - xMin) * scale));
    }
}
