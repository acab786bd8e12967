package dev.penduline.physics.identify;

import java.util.List;

import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;

/**
 * A refit of resampled data that starts at the optimum of the original fit and stops as soon
 * as it has arrived: the resampling refits' fast path.
 *
 * <p>A resampled record is the fitted trajectory plus resampled residuals e*, so at the
 * optimum p̂ the residual of the new data is e* itself, and the Gauss–Newton step on the
 * optimum's Jacobian J is {@code δ = (JᵀJ)⁻¹ Jᵀ e*} — no model evaluation. The step is exact
 * for a model linear in its parameters; for ours it is checked and corrected: the model is
 * evaluated at the new point (values only, no sensitivities), and the step on the residual
 * there, with the same J (the chord, or simplified Gauss–Newton, method: Dennis &amp; Schnabel,
 * "Numerical Methods for Unconstrained Optimization and Nonlinear Equations", SIAM 1996,
 * §5.4, from memory), is taken until it is below {@link #SETTLED} of every parameter's standard
 * error. The point it settles at solves {@code Jᵀ r(p) = 0} with J from p̂ instead of p: the
 * two differ by the change of J over a step of the size of the spread times a residual of the
 * size of the noise, a second-order amount far below the spread it measures.
 *
 * <p>A refit that reaches a bound (a friction term at zero), does not settle within
 * {@link #MAX_CORRECTIONS} evaluations or raises its cost is left to the full
 * Levenberg–Marquardt refit (the caller's fallback), so that the fast path never stands for a
 * point it has not reached. Immutable and thread-safe; each refit keeps its own model.
 */
final class OptimumRefit {

    /** A correction step this small in standard errors ends the refit. */
    static final double SETTLED = 0.01;
    /** Model evaluations a refit may take before it is handed to the full refit. */
    static final int MAX_CORRECTIONS = 4;

    private final ParameterLayout layout;
    private final double[] optimum;
    private final RealVector scaledOptimum;
    /** The optimum's Jacobian of the model, transposed: one row per free parameter (scaled). */
    private final double[][] transposed;
    private final DecompositionSolver normal;
    private final double[] sigma;

    private OptimumRefit(ParameterLayout layout, double[] optimum, double[][] transposed, DecompositionSolver normal,
            double[] sigma) {
        this.layout = layout;
        this.optimum = optimum.clone();
        this.scaledOptimum = layout.scaled(optimum);
        this.transposed = transposed;
        this.normal = normal;
        this.sigma = sigma;
    }

    /**
     * The fast path at an optimum, or null when it cannot serve (no Jacobian, or one whose
     * normal matrix is singular).
     *
     * @param layout   the fit's layout
     * @param optimum  the optimum (full vector, SI)
     * @param jacobian the model's Jacobian at the optimum in the layout's scaled free columns
     * @param rss      the residual sum of squares at the optimum
     */
    static OptimumRefit at(ParameterLayout layout, double[] optimum, RealMatrix jacobian, double rss) {
        if (jacobian == null || jacobian.getColumnDimension() != layout.freeCount()) {
            return null;
        }
        final int n = jacobian.getRowDimension();
        final int p = jacobian.getColumnDimension();
        if (n <= p) {
            return null;
        }
        final double[][] t = jacobian.transpose().getData();
        final double[][] a = new double[p][p];
        for (int k = 0; k < p; k++) {
            for (int l = 0; l <= k; l++) {
                a[k][l] = dot(t[k], t[l]);
                a[l][k] = a[k][l];
            }
        }
        final DecompositionSolver solver = new QRDecomposition(MatrixUtils.createRealMatrix(a), 1e-13).getSolver();
        if (!solver.isNonSingular()) {
            return null;
        }
        final RealMatrix inverse = solver.getInverse();
        final double variance = rss / (n - p);
        final double[] sigma = new double[p];
        for (int k = 0; k < p; k++) {
            sigma[k] = Math.sqrt(Math.max(0, variance * inverse.getEntry(k, k)));
            if (!(sigma[k] > 0) || !Double.isFinite(sigma[k])) {
                return null;
            }
        }
        return new OptimumRefit(layout, optimum, t, solver, sigma);
    }

