package dev.penduline.physics.identify;

/**
 * How a fit ended. Only {@link #CONVERGED} results carry trustworthy estimates; the others
 * still report the best parameters reached, the iterations, evaluations and cost.
 */
public enum FitStatus {
    /** The optimiser met its convergence tolerances. */
    CONVERGED,
    /** The iteration limit was reached first. */
    MAX_ITERATIONS,
    /** The evaluation limit was reached first. */
    MAX_EVALUATIONS,
    /** The caller's cancellation check answered true. */
    CANCELLED,
    /** The model could not be evaluated or the optimiser gave up (see the message). */
    FAILED,
    /**
     * The optimiser converged, but the residuals are clearly above the records' noise floor:
     * the model does not describe the records, and no verdict is drawn (see {@link Goodness}).
     */
    MISFIT
}
