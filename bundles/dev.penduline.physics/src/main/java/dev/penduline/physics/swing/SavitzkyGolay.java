package dev.penduline.physics.swing;

import dev.penduline.physics.InvalidValueException;

/**
 * Savitzky–Golay smoothing and differentiation: at each sample a polynomial of low order is
 * fitted by least squares to the samples of a window around it, and its value or slope there is
 * taken (A. Savitzky, M. J. E. Golay, Anal. Chem. 36 (1964) 1627).
 *
 * <p>On evenly spaced samples this is a convolution with the published weights
 * ({@link #weights}); on irregular samples the same local fit is made on the true times, so
 * dropped or jittered samples do not bend the result. Near the ends the window is shifted to
 * stay inside the record and the polynomial is evaluated off-centre.
 *
 * <p>Why not finite differences: an encoder reading moves in steps of one count, so the
 * difference of neighbours is either 0 or one count over one sample step — a velocity that
 * jumps between zero and a large value. A fit over a window of a fraction of a period averages
 * the steps away while following the swing.
 *
 * @param halfWidth samples on each side of the centre, ≥ 1 (window 2·halfWidth + 1)
 * @param order     polynomial order, 0 ≤ order &lt; 2·halfWidth + 1, at most 4
 */
public record SavitzkyGolay(int halfWidth, int order) {

    /**
     * Checks the window and the order.
     *
     * @throws IllegalArgumentException for a window too small for the order
     */
    public SavitzkyGolay {
        if (halfWidth < 1) {
            throw new IllegalArgumentException("halfWidth must be at least 1 sample, got " + halfWidth);
        }
        if (order < 0 || order > 4 || order >= 2 * halfWidth + 1) {
            throw new IllegalArgumentException("order must be in [0, min(4, 2·halfWidth)], got " + order
                    + " for halfWidth " + halfWidth);
        }
    }

    /**
     * A cubic filter over about an eighth of a period, the choice used for swing records: wide
     * enough to average encoder steps and noise, narrow enough (±22° of phase) that a cubic
     * follows the swing. Clamped to 2 … 25 samples each side.
     *
     * @param sampleStep median time between samples (s), &gt; 0
     * @param period     swing period (s), &gt; 0
     * @return the filter
     */
    public static SavitzkyGolay forSwing(double sampleStep, double period) {
        final long m = Math.round(period / (16 * sampleStep));
        return new SavitzkyGolay((int) Math.max(2, Math.min(25, m)), 3);
    }

    /**
     * Convolution weights for evenly spaced samples of unit spacing: the estimate at the centre
     * is {@code Σ w[j] y[centre − halfWidth + j]}, divided by {@code h^derivative} for a spacing
     * h.
     *
     * @param halfWidth  samples on each side, ≥ 1
     * @param order      polynomial order
     * @param derivative 0 for smoothing, 1 for the first derivative, up to {@code order}
     * @return the 2·halfWidth + 1 weights
     */
    public static double[] weights(int halfWidth, int order, int derivative) {
        new SavitzkyGolay(halfWidth, order);
        if (derivative < 0 || derivative > order) {
            throw new IllegalArgumentException("derivative must be in [0, order], got " + derivative);
        }
        final int p = order + 1;
        final double[][] normal = new double[p][p];
        for (int j = -halfWidth; j <= halfWidth; j++) {
            for (int a = 0; a < p; a++) {
                for (int b = 0; b < p; b++) {
                    normal[a][b] += Math.pow(j, a + b);
                }
            }
        }
        final double[] unit = new double[p];
        unit[derivative] = 1;
        final double[] row = LocalPolynomial.solve(normal, unit, p);
        double factorial = 1;
        for (int k = 2; k <= derivative; k++) {
            factorial *= k;
        }
        final double[] w = new double[2 * halfWidth + 1];
        for (int j = -halfWidth; j <= halfWidth; j++) {
            double s = 0;
            for (int a = 0; a < p; a++) {
                s += row[a] * Math.pow(j, a);
            }
            w[j + halfWidth] = factorial * s;
        }
        return w;
    }

    /**
     * Smoothed values at every sample.
     *
     * @param t sample times (s), strictly increasing
     * @param y samples (any unit)
     * @return the smoothed samples, same unit
     */
    public double[] smooth(double[] t, double[] y) {
        return apply(t, y, 0);
    }

    /**
     * First derivative at every sample.
     *
     * @param t sample times (s), strictly increasing
     * @param y samples (e.g. rad)
     * @return dy/dt (e.g. rad/s)
     */
    public double[] derivative(double[] t, double[] y) {
        return apply(t, y, 1);
    }

    private double[] apply(double[] t, double[] y, int derivative) {
        if (t.length != y.length) {
            throw new IllegalArgumentException("times and values differ in length: " + t.length + " and " + y.length);
        }
        final int n = t.length;
        final int width = 2 * halfWidth + 1;
        if (n < width) {
            throw new InvalidValueException("the record has " + n + " samples, fewer than the window of " + width);
        }
        final double step = RobustStatistics.medianStep(t);
        final double scale = step * halfWidth;
        // uneven[k]: how many of the gaps before sample k differ from the median step by more than
        // EVEN_TOLERANCE of it; a window whose gaps are all even takes the convolution (the same
        // polynomial fit, its weights computed once), any other the local fit on the true times
        final int[] uneven = new int[n];
        for (int k = 1; k < n; k++) {
            uneven[k] = uneven[k - 1] + (Math.abs(t[k] - t[k - 1] - step) > EVEN_TOLERANCE * step ? 1 : 0);
        }
        final double[] w = weights(halfWidth, order, derivative);
        final double unit = derivative == 0 ? 1 : step;
        final LocalPolynomial fit = new LocalPolynomial(order);
        final double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            final int from = Math.max(0, Math.min(i - halfWidth, n - width));
            if (from == i - halfWidth && uneven[from + width - 1] == uneven[from]) {
                double sum = 0;
                for (int j = 0; j < width; j++) {
                    sum += w[j] * y[from + j];
                }
                out[i] = sum / unit;
            } else {
                fit.fit(t, y, from, from + width, t[i], scale);
                out[i] = derivative == 0 ? fit.value() : fit.slope();
            }
        }
        return out;
    }

    /**
     * How far a gap may differ from the median step, as a fraction of it, and still count as even:
     * a millionth, far below the time resolution of the records read (a microsecond at 1 kHz) and far
     * above the rounding of their decimal times.
     */
    static final double EVEN_TOLERANCE = 1e-6;
}
