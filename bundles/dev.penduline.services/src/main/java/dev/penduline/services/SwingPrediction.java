package dev.penduline.services;

import java.util.Locale;
import java.util.Optional;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;
import dev.penduline.records.InputLimits;

/**
 * Predicts a free swing of a mechanism: the use case behind {@code penduline simulate} and the
 * workbench's prediction views. Angles are measured from the hanging equilibrium.
 */
public final class SwingPrediction {

    private SwingPrediction() {
    }

    /**
     * Simulates a swing from a release.
     *
     * @param mechanism  the mechanism
     * @param friction   the friction torques (SI)
     * @param theta0     release angle from the hanging equilibrium (rad)
     * @param omega0     initial angular velocity (rad/s)
     * @param duration   how long to simulate (s)
     * @param sampleRate output samples per second (Hz)
     * @return the run
     * @throws InputException when a value is out of range (named in the message)
     */
    public static SwingRun simulate(MechanismSource mechanism, FrictionTorques friction, double theta0,
            double omega0, double duration, double sampleRate) throws InputException {
        if (!(duration > 0) || !(sampleRate > 0)) {
            throw new InputException("duration and rate must be positive (got " + duration + " s, " + sampleRate
                    + " Hz)");
        }
        if (Math.floor(duration * sampleRate) + 1 > InputLimits.MAX_RECORD_SAMPLES) {
            throw new InputException(String.format(Locale.ROOT, "--duration %.6g s at --rate %.6g Hz asks for %.4g samples,"
                    + " more than the %d a simulated record may have (README, \"Limits\"); shorten the duration or lower"
                    + " the rate", duration, sampleRate, Math.floor(duration * sampleRate) + 1,
                    InputLimits.MAX_RECORD_SAMPLES));
        }
        MechanismProperties p = mechanism.properties();
        requireSwing(p, friction, theta0, omega0);
        MechanismProperties aboutEquilibrium = new MechanismProperties(p.mass(), p.centroidDistance(),
                p.pivotInertia(), 0, p.gravity(), p.axisTilt());
        try {
            return new SwingSimulator(aboutEquilibrium, friction).simulate(theta0, omega0, duration, sampleRate);
        } catch (InvalidValueException e) {
            throw new InputException(e.getMessage(), e);
        }
    }

    /**
     * Why a mechanism cannot swing at all, if it cannot: its centroid on the pivot axis (no
     * restoring torque, so no equilibrium to swing about) or no inertia about the pivot.
     *
     * @param p the mechanism
     * @return the reason in words, empty when it can swing
     */
    public static Optional<String> noRestoringTorque(MechanismProperties p) {
        double gyration = p.pivotInertia() > 0 && p.mass() > 0 ? Math.sqrt(p.pivotInertia() / p.mass()) : 0;
        if (!(p.pivotInertia() > 0)) {
            return Optional.of("the inertia about the pivot is 0: every part lies on the pivot axis, so there is nothing to "
                    + "swing; check the parts' coordinates (the pivot axis is the z axis through the origin)");
        }
        if (!(Math.abs(p.centroidDistance()) > 1e-9 * gyration)) {
            return Optional.of("the centroid lies on the pivot axis (Lc = 0): a body balanced on its pivot has no restoring "
                    + "torque and does not swing; check the parts' coordinates (the pivot axis is the z axis through the origin)");
        }
        return Optional.empty();
    }

    /**
     * Whether the viscous term alone stops every swing: the damping ratio at the hanging
     * equilibrium, {@code ζ = b / (2 J0 ω_n)}, is above 1, so the body creeps back without ever
     * reversing (the linear oscillator's overdamped case, any dynamics text). The time to creep
     * to within 1 % of the release is {@code ln(100) / λ} with the slow root
     * {@code λ = ω_n (ζ − √(ζ² − 1))}. Such friction would also make the integration crawl along
     * steps of {@code J0 / b}, so it is caught before the simulator runs.
     *
     * @param p        the mechanism
     * @param friction the friction torques
     * @return the message, empty when the body swings
     */
    public static Optional<String> overdamped(MechanismProperties p, FrictionTorques friction) {
        double wn = p.naturalFrequency();
        double zeta = friction.viscous() / (2 * p.pivotInertia() * wn);
        if (!(zeta > 1) || !Double.isFinite(wn)) {
            return Optional.empty();
        }
        // the same root as ω_n (ζ − √(ζ² − 1)), written without the cancellation at large ζ
        double slow = wn / (zeta + Math.sqrt(zeta * zeta - 1));
        double creep = Math.log(100) / slow;
        return Optional.of(String.format(Locale.ROOT, "no swing: the motion is overdamped (damping ratio %.3g at the hanging "
                + "equilibrium, above 1 where swinging ends): viscous %.3g N·m·s/rad lets the body creep to rest in about %.3g s"
                + " without a single reversal. Check the value and its unit (N·m·s/rad)", zeta, friction.viscous(), creep));
    }

    /** The largest drag torque at the swing's natural speed, against the gravity torque m·g·Lc, that is still a swing. */
    static final double DRAG_TO_GRAVITY_LIMIT = 1e4;

    /**
     * Refuses a drag coefficient so large that the body could only creep: at the speed a swing of
     * this amplitude reaches (about ω_n·θ0, or the given start velocity) the drag torque would
     * exceed the gravity torque m·g·Lc by {@value #DRAG_TO_GRAVITY_LIMIT} times. Such a motion
     * is not a swing and the integration cannot follow it; a value that large is nearly always a
     * unit mistake.
     *
     * @param p        the mechanism
     * @param friction the friction torques
     * @param theta0   release angle (rad)
     * @param omega0   initial angular velocity (rad/s)
     * @throws InputException naming the coefficient and the ratio
     */
    static void requireSwing(MechanismProperties p, FrictionTorques friction, double theta0, double omega0)
            throws InputException {
        Optional<String> still = noRestoringTorque(p);
        if (still.isPresent()) {
            throw new InputException(still.get());
        }
        Optional<String> creep = overdamped(p, friction);
        if (creep.isPresent()) {
            throw new InputException(creep.get());
        }
        double gravityTorque = p.mass() * p.gravity() * Math.abs(p.centroidDistance());
        double speed = Math.max(p.naturalFrequency() * Math.abs(theta0), Math.abs(omega0));
        double dragTorque = friction.drag() * speed * speed;
        if (gravityTorque > 0 && dragTorque > DRAG_TO_GRAVITY_LIMIT * gravityTorque) {
            throw new InputException(String.format(Locale.ROOT, "drag %.3g N·m·s²/rad² would brake this swing with "
                    + "%.2g times the gravity torque m·g·Lc = %.3g N·m: the body could only creep, which is not a swing. "
                    + "Check the value and its unit (N·m·s²/rad²)", friction.drag(), dragTorque / gravityTorque, gravityTorque));
        }
    }
}
