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
 * <p>The factorisation follows the Jacobian's blocks: a session's own columns (its θ0, release
 * time and offset) are zero outside its rows, so they are reduced first, session by session,
 * with reflections that touch only that session's rows; the shared columns (friction, drag,
 * inertia) are then reduced on the rows left. Any orthogonal reduction serves (the identity
 * above holds for every Q); this one costs a third of a dense factorisation for three sessions.
 * The reduced Jacobian's columns stay in the problem's order (R's columns permuted back).
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
    /** Column-major [J | r]: the reduction overwrites it. */
    private final double[][] work;
    private final int[] rowStarts;
    /** Each session's own free columns, reduced within its rows. */
    private final int[][] own;
    /** The free columns shared by all sessions. */
    private final int[] shared;
    /** The shared columns and r on the rows the sessions' own columns leave. */
    private final double[][] compact;
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
        this.rowStarts = model.sessionRowStarts();
        int[][] sessions = model.sessionOwnColumns();
        for (int s = 0; s < sessions.length; s++) {
            if (rowStarts[s + 1] - rowStarts[s] <= sessions[s].length) {
                // a session too short for its own block: reduce everything densely
                sessions = new int[0][];
                break;
            }
        }
        this.own = sessions;
        final boolean[] owned = new boolean[free];
        int ownCount = 0;
        for (int[] columns : own) {
            for (int c : columns) {
                owned[c] = true;
                ownCount++;
            }
        }
        this.shared = new int[free - ownCount];
        for (int c = 0, t = 0; c < free; c++) {
            if (!owned[c]) {
                shared[t++] = c;
            }
        }
        this.compact = new double[shared.length + 1][rows - ownCount];
    }

    /** The target of the reduced problem: p + 1 zeros (its residual is minus its value). */
    RealVector target() {
        return new ArrayRealVector(free + 1);
    }

    @Override
    public Pair<RealVector, RealMatrix> value(RealVector point) {
        final double[][] a = work;
        final double[] r = a[free];
        final double cost = model.evaluate(point, values, Arrays.copyOf(a, free));
        for (int i = 0; i < rows; i++) {
            r[i] = target[i] - values[i];
        }
        if (cost < bestCost) {
            remember(point, a, r, cost);
        }
        final double[][] reduced = new double[free + 1][free];
        final double[] value = new double[free + 1];
        int pivot = 0;
        // each session's own columns, by reflections within its rows
        for (int s = 0; s < own.length; s++) {
            final int[] columns = own[s];
            final int end = rowStarts[s + 1];
            for (int j = 0; j < columns.length; j++, pivot++) {
                final int row = rowStarts[s] + j;
                final double[] v = a[columns[j]];
                final double alpha = reflector(v, row, end);
                reduced[pivot][columns[j]] = alpha;
                if (alpha != 0) {
                    final double scale = -1 / (alpha * v[row]);
                    for (int l = j + 1; l < columns.length; l++) {
                        reflect(v, a[columns[l]], row, end, scale);
                    }
                    for (int c : shared) {
                        reflect(v, a[c], row, end, scale);
                    }
                    reflect(v, r, row, end, scale);
                }
                for (int l = j + 1; l < columns.length; l++) {
                    reduced[pivot][columns[l]] = a[columns[l]][row];
                }
                for (int c : shared) {
                    reduced[pivot][c] = a[c][row];
                }
                value[pivot] = -r[row];
            }
        }
        // the shared columns on the rows left
        gather(a, r);
        final int f = shared.length;
        final double[] diagonal = factor(compact, f, compact[f].length);
        for (int t = 0; t < f; t++, pivot++) {
            reduced[pivot][shared[t]] = diagonal[t];
            for (int l = t + 1; l < f; l++) {
                reduced[pivot][shared[l]] = compact[l][t];
            }
            value[pivot] = -compact[f][t];
        }
        double tail = 0;
        final double[] rest = compact[f];
        for (int i = f; i < rest.length; i++) {
            tail += rest[i] * rest[i];
        }
        value[free] = -Math.sqrt(tail);
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(reduced, false));
    }

    private void remember(RealVector point, double[][] a, double[] r, double cost) {
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

    /** Copies the shared columns and r, without the sessions' pivot rows, into the compact block. */
    private void gather(double[][] a, double[] r) {
        final int f = shared.length;
        int to = 0;
        int from = 0;
        for (int s = 0; s <= own.length; s++) {
            // the rows from the last session's pivots to the next session's (or the end)
            final int stop = s < own.length ? rowStarts[s] : rows;
            final int length = stop - from;
            if (length > 0) {
                for (int t = 0; t < f; t++) {
                    System.arraycopy(a[shared[t]], from, compact[t], to, length);
                }
                System.arraycopy(r, from, compact[f], to, length);
                to += length;
            }
            if (s < own.length) {
                from = rowStarts[s] + own[s].length;
            }
        }
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
            final double alpha = reflector(v, k, n);
            diagonal[k] = alpha;
            if (alpha == 0) {
                continue;
            }
            final double scale = -1 / (alpha * v[k]);
            for (int j = k + 1; j <= p; j++) {
                reflect(v, a[j], k, n, scale);
            }
        }
        return diagonal;
    }

    /**
     * Turns x = v[from..to) into the Householder vector that maps it onto α e₁ (v[from] − α, the
     * rest unchanged) and returns α = −sign(x₀)‖x‖, or 0 (v untouched) for a zero x.
     */
    private static double reflector(double[] v, int from, int to) {
        double norm2 = 0;
        for (int i = from; i < to; i++) {
            norm2 += v[i] * v[i];
        }
        if (norm2 == 0) {
            return 0;
        }
        final double alpha = v[from] > 0 ? -Math.sqrt(norm2) : Math.sqrt(norm2);
        v[from] -= alpha;
        return alpha;
    }

    /** c ← (I − 2vvᵀ/vᵀv) c on rows from..to; scale = 2/vᵀv = −1/(α v_from). */
    private static void reflect(double[] v, double[] c, int from, int to, double scale) {
        double s = 0;
        for (int i = from; i < to; i++) {
            s += v[i] * c[i];
        }
        final double f = s * scale;
        for (int i = from; i < to; i++) {
            c[i] -= f * v[i];
        }
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
