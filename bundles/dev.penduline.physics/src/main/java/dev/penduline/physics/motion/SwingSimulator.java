package dev.penduline.physics.motion;

import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * Simulates the swing of a pivoted body with any mix of viscous, Coulomb, stiction and
 * quadratic-drag friction, by event-driven integration (Dormand–Prince 8(5,3), adaptive).
 *
 * <p>The equation of motion is
 * {@code J0 θ'' = − m g cos α Lc sin(θ − θeq) − T_friction(θ, ω) + T_applied(t, θ, ω)}.
 * Each half-swing is integrated with a constant friction sign; an event on {@code ω = 0}
 * stops the integration, and the stick test decides whether the body rests (net torque at
 * rest within the static torque) or swings back. The equation, its event and the stick test
 * are {@link SwingEquation}'s (with the energy integrals in its state), integrated by
 * {@link SwingIntegration}; the identification integrates the same equation with its
 * sensitivities.
 * See the package documentation.
 *
 * <p>The simulator is immutable and thread-safe: the {@code withX} methods return cheap copies
 * and every {@code simulate} call keeps its own state, so one instance may serve many parallel
 * fits. Angles are in the sensor's frame: the initial angle and all results include θeq.
 */
public final class SwingSimulator {

    /** Default relative tolerance of the integration. */
    public static final double DEFAULT_TOLERANCE = 1e-10;

    /**
     * Most integration steps of one simulation (about ten seconds of computing): a swing of a
     * day's length at 1 Hz takes a few million; beyond it the run stops with an
     * {@link IntegrationLimitException} that says so.
     */
    public static final long MAX_STEPS = 10_000_000;

    private final MechanismProperties mechanism;
    private final FrictionTorques friction;
    private final double tolerance;
    private final AppliedTorque applied;
    private final double smoothingScale;
    private final boolean linearGravity;
    private final SwingModel model;

    /**
     * A simulator with the default tolerance, no applied torque, the exact sign of the velocity
     * and the full (non-linear) gravity term.
     *
     * @param mechanism mass properties of the body
     * @param friction  friction and damping torques
     */
    public SwingSimulator(MechanismProperties mechanism, FrictionTorques friction) {
        this(mechanism, friction, DEFAULT_TOLERANCE, null, 0, false);
    }

    private SwingSimulator(MechanismProperties mechanism, FrictionTorques friction, double tolerance,
            AppliedTorque applied, double smoothingScale, boolean linearGravity) {
        this.mechanism = Objects.requireNonNull(mechanism, "mechanism");
        this.friction = Objects.requireNonNull(friction, "friction");
        this.tolerance = tolerance;
        this.applied = applied;
        this.smoothingScale = smoothingScale;
        this.linearGravity = linearGravity;
        this.model = new SwingModel(mechanism, friction, applied, smoothingScale, linearGravity);
    }

    /**
     * Returns a copy with another mechanism (a fit changing the inertia, say).
     *
     * @param newMechanism mass properties of the body
     * @return the copy
     */
    public SwingSimulator withMechanism(MechanismProperties newMechanism) {
        return new SwingSimulator(newMechanism, friction, tolerance, applied, smoothingScale, linearGravity);
    }

    /**
     * Returns a copy with other friction torques.
     *
     * @param newFriction friction and damping torques
     * @return the copy
     */
    public SwingSimulator withFriction(FrictionTorques newFriction) {
        return new SwingSimulator(mechanism, newFriction, tolerance, applied, smoothingScale, linearGravity);
    }

    /**
     * Returns a copy with another integration tolerance. The absolute tolerances follow from
     * it and the scale of each run (amplitude, ωn·amplitude, J0·(ωn·amplitude)²).
     *
     * @param relativeTolerance relative tolerance, in (0, 1e-3]; 1e-8 to 1e-11 is sensible
     * @return the copy
     */
    public SwingSimulator withTolerance(double relativeTolerance) {
        if (!(relativeTolerance > 0 && relativeTolerance <= 1e-3)) {
            throw new IllegalArgumentException(
                    "relativeTolerance must be in (0, 1e-3], got " + relativeTolerance);
        }
        return new SwingSimulator(mechanism, friction, relativeTolerance, applied, smoothingScale,
                linearGravity);
    }

    /**
     * Returns a copy with an applied torque (motor, spring, closer); {@code null} removes it.
     * While the body is held by stiction, the simulator watches for the moment the applied
     * torque breaks it away.
     *
     * @param torque the applied torque (N·m)
     * @return the copy
     */
    public SwingSimulator withAppliedTorque(AppliedTorque torque) {
        return new SwingSimulator(mechanism, friction, tolerance, torque, smoothingScale, linearGravity);
    }

    /**
     * Returns a copy with an applied torque that depends on time only.
     *
     * @param torqueOfTime torque (N·m) as a function of time since release (s)
     * @return the copy
     */
    public SwingSimulator withAppliedTorque(DoubleUnaryOperator torqueOfTime) {
        return withAppliedTorque(AppliedTorque.ofTime(Objects.requireNonNull(torqueOfTime, "torqueOfTime")));
    }

