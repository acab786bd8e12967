package dev.penduline.physics.motion;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * The torques of the equation of motion, reduced once per configuration to the few numbers the
 * integration loop needs, so that a run does no set-up arithmetic per step. Immutable and
 * shared; the equation that uses them, with the state of one run, is {@link SwingEquation}.
 *
 * <p>{@code stiction} is the holding torque at rest Ts (already Tc when no extra stiction is
 * modelled).
 */
final class SwingModel {

    final double inertia;
    final double inverseInertia;
    final double stiffness;
    final double equilibrium;
    final double viscous;
    final double coulomb;
    final double stiction;
    final double drag;
    final AppliedTorque applied;
    final double smoothingScale;
    final boolean linearGravity;

    SwingModel(MechanismProperties mechanism, FrictionTorques friction, AppliedTorque applied,
            double smoothingScale, boolean linearGravity) {
        this(mechanism.pivotInertia(), mechanism.gravityStiffness(), mechanism.equilibriumAngle(),
                friction.viscous(), friction.coulomb(), friction.staticTorque(), friction.drag(), applied,
                smoothingScale, linearGravity);
    }

    /**
     * From the numbers themselves, unchecked but for the inertia: the identification may probe
     * slightly negative friction values, which the equation handles as written.
     */
    SwingModel(double inertia, double stiffness, double equilibrium, double viscous, double coulomb,
            double stiction, double drag, AppliedTorque applied, double smoothingScale, boolean linearGravity) {
        if (!(inertia > 0)) {
            throw new InvalidValueException(
                    "pivotInertia must be positive to simulate a swing, got " + inertia + " kg·m²");
        }
        this.inertia = inertia;
        this.inverseInertia = 1 / inertia;
        this.stiffness = stiffness;
        this.equilibrium = equilibrium;
        this.viscous = viscous;
        this.coulomb = coulomb;
        this.stiction = stiction;
        this.drag = drag;
        this.applied = applied;
        this.smoothingScale = smoothingScale;
        this.linearGravity = linearGravity;
    }

    boolean smoothed() {
        return smoothingScale > 0;
    }

    /** Small-angle natural frequency ωn (rad/s), zero when the body is balanced on its axis. */
    double naturalFrequency() {
        return Math.sqrt(stiffness / inertia);
    }

    /** Gravity torque at θ (N·m): −K sin(θ − θeq), or −K (θ − θeq) when linearised. */
    double gravityTorque(double theta) {
        final double x = theta - equilibrium;
        return linearGravity ? -stiffness * x : -stiffness * Math.sin(x);
    }

    /** Viscous torque b ω (N·m). */
    double viscousTorque(double omega) {
        return viscous * omega;
    }

    /** Coulomb torque: s Tc over a half-swing of friction sign s, or Tc tanh(ω/ε) when smoothed (N·m). */
    double coulombTorque(double omega, double sign) {
        return smoothed() ? coulomb * Math.tanh(omega / smoothingScale) : sign * coulomb;
    }

    /** Drag torque: s c ω² over a half-swing of friction sign s, or c ω|ω| when smoothed (N·m). */
    double dragTorque(double omega, double sign) {
        return smoothed() ? drag * omega * Math.abs(omega) : sign * drag * omega * omega;
    }

    /** Potential energy above the hanging equilibrium (J). */
    double potentialEnergy(double theta) {
        final double x = theta - equilibrium;
        if (linearGravity) {
            return 0.5 * stiffness * x * x;
        }
        // K (1 − cos x) written as 2 K sin²(x/2): no cancellation at small angles
        final double s = Math.sin(0.5 * x);
        return 2 * stiffness * s * s;
    }

    /** Kinetic energy ½ J0 ω² (J). */
    double kineticEnergy(double omega) {
        return 0.5 * inertia * omega * omega;
    }

    double appliedTorque(double t, double theta, double omega) {
        return applied == null ? 0 : applied.torque(t, theta, omega);
    }

    /** The torque friction must resist to keep the body at rest at θ at time t (N·m). */
    double netTorqueAtRest(double t, double theta) {
        return gravityTorque(theta) + appliedTorque(t, theta, 0);
    }
}
