package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Standard errors and correlations from the Jacobian at the optimum.
 *
 * <p>Asymptotic covariance of nonlinear least squares: {@code σ² (JᵀJ)⁻¹} with
 * {@code σ² = RSS / (n − p)} (Seber &amp; Wild, Nonlinear Regression, §2.1). Hipparchus'
 * {@code Optimum.getCovariances} returns the unscaled {@code (JᵀJ)⁻¹}, hence the explicit
 * σ². Parameters on their bound are treated as held there: their columns are dropped and they
 * get no σ. The normal matrix is equilibrated (columns scaled to unit norm) before its
 * pseudo-inverse, so that rank deficiency shows as a tiny singular value rather than as
 * rounding noise.
 *
 * @param sigma         standard error per full index (SI); NaN where not free or on bound
 * @param names         names of the parameters in the correlation matrix
 * @param indices       their full indices
 * @param correlation   the correlation matrix
 * @param rankDeficient whether the Jacobian was (nearly) rank deficient
 */
record Uncertainty(double[] sigma, List<String> names, int[] indices, double[][] correlation,
        boolean rankDeficient) {

    /**
     * Singular values of the equilibrated normal matrix below this fraction of the largest
     * count as zero: a Jacobian condition number above 1e6 (correlations beyond 1 − 1e-12).
     */
    private static final double RANK_TOLERANCE = 1e-12;

    static Uncertainty of(RealMatrix jacobian, ParameterLayout layout, double[] full, double rss, int rows) {
        return of(jacobian, layout, full, rss, rows, null);
    }

    /**
     * The standard errors, in the sandwich form when the residuals are given.
     *
     * <p>The classical {@code σ²(JᵀJ)⁻¹} holds for independent residuals of equal variance.
     * Residuals of a swing record are often neither: a filtering sensor correlates them, and an
     * encoder's rounding makes their variance depend on where the angle sits between counts.
     * The sandwich {@code (JᵀJ)⁻¹ M (JᵀJ)⁻¹} with M the covariance of the score sums
     * {@code Σ J_iᵀ r_i} allows for both (Huber 1967; White, Econometrica 48, 1980; for
     * correlation Newey &amp; West, Econometrica 55, 1987). M is estimated by batch means: the
     * score summed over consecutive blocks of ten correlation times of the residuals
     * ({@code (1 + ρ1)/(1 − ρ1)}), at least one sample (then it is White's estimator), and the
     * outer products of the block sums added up; blocks cut the correlation at their joints, so
     * the bias is about one correlation time in ten. Scaled by n/(n − p), as the classical form.
     *
     * @param residuals measured − model (rad), or null for the classical form
     */
    static Uncertainty of(RealMatrix jacobian, ParameterLayout layout, double[] full, double rss, int rows,
            double[] residuals) {
        final double[] sigma = new double[layout.size()];
        Arrays.fill(sigma, Double.NaN);
        final List<Integer> active = new ArrayList<>();
        for (int c = 0; c < layout.freeCount(); c++) {
            final int i = layout.fullIndex(c);
            if (!layout.onBound(i, full[i])) {
                active.add(c);
            }
        }
        final int q = active.size();
        final int dof = rows - layout.freeCount();
        if (q == 0 || dof <= 0 || jacobian == null) {
            return new Uncertainty(sigma, List.of(), new int[0], new double[0][0], false);
        }
        // normal matrix of the active, equilibrated columns (each column read once, contiguous;
        // every sum runs over the rows in order, as a row-by-row loop would)
        final double[] norms = new double[q];
        final double[][] normal = new double[q][q];
        final int n = jacobian.getRowDimension();
        final double[][] columns = new double[q][];
        for (int a = 0; a < q; a++) {
            columns[a] = jacobian.getColumn(active.get(a));
        }
        for (int a = 0; a < q; a++) {
            for (int b = 0; b <= a; b++) {
                normal[a][b] = dot(columns[a], columns[b]);
            }
        }
        for (int a = 0; a < q; a++) {
            norms[a] = Math.sqrt(normal[a][a]);
        }
        boolean deficient = false;
        for (int a = 0; a < q; a++) {
            for (int b = 0; b <= a; b++) {
                final double v = norms[a] > 0 && norms[b] > 0 ? normal[a][b] / (norms[a] * norms[b]) : 0;
                normal[a][b] = v;
                normal[b][a] = v;
            }
            deficient |= norms[a] == 0;
        }
        final SingularValueDecomposition svd = new SingularValueDecomposition(MatrixUtils.createRealMatrix(normal));
        final double[] singular = svd.getSingularValues();
        // the normal matrix squares the Jacobian's singular values
        deficient |= singular[q - 1] < RANK_TOLERANCE * singular[0];
        RealMatrix inverse = svd.getSolver().getInverse();
        double variance = rss / dof;
        if (residuals != null && residuals.length == n) {
            inverse = sandwich(inverse, columns, norms, residuals).scalarMultiply((double) n / dof);
            variance = 1;
        }
        final double[][] correlation = new double[q][q];
        final List<String> names = new ArrayList<>();
        final int[] indices = new int[q];
        for (int a = 0; a < q; a++) {
            final int i = layout.fullIndex(active.get(a));
            indices[a] = i;
            names.add(layout.name(i));
            sigma[i] = layout.scale(i) * Math.sqrt(variance * inverse.getEntry(a, a)) / norms[a];
            for (int b = 0; b < q; b++) {
                correlation[a][b] = inverse.getEntry(a, b)
                        / Math.sqrt(inverse.getEntry(a, a) * inverse.getEntry(b, b));
            }
        }
        return new Uncertainty(sigma, List.copyOf(names), indices, correlation, deficient);
    }

    /** Block length of the batch means, in correlation times of the residuals. */
    private static final double CORRELATION_TIMES = 10;

    /** A⁻¹ M A⁻¹ on the equilibrated active columns, M from batch means of the score. */
    private static RealMatrix sandwich(RealMatrix inverse, double[][] columns, double[] norms, double[] residuals) {
        final int q = columns.length;
        final int n = residuals.length;
        final double rho = Math.max(0, Math.min(0.99, RecordSignals.lag1(residuals, 0, n)));
        final int block = (int) Math.max(1, Math.min(n / 20.0, Math.ceil(CORRELATION_TIMES * (1 + rho) / (1 - rho))));
        final double[][] meat = new double[q][q];
        final double[] sum = new double[q];
        for (int start = 0; start < n; start += block) {
            Arrays.fill(sum, 0);
            for (int r = start; r < Math.min(n, start + block); r++) {
                for (int a = 0; a < q; a++) {
                    sum[a] += columns[a][r] / norms[a] * residuals[r];
                }
            }
            for (int a = 0; a < q; a++) {
                for (int b = 0; b <= a; b++) {
                    meat[a][b] += sum[a] * sum[b];
                }
            }
        }
        for (int a = 0; a < q; a++) {
            for (int b = 0; b < a; b++) {
                meat[b][a] = meat[a][b];
            }
        }
        return inverse.multiply(MatrixUtils.createRealMatrix(meat)).multiply(inverse);
    }

    private static double dot(double[] x, double[] y) {
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            sum += x[i] * y[i];
        }
        return sum;
    }
}
