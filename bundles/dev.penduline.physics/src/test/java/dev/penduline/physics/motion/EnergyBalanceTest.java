package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

class EnergyBalanceTest {

    private static final MechanismProperties ARM = SwingFixtures.ARM;
    private static final FrictionTorques MIXED = new FrictionTorques(0.02, 0.05, 0.08, 0.01);

    @Test
    void mixedLargeSwingConservesEnergyWithItsDissipation() {
        // Work–energy theorem: initial energy = final kinetic + potential + work of the friction
        // torques (classic mechanics; e.g. Meriam & Kraige, Engineering Mechanics: Dynamics,
        // work–energy for rigid bodies). Potential m g Lc (1 − cos x) of the compound pendulum.
        final double theta0 = ARM.equilibriumAngle() + 2.6;
        final SwingRun run = new SwingSimulator(ARM, MIXED).simulate(theta0, 0, 60, 100);
        final SwingEnergy e = run.energy();
        final double k = ARM.gravityStiffness();
        assertEquals(k * (1 - Math.cos(2.6)), e.initial(), 1e-15 * e.initial());
        assertEquals(0, e.imbalance(), 1e-8 * e.initial());
        assertTrue(e.viscous() > 0 && e.coulomb() > 0 && e.drag() > 0, "every term dissipates: " + e);
        assertEquals(0, e.applied(), 0);
        // the remaining energy is the one of the final state
        final double[] angles = run.angles();
        final double[] velocities = run.velocities();
        final int last = angles.length - 1;
        final double x = angles[last] - ARM.equilibriumAngle();
        assertEquals(0.5 * ARM.pivotInertia() * velocities[last] * velocities[last] + k * (1 - Math.cos(x)),
                e.remaining(), 1e-12 * e.initial());
        // it stopped inside the static band ± asin(Ts / (m g Lc)) (Coulomb's law of static friction)
        assertTrue(run.stopped());
        assertTrue(Math.abs(run.restAngle() - ARM.equilibriumAngle()) <= Math.asin(0.08 / k));
        assertEquals(0, e.kinetic(), 0);
    }

    @Test
    void energyBalanceHoldsWithAThrownStartAndAnAppliedTorque() {
        // same theorem with the work of an external torque, ∫ T ω dt, on the credit side
        final SwingRun run = new SwingSimulator(ARM, MIXED)
                .withAppliedTorque((t, angle, omega) -> 0.3 * Math.sin(2.0 * t) - 0.5 * (angle - 0.05))
                .simulate(ARM.equilibriumAngle() - 0.5, 4.0, 30, 100);
        final SwingEnergy e = run.energy();
        assertTrue(e.initial() > 0.5 * ARM.pivotInertia() * 16);
        assertEquals(0, e.imbalance(), 1e-8 * e.initial());
        assertTrue(e.applied() != 0);
    }

    @Test
    void undampedTwoMinuteSwingKeepsItsEnergy() {
        // conservation of energy for the undamped compound pendulum (classic mechanics)
        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.none())
                .simulate(ARM.equilibriumAngle() + 2.6, 0, 120, 10);
        final SwingEnergy e = run.energy();
        assertEquals(e.initial(), e.remaining(), 1e-8 * e.initial());
        assertEquals(0, e.dissipated(), 0);
    }
}
