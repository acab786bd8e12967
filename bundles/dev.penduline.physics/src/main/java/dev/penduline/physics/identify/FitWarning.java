package dev.penduline.physics.identify;

/**
 * Something the user should know before trusting a fit.
 *
 * @param kind    what kind of doubt
 * @param message a sentence for the user, naming the parameters and values
 */
public record FitWarning(Kind kind, String message) {

    /** The kinds of doubt a fit can raise. */
    public enum Kind {
        /** Two parameters correlate beyond the limit: the record hardly separates them. */
        STRONG_CORRELATION,
        /** A parameter sits on its lower bound (zero friction, or J0 = m Lc²). */
        ON_BOUND,
        /** A friction term lies within two standard errors of zero. */
        NOT_CLEAR_OF_ZERO,
        /** The fitted inertia differs from the calculated one by more than the limit. */
        INERTIA_MISMATCH,
        /** The optimiser did not converge. */
        NOT_CONVERGED,
        /** The Jacobian is (nearly) rank deficient: some parameter is not identifiable. */
        NOT_IDENTIFIABLE,
        /** Some resampling refits failed; the resampling σ rests on fewer refits. */
        RESAMPLING_INCOMPLETE,
        /** The sessions' stiction bands do not overlap. */
        STICTION_UNRESOLVED,
        /** The two uncertainty estimates disagree strongly (residuals far from white noise). */
        UNCERTAINTY_DISAGREEMENT,
        /** The residuals of a record are clearly above its noise floor: the model does not describe it. */
        MISFIT,
        /** The residuals are above the noise floor, but below the misfit limit. */
        ABOVE_NOISE,
        /** A record is quantised coarsely for its noise: the encoder's rounding was modelled. */
        ENCODER_ROUNDING
    }
}
