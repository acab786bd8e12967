package dev.penduline.physics.forecast;

import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.random.CorrelatedRandomVectorGenerator;
import org.hipparchus.random.GaussianRandomGenerator;
import org.hipparchus.random.Well19937c;

import dev.penduline.physics.InvalidValueException;

/**
 * Parameter sets drawn from a multivariate normal distribution with given means, standard
 * deviations and correlations (Hipparchus' {@link CorrelatedRandomVectorGenerator}, which
 * copes with a covariance that is only positive semi-definite). The same seed gives the same
 * draws.
 */
public final class ParameterDraws {

    /** Correlations are symmetric to this tolerance, and lie in [−1, 1] within it. */
    private static final double CORRELATION_SLACK = 1e-9;
    /** Eigenvalues of the covariance below this fraction of its largest are taken as zero. */
    private static final double RANK_THRESHOLD = 1e-12;

    private ParameterDraws() {
    }

    /**
     * Draws parameter sets.
     *
     * @param mean        the means, one per parameter
     * @param sigma       the standard deviations, ≥ 0 (0 keeps a parameter at its mean)
     * @param correlation the correlation matrix (k × k), symmetric with a unit diagonal
     * @param count       how many sets, &gt; 0
     * @param seed        the random generator's seed
     * @return {@code count} rows of {@code k} values
     */
    public static double[][] draw(double[] mean, double[] sigma, double[][] correlation, int count, long seed) {
        final int k = mean.length;
        if (sigma.length != k || correlation.length != k) {
            throw new IllegalArgumentException("mean, sigma and correlation must have one entry per parameter");
        }
        if (count <= 0) {
            throw new IllegalArgumentException("count must be positive, got " + count);
        }
        final double[][] cov = new double[k][k];
        double largest = 0;
        for (int i = 0; i < k; i++) {
            if (!(sigma[i] >= 0) || Double.isInfinite(sigma[i]) || !Double.isFinite(mean[i])) {
                throw new InvalidValueException("parameter " + i + ": mean " + mean[i] + ", sigma " + sigma[i]
                        + " (finite values and sigma >= 0 needed)");
            }
            if (correlation[i].length != k) {
                throw new IllegalArgumentException("correlation row " + i + " has " + correlation[i].length
                        + " entries, expected " + k);
            }
            for (int j = 0; j < k; j++) {
                final double r = i == j ? 1 : correlation[i][j];
                if (!(Math.abs(r) <= 1 + CORRELATION_SLACK) || Math.abs(r - correlation[j][i]) > CORRELATION_SLACK) {
                    throw new InvalidValueException("correlation[" + i + "][" + j + "] = " + r
                            + ": a correlation matrix is symmetric with entries in [-1, 1]");
                }
                cov[i][j] = Math.max(-1, Math.min(1, r)) * sigma[i] * sigma[j];
            }
            largest = Math.max(largest, cov[i][i]);
        }
        final double[][] out = new double[count][];
        if (largest == 0) {
            for (int n = 0; n < count; n++) {
                out[n] = mean.clone();
            }
            return out;
        }
        final RealMatrix covariance = new Array2DRowRealMatrix(cov, false);
        final CorrelatedRandomVectorGenerator generator;
        try {
            generator = new CorrelatedRandomVectorGenerator(mean, covariance, RANK_THRESHOLD * largest,
                    new GaussianRandomGenerator(new Well19937c(seed)));
        } catch (MathIllegalArgumentException e) {
            throw new InvalidValueException("the correlations are not those of any set of parameters (the table is not"
                    + " positive semi-definite)", e);
        }
        for (int n = 0; n < count; n++) {
            out[n] = generator.nextVector();
        }
        return out;
    }
}
