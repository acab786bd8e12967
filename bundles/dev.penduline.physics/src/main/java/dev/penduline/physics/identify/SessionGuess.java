package dev.penduline.physics.identify;

import dev.penduline.physics.InvalidValueException;

/**
 * Starting values for the nuisance parameters of one release, usually from the release
 * detector and the zero-offset estimate of the swing analysis.
 *
 * @param releaseAngle θ0, the angle at release measured from the hanging equilibrium (rad),
 *                     non-zero, |θ0| &lt; π
 * @param releaseTime  t_r, the release instant on the record's time base (s)
 * @param offset       the sensor's reading at the hanging equilibrium (rad)
 */
public record SessionGuess(double releaseAngle, double releaseTime, double offset) {

    /**
     * Checks that the guesses are finite and the release angle usable.
     *
     * @throws IllegalArgumentException naming the offending field and value
     */
    public SessionGuess {
        if (!Double.isFinite(releaseAngle) || releaseAngle == 0 || Math.abs(releaseAngle) >= Math.PI) {
            throw new InvalidValueException("releaseAngle must be finite, non-zero and within ±π rad, got "
                    + releaseAngle + " rad");
        }
        if (!Double.isFinite(releaseTime)) {
            throw new InvalidValueException("releaseTime must be a finite number of seconds, got " + releaseTime);
        }
        if (!Double.isFinite(offset)) {
            throw new InvalidValueException("offset must be a finite number of radians, got " + offset);
        }
    }
}
