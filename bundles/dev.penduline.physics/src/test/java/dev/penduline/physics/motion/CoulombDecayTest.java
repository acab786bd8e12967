package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

class CoulombDecayTest {

    private static final MechanismProperties ARM = SwingFixtures.ARM;
    /** Tc chosen so that Tc / K = 0.007 rad. */
    private static final double TC = 0.007 * ARM.gravityStiffness();

    private static SwingSimulator linearCoulomb() {
        return new SwingSimulator(ARM, FrictionTorques.coulombOnly(TC)).withLinearGravity(true);
    }

    @Test
    void amplitudeFallsByFourTcOverKPerCycleAndStopsInTheDeadBand() {
        // Coulomb-damped free vibration: the amplitude falls linearly, by 4 Tc/k per cycle,
        // and the motion ends at the first reversal inside |x| ≤ Tc/k (Den Hartog, Mechanical
        // Vibrations, "Coulomb damping"; Thomson, Theory of Vibration with Applications)
        final double k = ARM.gravityStiffness();
        final double loss = 4 * TC / k;
        final SwingRun run = linearCoulomb().simulate(ARM.equilibriumAngle() + 0.2, 0, 30, 100);
        final double[] x = SwingFixtures.deviations(run.turningPoints(), ARM);
        assertTrue(x.length > 10, "expected many reversals, got " + x.length);
        for (int i = 0; i + 2 < x.length; i++) {
            if (Math.abs(x[i + 1]) > TC / k) {
                assertEquals(Math.abs(x[i]) - loss, Math.abs(x[i + 2]), 1e-9, "cycle from turning point " + i);
            }
        }
        assertTrue(run.stopped());
        final double rest = run.restAngle() - ARM.equilibriumAngle();
        assertTrue(Math.abs(rest) <= TC / k, "rest " + rest + " outside the dead band " + TC / k);
        assertEquals(run.turningPoints().get(run.turningPoints().size() - 1).time(), run.stopTime(), 0);
        // after the stop the samples stay at the rest angle with zero velocity
        final double[] t = run.times();
        final double[] angles = run.angles();
        final double[] velocities = run.velocities();
        for (int i = 0; i < t.length; i++) {
            if (t[i] > run.stopTime()) {
                assertEquals(run.restAngle(), angles[i], 0);
                assertEquals(0, velocities[i], 0);
            }
        }
    }

    @Test
    void reversalTimesAndAnglesMatchThePiecewiseClosedForm() {
        // Every half-swing of the linear Coulomb oscillator lasts exactly π/ωn, about a centre
        // shifted by ±Tc/k (Den Hartog, Mechanical Vibrations, "Coulomb damping"). The event
        // detector finds each reversal to the root-finder's accuracy; a fixed-step integrator
        // with sgn in the right-hand side would be off by up to a step and chatter at the end.
        final double theta0 = ARM.equilibriumAngle() - 0.25;
        final LinearCoulombDecay exact = new LinearCoulombDecay(ARM, TC, 0);
        final List<TurningPoint> expected = exact.turningPoints(theta0);
        final double halfPeriod = Math.PI / ARM.naturalFrequency();
        for (int i = 0; i < expected.size(); i++) {
            assertEquals(i * halfPeriod, expected.get(i).time(), 1e-12 * (i + 1));
        }
        // default tolerance, then a tight one: the event times follow the tolerance down,
        // far below the 20 ms sample spacing
        final double[][] tolerances = {{SwingSimulator.DEFAULT_TOLERANCE, 1e-9}, {1e-13, 2e-11}};
        for (double[] pair : tolerances) {
            final SwingRun run = linearCoulomb().withTolerance(pair[0]).simulate(theta0, 0, 40, 50);
            final double allowed = pair[1];
            final List<TurningPoint> actual = run.turningPoints();
            assertEquals(expected.size(), actual.size());
            for (int i = 0; i < expected.size(); i++) {
                // a reversal ending a half-swing of small amplitude a (about its centre) is
                // located less sharply, since ω crosses zero with slope ωn² a: scale by 0.25/a
                final double a = i == 0 ? 0.25
                        : 0.5 * Math.abs(expected.get(i).angle() - expected.get(i - 1).angle());
                final double timeAllowed = allowed * halfPeriod * Math.max(1, 0.25 / a);
                assertEquals(expected.get(i).time(), actual.get(i).time(), timeAllowed, "reversal " + i);
                assertEquals(expected.get(i).angle(), actual.get(i).angle(), allowed, "reversal " + i);
            }
            final double[] halves = run.halfSwingDurations();
            for (int i = 0; i + 1 < halves.length; i++) {
                assertEquals(halfPeriod, halves[i], 2 * allowed * halfPeriod);
            }
            assertEquals(actual.get(actual.size() - 1).time(), run.stopTime(), 0);
            assertEquals(expected.get(expected.size() - 1).angle(), run.restAngle(), allowed);
        }
    }

