package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.MultivariateJacobianFunction;
import org.hipparchus.util.Pair;

/**
 * The model of a joint fit: for each session, {@code θ_model(t) = offset + x(t − t_r)}, where x
 * is the deviation of a release from rest at θ0 (held before t_r), and the Jacobian of all
 * sessions' samples with respect to the scaled free parameters.
 *
 * <p>Columns: integrated sensitivities for θ0, b, Tc, c and J0 (see {@link SensitivitySwing});
 * {@code ∂θ/∂t_r = −ω(t − t_r)} and {@code ∂θ/∂offset = 1} analytically. Not thread-safe: one
 * instance per optimisation. It remembers the lowest-cost evaluation, so that a fit stopped by
 * a limit or by cancellation can still report where it was.
 */
final class JointModel implements MultivariateJacobianFunction {

    private final ParameterLayout layout;
    private final double[] base;
    private final List<StageSamples> data;
    private final double stiffness;
    private final double stiction;
    private final double tolerance;
    private final BooleanSupplier cancel;
    private final List<SensitivitySwing> swings = new ArrayList<>();
    /** Swings without sensitivities, made on first use, for evaluations without a Jacobian. */
    private final SensitivitySwing[] plain;
    private final List<int[]> sessionColumns = new ArrayList<>();
    private final double[][] tau;
    private final int rows;
    private final double[] target;

    private int evaluations;
    private double bestCost = Double.POSITIVE_INFINITY;
    private double[] bestFull;

