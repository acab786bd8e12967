package dev.penduline.physics.motion;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

import org.hipparchus.ode.ExpandableODE;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStepHandler;

import dev.penduline.physics.InvalidValueException;

/**
 * The event-driven integration of one swing: the single code path by which the simulator and
 * the identification's sensitivity integration obtain θ(t) and ω(t).
 *
 * <p>Each half-swing is one Hipparchus integration (Dormand–Prince 8(5,3), adaptive) of the
 * {@link SwingEquation} with its friction sign frozen, ended by the reversal event; there the
 * equation's stick test decides whether the body rests or swings back, and the integration is
 * restarted with the new mode, or not at all. A {@link SwingCompanion} rides along as a
 * secondary equation over the same steps: error control acts on the equation's own state only
 * (θ and ω, and the simulator's energy account), so the motion is the same with any companion or
 * none. A {@link SwingSampler} records the samples.
 *
 * <p>One run per instance, on one thread.
 */
public final class SwingIntegration {

    /** Guards against a pathological torque that makes the body chatter forever. */
    private static final int MAX_SEGMENTS = 10_000_000;

    private final SwingEquation equation;
    private final double tolerance;
    private final SwingCompanion companion;
    private final SwingSampler sampler;
    private final List<ODEStepHandler> observers = new ArrayList<>();
    private final List<TurningPoint> turningPoints = new ArrayList<>();
    private boolean eventFired;
    private double stopTime = Double.NaN;
    private double restAngle = Double.NaN;
    private double[] primary;
    private double[] secondary;
    private long stepLimit = Long.MAX_VALUE;
    private long steps;

    /**
     * Prepares a run.
     *
     * @param equation  the equation of motion (its mode is reset by the run)
     * @param tolerance relative tolerance of θ and ω, in (0, 1e-3]
     * @param companion the secondary equation, or null for none
     * @param sampler   the sample times and buffers, {@link SwingSampler#start started}
     */
    public SwingIntegration(SwingEquation equation, double tolerance, SwingCompanion companion,
            SwingSampler sampler) {
        this.equation = equation;
        this.tolerance = tolerance;
        this.companion = companion;
        this.sampler = sampler;
    }

    /**
     * Caps the number of integration steps of the run (all segments together): beyond it the
     * run stops with an {@link IntegrationLimitException} instead of grinding on. Used where a
     * person's options drive the simulator; the fit has its own evaluation limits.
     *
     * @param limit the most steps allowed, at least 1
     */
    public void limitSteps(long limit) {
        if (limit < 1) {
            throw new IllegalArgumentException("the step limit must be at least 1, got " + limit);
        }
        stepLimit = limit;
    }

    /**
     * Adds a handler called at every accepted step after the samples are recorded (a
     * cancellation check may throw from it to end the run).
     *
     * @param observer the step handler
     */
    public void observe(ODEStepHandler observer) {
        observers.add(observer);
    }

    /**
     * Integrates from (θ0, ω0) at t = 0 to the sampler's last sample time.
     *
     * @param theta0 initial angle in the equation's frame (rad)
     * @param omega0 initial angular velocity (rad/s)
     */
    public void run(double theta0, double omega0) {
        if (primary != null) {
            throw new IllegalStateException("a SwingIntegration runs once; make a new one for the next run");
        }
        final double duration = sampler.lastTime();
        equation.begin(tolerance, duration, new Reversal());
        double[] y = new double[equation.getDimension()];
        y[0] = theta0;
        y[1] = omega0;
        double[] s = companion == null ? null : companion.initialState();
        sampler.holdUntil(0, y, s);
        if (omega0 == 0) {
            turningPoints.add(new TurningPoint(0, theta0));
            if (equation.settle(0, theta0)) {
                stopTime = 0;
                restAngle = theta0;
            }
        } else {
            equation.move(omega0);
        }
        double t = 0;
        if (duration > 0 && !equation.heldForGood()) {
            final DormandPrince853Integrator integrator = integrator(theta0, omega0, duration);
            final ExpandableODE ode = new ExpandableODE(equation);
            if (companion != null) {
                ode.addSecondaryEquations(companion);
            }
            int segments = 0;
            while (t < duration && !equation.heldForGood()) {
                eventFired = false;
                final double segmentStart = t;
                final ODEState start = s == null ? new ODEState(t, y) : new ODEState(t, y, new double[][] {s});
                final ODEStateAndDerivative end = integrator.integrate(ode, start, duration);
                t = end.getTime();
                y = end.getPrimaryState();
                s = s == null ? null : end.getSecondaryState(1);
                if (!eventFired) {
                    break;
                }
                y[1] = 0;
                turn(t, t - segmentStart, y[0], s);
                if (++segments > MAX_SEGMENTS) {
                    throw new InvalidValueException("more than " + MAX_SEGMENTS
                            + " reversals before t = " + t + " s: the applied torque makes the body chatter");
                }
            }
        }
        // samples after the body came to rest for good
        sampler.holdRest(y, s);
        primary = y;
        secondary = s;
    }

