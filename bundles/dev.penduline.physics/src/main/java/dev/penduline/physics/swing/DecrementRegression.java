package dev.penduline.physics.swing;

import java.util.List;

/**
 * The per-half-swing decrement as a quadratic in the amplitude, {@code ΔA ≈ a0 + a1 Ā + a2 Ā²}
 * (per half-swing, from the energy balance), fitted by least squares with every coefficient kept ≥ 0.
 *
 * <p>The regressand is the {@link HalfSwing#equivalentDecrement() energy-equivalent decrement}
 * and the regressor the half-swing's mean amplitude Ā. Energy balance over a half-swing of
 * amplitude Ā, with {@code ΔE = K Ā ΔA} and at small angles {@code ω ≈ Ā ωn sin(ωn t)}:
 * <ul>
 * <li>Coulomb: work {@code Tc · 2Ā}, so {@code a0 = 2 Tc / K} (the classic decrement of
 * {@code 4 Tc/K} per cycle, Den Hartog, Mechanical Vibrations, "Coulomb damping");</li>
 * <li>viscous: {@code ∫ b ω² dt = b Ā² ωn ∫₀^π sin² = (π/2) b ωn Ā²}, so
 * {@code a1 = π b ωn / (2K) = π ζ};</li>
 * <li>drag: {@code ∫ c |ω|³ dt = c Ā³ ωn² ∫₀^π sin³ = (4/3) c ωn² Ā³}, so
 * {@code a2 = 4 c ωn² / (3K)}.</li>
 * </ul>
 * Non-negativity and parsimony: every subset of the three terms is fitted, those with a negative
 * coefficient are discarded, and of the rest the subset with the lowest Bayesian information
 * criterion is kept (Schwarz 1978), so that a term stays only when the decrements need it; the
 * terms left out are reported as dropped.
 *
 * @param a0          constant decrement (rad), the Coulomb term
 * @param a1          decrement per radian of amplitude (dimensionless), the viscous term
 * @param a2          decrement per radian² of amplitude (1/rad), the drag term
 * @param a0Error     standard error of a0 (rad), NaN when dropped
 * @param a1Error     standard error of a1, NaN when dropped
 * @param a2Error     standard error of a2 (1/rad), NaN when dropped
 * @param rSquared    coefficient of determination of the fit
 * @param residualStd residual standard deviation (rad)
 * @param count       number of half-swings fitted
 * @param dropped     names of the terms held at zero ("a0", "a1", "a2")
 */
public record DecrementRegression(double a0, double a1, double a2, double a0Error, double a1Error, double a2Error,
        double rSquared, double residualStd, int count, List<String> dropped) {

    /**
     * Freezes the list.
     */
    public DecrementRegression {
        dropped = List.copyOf(dropped);
    }

    /**
     * The fitted decrement at an amplitude.
     *
     * @param amplitude mean half-swing amplitude (rad)
     * @return ΔA (rad)
     */
    public double decrement(double amplitude) {
        return a0 + a1 * amplitude + a2 * amplitude * amplitude;
    }

    /**
     * The half-swing centre shift of dry friction, {@code Tc/K = a0/2}.
     *
     * @return the shift (rad)
     */
    public double coulombShift() {
        return 0.5 * a0;
    }

    /**
     * The viscous damping ratio implied by a1, {@code ζ = a1/π}.
     *
     * @return ζ (dimensionless)
     */
    public double viscousDampingRatio() {
        return a1 / Math.PI;
    }

    /**
     * The shares of the Coulomb, viscous and drag terms in the mean fitted decrement over the
     * given amplitudes.
     *
     * @param amplitudes the half-swings' mean amplitudes (rad)
     * @return {coulomb, viscous, drag} shares, summing to 1 (all NaN when the sum is 0)
     */
    public double[] shares(double[] amplitudes) {
        double s1 = 0;
        double s2 = 0;
        for (double a : amplitudes) {
            s1 += a;
            s2 += a * a;
        }
        final double n = amplitudes.length;
        final double c = a0;
        final double v = a1 * s1 / n;
        final double d = a2 * s2 / n;
        final double total = c + v + d;
        return total > 0 ? new double[] {c / total, v / total, d / total}
                : new double[] {Double.NaN, Double.NaN, Double.NaN};
    }
}
