package dev.penduline.physics.motion;

import org.hipparchus.ode.SecondaryODE;

/**
 * What a {@link SwingIntegration} carries besides the equation's own state: a secondary equation
 * (Hipparchus' {@link SecondaryODE}) integrated over the same steps, outside the error control,
 * so the motion is exactly what a run without it gives. The identification's sensitivities are
 * such a companion.
 *
 * <p>A companion reads the mode of the half-swing (friction sign, held) from the
 * {@link SwingEquation} it was made for. At a reversal the primary state is continuous (θ is,
 * and ω = 0 on both sides) but ω' jumps; a companion whose state depends on the reversal time
 * applies its jump condition in {@link #reversal}. A breakaway under an applied torque calls no
 * jump: the identification, the only user of sensitivities, has no applied torque.
 */
public interface SwingCompanion extends SecondaryODE {

    /**
     * The companion's state at the release.
     *
     * @return a new array of {@link #getDimension()} values (units of the companion)
     */
    double[] initialState();

    /**
     * Applies the jump condition at a reversal, after the stick test; the default keeps the state.
     *
     * @param state               the companion's state at the reversal, updated in place
     * @param accelerationBefore  ω' just before the reversal (rad/s²)
     * @param accelerationAfter   ω' just after it (rad/s²), zero when the body sticks
     */
    default void reversal(double[] state, double accelerationBefore, double accelerationAfter) {
        // nothing depends on the reversal time
    }
}
