package dev.penduline.physics.swing;

/**
 * Fits the release instant tr of a body let go from rest: before tr the reading is the still
 * level L, after it {@code L − a τ² + c τ⁴} with {@code τ = t − tr} (the Taylor series of the
 * motion from rest; for a cosine swing {@code c = a ωn²/12}). For a trial tr the model is linear in
 * (L, a, c), so the residual is a function of tr alone: it is scanned on a grid, refined by golden
 * section, and the uncertainty read from where the residual has grown by one residual variance
 * (the profile of the least-squares criterion, e.g. Bates &amp; Watts, Nonlinear Regression
 * Analysis, §6.1). Fitting the level with the parabola, instead of taking it from the still
 * segment alone, keeps a level that quantisation rounded to a whole count from biasing tr.
 */
final class ReleaseFit {

    private final double[] t;
    private final double[] theta;
    private final int from;
    private final int to;
    private final int terms;

    private ReleaseFit(double[] t, double[] theta, int from, int to, int terms) {
        this.t = t;
        this.theta = theta;
        this.from = from;
        this.to = to;
        this.terms = terms;
    }

    /**
     * The release in [lo, hi] for samples [from, to), as {tr, standard uncertainty, count}; null
     * when the samples cannot support the model.
     */
    static double[] fit(double[] t, double[] theta, int from, int to, double lo, double hi, int motionSamples) {
        if (motionSamples < 3 || to - from < 6) {
            return null;
        }
        final ReleaseFit f = new ReleaseFit(t, theta, from, to, motionSamples >= 8 ? 3 : 2);
        final int grid = 200;
        final double step = (hi - lo) / grid;
        double best = lo;
        double bestRss = Double.POSITIVE_INFINITY;
        for (int k = 0; k <= grid; k++) {
            final double tr = lo + k * step;
            final double r = f.rss(tr);
            if (r < bestRss) {
                bestRss = r;
                best = tr;
            }
        }
        double a = Math.max(lo, best - step);
        double b = Math.min(hi, best + step);
        final double golden = 0.5 * (Math.sqrt(5) - 1);
        double c = b - golden * (b - a);
        double d = a + golden * (b - a);
        double fc = f.rss(c);
        double fd = f.rss(d);
        for (int i = 0; i < 50; i++) {
            if (fc < fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - golden * (b - a);
                fc = f.rss(c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + golden * (b - a);
                fd = f.rss(d);
            }
        }
        final double tr = 0.5 * (a + b);
        final double rssMin = f.rss(tr);
        final int dof = to - from - f.terms - 1;
        final double variance = dof > 0 ? rssMin / dof : 0;
        final double sigma = 0.5 * (f.reach(tr, rssMin + variance, -1, step) + f.reach(tr, rssMin + variance, 1, step));
        return new double[] {tr, sigma, to - from};
    }

    /** Distance from tr in a direction to where the residual first reaches the level. */
    private double reach(double tr, double level, int direction, double step) {
        final double h = step / 4;
        for (int k = 1; k <= 4000; k++) {
            if (rss(tr + direction * k * h) >= level) {
                return k * h;
            }
        }
        return 4000 * h;
    }

    private double rss(double tr) {
        final double[][] normal = new double[terms][terms];
        final double[] rhs = new double[terms];
        final double[] x = new double[terms];
        for (int j = from; j < to; j++) {
            basis(t[j] - tr, x);
            for (int p = 0; p < terms; p++) {
                rhs[p] += x[p] * theta[j];
                for (int q = 0; q < terms; q++) {
                    normal[p][q] += x[p] * x[q];
                }
            }
        }
        final double[] beta = LocalPolynomial.solve(normal, rhs, terms);
        if (beta == null) {
            return Double.POSITIVE_INFINITY;
        }
        double rss = 0;
        for (int j = from; j < to; j++) {
            basis(t[j] - tr, x);
            double model = 0;
            for (int p = 0; p < terms; p++) {
                model += beta[p] * x[p];
            }
            rss += (theta[j] - model) * (theta[j] - model);
        }
        return rss;
    }

    private void basis(double tau, double[] x) {
        final double s = tau > 0 ? tau * tau : 0;
        x[0] = 1;
        x[1] = s;
        if (terms > 2) {
            x[2] = s * s;
        }
    }
}
