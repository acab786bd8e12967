package dev.penduline.physics.motion;

/**
 * Where the energy of a run went, in joules.
 *
 * <p>Potential energy is measured from the hanging equilibrium:
 * {@code m g cos α Lc (1 − cos(θ − θeq))}, or {@code ½ m g cos α Lc (θ − θeq)²} with
 * linearised gravity. The balance {@code initial + applied = kinetic + potential + dissipated}
 * holds to the integrator's tolerance, because every dissipated term is integrated, and
 * error-controlled, as part of the state (see {@link SwingEquation}).
 *
 * @param initial   kinetic plus potential energy at release (J)
 * @param kinetic   kinetic energy ½ J0 ω² at the end of the run (J)
 * @param potential potential energy at the end of the run (J)
 * @param viscous   energy dissipated by the viscous term, ∫ b ω² dt (J)
 * @param coulomb   energy dissipated by the Coulomb term, ∫ Tc |ω| dt (J)
 * @param drag      energy dissipated by quadratic drag, ∫ c |ω|³ dt (J)
 * @param applied   work done on the body by the applied torque, ∫ T ω dt (J)
 */
public record SwingEnergy(double initial, double kinetic, double potential, double viscous,
        double coulomb, double drag, double applied) {

    /**
     * Total energy dissipated by friction and damping.
     *
     * @return viscous + coulomb + drag (J)
     */
    public double dissipated() {
        return viscous + coulomb + drag;
    }

    /**
     * Mechanical energy at the end of the run.
     *
     * @return kinetic + potential (J)
     */
    public double remaining() {
        return kinetic + potential;
    }

    /**
     * What the energy balance fails to account for; zero up to the integrator's tolerance.
     *
     * @return initial + applied − remaining − dissipated (J)
     */
    public double imbalance() {
        return initial + applied - remaining() - dissipated();
    }
}
