package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;
import dev.penduline.physics.motion.TurningPoint;

/**
 * The simulator and the identification's sensitivity integration share one equation of motion,
 * reversal event and stick test: a release with viscous, Coulomb, drag and stiction (it stops)
 * must come out the same from both, and the same as from an independent integration.
 */
class SimulatorAgreementTest {

    /** The arm of the motion tests, hanging at the sensor's zero (θeq = 0, as the fit integrates). */
    private static final MechanismProperties ARM = MechanismProperties.of(2.0, 0.4, 0.5);
    private static final double K = ARM.gravityStiffness();
    /** Viscous, Coulomb, stiction well above Coulomb, and drag: the arm stops after a few swings. */
    private static final FrictionTorques FRICTION = new FrictionTorques(0.02, 0.05, 0.2, 0.01);
    private static final double X0 = 1.0;
    private static final double DURATION = 40;
    private static final ParameterKind[] KINDS = {ParameterKind.RELEASE_ANGLE, ParameterKind.VISCOUS,
        ParameterKind.COULOMB, ParameterKind.DRAG, ParameterKind.INERTIA};

    private static double[] times() {
        final double[] t = new double[(int) (DURATION * 100) + 1];
        for (int i = 0; i < t.length; i++) {
            t[i] = i / 100.0;
        }
        return t;
    }

    private static SensitivitySwing sensitivityPath(double tolerance, double[] times) {
        final SensitivitySwing swing = new SensitivitySwing(times.length, KINDS);
        swing.configure(K, ARM.pivotInertia(), FRICTION.viscous(), FRICTION.coulomb(), FRICTION.stiction(),
                FRICTION.drag(), tolerance, null);
        swing.run(X0, times, 0, times.length);
        return swing;
    }

    /**
     * Self-consistency: the simulator and the fit's sensitivity integration integrate the same
     * equation through the same code, but the simulator also error-controls its energy account,
     * so their steps differ and each is off the exact trajectory by its own integration error.
     * An adaptive embedded Runge–Kutta pair keeps the local error below the tolerance, so the
     * difference is of the order of tolerance × scale × cycles and shrinks in step with the
     * tolerance (Hairer, Nørsett &amp; Wanner, Solving Ordinary Differential Equations I, step size
     * control; the factor 10 is common practice, as in the motion package's convergence test).
     * Measured: 2.4e-5, 1.8e-7, 1.2e-9 rad at 1e-6, 1e-8, 1e-10.
     */
    @Test
    void simulatorAndSensitivityIntegrationFollowTheSameTrajectory() {
        final double[] times = times();
        final int cycles = (int) Math.ceil(DURATION / ARM.smallAnglePeriod());
        final double peakRate = X0 * ARM.naturalFrequency();
        double[] previous = null;
        for (double tol : new double[] {1e-6, 1e-8, 1e-10}) {
            final SwingRun run = new SwingSimulator(ARM, FRICTION).withTolerance(tol).simulate(X0, 0, times);
            final SensitivitySwing swing = sensitivityPath(tol, times);
            final double[] angles = run.angles();
            final double[] velocities = run.velocities();
            double angle = 0;
            double rate = 0;
            for (int i = 0; i < times.length; i++) {
                angle = Math.max(angle, Math.abs(angles[i] - swing.angle[i]));
                rate = Math.max(rate, Math.abs(velocities[i] - swing.velocity[i]));
            }
            final List<TurningPoint> a = run.turningPoints();
            final List<TurningPoint> b = swing.turningPoints();
            assertEquals(a.size(), b.size(), "turning points at tolerance " + tol);
            double reversal = 0;
            for (int k = 0; k < a.size(); k++) {
                reversal = Math.max(reversal, Math.abs(a.get(k).time() - b.get(k).time()));
            }
            assertTrue(run.stopped(), "the arm should stop within the run");
            assertEquals(a.get(a.size() - 1).time(), run.stopTime(), 0, "it stops at its last reversal");
            final double stop = Math.abs(run.stopTime() - swing.stopTime());
            final double[] change = {angle, rate, reversal, stop};
            final double[] promised = {X0, peakRate, ARM.smallAnglePeriod(), ARM.smallAnglePeriod()};
            final String[] names = {"θ (rad)", "ω (rad/s)", "reversal time (s)", "stop time (s)"};
            for (int q = 0; q < change.length; q++) {
                final double bound = 10 * tol * promised[q] * cycles;
                assertTrue(change[q] < bound, "tolerance " + tol + ": " + names[q] + " differs by " + change[q]
                        + ", promised " + bound);
                if (previous != null) {
                    // 100 times tighter: the difference must shrink at least 30-fold
                    assertTrue(change[q] < previous[q] / 30, names[q] + ": " + change[q] + " after " + previous[q]);
                }
            }
            previous = change;
        }
    }