    @Test
    void trajectoryMatchesThePiecewiseCosines() {
        // piecewise cosines about the shifted centres (Den Hartog, Mechanical Vibrations)
        final double theta0 = ARM.equilibriumAngle() + 0.15;
        final LinearCoulombDecay exact = new LinearCoulombDecay(ARM, TC, 0);
        final double[] times = SwingFixtures.irregularTimes(20, 4001);
        final SwingRun run = linearCoulomb().withTolerance(1e-12).simulate(theta0, 0, times);
        final double[] angles = run.angles();
        for (int i = 0; i < times.length; i++) {
            assertEquals(exact.angle(theta0, times[i]), angles[i], 1e-10, "θ at " + times[i]);
        }
        // the energy went into friction: ∫ Tc |ω| dt = Tc × total angle travelled
        double travelled = 0;
        final List<TurningPoint> points = run.turningPoints();
        for (int i = 1; i < points.size(); i++) {
            travelled += Math.abs(points.get(i).angle() - points.get(i - 1).angle());
        }
        assertEquals(TC * travelled, run.energy().coulomb(), 1e-10 * run.energy().initial());
    }

    @Test
    void smallSwingWithFullGravityLosesNearlyFourTcOverKPerCycle() {
        // with sin x in place of x the linear result still holds to O(x²) at 20 mrad
        // (Den Hartog, Mechanical Vibrations, "Coulomb damping")
        final double k = ARM.gravityStiffness();
        final double tc = 0.0005 * k;
        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.coulombOnly(tc))
                .simulate(ARM.equilibriumAngle() + 0.02, 0, 12, 100);
        final double[] x = SwingFixtures.deviations(run.turningPoints(), ARM);
        for (int i = 0; i + 2 < x.length && Math.abs(x[i + 2]) > 0.005; i++) {
            assertEquals(4 * tc / k, Math.abs(x[i]) - Math.abs(x[i + 2]), 4e-3 * 4 * tc / k);
        }
    }

    @Test
    void balancedWheelThrownAgainstCoulombFrictionDeceleratesUniformly() {
        // Centroid on the axis: no gravity torque, so J0 ω' = −Tc (Newton's second law for
        // rotation, constant torque): it stops at t = J0 ω0 / Tc after turning J0 ω0² / (2 Tc),
        // and stays there since nothing pulls it (Coulomb's law of static friction).
        final MechanismProperties wheel = MechanismProperties.of(3.0, 0.0, 0.06);
        final double tc = 0.12;
        final double omega0 = 5.0;
        final SwingRun run = new SwingSimulator(wheel, FrictionTorques.coulombOnly(tc)).simulate(0.3, omega0, 6, 100);
        assertTrue(run.stopped());
        assertEquals(0.06 * omega0 / tc, run.stopTime(), 1e-9);
        assertEquals(0.3 + 0.06 * omega0 * omega0 / (2 * tc), run.restAngle(), 1e-9);
        assertEquals(0.5 * 0.06 * omega0 * omega0, run.energy().coulomb(), 1e-9);
        final double[] t = run.times();
        final double[] velocities = run.velocities();
        for (int i = 0; i < t.length; i++) {
            assertEquals(Math.max(0, omega0 - tc / 0.06 * t[i]), velocities[i], 1e-9, "ω at " + t[i]);
        }
    }
}
