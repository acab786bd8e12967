package dev.penduline.physics.swing;

/**
 * Fits the release instant tr of a body let go from rest: before tr the reading is the still
 * level L, after it {@code L − a τ² + c τ⁴} with {@code τ = t − tr} (the Taylor series of the
 * motion from rest; for a cosine swing {@code c = a ωn²/12}). For a trial tr the model is linear in
 * (L, a, c), so the residual is a function of tr alone: it is minimised and the uncertainty read
 * from its profile by {@link ProfileScan}. Fitting the level with the parabola, instead of taking
 * it from the still segment alone, keeps a level that quantisation rounded to a whole count from
 * biasing tr.
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
        final double[] fit = ProfileScan.minimise(f::rss, lo, hi, to - from - f.terms - 1);
        return new double[] {fit[0], fit[1], to - from};
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
