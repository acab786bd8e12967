package dev.penduline.ui.internal.chart;

import java.util.Arrays;

/**
 * Thins a long record for drawing without losing its peaks: the samples are cut into equal
 * runs and each run keeps its lowest and its highest sample, in time order, so every turning
 * point and the extremes of the record survive. A screen has far fewer pixels than a
 * 300 000-sample record; the analysis always uses the full record, never this.
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
}
