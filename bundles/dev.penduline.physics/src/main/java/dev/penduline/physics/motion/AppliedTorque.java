package dev.penduline.physics.motion;

import java.util.function.DoubleUnaryOperator;

/**
 * An external torque acting on the body besides gravity and friction: a motor, a spring, a
 * door closer. Positive torque drives the angle up.
 *
 * <p>It must be continuous (a jump in time should coincide with nothing the simulator has to
 * locate; a true switch belongs in its own event). It may depend on the angle and velocity
 * (a spring or a hydraulic closer), but the stick test evaluates it at zero velocity.
 */
@FunctionalInterface
public interface AppliedTorque {

    /**
     * The applied torque.
     *
     * @param time     time since release (s)
     * @param angle    angle θ in the sensor's frame (rad)
     * @param velocity angular velocity ω (rad/s)
     * @return torque about the pivot (N·m), positive in the direction of increasing θ
     */
    double torque(double time, double angle, double velocity);

    /**
     * A torque that depends on time only.
     *
     * @param ofTime torque (N·m) as a function of time since release (s)
     * @return the applied torque
     */
    static AppliedTorque ofTime(DoubleUnaryOperator ofTime) {
        return (t, angle, velocity) -> ofTime.applyAsDouble(t);
    }
}
