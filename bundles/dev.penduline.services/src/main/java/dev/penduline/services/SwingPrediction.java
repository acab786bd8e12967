package dev.penduline.services;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;

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
        if (duration * sampleRate > 50_000_000) {
            throw new InputException("duration × rate asks for more than 50 million samples; lower the rate");
        }
        MechanismProperties p = mechanism.properties();
        MechanismProperties aboutEquilibrium = new MechanismProperties(p.mass(), p.centroidDistance(),
                p.pivotInertia(), 0, p.gravity(), p.axisTilt());
        try {
            return new SwingSimulator(aboutEquilibrium, friction).simulate(theta0, omega0, duration, sampleRate);
        } catch (IllegalArgumentException e) {
            throw new InputException(e.getMessage(), e);
        }
    }
}
