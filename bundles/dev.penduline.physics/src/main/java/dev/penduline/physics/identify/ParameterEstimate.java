package dev.penduline.physics.identify;

/**
 * One fitted parameter with its two uncertainty estimates.
 *
 * @param name            the parameter's name (b, Tc, Ts, c, J0, theta0[session], ...)
 * @param unit            its SI unit
 * @param value           the estimate (SI)
 * @param sigmaJacobian   standard error from the Jacobian at the optimum, σ²(JᵀJ)⁻¹ with
 *                        σ² = RSS/(n − p) (SI); NaN when the parameter was not free or sits on its bound
 * @param sigmaResampling standard deviation over the block-bootstrap refits (SI); NaN when
 *                        resampling was skipped or the parameter was not free
 * @param free            whether the parameter was fitted (false: held at its given value)
 * @param onBound         whether the estimate sits on its lower bound (then its σ is not meaningful)
 */
public record ParameterEstimate(String name, String unit, double value, double sigmaJacobian,
        double sigmaResampling, boolean free, boolean onBound) {

    /**
     * How far the resampling σ must exceed the Jacobian's before it is quoted: twice the
     * sampling error of a standard deviation from the default 40 refits, {@code 2/√(2·39)} ≈
     * 23 % (the standard error of a sample standard deviation, σ/√(2(n − 1)), for normal data).
     */
    public static final double RESAMPLING_LEAD = 1.25;

    /**
     * The standard error to quote. With white residuals both estimates measure the same thing,
     * and the larger of two noisy estimates is biased high (the coverage test saw ±1σ cover 81 %
     * instead of 68 %); so the resampling σ is quoted only when it exceeds the Jacobian's by
     * more than its own sampling error ({@link #RESAMPLING_LEAD}): residuals that are correlated
     * or a model that misses something, where the Jacobian's is too small.
     *
     * @return σ_resampling when it exceeds {@link #RESAMPLING_LEAD} σ_Jacobian, else σ_Jacobian;
     *         whichever exists when the other is NaN (SI)
     */
    public double sigma() {
        if (Double.isNaN(sigmaResampling)) {
            return sigmaJacobian;
        }
        if (Double.isNaN(sigmaJacobian)) {
            return sigmaResampling;
        }
        return sigmaResampling > RESAMPLING_LEAD * sigmaJacobian ? sigmaResampling : sigmaJacobian;
    }
}