    /**
     * Returns a copy that replaces {@code sgn ω} by {@code tanh(ω / scale)} and integrates
     * without reversal events. The result then says {@link SwingRun#smoothed() smoothed};
     * stiction is not modelled and the body never stops exactly. Zero switches it off.
     *
     * @param velocityScale velocity over which the Coulomb torque builds up (rad/s), ≥ 0
     * @return the copy
     */
    public SwingSimulator withSmoothing(double velocityScale) {
        if (!(velocityScale >= 0) || Double.isInfinite(velocityScale)) {
            throw new IllegalArgumentException(
                    "velocityScale must be a finite number ≥ 0 rad/s, got " + velocityScale);
        }
        return new SwingSimulator(mechanism, friction, tolerance, applied, velocityScale, linearGravity);
    }

    /**
     * Returns a copy with gravity linearised ({@code sin(θ − θeq) → θ − θeq}), for exact checks
     * against the linear closed forms.
     *
     * @param linear true to linearise the gravity torque
     * @return the copy
     */
    public SwingSimulator withLinearGravity(boolean linear) {
        return new SwingSimulator(mechanism, friction, tolerance, applied, smoothingScale, linear);
    }

    /**
     * The mechanism simulated.
     *
     * @return the mass properties
     */
    public MechanismProperties mechanism() {
        return mechanism;
    }

    /**
     * The friction simulated.
     *
     * @return the friction torques
     */
    public FrictionTorques friction() {
        return friction;
    }

    /**
     * The relative integration tolerance.
     *
     * @return the tolerance (dimensionless)
     */
    public double tolerance() {
        return tolerance;
    }

    /**
     * Whether gravity is linearised ({@code K (θ − θeq)} instead of {@code K sin(θ − θeq)}).
     *
     * @return true for the linear (small-angle) gravity term
     */
    public boolean linearGravity() {
        return linearGravity;
    }

    /**
     * Simulates a swing sampled at a constant rate from release.
     *
     * @param theta0     initial angle in the sensor's frame (rad)
     * @param omega0     initial angular velocity (rad/s)
     * @param duration   length of the run (s), &gt; 0
     * @param sampleRate output samples per second (Hz), &gt; 0; samples at i / sampleRate
     * @return the run
     */
    public SwingRun simulate(double theta0, double omega0, double duration, double sampleRate) {
        if (!(duration > 0) || Double.isInfinite(duration)) {
            throw new InvalidValueException("duration must be a finite number > 0 s, got " + duration);
        }
        if (!(sampleRate > 0) || Double.isInfinite(sampleRate)) {
            throw new InvalidValueException("sampleRate must be a finite number > 0 Hz, got " + sampleRate);
        }
        final double count = Math.floor(duration * sampleRate * (1 + 1e-12));
        if (count >= Integer.MAX_VALUE - 1) {
            throw new InvalidValueException("duration × sampleRate = " + count + " samples is too many");
        }
        final double[] times = new double[(int) count + 1];
        for (int i = 0; i < times.length; i++) {
            times[i] = i / sampleRate;
        }
        return run(theta0, omega0, times);
    }

    /**
     * Simulates a swing sampled at given times.
     *
     * @param theta0      initial angle in the sensor's frame (rad)
     * @param omega0      initial angular velocity (rad/s)
     * @param sampleTimes times since release (s), finite, ≥ 0, non-decreasing; not modified
     * @return the run; the integration ends at the last sample time
     */
    public SwingRun simulate(double theta0, double omega0, double[] sampleTimes) {
        Objects.requireNonNull(sampleTimes, "sampleTimes");
        if (sampleTimes.length == 0) {
            throw new InvalidValueException("sampleTimes must not be empty");
        }
        double previous = 0;
        for (int i = 0; i < sampleTimes.length; i++) {
            final double t = sampleTimes[i];
            if (!Double.isFinite(t) || t < previous) {
                throw new InvalidValueException("sampleTimes[" + i + "] = " + t
                        + " s: times must be finite, ≥ 0 and non-decreasing");
            }
            previous = t;
        }
        return run(theta0, omega0, sampleTimes.clone());
    }

    private SwingRun run(double theta0, double omega0, double[] times) {
        if (!Double.isFinite(theta0)) {
            throw new InvalidValueException("theta0 must be a finite number, got " + theta0 + " rad");
        }
        if (!Double.isFinite(omega0)) {
            throw new InvalidValueException("omega0 must be a finite number, got " + omega0 + " rad/s");
        }
        final SwingSampler sampler = new SwingSampler(times.length);
        sampler.start(times, 0, times.length);
        final SwingIntegration integration = new SwingIntegration(new SwingEquation(model, true), tolerance,
                null, sampler);
        integration.limitSteps(MAX_STEPS);
        integration.run(theta0, omega0);
        final double[] y = integration.finalState();
        final SwingEnergy energy = new SwingEnergy(model.kineticEnergy(omega0) + model.potentialEnergy(theta0),
                model.kineticEnergy(y[1]), model.potentialEnergy(y[0]), y[2], y[3], y[4], y[5]);
        return new SwingRun(times, sampler.angles(), sampler.velocities(), integration.turningPoints(),
                integration.stopped(), integration.stopTime(), integration.restAngle(), energy, model.smoothed());
    }
}
