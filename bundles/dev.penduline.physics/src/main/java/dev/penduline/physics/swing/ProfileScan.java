package dev.penduline.physics.swing;

import java.util.function.DoubleUnaryOperator;

/**
 * Minimises a least-squares criterion over one nonlinear parameter, the others being linear and
 * solved inside the criterion: a grid over the interval, then golden-section refinement, and the
 * standard uncertainty read from where the residual has grown by one residual variance (the
 * profile of the least-squares criterion, e.g. Bates &amp; Watts, Nonlinear Regression Analysis,
 * §6.1).
 */
final class ProfileScan {

    private static final int GRID = 200;

    private ProfileScan() {
    }

    /**
     * The minimum of {@code rss} in [lo, hi] as {parameter, standard uncertainty}.
     *
     * @param rss residual sum of squares as a function of the parameter
     * @param lo  lower end of the interval
     * @param hi  upper end, &gt; lo
     * @param dof degrees of freedom of the residual (samples less fitted parameters)
     * @return {parameter, uncertainty}
     */
    static double[] minimise(DoubleUnaryOperator rss, double lo, double hi, int dof) {
        final double x = argmin(rss, lo, hi);
        final double step = (hi - lo) / GRID;
        final double rssMin = rss.applyAsDouble(x);
        final double variance = dof > 0 ? rssMin / dof : 0;
        final double sigma = 0.5 * (reach(rss, x, rssMin + variance, -1, step)
                + reach(rss, x, rssMin + variance, 1, step));
        return new double[] {x, sigma};
    }

    /**
     * Where {@code rss} is least in [lo, hi]: the best of a grid, refined by golden section
     * between its neighbours.
     *
     * @param rss the criterion
     * @param lo  lower end of the interval
     * @param hi  upper end, &gt; lo
     * @return the parameter
     */
    static double argmin(DoubleUnaryOperator rss, double lo, double hi) {
        final double step = (hi - lo) / GRID;
        double best = lo;
        double bestRss = Double.POSITIVE_INFINITY;
        for (int k = 0; k <= GRID; k++) {
            final double x = lo + k * step;
            final double r = rss.applyAsDouble(x);
            if (r < bestRss) {
                bestRss = r;
                best = x;
            }
        }
        double a = Math.max(lo, best - step);
        double b = Math.min(hi, best + step);
        final double golden = 0.5 * (Math.sqrt(5) - 1);
        double c = b - golden * (b - a);
        double d = a + golden * (b - a);
        double fc = rss.applyAsDouble(c);
        double fd = rss.applyAsDouble(d);
        for (int i = 0; i < 50; i++) {
            if (fc < fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - golden * (b - a);
                fc = rss.applyAsDouble(c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + golden * (b - a);
                fd = rss.applyAsDouble(d);
            }
        }
        return 0.5 * (a + b);
    }

    /** Distance from x in a direction to where the residual first reaches the level. */
    private static double reach(DoubleUnaryOperator rss, double x, double level, int direction, double step) {
        final double h = step / 4;
        for (int k = 1; k <= 4000; k++) {
            if (rss.applyAsDouble(x + direction * k * h) >= level) {
                return k * h;
            }
        }
        return 4000 * h;
    }
}
