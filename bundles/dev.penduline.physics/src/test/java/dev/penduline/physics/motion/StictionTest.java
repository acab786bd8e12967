package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

class StictionTest {

    private static final MechanismProperties ARM = SwingFixtures.ARM;
    private static final double K = ARM.gravityStiffness();

    @Test
    void higherStictionStopsTheBodyOneReversalEarlier() {
        // Release at x0 = 0.1 rad with Tc/k = 0.009 rad: reversals at 0.1, −0.082, 0.064,
        // −0.046, 0.028, −0.010, −0.008 (the last half-swing, about the centre −0.009, is too
        // short to cross zero). With Ts = Tc the body rests at the first |x| ≤ 0.009, i.e.
        // −0.008 (Den Hartog, Mechanical Vibrations, "Coulomb damping"); with
        // Ts = 0.011 k the reversal at −0.010 is already inside the static band (Coulomb's law of
        // static friction: no motion while the applied torque is within Ts).
        final double tc = 0.009 * K;
        final double theta0 = ARM.equilibriumAngle() + 0.1;
        final SwingRun sameAsCoulomb = new SwingSimulator(ARM, new FrictionTorques(0, tc, 0, 0))
                .withLinearGravity(true).simulate(theta0, 0, 20, 50);
        final SwingRun sticky = new SwingSimulator(ARM, new FrictionTorques(0, tc, 0.011 * K, 0))
                .withLinearGravity(true).simulate(theta0, 0, 20, 50);
        final List<TurningPoint> a = sameAsCoulomb.turningPoints();
        final List<TurningPoint> b = sticky.turningPoints();
        assertEquals(7, a.size());
        assertEquals(6, b.size());
        assertEquals(-0.008, sameAsCoulomb.restAngle() - ARM.equilibriumAngle(), 1e-10);
        assertEquals(-0.010, sticky.restAngle() - ARM.equilibriumAngle(), 1e-10);
        // the last half-swing has an amplitude of only 1 mrad about its centre, so its end is
        // located less sharply (ω is small all through it): 1e-8 s is still far below a sample
        final double halfPeriod = Math.PI / ARM.naturalFrequency();
        assertEquals(6 * halfPeriod, sameAsCoulomb.stopTime(), 1e-8);
        assertEquals(5 * halfPeriod, sticky.stopTime(), 1e-8);
        // the reversals by hand above, one every half period (a linear oscillator with Coulomb
        // friction keeps its period: Den Hartog, as above), and the closed form, agree with both runs
        final double[] byHand = {0.1, -0.082, 0.064, -0.046, 0.028, -0.010, -0.008};
        for (int i = 0; i < a.size(); i++) {
            assertEquals(byHand[i], a.get(i).angle() - ARM.equilibriumAngle(), 1e-10, "reversal " + i);
            assertEquals(i * halfPeriod, a.get(i).time(), 1e-8, "time of reversal " + i);
        }
        for (int i = 0; i < b.size(); i++) {
            assertEquals(byHand[i], b.get(i).angle() - ARM.equilibriumAngle(), 1e-10, "sticky reversal " + i);
            assertEquals(i * halfPeriod, b.get(i).time(), 1e-8, "time of sticky reversal " + i);
        }
        assertSameTurningPoints(new LinearCoulombDecay(ARM, tc, 0).turningPoints(theta0), a);
        assertSameTurningPoints(new LinearCoulombDecay(ARM, tc, 0.011 * K).turningPoints(theta0), b);
    }

    @Test
    void bodyReleasedInsideTheStaticBandNeverMoves() {
        // The gravity torque k sin x at release is 0.9 Ts: static friction holds it (Coulomb's
        // law of static friction; the rest band ± asin(Ts / (m g Lc)))
        final double ts = 0.05 * K;
        final double theta0 = ARM.equilibriumAngle() + Math.asin(0.9 * ts / K);
        final SwingRun run = new SwingSimulator(ARM, new FrictionTorques(0.01, 0.02 * K, ts, 0.001))
                .simulate(theta0, 0, 5, 100);
        assertTrue(run.stopped());
        assertEquals(0, run.stopTime(), 0);
        assertEquals(theta0, run.restAngle(), 0);
        for (double angle : run.angles()) {
            assertEquals(theta0, angle, 0);
        }
        for (double omega : run.velocities()) {
            assertEquals(0, omega, 0);
        }
        assertEquals(List.of(new TurningPoint(0, theta0)), run.turningPoints());
        assertEquals(0, run.energy().dissipated(), 0);
    }

    @Test
    void bodyReleasedJustOutsideTheStaticBandMoves() {
        // 1.1 Ts of gravity torque exceeds static friction (Coulomb's law of static friction)
        final double ts = 0.05 * K;
        final double theta0 = ARM.equilibriumAngle() - Math.asin(1.1 * ts / K);
        final SwingRun run = new SwingSimulator(ARM, new FrictionTorques(0, 0.02 * K, ts, 0))
                .simulate(theta0, 0, 5, 100);
        assertTrue(run.velocities()[1] > 0, "it should start towards the equilibrium");
        assertTrue(run.turningPoints().size() >= 2);
    }

    @Test
    void rampingTorqueBreaksARestingBodyAwayWhenItExceedsStiction() {
        // At θeq gravity exerts no torque, so a torque ramp r t breaks the body away at
        // t = Ts / r (Coulomb's law of static friction); just after, J0 x'' ≈ Ts − Tc gives
        // x ≈ (Ts − Tc)/(2 J0) τ² (Newton's second law for rotation).
        final double ts = 0.2;
        final double tc = 0.1;
        final double rate = 0.05;
        final SwingRun run = new SwingSimulator(ARM, new FrictionTorques(0, tc, ts, 0))
                .withAppliedTorque(t -> rate * t)
                .simulate(ARM.equilibriumAngle(), 0, new double[] {0, 1, 3.99, 4.0, 4.01, 4.02});
        final double[] angles = run.angles();
        final double[] velocities = run.velocities();
        for (int i = 0; i <= 3; i++) {
            assertEquals(ARM.equilibriumAngle(), angles[i], 0, "still held at sample " + i);
            assertEquals(0, velocities[i], 0);
        }
        final double curvature = (ts - tc) / (2 * ARM.pivotInertia());
        assertEquals(curvature * 1e-4, angles[4] - ARM.equilibriumAngle(), 0.02 * curvature * 1e-4);
        assertEquals(curvature * 4e-4, angles[5] - ARM.equilibriumAngle(), 0.02 * curvature * 4e-4);
        assertFalse(run.stopped());
        assertTrue(Double.isNaN(run.restAngle()));
        // the work of the applied torque is accounted for
        assertEquals(0, run.energy().imbalance(), 1e-12);
    }

    /** Compares closed-form points with simulated ones (1e-8 s, 1e-10 rad). */
    private static void assertSameTurningPoints(List<TurningPoint> closed, List<TurningPoint> simulated) {
        assertEquals(closed.size(), simulated.size());
        for (int i = 0; i < closed.size(); i++) {
            assertEquals(closed.get(i).time(), simulated.get(i).time(), 1e-8, "time of point " + i);
            assertEquals(closed.get(i).angle(), simulated.get(i).angle(), 1e-10, "angle of point " + i);
        }
    }
}
