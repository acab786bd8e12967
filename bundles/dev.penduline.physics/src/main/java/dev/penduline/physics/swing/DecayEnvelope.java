package dev.penduline.physics.swing;

/**
 * A model of how the amplitude falls from one half-swing to the next, fitted to the turning
 * points' amplitudes {@code A_n} (n counts half-swings from the release).
 *
 * @param model            the shape
 * @param initialAmplitude the fitted amplitude at the release (rad)
 * @param ratePerCycle     the model's rate per full cycle: for {@link Model#LINEAR} the
 *                         amplitude lost (rad); for {@link Model#GEOMETRIC} the logarithmic
 *                         decrement δ = ln(A_n / A_{n+2}); for {@link Model#RECIPROCAL} the growth
 *                         of 1/A (1/rad)
 * @param rSquared         coefficient of determination in amplitude space, comparable between
 *                         the models
 * @param points           number of amplitudes fitted
 */
public record DecayEnvelope(Model model, double initialAmplitude, double ratePerCycle, double rSquared, int points) {

    /** The envelope shapes and the loss each one is the signature of (see the package documentation). */
    public enum Model {
        /** {@code A_n = A_0 − d n}: a constant decrement, the signature of dry (Coulomb) friction. */
        LINEAR,
        /** {@code A_n = A_0 e^(−λ n)}: a constant ratio, the signature of viscous damping. */
        GEOMETRIC,
        /** {@code 1/A_n = 1/A_0 + μ n}: a decrement growing as A², the signature of quadratic drag. */
        RECIPROCAL
    }

    /**
     * The amplitude after a number of cycles according to the model.
     *
     * @param cycles full cycles since the release (may be fractional)
     * @return the amplitude (rad)
     */
    public double amplitudeAfter(double cycles) {
        return switch (model) {
            case LINEAR -> initialAmplitude - ratePerCycle * cycles;
            case GEOMETRIC -> initialAmplitude * Math.exp(-ratePerCycle * cycles);
            case RECIPROCAL -> 1 / (1 / initialAmplitude + ratePerCycle * cycles);
        };
    }

    /**
     * The equivalent viscous damping ratio of a geometric envelope, {@code ζ = δ/sqrt(4π² + δ²)}
     * (the inverse of δ = 2πζ/sqrt(1 − ζ²), Thomson, Theory of Vibration with Applications).
     *
     * @return ζ (dimensionless), NaN for the other models
     */
    public double dampingRatio() {
        return model == Model.GEOMETRIC
                ? ratePerCycle / Math.sqrt(4 * Math.PI * Math.PI + ratePerCycle * ratePerCycle) : Double.NaN;
    }
}
