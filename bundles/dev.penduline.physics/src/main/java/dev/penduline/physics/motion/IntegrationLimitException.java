package dev.penduline.physics.motion;

import dev.penduline.physics.InvalidValueException;

/**
 * A simulation asked for more integration steps than its limit allows: the motion is too stiff
 * (friction so large that the body creeps) or the simulated time too long for the step size the
 * accuracy needs. It is an {@link InvalidValueException} because the cause is a value the
 * caller chose; the message says which limit was hit, where, and what to change.
 */
public class IntegrationLimitException extends InvalidValueException {

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