    JointModel(ParameterLayout layout, double[] base, List<StageSamples> data, double stiffness,
            double stiction, double tolerance, BooleanSupplier cancel) {
        this.layout = layout;
        this.base = base.clone();
        this.data = List.copyOf(data);
        this.stiffness = stiffness;
        this.stiction = stiction;
        this.tolerance = tolerance;
        this.cancel = cancel;
        this.tau = new double[data.size()][];
        this.plain = new SensitivitySwing[data.size()];
        int n = 0;
        for (int s = 0; s < data.size(); s++) {
            final int size = data.get(s).size();
            n += size;
            tau[s] = new double[size];
            final List<ParameterKind> kinds = new ArrayList<>();
            final List<Integer> cols = new ArrayList<>();
            final int theta = ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE);
            if (layout.isFree(theta)) {
                kinds.add(ParameterKind.RELEASE_ANGLE);
                cols.add(layout.column(theta));
            }
            for (ParameterKind k : new ParameterKind[] {ParameterKind.VISCOUS, ParameterKind.COULOMB,
                ParameterKind.DRAG, ParameterKind.INERTIA}) {
                final int i = ParameterLayout.index(k);
                if (layout.isFree(i)) {
                    kinds.add(k);
                    cols.add(layout.column(i));
                }
            }
            swings.add(new SensitivitySwing(size, kinds.toArray(new ParameterKind[0])));
            sessionColumns.add(cols.stream().mapToInt(Integer::intValue).toArray());
        }
        this.rows = n;
        this.target = new double[n];
        int r = 0;
        for (StageSamples d : data) {
            System.arraycopy(d.angles(), 0, target, r, d.size());
            r += d.size();
        }
    }

    /** The measured angles of every session, concatenated (rad). */
    RealVector target() {
        return new ArrayRealVector(target, true);
    }

    int rows() {
        return rows;
    }

    /**
     * The first row of each session, and one past the last row: the Jacobian is zero in a
     * session's own columns (its θ0, release time and offset) outside that session's rows.
     */
    int[] sessionRowStarts() {
        final int[] starts = new int[data.size() + 1];
        for (int s = 0; s < data.size(); s++) {
            starts[s + 1] = starts[s] + data.get(s).size();
        }
        return starts;
    }

    /** The free columns of each session's own parameters (θ0, release time, offset), in order. */
    int[][] sessionOwnColumns() {
        final int[][] own = new int[data.size()][];
        for (int s = 0; s < data.size(); s++) {
            final int[] columns = new int[ParameterLayout.PER_SESSION];
            int count = 0;
            for (ParameterKind k : ParameterLayout.NUISANCE) {
                final int c = layout.column(ParameterLayout.index(s, k));
                if (c >= 0) {
                    columns[count++] = c;
                }
            }
            own[s] = Arrays.copyOf(columns, count);
        }
        return own;
    }

    /** The number of free (scaled) parameters: the Jacobian's columns. */
    int freeCount() {
        return layout.freeCount();
    }

    @Override
    public Pair<RealVector, RealMatrix> value(RealVector point) {
        final double[] values = new double[rows];
        final double[][] columns = new double[layout.freeCount()][rows];
        evaluate(point, values, columns);
        return new Pair<>(new ArrayRealVector(values, false), rowMajor(columns, rows));
    }

    /** A Jacobian given column by column as a matrix (one row per sample). */
    static RealMatrix rowMajor(double[][] columns, int rows) {
        final double[][] jacobian = new double[rows][columns.length];
        for (int k = 0; k < columns.length; k++) {
            final double[] column = columns[k];
            for (int i = 0; i < rows; i++) {
                jacobian[i][k] = column[i];
            }
        }
        return new Array2DRowRealMatrix(jacobian, false);
    }

    /**
     * One counted evaluation with its Jacobian, written column by column (the layout the
     * reduction of {@link ReducedProblem} reads); it remembers the lowest cost as {@link #value} does.
     *
     * @param point   the scaled free parameters
     * @param values  on return, the model's value at every sample
     * @param columns on return, {@code columns[k][i]}: ∂value_i/∂(scaled free parameter k)
     * @return the residual sum of squares
     */
    double evaluate(RealVector point, double[] values, double[][] columns) {
        if (cancel != null && cancel.getAsBoolean()) {
            throw new FitCancelledException();
        }
        final double[] full = layout.expand(point, base);
        evaluate(full, values, columns);
        evaluations++;
        double cost = 0;
        for (int i = 0; i < rows; i++) {
            final double r = target[i] - values[i];
            cost += r * r;
        }
        if (cost < bestCost) {
            bestCost = cost;
            bestFull = full;
        }
        return cost;
    }

    /**
     * Model values and (when columns is not null) the Jacobian's columns at a full vector. Without
     * a Jacobian no sensitivities are integrated (the values are the same: the steps follow the
     * motion alone), and the evaluation is not counted. The columns are overwritten whole (a
     * session's rows are zero in the columns of the other sessions' own parameters).
     */
    void evaluate(double[] full, double[] values, double[][] columns) {
        if (columns != null) {
            for (double[] column : columns) {
                Arrays.fill(column, 0);
            }
        }
        final double b = full[ParameterLayout.index(ParameterKind.VISCOUS)];
        final double tc = full[ParameterLayout.index(ParameterKind.COULOMB)];
        final double c = full[ParameterLayout.index(ParameterKind.DRAG)];
        final double j = full[ParameterLayout.index(ParameterKind.INERTIA)];
        int row = 0;
        for (int s = 0; s < data.size(); s++) {
            final double theta0 = full[ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE)];
            final double release = full[ParameterLayout.index(s, ParameterKind.RELEASE_TIME)];
            final double offset = full[ParameterLayout.index(s, ParameterKind.OFFSET)];
            final double[] t = data.get(s).times();
            final double[] ts = tau[s];
            for (int i = 0; i < t.length; i++) {
                ts[i] = t[i] - release;
            }
            final SensitivitySwing swing = columns != null ? swings.get(s) : plainSwing(s);
            swing.configure(stiffness, j, b, tc, stiction, c, tolerance, cancel);
            swing.run(theta0, ts, 0, t.length);
            final int[] cols = sessionColumns.get(s);
            final int releaseColumn = layout.column(ParameterLayout.index(s, ParameterKind.RELEASE_TIME));
            final int offsetColumn = layout.column(ParameterLayout.index(s, ParameterKind.OFFSET));
            final double releaseScale = layout.scale(ParameterLayout.index(s, ParameterKind.RELEASE_TIME));
            final double offsetScale = layout.scale(ParameterLayout.index(s, ParameterKind.OFFSET));
            final double[] colScale = new double[cols.length];
            for (int k = 0; k < cols.length; k++) {
                colScale[k] = layout.scale(layout.fullIndex(cols[k]));
            }
            final EncoderRounding rounding = data.get(s).rounding();
            final double[] expected = new double[2];
            for (int i = 0; i < t.length; i++, row++) {
                double slope = 1;
                values[row] = offset + swing.angle[i];
                if (rounding != null) {
                    // the expected encoder reading of the modelled angle, and the chain rule
                    rounding.expected(values[row], expected);
                    values[row] = expected[0];
                    slope = expected[1];
                }
                if (columns == null) {
                    continue;
                }
                for (int k = 0; k < cols.length; k++) {
                    columns[cols[k]][row] = swing.sensitivity[k][i] * colScale[k] * slope;
                }
                if (releaseColumn >= 0) {
                    columns[releaseColumn][row] = -swing.velocity[i] * releaseScale * slope;
                }
                if (offsetColumn >= 0) {
                    columns[offsetColumn][row] = offsetScale * slope;
                }
            }
        }
    }

    private SensitivitySwing plainSwing(int session) {
        if (plain[session] == null) {
            plain[session] = new SensitivitySwing(data.get(session).size(), new ParameterKind[0]);
        }
        return plain[session];
    }

    int evaluations() {
        return evaluations;
    }

    double bestCost() {
        return bestCost;
    }

    /** The full vector of the lowest-cost evaluation so far, or null before the first. */
    double[] bestFull() {
        return bestFull == null ? null : bestFull.clone();
    }
}
