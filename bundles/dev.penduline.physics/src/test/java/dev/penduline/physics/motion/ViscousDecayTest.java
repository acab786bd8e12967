package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import dev.penduline.physics.MechanismProperties;

class ViscousDecayTest {

    private static final MechanismProperties ARM = SwingFixtures.ARM;

    /** Viscous coefficient giving damping ratio ζ: b = 2 ζ sqrt(J0 K). */
    private static double viscousFor(double zeta) {
        return 2 * zeta * Math.sqrt(ARM.pivotInertia() * ARM.gravityStiffness());
    }

    @ParameterizedTest(name = "ζ = {0}")
    @ValueSource(doubles = {0.002, 0.02, 0.2})
    void successivePeaksFallByTheLogarithmicDecrement(double zeta) {
        final double b = viscousFor(zeta);
        // δ = 2πζ / sqrt(1 − ζ²) (Thomson, Theory of Vibration with Applications, logarithmic
        // decrement; Den Hartog, Mechanical Vibrations, viscous damping)
        final double delta = 2 * Math.PI * zeta / Math.sqrt(1 - zeta * zeta);
        final LinearViscousDecay closedForm = new LinearViscousDecay(ARM, b);
        assertEquals(zeta, closedForm.dampingRatio(), 1e-15);
        assertEquals(delta, closedForm.logarithmicDecrement(), 1e-15);

        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.viscousOnly(b)).withLinearGravity(true)
                .simulate(ARM.equilibriumAngle() + 0.3, 0, 4 * closedForm.dampedPeriod(), 100);
        final double[] x = SwingFixtures.deviations(run.turningPoints(), ARM);
        assertTrue(x.length >= 8, "expected 4 cycles of turning points, got " + x.length);
        for (int i = 0; i + 2 < x.length; i++) {
            assertEquals(delta, Math.log(x[i] / x[i + 2]), 1e-7 * delta, "peaks " + i + " and " + (i + 2));
        }
        // extrema of the damped response are half a damped period apart (same sources)
        for (double half : run.halfSwingDurations()) {
            assertEquals(closedForm.dampedPeriod() / 2, half, 1e-9);
        }
    }

    @Test
    void linearTrajectoryFollowsTheClosedForm() {
        // θ(t) = θ0 e^(−ζωn t)(cos ωd t + ζ/sqrt(1−ζ²) sin ωd t) for a release from rest, and the
        // general form with an initial velocity (Thomson, Theory of Vibration with
        // Applications, viscously damped free vibration)
        final double b = viscousFor(0.05);
        final LinearViscousDecay exact = new LinearViscousDecay(ARM, b);
        // tight tolerance: the phase error of the integration grows with time
        final SwingSimulator simulator = new SwingSimulator(ARM, FrictionTorques.viscousOnly(b))
                .withLinearGravity(true).withTolerance(1e-12);
        final double theta0 = ARM.equilibriumAngle() + 0.4;
        final double[] times = SwingFixtures.irregularTimes(12, 3001);
        for (double omega0 : new double[] {0, -1.5}) {
            final SwingRun run = simulator.simulate(theta0, omega0, times);
            final double[] angles = run.angles();
            final double[] velocities = run.velocities();
            for (int i = 0; i < times.length; i++) {
                assertEquals(exact.angle(theta0, omega0, times[i]), angles[i], 2e-11, "θ at " + times[i]);
                assertEquals(exact.velocity(theta0, omega0, times[i]), velocities[i], 1e-10, "ω at " + times[i]);
            }
            // the viscous term dissipated all the energy lost: ∫ b ω² dt
            final SwingEnergy e = run.energy();
            assertEquals(e.initial() - e.remaining(), e.viscous(), 1e-11 * e.initial());
            assertEquals(0, e.coulomb(), 0);
            assertEquals(0, e.drag(), 0);
        }
    }

    @Test
    void smallSwingWithFullGravityStaysCloseToTheLinearClosedForm() {
        // At 1 mrad, sin x = x (1 − x²/6): the closed form holds to about x³/16 per cycle
        // (Thomson, Theory of Vibration with Applications, viscously damped free vibration).
        final double b = viscousFor(0.02);
        final LinearViscousDecay exact = new LinearViscousDecay(ARM, b);
        final double theta0 = ARM.equilibriumAngle() + 1e-3;
        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.viscousOnly(b)).simulate(theta0, 0, 5, 200);
        final double[] t = run.times();
        final double[] angles = run.angles();
        for (int i = 0; i < t.length; i++) {
            assertEquals(exact.angle(theta0, 0, t[i]), angles[i], 1e-9, "θ at " + t[i]);
        }
    }

    @Test
    void overdampedDecayHasNoDecrement() {
        final LinearViscousDecay overdamped = new LinearViscousDecay(ARM, viscousFor(1.5));
        assertEquals(1.5, overdamped.dampingRatio(), 1e-15);
        assertThrows(IllegalStateException.class, overdamped::logarithmicDecrement);
    }
}
