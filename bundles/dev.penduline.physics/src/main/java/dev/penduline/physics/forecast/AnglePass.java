package dev.penduline.physics.forecast;

/**
 * The first passage of the swing through a chosen angle.
 *
 * @param angle           the angle from the hanging equilibrium (rad)
 * @param time            when it is first passed, after release (s)
 * @param angularVelocity the angular velocity there (rad/s, signed)
 * @param tipSpeed        |ω| times the chosen radius (m/s), NaN when no radius was given
 * @param kineticEnergy   ½ J0 ω² there (J)
 */
public record AnglePass(double angle, double time, double angularVelocity, double tipSpeed, double kineticEnergy) {
}
