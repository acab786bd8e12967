package dev.penduline.physics.motion;

import java.util.ArrayList;
import java.util.Arrays;
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
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * One run of the event-driven integration. It holds the run's mode (friction sign, stuck or
 * moving), so it is used by one thread for one run and then dropped; the configuration it reads
 * ({@link SwingModel}) is immutable and shared.
 *
 * <p>State vector: θ, ω, then the energies dissipated by the viscous, Coulomb and drag terms
 * and the work of the applied torque, so that the energy account is as accurate as the motion.
 */
final class SwingIntegration implements OrdinaryDifferentialEquation, ODEEventDetector,
        ODEEventHandler {

    private static final int DIMENSION = 6;
    /** Guards against a pathological torque that makes the body chatter forever. */
    private static final int MAX_SEGMENTS = 10_000_000;
    private static final int MAX_ROOT_ITERATIONS = 100;

    private final SwingModel model;
    private final double[] sampleTimes;
    private final double[] angles;
    private final double[] velocities;
    private final double[] derivatives = new double[DIMENSION];
    private final List<TurningPoint> turningPoints = new ArrayList<>();
    private final DormandPrince853Integrator integrator;
    private final AdaptableInterval maxCheck;
    private final BracketedUnivariateSolver<UnivariateFunction> solver;
    private final double threshold;

    private int nextSample;
    private double sign;
    private boolean stuck;
    private boolean eventFired;
    private double stopTime = Double.NaN;
    private double restAngle = Double.NaN;

    SwingIntegration(SwingModel model, double tolerance, double theta0, double omega0,
            double[] sampleTimes) {
        this.model = model;
        this.sampleTimes = sampleTimes;
        this.angles = new double[sampleTimes.length];
        this.velocities = new double[sampleTimes.length];
        final double tEnd = sampleTimes[sampleTimes.length - 1];
        final double wn = model.naturalFrequency();
        // Time scale of the motion: the small-angle period, or the run when nothing swings.
        final double timeScale = wn > 0 ? 2 * Math.PI / wn : Math.max(tEnd, 1e-3);
        // Zeros of ω are at least half a period apart; checking g eight times a period cannot
        // step over a pair of them (the default 600 s check would).
        this.maxCheck = AdaptableInterval.of(timeScale / 8);
        this.threshold = Math.max(1e-2 * tolerance * timeScale, 4 * Math.ulp(tEnd + timeScale));
        this.solver = new BracketingNthOrderBrentSolver(0, threshold, 0, 5);
        // Absolute tolerances from the run's own scale, so a 1 mrad swing is integrated as
        // accurately as a 1 rad one.
        final double amplitude = Math.max(
                Math.hypot(theta0 - model.equilibrium, wn > 0 ? omega0 / wn : 0), 1e-6);
        final double rate = Math.max(Math.max(amplitude * wn, Math.abs(omega0)), amplitude / timeScale);
        final double energy = Math.max(model.inertia * rate * rate, 1e-300);
        final double[] absolute = {tolerance * amplitude, tolerance * rate, tolerance * energy,
            tolerance * energy, tolerance * energy, tolerance * energy};
        final double[] relative = {tolerance, tolerance, tolerance, tolerance, tolerance, tolerance};
        this.integrator = new DormandPrince853Integrator(0, Math.max(tEnd, timeScale), absolute, relative);
        integrator.addStepHandler(new SampleRecorder());
        integrator.addEventDetector(this);
    }

    SwingRun run(double theta0, double omega0) {
        double[] y = new double[DIMENSION];
        y[0] = theta0;
        y[1] = omega0;
        final double tEnd = sampleTimes[sampleTimes.length - 1];
        recordUpTo(0, theta0, omega0);
        double t = 0;
        if (omega0 == 0) {
            turningPoints.add(new TurningPoint(0, theta0));
            decideAtRest(0, theta0);
        } else {
            sign = Math.signum(omega0);
        }
        int segments = 0;
        while (t < tEnd) {
            if (stuck && model.applied == null) {
                recordUpTo(Double.POSITIVE_INFINITY, y[0], 0);
                break;
            }
            eventFired = false;
            final double segmentStart = t;
            final ODEStateAndDerivative end = integrator.integrate(this, new ODEState(t, y), tEnd);
            t = end.getTime();
            y = end.getPrimaryState();
            if (!eventFired) {
                break;
            }
            y[1] = 0;
            if (stuck) {
                // breakaway: the applied torque has overcome stiction
                stuck = false;
                sign = Math.signum(model.netTorqueAtRest(t, y[0]));
                stopTime = Double.NaN;
                restAngle = Double.NaN;
            } else if (t - segmentStart <= threshold) {
                // the body could not leave rest within the event accuracy: it is held
                stuck = true;
                stopTime = t;
                restAngle = y[0];
            } else {
                turningPoints.add(new TurningPoint(t, y[0]));
                decideAtRest(t, y[0]);
            }
            if (++segments > MAX_SEGMENTS) {
                throw new IllegalStateException("more than " + MAX_SEGMENTS
                        + " reversals before t = " + t + " s: the applied torque makes the body chatter");
            }
        }
        final SwingEnergy energy = new SwingEnergy(
                model.kineticEnergy(omega0) + model.potentialEnergy(theta0),
                model.kineticEnergy(y[1]), model.potentialEnergy(y[0]), y[2], y[3], y[4], y[5]);
        return new SwingRun(sampleTimes, angles, velocities, turningPoints, stuck, stopTime,
                restAngle, energy, model.smoothed());
    }

    /** The stick test: at rest, the body stays put while the net torque is within stiction. */
    private void decideAtRest(double t, double theta) {
        final double net = model.netTorqueAtRest(t, theta);
        if (!model.smoothed() && Math.abs(net) <= model.stiction) {
            stuck = true;
            stopTime = t;
            restAngle = theta;
        } else {
            stuck = false;
            sign = Math.signum(net);
        }
    }

    private void recordUpTo(double t, double theta, double omega) {
        while (nextSample < sampleTimes.length && sampleTimes[nextSample] <= t) {
            angles[nextSample] = theta;
            velocities[nextSample] = omega;
            nextSample++;
        }
    }

    // ---- the equation of motion -------------------------------------------------------------

    @Override
    public int getDimension() {
        return DIMENSION;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        // One buffer per run: Hipparchus copies the returned array into its own.
        final double[] d = derivatives;
        if (stuck) {
            Arrays.fill(d, 0);
            return d;
        }
        final SwingModel m = model;
        final double omega = y[1];
        final double applied = m.appliedTorque(t, y[0], omega);
        final double viscous = m.viscous * omega;
        final double coulomb;
        final double drag;
        if (m.smoothed()) {
            coulomb = m.coulomb * Math.tanh(omega / m.smoothingScale);
            drag = m.drag * omega * Math.abs(omega);
        } else {
            // constant sign over the half-swing: the right-hand side stays smooth up to and
            // beyond ω = 0, which is what lets the integrator and the root finder keep order
            coulomb = sign * m.coulomb;
            drag = sign * m.drag * omega * omega;
        }
        d[0] = omega;
        d[1] = (m.gravityTorque(y[0]) - viscous - coulomb - drag + applied) * m.inverseInertia;
        d[2] = viscous * omega;
        d[3] = coulomb * omega;
        d[4] = drag * omega;
        d[5] = applied * omega;
        return d;
    }

    // ---- the zero-velocity (and breakaway) event ------------------------------------------------

    @Override
    public double g(ODEStateAndDerivative state) {
        final double[] y = state.getPrimaryState();
        if (stuck) {
            return model.stiction - Math.abs(model.netTorqueAtRest(state.getTime(), y[0]));
        }
        return model.smoothed() ? y[1] : sign * y[1];
    }

    @Override
    public Action eventOccurred(ODEStateAndDerivative state, ODEEventDetector detector, boolean increasing) {
        if (model.smoothed()) {
            turningPoints.add(new TurningPoint(state.getTime(), state.getPrimaryState()[0]));
            return Action.CONTINUE;
        }
        eventFired = true;
        return Action.STOP;
    }

    @Override
    public AdaptableInterval getMaxCheckInterval() {
        return maxCheck;
    }

    @Override
    public int getMaxIterationCount() {
        return MAX_ROOT_ITERATIONS;
    }

    @Override
    public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
        return solver;
    }

    @Override
    public ODEEventHandler getHandler() {
        return this;
    }

    // ---- dense output at the user's sample times ------------------------------------------------

    /**
     * Interpolates the state at the sample times that fall in each accepted step: directly when
     * they are few, through the step's polynomial when there are more than its nodes.
     */
    private final class SampleRecorder implements ODEStepHandler {

        private final ChebyshevStep polynomial = new ChebyshevStep(2);

        @Override
        public void handleStep(ODEStateInterpolator interpolator) {
            final double tCurrent = interpolator.getCurrentState().getTime();
            int last = nextSample;
            while (last < sampleTimes.length && sampleTimes[last] <= tCurrent) {
                last++;
            }
            final double tPrevious = interpolator.getPreviousState().getTime();
            if (last - nextSample > ChebyshevStep.NODES && tCurrent > tPrevious) {
                polynomial.begin(tPrevious, tCurrent);
                for (int j = 0; j < ChebyshevStep.NODES; j++) {
                    final double[] y = interpolator.getInterpolatedState(polynomial.nodeTime(j)).getPrimaryState();
                    polynomial.set(0, j, y[0]);
                    polynomial.set(1, j, y[1]);
                }
                polynomial.transform();
                for (; nextSample < last; nextSample++) {
                    angles[nextSample] = polynomial.value(0, sampleTimes[nextSample]);
                    velocities[nextSample] = polynomial.value(1, sampleTimes[nextSample]);
                }
            } else {
                for (; nextSample < last; nextSample++) {
                    final double[] y = interpolator.getInterpolatedState(sampleTimes[nextSample])
                            .getPrimaryState();
                    angles[nextSample] = y[0];
                    velocities[nextSample] = y[1];
                }
            }
        }
    }
}
