package dev.penduline.physics.identify;

/**
 * Where the energy went over the recorded swings, at the fitted parameters: the share of the
 * dissipated energy taken by each loss (∫ b ω² dt, ∫ Tc |ω| dt, ∫ c |ω|³ dt), summed over the
 * sessions. The shares add up to one. Their standard deviations come from the spread of the
 * shares over the resampling refits (or over parameter sets drawn from the Jacobian's
 * covariance when there was no resampling); NaN when neither is available.
 *
 * @param viscous       share of the viscous term (0..1)
 * @param coulomb       share of the Coulomb term (0..1)
 * @param drag          share of quadratic drag (0..1)
 * @param dissipated    total energy dissipated over the records (J)
 * @param dominant      the term with the largest share (not a verdict: see {@link FrictionVerdict})
 * @param viscousSigma  standard deviation of the viscous share
 * @param coulombSigma  standard deviation of the Coulomb share
 * @param dragSigma     standard deviation of the drag share
 */
public record EnergyShares(double viscous, double coulomb, double drag, double dissipated,
        FrictionTerm dominant, double viscousSigma, double coulombSigma, double dragSigma) {

    /**
     * Shares without uncertainties.
     *
     * @param viscous    share of the viscous term
     * @param coulomb    share of the Coulomb term
     * @param drag       share of quadratic drag
     * @param dissipated total energy dissipated (J)
     * @param dominant   the term with the largest share
     */
    public EnergyShares(double viscous, double coulomb, double drag, double dissipated, FrictionTerm dominant) {
        this(viscous, coulomb, drag, dissipated, dominant, Double.NaN, Double.NaN, Double.NaN);
    }

    /**
     * The share of one loss (stiction dissipates nothing of its own: it holds the body at rest).
     *
     * @param term the loss
     * @return its share (0..1)
     */
    public double share(FrictionTerm term) {
        return switch (term) {
            case VISCOUS -> viscous;
            case COULOMB -> coulomb;
            case DRAG -> drag;
            case STICTION -> 0;
        };
    }

    /**
     * The standard deviation of one loss's share.
     *
     * @param term the loss
     * @return its σ, NaN when unknown
     */
    public double sigma(FrictionTerm term) {
        return switch (term) {
            case VISCOUS -> viscousSigma;
            case COULOMB -> coulombSigma;
            case DRAG -> dragSigma;
            case STICTION -> 0;
        };
    }

    /**
     * A copy with the standard deviations of the shares.
     *
     * @param v σ of the viscous share
     * @param c σ of the Coulomb share
     * @param d σ of the drag share
     * @return the copy
     */
    public EnergyShares withSigmas(double v, double c, double d) {
        return new EnergyShares(viscous, coulomb, drag, dissipated, dominant, v, c, d);
    }
}
