package dev.penduline.physics.motion;

import org.hipparchus.special.elliptic.jacobi.CopolarN;
import org.hipparchus.special.elliptic.jacobi.JacobiElliptic;
import org.hipparchus.special.elliptic.jacobi.JacobiEllipticBuilder;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * Closed-form undamped swing of any amplitude below π, released from rest.
 *
 * <p>With {@code k = sin(A/2)} for the amplitude {@code A = |θ0 − θeq|}, the period is
 * {@code T = 4 K(k) / ωn} and the motion {@code θ − θeq = 2 asin(k sn(K − ωn t, k))}
 * (the classic solution of the pendulum equation; K and sn as defined in Abramowitz &amp;
 * Stegun, Handbook of Mathematical Functions, chapters 17 and 16).
 *
 * <p>Trap: textbooks write K and sn with the modulus k; Hipparchus'
 * {@link LegendreEllipticIntegral#bigK(double)} and {@link JacobiEllipticBuilder#build(double)}
 * both take the <em>parameter</em> {@code m = k²} (their Javadoc: "m=k² where k is the
 * elliptic modulus"). This class passes {@code m = sin²(A/2)}.
 */
public final class EllipticSwing {

    private final double equilibrium;
    private final double direction;
    private final double naturalFrequency;
    private final double modulus;
    private final double quarterPeriod;
    private final JacobiElliptic jacobi;

    /**
     * The undamped swing released from rest at θ0.
     *
     * @param mechanism mass properties; must have a restoring gravity torque (Lc &gt; 0)
     * @param theta0    release angle in the sensor's frame (rad), |θ0 − θeq| &lt; π
     */
    public EllipticSwing(MechanismProperties mechanism, double theta0) {
        if (!(mechanism.gravityStiffness() > 0)) {
            throw new InvalidValueException("the mechanism has no restoring torque: it does not swing");
        }
        final double amplitude = Math.abs(theta0 - mechanism.equilibriumAngle());
        if (!(amplitude < Math.PI)) {
            throw new InvalidValueException("amplitude |θ0 − θeq| must be below π rad, got "
                    + amplitude + " rad: at π the body balances upside down and never returns");
        }
        this.equilibrium = mechanism.equilibriumAngle();
        this.direction = theta0 >= equilibrium ? 1 : -1;
        this.naturalFrequency = mechanism.naturalFrequency();
        this.modulus = Math.sin(0.5 * amplitude);
        final double parameter = modulus * modulus;
        this.quarterPeriod = LegendreEllipticIntegral.bigK(parameter);
        this.jacobi = JacobiEllipticBuilder.build(parameter);
    }

    /**
     * The elliptic modulus k = sin(A/2).
     *
     * @return k (dimensionless)
     */
    public double modulus() {
        return modulus;
    }

    /**
     * The elliptic parameter m = k² = sin²(A/2), what Hipparchus' elliptic functions take.
     *
     * @return m (dimensionless)
     */
    public double parameter() {
        return modulus * modulus;
    }

    /**
     * The complete elliptic integral of the first kind K(m).
     *
     * @return K (dimensionless)
     */
    public double completeIntegral() {
        return quarterPeriod;
    }

    /**
     * The period 4 K / ωn.
     *
     * @return T (s)
     */
    public double period() {
        return 4 * quarterPeriod / naturalFrequency;
    }

    /**
     * The period over the small-angle period, 2 K / π.
     *
     * @return T / T0 (dimensionless, ≥ 1)
     */
    public double periodRatio() {
        return 2 * quarterPeriod / Math.PI;
    }

    /**
     * Angle at time t.
     *
     * @param t time since release (s)
     * @return θ in the sensor's frame (rad)
     */
    public double angle(double t) {
        final CopolarN v = jacobi.valuesN(quarterPeriod - naturalFrequency * t);
        return equilibrium + direction * 2 * Math.asin(modulus * v.sn());
    }

    /**
     * Angular velocity at time t: {@code −2 k ωn cn(K − ωn t)}.
     *
     * @param t time since release (s)
     * @return ω (rad/s)
     */
    public double velocity(double t) {
        final CopolarN v = jacobi.valuesN(quarterPeriod - naturalFrequency * t);
        return -direction * 2 * modulus * naturalFrequency * v.cn();
    }
}
