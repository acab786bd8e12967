package dev.penduline.physics.swing;

/**
 * Ordinary least-squares straight line {@code y = intercept + slope·x} (the textbook simple
 * regression, e.g. Draper &amp; Smith, Applied Regression Analysis, ch. 1), and r² of any model
 * against data.
 */
record StraightLine(double intercept, double slope) {

    /** Fits {@code y[i]} against {@code x[i]} for i in [0, n); needs n ≥ 2 distinct x. */
    static StraightLine fit(double[] x, double[] y, int n) {
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i];
            my += y[i];
        }
        mx /= n;
        my /= n;
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            sxx += (x[i] - mx) * (x[i] - mx);
            sxy += (x[i] - mx) * (y[i] - my);
        }
        final double slope = sxy / sxx;
        return new StraightLine(my - slope * mx, slope);
    }

    /** Coefficient of determination 1 − RSS/TSS of model values against data. */
    static double rSquared(double[] data, double[] model, int n) {
        double mean = 0;
        for (int i = 0; i < n; i++) {
            mean += data[i];
        }
        mean /= n;
        double rss = 0;
        double tss = 0;
        for (int i = 0; i < n; i++) {
            rss += (data[i] - model[i]) * (data[i] - model[i]);
            tss += (data[i] - mean) * (data[i] - mean);
        }
        return tss > 0 ? 1 - rss / tss : (rss == 0 ? 1 : 0);
    }
}
