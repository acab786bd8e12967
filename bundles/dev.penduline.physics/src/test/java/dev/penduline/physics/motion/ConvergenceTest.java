package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

class ConvergenceTest {

    private static final MechanismProperties ARM = SwingFixtures.ARM;

    @Test
    void halvingTheToleranceChangesTheRunLessThanTheTolerancePromises() {
        // An adaptive embedded Runge–Kutta pair keeps the local error below the tolerance; the
        // change in the result when the tolerance is halved is then of the order of the
        // tolerance times the amplitude and the number of cycles (Hairer, Nørsett & Wanner,
        // Solving Ordinary Differential Equations I, step size control; the safety factor 10
        // is common practice). The change must also shrink in step with the tolerance, and
        // each run must keep its own energy balance, which no tolerance change can fake.
        final FrictionTorques friction = new FrictionTorques(0.01, 0.03, 0.05, 0.005);
        final double theta0 = ARM.equilibriumAngle() + 2.0;
        final double duration = 20;
        final int periods = (int) Math.ceil(duration / ARM.smallAnglePeriod());
        final double amplitude = 2.0;
        double previousChange = Double.NaN;
        for (double tol : new double[] {1e-7, 1e-9}) {
            final SwingSimulator coarse = new SwingSimulator(ARM, friction).withTolerance(tol);
            final SwingSimulator fine = coarse.withTolerance(tol / 2);
            final SwingRun a = coarse.simulate(theta0, 0, duration, 200);
            final SwingRun b = fine.simulate(theta0, 0, duration, 200);
            final double[] angleA = a.angles();
            final double[] angleB = b.angles();
            double worst = 0;
            for (int i = 0; i < angleA.length; i++) {
                worst = Math.max(worst, Math.abs(angleA[i] - angleB[i]));
            }
            final double promised = 10 * tol * amplitude * periods;
            assertTrue(worst < promised, "tolerance " + tol + ": change " + worst + " rad, promised " + promised);
            if (!Double.isNaN(previousChange)) {
                // 100 times tighter: the change must shrink at least 30-fold
                assertTrue(worst < previousChange / 30, "change " + worst + " after " + previousChange);
            }
            previousChange = worst;
            final List<TurningPoint> pa = a.turningPoints();
            final List<TurningPoint> pb = b.turningPoints();
            assertEquals(pa.size(), pb.size());
            for (int i = 0; i < pa.size(); i++) {
                assertEquals(pa.get(i).angle(), pb.get(i).angle(), promised);
            }
            // measured 6 to 30 times the tolerance over these 13 cycles: allow 50
            assertEquals(0, a.energy().imbalance(), 50 * tol * a.energy().initial());
            assertEquals(0, b.energy().imbalance(), 50 * tol * b.energy().initial());
        }
    }
}
