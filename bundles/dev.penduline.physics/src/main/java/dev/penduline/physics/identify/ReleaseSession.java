package dev.penduline.physics.identify;

import java.util.Arrays;
import java.util.Objects;

import dev.penduline.physics.InvalidValueException;

/**
 * One recorded release of the mechanism: the measured angle against time, and starting values
 * for the release angle, release instant and sensor offset.
 *
 * <p>The record may start before the release (the body held still) and may end with the body
 * at rest; every sample is fitted. Times may be on any time base and need not be evenly
 * spaced. The arrays are copied on the way in and out.
 *
 * @param name   a label for reports and parameter names (e.g. the file name)
 * @param times  sample times (s), finite and strictly increasing, at least 10 samples
 * @param angles measured angles in the sensor's frame, offset included (rad), finite
 * @param guess  starting values of the session's nuisance parameters
 */
public record ReleaseSession(String name, double[] times, double[] angles, SessionGuess guess) {

    /** Fewest samples a session may have. */
    public static final int MIN_SAMPLES = 10;

    /**
     * Copies the arrays and checks them.
     *
     * @throws IllegalArgumentException naming the session, the field and the sample index
     */
    public ReleaseSession {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(times, "times of session " + name);
        Objects.requireNonNull(angles, "angles of session " + name);
        Objects.requireNonNull(guess, "guess of session " + name);
        if (name.isBlank()) {
            throw new InvalidValueException("session name must not be blank");
        }
        times = times.clone();
        angles = angles.clone();
        if (times.length != angles.length) {
            throw new IllegalArgumentException("session " + name + ": " + times.length + " times but "
                    + angles.length + " angles");
        }
        if (times.length < MIN_SAMPLES) {
            throw new InvalidValueException("session " + name + ": " + times.length
                    + " samples, at least " + MIN_SAMPLES + " are needed");
        }
        for (int i = 0; i < times.length; i++) {
            if (!Double.isFinite(times[i]) || (i > 0 && !(times[i] > times[i - 1]))) {
                throw new InvalidValueException("session " + name + ": times[" + i + "] = " + times[i]
                        + " s; times must be finite and strictly increasing");
            }
            if (!Double.isFinite(angles[i])) {
                throw new InvalidValueException("session " + name + ": angles[" + i + "] = " + angles[i]
                        + " rad is not a finite number");
            }
        }
        if (!(guess.releaseTime() < times[times.length - 1])) {
            throw new InvalidValueException("session " + name + ": releaseTime guess " + guess.releaseTime()
                    + " s is not before the last sample at " + times[times.length - 1] + " s");
        }
    }

    /**
     * The sample times.
     *
     * @return a copy of the times (s)
     */
    @Override
    public double[] times() {
        return times.clone();
    }

    /**
     * The measured angles.
     *
     * @return a copy of the angles (rad)
     */
    @Override
    public double[] angles() {
        return angles.clone();
    }

    /**
     * Returns a copy with other starting values.
     *
     * @param newGuess starting values of the nuisance parameters
     * @return the copy
     */
    public ReleaseSession withGuess(SessionGuess newGuess) {
        return new ReleaseSession(name, times, angles, newGuess);
    }

    /**
     * Returns a copy with other measured angles on the same times (a resampled record).
     *
     * @param newAngles measured angles (rad), as many as the times
     * @return the copy
     */
    public ReleaseSession withAngles(double[] newAngles) {
        return new ReleaseSession(name, times, newAngles, guess);
    }

    /**
     * Number of samples.
     *
     * @return the length of the record
     */
    public int size() {
        return times.length;
    }

    /** The times without a copy: callers in this package must not modify them. */
    double[] timesView() {
        return times;
    }

    /** The angles without a copy: callers in this package must not modify them. */
    double[] anglesView() {
        return angles;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof ReleaseSession s && name.equals(s.name)
                && Arrays.equals(times, s.times) && Arrays.equals(angles, s.angles)
                && guess.equals(s.guess);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, Arrays.hashCode(times), Arrays.hashCode(angles), guess);
    }

    @Override
    public String toString() {
        return "ReleaseSession[" + name + ", " + times.length + " samples, " + guess + "]";
    }
}
