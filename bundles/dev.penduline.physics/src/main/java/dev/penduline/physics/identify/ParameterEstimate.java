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
     * The larger of the two standard errors, the honest one to quote for records with
     * autocorrelated residuals.
     *
     * @return max(σ_Jacobian, σ_resampling), ignoring NaN (SI)
     */
    public double sigma() {
        if (Double.isNaN(sigmaResampling)) {
            return sigmaJacobian;
        }
        return Double.isNaN(sigmaJacobian) ? sigmaResampling : Math.max(sigmaJacobian, sigmaResampling);
    }
}
