package dev.penduline.physics.swing;

/**
 * Whether and where the body came to rest.
 *
 * <p>A body at rest at {@code x = θrest − θeq} is held against the gravity torque
 * {@code K sin x}, so the static friction torque is at least {@code K |sin x|}: a lower bound on
 * stiction (the equation of motion of DOMAIN §1 at ω = 0). It is reported only when the rest
 * offset exceeds twice its uncertainty; a viscous decay settles at the equilibrium itself.
 *
 * @param stopped            true when the record ends in a settled tail
 * @param time               when the tail begins, in the record's time base (s); NaN when not
 *                           stopped
 * @param restAngle          median angle of the tail, sensor frame (rad); NaN when not stopped
 * @param restOffset         rest angle minus the equilibrium (rad); NaN when not stopped
 * @param stictionLowerBound {@code K |sin(restOffset)|} (N·m); 0 when the offset is within its
 *                           uncertainty; NaN when not stopped or the mechanism is unknown
 * @param note               a sentence for the report
 */
public record StopInfo(boolean stopped, double time, double restAngle, double restOffset, double stictionLowerBound,
        String note) {
}
