package dev.penduline.physics.motion;

/**
 * A simulation asked for more integration steps than its limit allows: the motion is too stiff
 * (friction so large that the body creeps) or the simulated time too long for the step size the
 * accuracy needs. It is an {@link IllegalArgumentException} because the cause is a value the
 * caller chose; the message says which limit was hit, where, and what to change.
 */
public class IntegrationLimitException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message what limit was hit and what to do
     */
    public IntegrationLimitException(String message) {
        super(message);
    }
}
