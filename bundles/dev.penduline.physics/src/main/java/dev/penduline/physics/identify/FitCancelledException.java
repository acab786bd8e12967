package dev.penduline.physics.identify;

/**
 * Thrown from inside an evaluation when the caller's cancellation check answers true; the
 * identifier catches it and returns a result with status {@link FitStatus#CANCELLED}.
 */
final class FitCancelledException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    FitCancelledException() {
        super("fit cancelled by the caller", null, false, false);
    }
}
