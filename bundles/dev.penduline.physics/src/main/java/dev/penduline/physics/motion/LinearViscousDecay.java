package dev.penduline.physics.motion;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * Closed-form small-angle swing with viscous damping only:
 * {@code J0 x'' + b x' + K x = 0}, {@code x = θ − θeq}, {@code K = m g cos α Lc}.
 *
 * <p>Underdamped solution (Thomson, Theory of Vibration with Applications,
 * viscously damped free vibration):
 * {@code x(t) = e^(−ζ ωn t) (x0 cos ωd t + (v0 + ζ ωn x0)/ωd sin ωd t)}, with
 * {@code ζ = b / (2 sqrt(J0 K))} and {@code ωd = ωn sqrt(1 − ζ²)}; released from rest this is
 * {@code x0 e^(−ζ ωn t)(cos ωd t + ζ/sqrt(1−ζ²) sin ωd t)}. Logarithmic decrement
 * {@code δ = 2πζ / sqrt(1 − ζ²)}.
 */
public final class LinearViscousDecay {

    private final double equilibrium;
    private final double naturalFrequency;
    private final double dampingRatio;

    /**
     * The decay of a mechanism with viscous damping.
     *
     * @param mechanism mass properties; must have a restoring gravity torque (Lc &gt; 0)
     * @param viscous   viscous coefficient b (N·m·s/rad), ≥ 0
     */
    public LinearViscousDecay(MechanismProperties mechanism, double viscous) {
        final double k = mechanism.gravityStiffness();
        if (!(k > 0)) {
            throw new InvalidValueException("the mechanism has no restoring torque (m g cos α Lc = "
                    + k + " N·m/rad): no oscillation to decay");
        }
        if (!(viscous >= 0) || Double.isInfinite(viscous)) {
            throw new InvalidValueException("viscous must be a finite number ≥ 0 N·m·s/rad, got " + viscous);
        }
        this.equilibrium = mechanism.equilibriumAngle();
        this.naturalFrequency = mechanism.naturalFrequency();
        this.dampingRatio = viscous / (2 * Math.sqrt(mechanism.pivotInertia() * k));
    }

    /**
     * Damping ratio ζ = b / (2 sqrt(J0 m g cos α Lc)).
     *
     * @return ζ (dimensionless)
     */
    public double dampingRatio() {
        return dampingRatio;
    }

    /**
     * Undamped natural frequency ωn.
     *
     * @return ωn (rad/s)
     */
    public double naturalFrequency() {
        return naturalFrequency;
    }

    /**
     * Damped natural frequency ωd = ωn sqrt(1 − ζ²).
     *
     * @return ωd (rad/s)
     * @throws IllegalStateException when ζ ≥ 1 (no oscillation)
     */
    public double dampedFrequency() {
        requireUnderdamped();
        return naturalFrequency * Math.sqrt(1 - dampingRatio * dampingRatio);
    }

    /**
     * Damped period 2π / ωd.
     *
     * @return Td (s)
     */
    public double dampedPeriod() {
        return 2 * Math.PI / dampedFrequency();
    }

    /**
     * Logarithmic decrement δ = 2πζ / sqrt(1 − ζ²): the natural log of the ratio of two
     * successive peaks of the same sign.
     *
     * @return δ (dimensionless)
     */
    public double logarithmicDecrement() {
        requireUnderdamped();
        return 2 * Math.PI * dampingRatio / Math.sqrt(1 - dampingRatio * dampingRatio);
    }

    /**
     * Angle at time t.
     *
     * @param theta0 initial angle in the sensor's frame (rad)
     * @param omega0 initial angular velocity (rad/s)
     * @param t      time since release (s)
     * @return θ in the sensor's frame (rad)
     */
    public double angle(double theta0, double omega0, double t) {
        final double wd = dampedFrequency();
        final double x0 = theta0 - equilibrium;
        final double decay = Math.exp(-dampingRatio * naturalFrequency * t);
        final double b = (omega0 + dampingRatio * naturalFrequency * x0) / wd;
        return equilibrium + decay * (x0 * Math.cos(wd * t) + b * Math.sin(wd * t));
    }

    /**
     * Angular velocity at time t (the derivative of {@link #angle(double, double, double)}).
     *
     * @param theta0 initial angle in the sensor's frame (rad)
     * @param omega0 initial angular velocity (rad/s)
     * @param t      time since release (s)
     * @return ω (rad/s)
     */
    public double velocity(double theta0, double omega0, double t) {
        final double wd = dampedFrequency();
        final double sigma = dampingRatio * naturalFrequency;
        final double x0 = theta0 - equilibrium;
        final double b = (omega0 + sigma * x0) / wd;
        final double c = Math.cos(wd * t);
        final double s = Math.sin(wd * t);
        return Math.exp(-sigma * t) * ((wd * b - sigma * x0) * c - (wd * x0 + sigma * b) * s);
    }

    private void requireUnderdamped() {
        if (dampingRatio >= 1) {
            throw new IllegalStateException("damping ratio " + dampingRatio
                    + " ≥ 1: the body creeps back without oscillating");
        }
    }
}
