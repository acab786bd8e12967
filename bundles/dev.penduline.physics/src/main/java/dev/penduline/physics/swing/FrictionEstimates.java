package dev.penduline.physics.swing;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * First estimates of the friction parameters in SI, from the decrement regression and the
 * mechanism: {@code Tc = K a0 / 2}, {@code b = 2 K a1 / (π ωn)}, {@code c = 3 K a2 / (4 ωn²)}
 * (energy balance per half-swing, see {@link DecrementRegression}). Starting values for the
 * time-domain fit, not its result.
 *
 * @param viscous          b (N·m·s/rad)
 * @param viscousError     standard error of b (N·m·s/rad), NaN when the term was dropped
 * @param coulomb          Tc (N·m)
 * @param coulombError     standard error of Tc (N·m), NaN when dropped
 * @param drag             c (N·m·s²/rad²)
 * @param dragError        standard error of c (N·m·s²/rad²), NaN when dropped
 * @param stiffness        K = m g cos α Lc used (N·m/rad)
 * @param naturalFrequency ωn used (rad/s)
 */
public record FrictionEstimates(double viscous, double viscousError, double coulomb, double coulombError,
        double drag, double dragError, double stiffness, double naturalFrequency) {

    static FrictionEstimates from(DecrementRegression r, double stiffness, double omegaN) {
        final double kb = 2 * stiffness / (Math.PI * omegaN);
        final double kc = 0.5 * stiffness;
        final double kd = 3 * stiffness / (4 * omegaN * omegaN);
        return new FrictionEstimates(kb * r.a1(), kb * r.a1Error(), kc * r.a0(), kc * r.a0Error(),
                kd * r.a2(), kd * r.a2Error(), stiffness, omegaN);
    }

    /**
     * The estimates as simulator input, with stiction equal to Coulomb.
     *
     * @return the friction torques
     */
    public FrictionTorques toFrictionTorques() {
        return new FrictionTorques(Math.max(0, viscous), Math.max(0, coulomb), 0, Math.max(0, drag));
    }
}