    /**
     * Refits data from the optimum and gives the cost it reached.
     *
     * @param data        the sessions to refit: for the bootstrap, the fitted trajectory plus
     *                    resampled residuals
     * @param atOptimum   the model's values at the optimum for this data's measurement model,
     *                    when the caller knows them (the bootstrap: the fitted trajectory, the
     *                    same for every replicate), or null to run the model there
     * @param stiffness   gravity stiffness K (N·m/rad)
     * @param stiction    holding torque (N·m), 0 meaning "as Coulomb"
     * @param settings    the integration tolerance
     * @param control     cancellation and progress
     * @param stage       name reported to the monitor
     * @param reachedCost on return, {@code reachedCost[0]} is the residual sum of squares at the
     *                    last point the model was run at (the final correction, below a
     *                    hundredth of a standard error, changes it by less than 1e-4 of the
     *                    noise variance)
     * @return the refitted full vector (SI), or null when the full refit must do it
     */
    double[] refit(List<StageSamples> data, double[] atOptimum, double stiffness, double stiction,
            FitSettings settings, FitControl control, String stage, double[] reachedCost) {
        final JointModel model = new JointModel(layout, optimum, data, stiffness, stiction,
                settings.integrationTolerance(), control.cancelled());
        final double[] target = model.target().toArray();
        final double[] values = new double[target.length];
        final double[] r = new double[target.length];
        if (atOptimum != null) {
            System.arraycopy(atOptimum, 0, values, 0, values.length);
        } else {
            model.evaluate(optimum, values, null);
        }
        double cost = residual(target, values, r);
        RealVector u = scaledOptimum.add(step(r));
        for (int evaluation = 1; evaluation <= MAX_CORRECTIONS; evaluation++) {
            if (!inside(u)) {
                return null;
            }
            final double[] full = layout.expand(u, optimum);
            model.evaluate(full, values, null);
            final double next = residual(target, values, r);
            control.monitor().evaluated(stage, evaluation, Math.sqrt(next / target.length));
            if (!(next <= cost * (1 + 1e-9))) {
                return null;
            }
            cost = next;
            reachedCost[0] = next;
            final RealVector correction = step(r);
            u = u.add(correction);
            if (settled(correction)) {
                return inside(u) ? layout.expand(u, optimum) : null;
            }
        }
        return null;
    }

    /** The Gauss–Newton step on the optimum's Jacobian for a residual (scaled free columns). */
    private RealVector step(double[] residual) {
        final double[] g = new double[transposed.length];
        for (int k = 0; k < g.length; k++) {
            g[k] = dot(transposed[k], residual);
        }
        return normal.solve(new ArrayRealVector(g, false));
    }

    private boolean settled(RealVector correction) {
        for (int k = 0; k < sigma.length; k++) {
            if (!(Math.abs(correction.getEntry(k)) <= SETTLED * sigma[k])) {
                return false;
            }
        }
        return true;
    }

    /** Whether a scaled point keeps every bound (a projected point is not a free refit's). */
    private boolean inside(RealVector u) {
        final RealVector projected = layout.validator().validate(u);
        return projected.getDistance(u) == 0;
    }

    /** target − values into r; returns the sum of squares. */
    private static double residual(double[] target, double[] values, double[] r) {
        double sum = 0;
        for (int i = 0; i < target.length; i++) {
            r[i] = target[i] - values[i];
            sum += r[i] * r[i];
        }
        return sum;
    }

    private static double dot(double[] a, double[] b) {
        double sum = 0;
        for (int i = 0; i < a.length; i++) {
            sum += a[i] * b[i];
        }
        return sum;
    }
}
