package dev.penduline.physics.identify;

import org.hipparchus.random.RandomGenerator;
import org.hipparchus.random.Well19937c;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * Records synthesised by our own simulator from known parameters: the truth of every recovery
 * test. The simulator's accuracy is established against closed forms (Den Hartog's Coulomb
 * decay, the viscous decay, the elliptic-integral period) in the dev.penduline.physics.motion
 * tests, and it is run here at a tolerance (1e-11) a hundred times tighter than the fits'.
 *
 * @param mechanism mechanism of the truth (its equilibrium angle is ignored: offset replaces it)
 * @param friction  friction of the truth
 * @param theta0    release angle from equilibrium (rad)
 * @param release   release time on the record's time base (s)
 * @param offset    sensor reading at equilibrium (rad)
 * @param start     first sample time (s)
 * @param duration  record length (s)
 * @param rate      sample rate (Hz)
 * @param noise     standard deviation of white Gaussian noise (rad)
 * @param counts    encoder counts per revolution for quantisation, 0 for none
 * @param seed      seed of the noise
 */
record SyntheticRelease(MechanismProperties mechanism, FrictionTorques friction, double theta0,
        double release, double offset, double start, double duration, double rate, double noise,
        int counts, long seed) {

    /**
     * A 2 kg arm, centroid 0.4 m below the pivot, J0 = 0.5 kg·m²: K = m g Lc = 7.84532 N·m/rad,
     * ωn ≈ 3.961 rad/s, T0 ≈ 1.586 s (the arm of the motion tests).
     */
    static final MechanismProperties ARM = MechanismProperties.of(2.0, 0.4, 0.5);

    /** A release of the arm at θ0 = 0.3 rad, 0.4 s into a 12 s record at 200 Hz, offset 0.02 rad. */
    static SyntheticRelease of(FrictionTorques friction) {
        return new SyntheticRelease(ARM, friction, 0.3, 0.4, 0.02, 0, 12, 200, 0, 0, 1L);
    }

    SyntheticRelease withTheta0(double value) {
        return new SyntheticRelease(mechanism, friction, value, release, offset, start, duration, rate, noise,
                counts, seed);
    }

    SyntheticRelease withDuration(double seconds, double hertz) {
        return new SyntheticRelease(mechanism, friction, theta0, release, offset, start, seconds, hertz, noise,
                counts, seed);
    }

    SyntheticRelease withNoise(double sigma, long newSeed) {
        return new SyntheticRelease(mechanism, friction, theta0, release, offset, start, duration, rate, sigma,
                counts, newSeed);
    }

    SyntheticRelease withCounts(int perRevolution) {
        return new SyntheticRelease(mechanism, friction, theta0, release, offset, start, duration, rate, noise,
                perRevolution, seed);
    }

    SyntheticRelease withMechanism(MechanismProperties value) {
        return new SyntheticRelease(value, friction, theta0, release, offset, start, duration, rate, noise,
                counts, seed);
    }

    /** The exact (noise-free) angles at the given times (rad). */
    double[] exactAngles(double[] times) {
        final SwingSimulator simulator = new SwingSimulator(level(mechanism), friction).withTolerance(1e-11);
        int first = 0;
        while (first < times.length && times[first] <= release) {
            first++;
        }
        final double[] tau = new double[times.length - first];
        for (int i = 0; i < tau.length; i++) {
            tau[i] = times[first + i] - release;
        }
        final double[] y = new double[times.length];
        for (int i = 0; i < first; i++) {
            y[i] = offset + theta0;
        }
        if (tau.length > 0) {
            final SwingRun run = simulator.simulate(theta0, 0, tau);
            final double[] x = run.angles();
            for (int i = 0; i < tau.length; i++) {
                y[first + i] = offset + x[i];
            }
        }
        return y;
    }

    /** The record with noise and quantisation, and guesses a little off the truth. */
    ReleaseSession session(String name) {
        final int n = (int) Math.round(duration * rate);
        final double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = start + i / rate;
        }
        final double[] y = exactAngles(t);
        // Hipparchus' WELL generator (Panneton, L'Ecuyer & Matsumoto 2006) and its Gaussian:
        // an independent, well-tested source of white noise
        final RandomGenerator random = new Well19937c(seed);
        final double quantum = counts > 0 ? 2 * Math.PI / counts : 0;
        for (int i = 0; i < n; i++) {
            y[i] += noise * random.nextGaussian();
            if (quantum > 0) {
                y[i] = quantum * Math.rint(y[i] / quantum);
            }
        }
        // guesses as a release detector would give them: a few percent and tens of ms off
        final SessionGuess guess = new SessionGuess(theta0 * 1.03, release + 0.02, offset - 0.003);
        return new ReleaseSession(name, t, y, guess);
    }

    /** The mechanism with the equilibrium at the sensor's zero (the offset carries it). */
    static MechanismProperties level(MechanismProperties m) {
        return new MechanismProperties(m.mass(), m.centroidDistance(), m.pivotInertia(), 0, m.gravity(),
                m.axisTilt());
    }
}
