package dev.penduline.physics.identify;

/**
 * Where the energy went over the recorded swings, at the fitted parameters: the share of the
 * dissipated energy taken by each loss (∫ b ω² dt, ∫ Tc |ω| dt, ∫ c |ω|³ dt), summed over the
 * sessions. The shares add up to one.
 *
 * @param viscous     share of the viscous term (0..1)
 * @param coulomb     share of the Coulomb term (0..1)
 * @param drag        share of quadratic drag (0..1)
 * @param dissipated  total energy dissipated over the records (J)
 * @param dominant    the term with the largest share
 */
public record EnergyShares(double viscous, double coulomb, double drag, double dissipated,
        FrictionTerm dominant) {
}
