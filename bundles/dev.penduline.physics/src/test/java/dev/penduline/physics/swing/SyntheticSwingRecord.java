package dev.penduline.physics.swing;

import java.util.SplittableRandom;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * A free-release record made the way a test rig makes one, from the event-driven simulator: a
 * still segment, the release between two samples, then the simulated swing in the sensor's
 * frame (the mechanism's θeq is the sensor's zero offset), with seeded Gaussian noise and
 * optional encoder quantisation. Invented data with known truth, for the analysis tests.
 *
 * @param mechanism   the body (its equilibriumAngle is the offset to recover)
 * @param friction    the losses
 * @param theta0      release angle from the equilibrium (rad)
 * @param stillTime   length of the still segment before release (s)
 * @param duration    record length after the release (s)
 * @param sampleRate  samples per second (Hz)
 * @param noise       standard deviation of added Gaussian noise (rad)
 * @param counts      encoder counts per revolution, 0 for none
 * @param seed        random seed
 * @param jitter      relative jitter of the sample times (0 for regular sampling)
 */
record SyntheticSwingRecord(MechanismProperties mechanism, FrictionTorques friction, double theta0,
        double stillTime, double duration, double sampleRate, double noise, int counts, long seed, double jitter) {

    /** A rig-like arm: 2 kg, centroid 0.4 m, J0 = 0.5 kg·m², sensor zero 3° off the hanging position. */
    static final MechanismProperties ARM =
            new MechanismProperties(2.0, 0.4, 0.5, Math.toRadians(3), MechanismProperties.STANDARD_GRAVITY, 0);

    static SyntheticSwingRecord of(FrictionTorques friction, double theta0) {
        return new SyntheticSwingRecord(ARM, friction, theta0, 1.3, 40, 200, Math.toRadians(0.03), 4096, 42, 0);
    }

    SyntheticSwingRecord withNoise(double sigma, int countsPerRev) {
        return new SyntheticSwingRecord(mechanism, friction, theta0, stillTime, duration, sampleRate, sigma,
                countsPerRev, seed, jitter);
    }

    SyntheticSwingRecord withDuration(double seconds) {
        return new SyntheticSwingRecord(mechanism, friction, theta0, stillTime, seconds, sampleRate, noise, counts,
                seed, jitter);
    }

    SyntheticSwingRecord withJitter(double relative) {
        return new SyntheticSwingRecord(mechanism, friction, theta0, stillTime, duration, sampleRate, noise, counts,
                seed, relative);
    }

    /** Record times start at 100 s so that nothing relies on a zero time base. */
    double releaseTime() {
        return 100 + stillTime;
    }

    double[][] samples() {
        final SplittableRandom random = new SplittableRandom(seed);
        final int n = (int) Math.round((stillTime + duration) * sampleRate);
        final double[] t = new double[n];
        final double start = 100 + 0.37 / sampleRate;
        for (int i = 0; i < n; i++) {
            t[i] = start + (i + jitter * (random.nextDouble() - 0.5)) / sampleRate;
        }
        int first = 0;
        while (t[first] < releaseTime()) {
            first++;
        }
        final double[] since = new double[n - first];
        for (int i = first; i < n; i++) {
            since[i - first] = t[i] - releaseTime();
        }
        final double thetaStart = mechanism.equilibriumAngle() + theta0;
        final SwingRun run = new SwingSimulator(mechanism, friction).withTolerance(1e-9).simulate(thetaStart, 0, since);
        final double[] swing = run.angles();
        final double[] theta = new double[n];
        final double q = counts > 0 ? 2 * Math.PI / counts : 0;
        for (int i = 0; i < n; i++) {
            final double clean = i < first ? thetaStart : swing[i - first];
            final double noisy = clean + noise * random.nextGaussian();
            theta[i] = q > 0 ? q * Math.rint(noisy / q) : noisy;
        }
        return new double[][] {t, theta};
    }

    SwingRun truth() {
        return new SwingSimulator(mechanism, friction).withTolerance(1e-10)
                .simulate(mechanism.equilibriumAngle() + theta0, 0, duration, sampleRate);
    }
}
