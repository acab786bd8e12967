package dev.penduline.physics.forecast;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * The angles at which a body can stay at rest: where the gravity torque does not exceed the
 * static friction torque, {@code m g cos α Lc |sin x| ≤ Ts} (or {@code K |x| ≤ Ts} with
 * linearised gravity), about the hanging equilibrium.
 *
 * @param lower    lowest rest angle from the equilibrium (rad), ≤ 0
 * @param upper    highest rest angle from the equilibrium (rad), ≥ 0
 * @param anywhere true when static friction can hold the body at any angle (Ts ≥ m g cos α Lc)
 */
public record RestBand(double lower, double upper, boolean anywhere) {

    /**
     * The rest band a static friction torque allows.
     *
     * @param mechanism     the body
     * @param staticTorque  the static friction torque Ts (N·m), ≥ 0
     * @param linearGravity whether gravity is linearised
     * @return the band; a single point (the equilibrium) when Ts = 0
     */
    public static RestBand of(MechanismProperties mechanism, double staticTorque, boolean linearGravity) {
        if (!(staticTorque >= 0) || Double.isInfinite(staticTorque)) {
            throw new InvalidValueException("staticTorque must be a finite torque >= 0 N·m, got " + staticTorque);
        }
        final double k = mechanism.gravityStiffness();
        if (linearGravity) {
            final double half = k > 0 ? staticTorque / k : Double.POSITIVE_INFINITY;
            return new RestBand(-half, half, false);
        }
        if (staticTorque >= k) {
            return new RestBand(-Math.PI, Math.PI, true);
        }
        final double half = Math.asin(staticTorque / k);
        return new RestBand(-half, half, false);
    }

    /**
     * Width of the band.
     *
     * @return upper − lower (rad)
     */
    public double width() {
        return upper - lower;
    }
}
