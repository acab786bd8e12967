package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.junit.jupiter.api.Test;

import dev.penduline.physics.motion.FrictionTorques;

class JacobianTest {

    private static double[] full(double b, double tc, double c, double j, double theta0, double release,
            double offset) {
        return new double[] {b, tc, c, j, theta0, release, offset};
    }

    private static ParameterLayout layout(double[] full) {
        final double[] scales = {0.01, 0.01, 0.01, 0.5, 0.3, 0.1, 0.01};
        final double[] lower = {0, 0, 0, 0.32, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        final boolean[] free = {true, true, true, true, true, true, true};
        return new ParameterLayout(List.of("a"), scales, new double[7], lower, free);
    }

    /**
     * The variational equations with the Hiskens & Pai jump conditions must give the
     * derivative of the trajectory; the independent check is a central finite difference of
     * the model itself, O(h²) accurate (Nocedal & Wright, Numerical Optimization, §8.1),
     * computed at an integration tolerance of 1e-12 so that integration error stays below it.
     */
    private static void checkColumns(FrictionTorques friction, double[] p, double duration, double stiction) {
        final ReleaseSession session = SyntheticRelease.of(friction).withDuration(duration, 100).session("a");
        final ParameterLayout layout = layout(p);
        final double k = SyntheticRelease.ARM.gravityStiffness();
        final JointModel model = new JointModel(layout, p, List.of(StageSamples.all(session)), k, stiction, 1e-12,
                null);
        final RealVector u = layout.scaled(p);
        final RealMatrix jacobian = model.value(u).getSecond();
        final double h = 1e-5;
        for (int col = 0; col < layout.freeCount(); col++) {
            final RealVector up = u.copy();
            final RealVector down = u.copy();
            up.addToEntry(col, h);
            down.addToEntry(col, -h);
            final RealVector difference = model.value(up).getFirst().subtract(model.value(down).getFirst())
                    .mapDivide(2 * h);
            final RealVector analytic = jacobian.getColumnVector(col);
            final double norm = difference.getNorm();
            assertTrue(norm > 0, "column " + col + " has no effect");
            final double relative = analytic.subtract(difference).getNorm() / norm;
            assertEquals(0, relative, 2e-5, "column " + layout.name(layout.fullIndex(col)));
        }
    }

    @Test
    void sensitivitiesAgreeWithCentralDifferencesAcrossReversals() {
        // viscous, Coulomb and drag together: every reversal applies the jump ω'⁺/ω'⁻
        checkColumns(new FrictionTorques(0.02, 0.03, 0, 0.01), full(0.02, 0.03, 0.01, 0.5, 0.3, 0.4, 0.02), 8, 0);
    }

    @Test
    void sensitivitiesAgreeWithCentralDifferencesThroughTheStop() {
        // Tc = 0.15 N·m and Ts = 0.3 N·m stop the arm after a few cycles: ∂ω/∂p drops to zero
        // and ∂x/∂p freezes at the stop, then the held angle's sensitivity carries on
        checkColumns(new FrictionTorques(0.01, 0.15, 0.3, 0), full(0.01, 0.15, 0, 0.5, 0.3, 0.4, 0.02), 10, 0.3);
    }
}