    private DormandPrince853Integrator integrator(double theta0, double omega0, double duration) {
        final double[] relative = new double[equation.getDimension()];
        Arrays.fill(relative, tolerance);
        final DormandPrince853Integrator integrator = new DormandPrince853Integrator(0,
                Math.max(duration, equation.timeScale()), absoluteTolerances(theta0, omega0), relative);
        integrator.addStepHandler(sampler);
        if (stepLimit < Long.MAX_VALUE) {
            integrator.addStepHandler(interpolator -> countStep(interpolator.getCurrentState().getTime(), duration));
        }
        for (ODEStepHandler observer : observers) {
            integrator.addStepHandler(observer);
        }
        integrator.addEventDetector(equation);
        return integrator;
    }

    /**
     * Absolute tolerances from the run's own scale (amplitude, ωn × amplitude, J0 × rate² for the
     * energy account), so that a 1 mrad swing is integrated as accurately as a 1 rad one.
     */
    private void countStep(double t, double duration) {
        if (++steps > stepLimit) {
            throw new IntegrationLimitException(String.format(Locale.ROOT, "the simulation took more than %d"
                    + " integration steps and was stopped at t = %.4g s of %.4g s: the friction makes the motion too stiff"
                    + " to follow (a body that creeps rather than swings), or the duration is too long for this"
                    + " mechanism; lower the friction or check its unit, or shorten --duration", stepLimit, t, duration));
        }
    }

    private double[] absoluteTolerances(double theta0, double omega0) {
        final SwingModel m = equation.model();
        final double wn = m.naturalFrequency();
        final double amplitude = Math.max(Math.hypot(theta0 - m.equilibrium, wn > 0 ? omega0 / wn : 0), 1e-6);
        final double[] absolute = new double[equation.getDimension()];
        absolute[0] = tolerance * amplitude;
        absolute[1] = Math.max(Math.max(absolute[0] * wn, tolerance * Math.abs(omega0)),
                absolute[0] / equation.timeScale());
        if (absolute.length > 2) {
            final double rate = Math.max(Math.max(amplitude * wn, Math.abs(omega0)), amplitude / equation.timeScale());
            Arrays.fill(absolute, 2, absolute.length, tolerance * Math.max(m.inertia * rate * rate, 1e-300));
        }
        return absolute;
    }

    /** The event stopped the run at t after a segment of the given length: decide what next. */
    private void turn(double t, double segment, double theta, double[] s) {
        if (equation.stuck()) {
            // breakaway: the applied torque has overcome stiction
            equation.breakAway(t, theta);
            stopTime = Double.NaN;
            restAngle = Double.NaN;
            return;
        }
        final double before = equation.accelerationAtRest(t, theta);
        final boolean held;
        if (segment <= equation.threshold()) {
            // the body could not leave rest within the event accuracy: it is held
            equation.hold();
            held = true;
        } else {
            turningPoints.add(new TurningPoint(t, theta));
            held = equation.settle(t, theta);
        }
        if (held) {
            stopTime = t;
            restAngle = theta;
        }
        if (s != null) {
            companion.reversal(s, before, equation.accelerationAtRest(t, theta));
        }
    }

    /**
     * Every instant of zero velocity, in time order: the release when it is from rest, each
     * reversal, and the final stop.
     *
     * @return the turning points (unmodifiable view)
     */
    public List<TurningPoint> turningPoints() {
        return Collections.unmodifiableList(turningPoints);
    }

    /**
     * Whether the body is held at the end of the run.
     *
     * @return true when at rest at the end
     */
    public boolean stopped() {
        return equation.stuck();
    }

    /**
     * When the body last came to rest.
     *
     * @return time since release (s), or NaN when it is moving at the end
     */
    public double stopTime() {
        return stopTime;
    }

    /**
     * Where the body rests.
     *
     * @return θ in the equation's frame (rad), or NaN when it is moving at the end
     */
    public double restAngle() {
        return restAngle;
    }

    /**
     * The equation's state at the end of the run (after {@link #run}).
     *
     * @return θ (rad), ω (rad/s), then the energy account (J) when the equation carries it
     */
    public double[] finalState() {
        return primary.clone();
    }

    /**
     * The companion's state at the end of the run (after {@link #run}).
     *
     * @return its values, or null without a companion
     */
    public double[] finalCompanionState() {
        return secondary == null ? null : secondary.clone();
    }

    /** Stops the integration at a reversal; with smoothing, only notes the turning point. */
    private final class Reversal implements ODEEventHandler {

        @Override
        public Action eventOccurred(ODEStateAndDerivative state, ODEEventDetector detector, boolean increasing) {
            if (equation.smoothed()) {
                turningPoints.add(new TurningPoint(state.getTime(), state.getPrimaryState()[0]));
                return Action.CONTINUE;
            }
            eventFired = true;
            return Action.STOP;
        }
    }
}
