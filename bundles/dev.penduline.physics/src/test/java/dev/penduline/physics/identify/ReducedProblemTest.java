package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.util.List;
import java.util.Random;

import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer.Optimum;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.MultivariateJacobianFunction;
import org.junit.jupiter.api.Test;

import dev.penduline.physics.motion.FrictionTorques;

class ReducedProblemTest {

    /**
     * The factorisation against Hipparchus' own Householder QR (an independent implementation):
     * R agrees up to the sign of each row, and Qᵀr is checked through the normal equations,
     * {@code Rᵀ(Qᵀr) = Jᵀr}, and the split of the residual's norm, {@code ‖Qᵀr‖² + e² = ‖r‖²}.
     */
    @Test
    void factorMatchesHipparchusQr() {
        final Random random = new Random(7);
        final int n = 500;
        final int p = 4;
        final double[][] rowMajor = new double[n][p];
        final double[][] a = new double[p + 1][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < p; k++) {
                rowMajor[i][k] = random.nextGaussian() + (k == 1 ? rowMajor[i][0] : 0);
                a[k][i] = rowMajor[i][k];
            }
            a[p][i] = random.nextGaussian();
        }
        final double[] r = a[p].clone();
        final double[] diagonal = ReducedProblem.factor(a, p, n);
        final RealMatrix hipparchusR = new QRDecomposition(MatrixUtils.createRealMatrix(rowMajor)).getR();
        for (int k = 0; k < p; k++) {
            final double sign = Math.signum(diagonal[k]) * Math.signum(hipparchusR.getEntry(k, k));
            assertEquals(hipparchusR.getEntry(k, k), sign * diagonal[k], 1e-12 * Math.abs(diagonal[k]));
            for (int j = k + 1; j < p; j++) {
                assertEquals(hipparchusR.getEntry(k, j), sign * a[j][k], 1e-11, "R[" + k + "][" + j + "]");
            }
        }
        double rr = 0;
        for (double v : r) {
            rr += v * v;
        }
        double cc = 0;
        for (int k = 0; k < p; k++) {
            cc += a[p][k] * a[p][k];
            double jtr = 0;
            for (int i = 0; i < n; i++) {
                jtr += rowMajor[i][k] * r[i];
            }
            double rtc = diagonal[k] * a[p][k];
            for (int l = 0; l < k; l++) {
                rtc += a[k][l] * a[p][l];
            }
            assertEquals(jtr, rtc, 1e-10 * n, "(Jᵀr)[" + k + "]");
        }
        double ee = 0;
        for (int i = p; i < n; i++) {
            ee += a[p][i] * a[p][i];
        }
        assertEquals(rr, cc + ee, 1e-12 * rr);
    }

    /** A zero column (a parameter without effect) gives a zero on R's diagonal, not a failure. */
    @Test
    void zeroColumnLeavesZeroDiagonal() {
        final double[][] a = {{1, 2, 3}, {0, 0, 0}, {1, 0, 1}};
        final double[] diagonal = ReducedProblem.factor(a, 2, 3);
        assertEquals(Math.sqrt(14), Math.abs(diagonal[0]), 1e-14);
        assertEquals(0, diagonal[1]);
    }

    /**
     * The block-wise reduction of a two-session problem keeps what the optimiser uses: the
     * normal matrix {@code J'ᵀJ' = JᵀJ}, the gradient {@code J'ᵀr' = Jᵀr} and the cost
     * {@code ‖r'‖ = ‖r‖}, with JᵀJ and Jᵀr by Hipparchus' matrix algebra on the full problem.
     */
    @Test
    void blockReductionKeepsNormalMatrixGradientAndCost() {
        final SyntheticRelease release = SyntheticRelease.of(new FrictionTorques(0.02, 0.03, 0, 0.01))
                .withDuration(5, 100).withNoise(1e-3, 5);
        final List<StageSamples> data = List.of(StageSamples.all(release.session("a")),
                StageSamples.all(release.withTheta0(0.2).withNoise(1e-3, 6).session("b")));
        final double[] scales = {0.01, 0.01, 0.01, 0.5, 0.3, 0.1, 0.01, 0.3, 0.1, 0.01};
        final double[] lower = new double[10];
        java.util.Arrays.fill(lower, Double.NEGATIVE_INFINITY);
        final boolean[] free = new boolean[10];
        java.util.Arrays.fill(free, true);
        free[2] = false;
        final ParameterLayout layout = new ParameterLayout(List.of("a", "b"), scales, new double[10], lower, free);
        final double[] point = {0.025, 0.028, 0.01, 0.51, 0.29, 0.41, 0.019, 0.21, 0.39, 0.021};
        final double k = SyntheticRelease.ARM.gravityStiffness();
        final JointModel model = new JointModel(layout, point, data, k, 0, 1e-10, null);
        final var full = model.value(layout.scaled(point));
        final RealMatrix j = full.getSecond();
        final RealVector r = model.target().subtract(full.getFirst());
        final var small = new ReducedProblem(new JointModel(layout, point, data, k, 0, 1e-10, null))
                .value(layout.scaled(point));
        final RealMatrix jr = small.getSecond();
        final RealVector rr = small.getFirst().mapMultiply(-1);
        final RealMatrix normal = j.transpose().multiply(j);
        assertEquals(0, normal.subtract(jr.transpose().multiply(jr)).getNorm1(), 1e-12 * normal.getNorm1());
        final RealVector gradient = j.transpose().operate(r);
        assertEquals(0, gradient.subtract(jr.transpose().operate(rr)).getNorm(), 1e-10 * gradient.getNorm());
        assertEquals(r.getNorm(), rr.getNorm(), 1e-13 * r.getNorm());
    }

    /**
     * Hipparchus' Levenberg–Marquardt on the full problem (one row per sample) and on the
     * reduced one take the same number of iterations and stop at the same optimum: apart by
     * less than a thousandth of each parameter's standard error (rounding carried through the
     * iterations is all that differs), and the reduced problem hands back the full residuals and
     * Jacobian of that optimum.
     */
    @Test
    void levenbergMarquardtTakesTheSameSteps() {
        final ReleaseSession session = SyntheticRelease.of(new FrictionTorques(0.02, 0.03, 0, 0.01))
                .withDuration(6, 200).withNoise(1e-3, 3).session("a");
        final ParameterLayout layout = new ParameterLayout(List.of("a"), new double[] {0.01, 0.01, 0.01, 0.5, 0.3, 0.1, 0.01},
                new double[7], new double[] {0, 0, 0, 0.32, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY,
                    Double.NEGATIVE_INFINITY},
                new boolean[] {true, true, true, true, true, true, true});
        final double[] start = {0.03, 0.02, 0.02, 0.52, 0.29, 0.38, 0.015};
        final double k = SyntheticRelease.ARM.gravityStiffness();
        final JointModel fullModel = new JointModel(layout, start, List.of(StageSamples.all(session)), k, 0, 1e-10, null);
        final Optimum full = optimize(fullModel, fullModel.target(), layout, start);
        final JointModel reducedModel = new JointModel(layout, start, List.of(StageSamples.all(session)), k, 0, 1e-10,
                null);
        final ReducedProblem reduced = new ReducedProblem(reducedModel);
        final Optimum small = optimize(reduced, reduced.target(), layout, start);
        assertEquals(full.getIterations(), small.getIterations());
        final RealMatrix covariance = full.getCovariances(1e-14);
        final double variance = full.getCost() * full.getCost() / (full.getResiduals().getDimension() - start.length);
        for (int c = 0; c < start.length; c++) {
            final double sigma = Math.sqrt(variance * covariance.getEntry(c, c));
            assertEquals(full.getPoint().getEntry(c), small.getPoint().getEntry(c), 1e-3 * sigma, layout.name(c));
        }
        // the full residuals and Jacobian handed back are the model's at the reduced optimum
        final double[] residuals = reduced.residualsAt(small.getPoint());
        assertNotNull(residuals);
        final var there = fullModel.value(small.getPoint());
        assertArrayEquals(fullModel.target().subtract(there.getFirst()).toArray(), residuals, 0);
        final RealMatrix jacobian = reduced.jacobianAt(small.getPoint());
        assertNotNull(jacobian);
        assertEquals(0, there.getSecond().subtract(jacobian).getNorm1(), 0);
    }

    private static Optimum optimize(MultivariateJacobianFunction model, RealVector target, ParameterLayout layout,
            double[] start) {
        final LeastSquaresProblem problem = new LeastSquaresBuilder().start(layout.scaled(start)).model(model)
                .target(target).parameterValidator(layout.validator()).maxIterations(200).maxEvaluations(400)
                .lazyEvaluation(false).build();
        return new LevenbergMarquardtOptimizer().optimize(problem);
    }
}
