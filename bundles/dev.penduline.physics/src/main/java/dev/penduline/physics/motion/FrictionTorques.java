package dev.penduline.physics.motion;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.units.Unit;

/**
 * The friction and damping torques that oppose a swing, in SI units.
 *
 * <p>The torque opposing a rotation at angular velocity ω is
 * {@code b ω + Tc sgn(ω) + c ω|ω|}; while the body is at rest it is held by up to
 * {@link #staticTorque() Ts}. Any combination may be zero.
 *
 * <p>Rule for stiction: {@code stiction == 0} means "the same as Coulomb" (no extra
 * breakaway torque), which is what a fit that does not model stiction wants. A non-zero
 * stiction must be at least the Coulomb torque, because a body that can slide against a
 * torque must also be able to stay put against a smaller one.
 *
 * @param viscous  viscous coefficient b (N·m·s/rad), ≥ 0
 * @param coulomb  Coulomb (dry, kinetic) torque Tc (N·m), ≥ 0
 * @param stiction static (breakaway) torque Ts (N·m), 0 or ≥ coulomb
 * @param drag     quadratic drag coefficient c (N·m·s²/rad²), ≥ 0
 */
public record FrictionTorques(double viscous, double coulomb, double stiction, double drag) {

    private static final FrictionTorques NONE = new FrictionTorques(0, 0, 0, 0);

    /**
     * Checks that every torque is finite and non-negative and that stiction is 0 or ≥ Coulomb.
     *
     * @throws IllegalArgumentException naming the offending parameter and value
     */
    public FrictionTorques {
        requireNonNegative("viscous", viscous, Unit.N_M_S_PER_RAD.symbol());
        requireNonNegative("coulomb", coulomb, Unit.NEWTON_METRE.symbol());
        requireNonNegative("stiction", stiction, Unit.NEWTON_METRE.symbol());
        requireNonNegative("drag", drag, Unit.N_M_S2_PER_RAD2.symbol());
        if (stiction != 0 && stiction < coulomb) {
            throw new InvalidValueException("stiction " + stiction
                    + " N·m is below coulomb " + coulomb
                    + " N·m: use 0 for 'same as coulomb', or a value ≥ coulomb");
        }
    }

    /**
     * No friction at all: the undamped pendulum.
     *
     * @return the frictionless set
     */
    public static FrictionTorques none() {
        return NONE;
    }

    /**
     * Pure viscous damping.
     *
     * @param b viscous coefficient (N·m·s/rad)
     * @return the friction set
     */
    public static FrictionTorques viscousOnly(double b) {
        return new FrictionTorques(b, 0, 0, 0);
    }

    /**
     * Pure Coulomb friction with no extra stiction.
     *
     * @param tc Coulomb torque (N·m)
     * @return the friction set
     */
    public static FrictionTorques coulombOnly(double tc) {
        return new FrictionTorques(0, tc, 0, 0);
    }

    /**
     * Returns a copy with another viscous coefficient.
     *
     * @param b viscous coefficient (N·m·s/rad)
     * @return the copy
     */
    public FrictionTorques withViscous(double b) {
        return new FrictionTorques(b, coulomb, stiction, drag);
    }

    /**
     * Returns a copy with another Coulomb torque (stiction is kept, so it must stay ≥ it or 0).
     *
     * @param tc Coulomb torque (N·m)
     * @return the copy
     */
    public FrictionTorques withCoulomb(double tc) {
        return new FrictionTorques(viscous, tc, stiction, drag);
    }

    /**
     * Returns a copy with another static torque.
     *
     * @param ts static (breakaway) torque (N·m), 0 meaning "same as coulomb"
     * @return the copy
     */
    public FrictionTorques withStiction(double ts) {
        return new FrictionTorques(viscous, coulomb, ts, drag);
    }

    /**
     * Returns a copy with another quadratic drag coefficient.
     *
     * @param c drag coefficient (N·m·s²/rad²)
     * @return the copy
     */
    public FrictionTorques withDrag(double c) {
        return new FrictionTorques(viscous, coulomb, stiction, c);
    }

    /**
     * The torque that holds the body at rest: {@code stiction}, or {@code coulomb} when
     * stiction is 0.
     *
     * @return Ts (N·m)
     */
    public double staticTorque() {
        return stiction == 0 ? coulomb : stiction;
    }

    /**
     * Whether any term is non-zero.
     *
     * @return true when the set dissipates or holds
     */
    public boolean isAny() {
        return viscous != 0 || coulomb != 0 || stiction != 0 || drag != 0;
    }

    private static void requireNonNegative(String name, double value, String unit) {
        if (!Double.isFinite(value) || value < 0) {
            throw new InvalidValueException(
                    name + " must be a finite number ≥ 0 " + unit + ", got " + value);
        }
    }
}
