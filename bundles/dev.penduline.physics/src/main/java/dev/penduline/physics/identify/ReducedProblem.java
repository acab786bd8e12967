package dev.penduline.physics.identify;

import java.util.Arrays;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.MultivariateJacobianFunction;
import org.hipparchus.util.Pair;

/**
 * A {@link JointModel}'s least-squares problem handed to Levenberg–Marquardt in p + 1 rows
 * instead of one row per sample, with the same cost, gradient and Gauss–Newton model.
 *
 * <p>At each point the Householder factorisation of the augmented matrix {@code [J | r]} (J the
 * n × p Jacobian, r = target − values) gives {@code J = Q R} and {@code c = Qᵀ r}, and the norm
 * e of the part of r outside J's columns. Then {@code ‖r − J δ‖² = ‖c − R δ‖² + e²} for every
 * step δ — the classic reduction of a linear least-squares problem (Golub &amp; Van Loan, "Matrix
 * Computations", 4th ed., §5.3.3 and §5.2.1 for the algorithm) — so the reduced residual
 * {@code [c; e]} with Jacobian {@code [R; 0]} has the cost, the gradient {@code Jᵀ r = Rᵀ c}, the
 * column norms and the local model of the full one, and the optimiser takes the same steps. It
 * no longer factors and copies an n × p matrix at every iteration (for 90 000 samples that was a
 * fifth of a fit's time and most of its garbage). The trial points' costs are exact: e is
 * computed from the residual, not from a difference of squares.
 *
 * <p>It keeps the full residuals and Jacobian of the lowest-cost point evaluated, which is where
 * a successful optimisation ends (the optimiser accepts only steps that lower the cost), so the
 * stage's outcome carries them as before. One instance per optimisation; not thread-safe.
 */
final class ReducedProblem implements MultivariateJacobianFunction {

    private final JointModel model;
    private final double[] target;
    private final int rows;
    private final int free;
    private final double[] values;
    /** Column-major working copy of [J | r]: the factorisation overwrites it. */
    private final double[][] work;
    private double bestCost = Double.POSITIVE_INFINITY;
    private double[] bestPoint;
    private double[] bestResiduals;
    private double[][] bestColumns;

    ReducedProblem(JointModel model) {
        this.model = model;
        this.target = model.target().toArray();
        this.rows = target.length;
        this.free = model.freeCount();
        this.values = new double[rows];
        this.work = new double[free + 1][rows];
    }

    /** The target of the reduced problem: p + 1 zeros (its residual is minus its value). */
    RealVector target() {
        return new ArrayRealVector(free + 1);
    }

    @Override
    public Pair<RealVector, RealMatrix> value(RealVector point) {
        final double[][] a = work;
        final double[] r = a[free];
        final double[][] columns = Arrays.copyOf(a, free);
        final double cost = model.evaluate(point, values, columns);
        for (int i = 0; i < rows; i++) {
            r[i] = target[i] - values[i];
        }
        if (cost < bestCost) {
            bestCost = cost;
            bestPoint = point.toArray();
            if (bestColumns == null) {
                bestColumns = new double[free][rows];
                bestResiduals = new double[rows];
            }
            for (int k = 0; k < free; k++) {
                System.arraycopy(a[k], 0, bestColumns[k], 0, rows);
            }
            System.arraycopy(r, 0, bestResiduals, 0, rows);
        }
        final double[] diagonal = factor(a, free, rows);
        final double[][] reduced = new double[free + 1][free];
        final double[] value = new double[free + 1];
        for (int k = 0; k < free; k++) {
            reduced[k][k] = diagonal[k];
            for (int j = k + 1; j < free; j++) {
                reduced[k][j] = a[j][k];
            }
            value[k] = -r[k];
        }
        double tail = 0;
        for (int i = free; i < rows; i++) {
            tail += r[i] * r[i];
        }
        value[free] = -Math.sqrt(tail);
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(reduced, false));
    }

    /**
     * Householder QR in place of the column-major n × (p + 1) matrix a, without pivoting (the
     * optimiser pivots on R): on return {@code a[j][k]} for k &lt; j holds R's entries above the
     * diagonal and, in the last column, {@code Qᵀ r}; a zero column leaves a zero on R's diagonal.
     *
     * @return R's diagonal
     */
    static double[] factor(double[][] a, int p, int n) {
        final double[] diagonal = new double[p];
        for (int k = 0; k < p; k++) {
            final double[] v = a[k];
            double norm2 = 0;
            for (int i = k; i < n; i++) {
                norm2 += v[i] * v[i];
            }
            if (norm2 == 0) {
                continue;
            }
            final double alpha = v[k] > 0 ? -Math.sqrt(norm2) : Math.sqrt(norm2);
            diagonal[k] = alpha;
            v[k] -= alpha;
            // vᵀv = ‖x‖² − 2αx_k + α² = −2α v_k
            final double scale = -1 / (alpha * v[k]);
            for (int j = k + 1; j <= p; j++) {
                final double[] c = a[j];
                double s = 0;
                for (int i = k; i < n; i++) {
                    s += v[i] * c[i];
                }
                final double f = s * scale;
                for (int i = k; i < n; i++) {
                    c[i] -= f * v[i];
                }
            }
        }
        return diagonal;
    }

    /**
     * The full residuals at a point, if it is the lowest-cost point evaluated, else null.
     *
     * @param point the scaled free parameters
     * @return target − values at every sample, or null
     */
    double[] residualsAt(RealVector point) {
        return bestPoint != null && Arrays.equals(bestPoint, point.toArray()) ? bestResiduals.clone() : null;
    }

    /**
     * The full Jacobian at a point, if it is the lowest-cost point evaluated, else null.
     *
     * @param point the scaled free parameters
     * @return the n × p Jacobian of the model's values, or null
     */
    RealMatrix jacobianAt(RealVector point) {
        if (bestPoint == null || !Arrays.equals(bestPoint, point.toArray())) {
            return null;
        }
        return JointModel.rowMajor(bestColumns, rows);
    }
}
