package dev.penduline.services;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;

/**
 * Where the energy of a simulated swing is at each of its samples: kinetic ½·J0·ω², potential
 * m·g·cos(α)·Lc·(1 − cos θ) above the hanging equilibrium, and what each friction term has
 * dissipated since the release (∫ b·ω² dt, ∫ Tc·|ω| dt, ∫ c·|ω|³ dt). The dissipated energies are
 * summed by the trapezoid rule over the run's samples (a quadrature of the simulator's output,
 * not a second integration of the motion); the simulator's own totals at the end of the run,
 * integrated with the motion, are {@link SwingRun#energy()}. Angles are from the hanging
 * equilibrium (the run of {@link SwingPrediction#simulate} or of the forecast's properties).
 *
 * @param times     sample times since release (s)
 * @param kinetic   kinetic energy (J)
 * @param potential potential energy (J)
 * @param viscous   dissipated by the viscous term so far (J)
 * @param coulomb   dissipated by the Coulomb term so far (J)
 * @param drag      dissipated by quadratic drag so far (J)
 */
public record EnergyLedger(double[] times, double[] kinetic, double[] potential, double[] viscous, double[] coulomb,
        double[] drag) {

    /**
     * The ledger of a run.
     *
     * @param p        the properties it was simulated with, equilibrium angle 0
     * @param friction its friction
     * @param run      the run
     * @return the ledger, one entry a sample
     */
    public static EnergyLedger of(MechanismProperties p, FrictionTorques friction, SwingRun run) {
        double[] t = run.times();
        double[] x = run.angles();
        double[] w = run.velocities();
        int n = t.length;
        double[] kinetic = new double[n];
        double[] potential = new double[n];
        double[] viscous = new double[n];
        double[] coulomb = new double[n];
        double[] drag = new double[n];
        double k = p.gravityStiffness();
        for (int i = 0; i < n; i++) {
            double s = Math.sin(0.5 * (x[i] - p.equilibriumAngle()));
            kinetic[i] = 0.5 * p.pivotInertia() * w[i] * w[i];
            // K (1 − cos x) as 2 K sin²(x/2), without the cancellation at small angles
            potential[i] = 2 * k * s * s;
            if (i > 0) {
                double dt = t[i] - t[i - 1];
                double a = Math.abs(w[i - 1]);
                double b = Math.abs(w[i]);
                viscous[i] = viscous[i - 1] + 0.5 * dt * friction.viscous() * (a * a + b * b);
                coulomb[i] = coulomb[i - 1] + 0.5 * dt * friction.coulomb() * (a + b);
                drag[i] = drag[i - 1] + 0.5 * dt * friction.drag() * (a * a * a + b * b * b);
            }
        }
        return new EnergyLedger(t, kinetic, potential, viscous, coulomb, drag);
    }

    /**
     * Number of samples.
     *
     * @return the length of every array
     */
    public int size() {
        return times.length;
    }
}
