package dev.penduline.physics.motion;

import java.util.ArrayList;
import java.util.List;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * Closed-form small-angle swing with Coulomb friction only, released from rest.
 *
 * <p>Each half-swing is a cosine of the undamped natural frequency about a centre shifted by
 * {@code Tc / K} against the motion ({@code K = m g cos α Lc}); every half-swing lasts exactly
 * π/ωn and lowers the amplitude by {@code 2 Tc / K}, so the amplitude falls by
 * {@code 4 Tc / K} per cycle and the motion stops at the first reversal inside the dead band
 * {@code |θ − θeq| ≤ Ts / K} (Den Hartog, Mechanical Vibrations, "Coulomb damping"; Thomson,
 * Theory of Vibration with Applications, Coulomb damping).
 */
public final class LinearCoulombDecay {

    private final double equilibrium;
    private final double naturalFrequency;
    private final double centreOffset;
    private final double deadBand;

    /**
     * The decay of a mechanism with Coulomb friction and stiction.
     *
     * @param mechanism mass properties; must have a restoring gravity torque (Lc &gt; 0)
     * @param coulomb   Coulomb torque Tc (N·m), ≥ 0
     * @param stiction  static torque Ts (N·m), 0 ("same as coulomb") or ≥ coulomb
     */
    public LinearCoulombDecay(MechanismProperties mechanism, double coulomb, double stiction) {
        final double k = mechanism.gravityStiffness();
        if (!(k > 0)) {
            throw new InvalidValueException("the mechanism has no restoring torque (m g cos α Lc = "
                    + k + " N·m/rad): no oscillation to decay");
        }
        final FrictionTorques friction = new FrictionTorques(0, coulomb, stiction, 0);
        this.equilibrium = mechanism.equilibriumAngle();
        this.naturalFrequency = mechanism.naturalFrequency();
        this.centreOffset = coulomb / k;
        this.deadBand = friction.staticTorque() / k;
    }

    /**
     * Shift of the centre of each half-swing, Tc / K.
     *
     * @return the offset (rad)
     */
    public double centreOffset() {
        return centreOffset;
    }

    /**
     * Half-width of the band about θeq in which the body can rest, Ts / K.
     *
     * @return the dead band (rad)
     */
    public double deadBand() {
        return deadBand;
    }

    /**
     * Amplitude lost per full cycle, 4 Tc / K.
     *
     * @return the loss (rad)
     */
    public double amplitudeLossPerCycle() {
        return 4 * centreOffset;
    }

    /**
     * The turning points of a release from rest: the release itself, each reversal, the stop.
     *
     * @param theta0 release angle in the sensor's frame (rad)
     * @return the turning points, the last one being where the body rests
     */
    public List<TurningPoint> turningPoints(double theta0) {
        final List<TurningPoint> points = new ArrayList<>();
        double x = theta0 - equilibrium;
        final double halfPeriod = Math.PI / naturalFrequency;
        for (int k = 0; ; k++) {
            points.add(new TurningPoint(k * halfPeriod, equilibrium + x));
            if (Math.abs(x) <= deadBand) {
                return points;
            }
            x = 2 * centre(x) - x;
        }
    }

    /**
     * Angle at time t after a release from rest.
     *
     * @param theta0 release angle in the sensor's frame (rad)
     * @param t      time since release (s), ≥ 0
     * @return θ in the sensor's frame (rad)
     */
    public double angle(double theta0, double t) {
        final double halfPeriod = Math.PI / naturalFrequency;
        double x = theta0 - equilibrium;
        double start = 0;
        while (Math.abs(x) > deadBand && t > start + halfPeriod) {
            x = 2 * centre(x) - x;
            start += halfPeriod;
        }
        if (Math.abs(x) <= deadBand) {
            return equilibrium + x;
        }
        final double c = centre(x);
        return equilibrium + c + (x - c) * Math.cos(naturalFrequency * (t - start));
    }

    /** Centre of the half-swing that starts from rest at x: gravity pulls towards 0, friction resists. */
    private double centre(double x) {
        return Math.signum(x) * centreOffset;
    }
}