    /**
     * Both paths at a tight tolerance against an integration that shares no code with them: the
     * reversal times and angles, hence the stop, agree to far below a sample interval.
     */
    @Test
    void tightRunsAgreeWithAnIndependentIntegration() {
        final double tol = 1e-12;
        final double[] times = times();
        final SwingRun run = new SwingSimulator(ARM, FRICTION).withTolerance(tol).simulate(X0, 0, times);
        final SensitivitySwing swing = sensitivityPath(tol, times);
        final List<TurningPoint> reference = reference();
        final List<TurningPoint> a = run.turningPoints();
        final List<TurningPoint> b = swing.turningPoints();
        assertEquals(reference.size(), a.size());
        assertEquals(reference.size(), b.size());
        // the stop is no coin toss: the last reversal is 15 % inside the static band
        // (K |sin x| ≤ Ts, Coulomb's law of static friction), the one before 37 % outside
        final int last = reference.size() - 1;
        assertTrue(K * Math.abs(Math.sin(reference.get(last).angle())) < 0.9 * FRICTION.stiction());
        assertTrue(K * Math.abs(Math.sin(reference.get(last - 1).angle())) > 1.1 * FRICTION.stiction());
        // measured 2.3e-11 s and 5.4e-12 rad
        for (int k = 0; k < reference.size(); k++) {
            assertEquals(reference.get(k).time(), a.get(k).time(), 1e-9, "simulator, reversal " + k);
            assertEquals(reference.get(k).angle(), a.get(k).angle(), 1e-9, "simulator, reversal " + k);
            assertEquals(reference.get(k).time(), b.get(k).time(), 1e-9, "sensitivity path, reversal " + k);
            assertEquals(reference.get(k).angle(), b.get(k).angle(), 1e-9, "sensitivity path, reversal " + k);
        }
        assertEquals(reference.get(last).time(), run.stopTime(), 1e-9);
        assertEquals(reference.get(last).time(), swing.stopTime(), 1e-9);
    }

    /**
     * The release integrated without any Penduline code: Hipparchus' Gragg–Bulirsch–Stoer
     * extrapolation integrator (another family than the simulator's Runge–Kutta pair) on the
     * equation written out here, stopped by its own event on ω = 0 at each reversal.
     */
    private static List<TurningPoint> reference() {
        final double j = ARM.pivotInertia();
        final double b = FRICTION.viscous();
        final double tc = FRICTION.coulomb();
        final double ts = FRICTION.stiction();
        final double c = FRICTION.drag();
        final List<TurningPoint> points = new ArrayList<>();
        points.add(new TurningPoint(0, X0));
        final double[] s = {-Math.signum(Math.sin(X0))};
        final OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                final double w = y[1];
                return new double[] {w, (-K * Math.sin(y[0]) - b * w - s[0] * tc - s[0] * c * w * w) / j};
            }
        };
        final boolean[] fired = new boolean[1];
        final ODEEventDetector reversal = new ODEEventDetector() {
            @Override
            public double g(ODEStateAndDerivative state) {
                return s[0] * state.getPrimaryState()[1];
            }

            @Override
            public AdaptableInterval getMaxCheckInterval() {
                return AdaptableInterval.of(0.05);
            }

            @Override
            public int getMaxIterationCount() {
                return 200;
            }

            @Override
            public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
                return new BracketingNthOrderBrentSolver(0, 1e-14, 0, 5);
            }

            @Override
            public ODEEventHandler getHandler() {
                return (state, detector, increasing) -> {
                    fired[0] = true;
                    return Action.STOP;
                };
            }
        };
        double t = 0;
        double[] y = {X0, 0};
        while (t < DURATION) {
            final GraggBulirschStoerIntegrator integrator = new GraggBulirschStoerIntegrator(0, 1, 1e-15, 1e-14);
            integrator.addEventDetector(reversal);
            fired[0] = false;
            final ODEStateAndDerivative end = integrator.integrate(ode, new ODEState(t, y), DURATION);
            if (!fired[0]) {
                break;
            }
            t = end.getTime();
            y = new double[] {end.getPrimaryState()[0], 0};
            points.add(new TurningPoint(t, y[0]));
            final double holding = -K * Math.sin(y[0]);
            if (Math.abs(holding) <= ts) {
                break;
            }
            s[0] = Math.signum(holding);
        }
        return points;
    }
}
