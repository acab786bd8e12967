package dev.penduline.physics.motion;

/**
 * An instant where the angular velocity is zero: a release from rest, a reversal at the end of
 * a half-swing, or the final stop.
 *
 * @param time  time since release (s)
 * @param angle angle θ in the sensor's frame (rad)
 */
public record TurningPoint(double time, double angle) {
}
