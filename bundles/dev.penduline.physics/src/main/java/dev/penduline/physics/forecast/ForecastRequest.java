package dev.penduline.physics.forecast;

import dev.penduline.physics.InvalidValueException;

/**
 * What to forecast: the release and the questions asked about the swing that follows.
 *
 * @param releaseAngle    release angle from the hanging equilibrium (rad), finite
 * @param releaseVelocity angular velocity at release (rad/s), finite
 * @param band            half-width of the settle band about the equilibrium (rad), &gt; 0
 * @param passAngle       the angle from the equilibrium whose first passage is reported (rad), or
 *                        NaN for none
 * @param radius          distance from the pivot axis of the point whose speed is reported at
 *                        the passage (m), ≥ 0, or NaN for none
 */
public record ForecastRequest(double releaseAngle, double releaseVelocity, double band, double passAngle, double radius) {

    /**
     * Checks the request.
     *
     * @throws IllegalArgumentException naming the field that is out of range
     */
    public ForecastRequest {
        if (!Double.isFinite(releaseAngle)) {
            throw new InvalidValueException("releaseAngle must be finite, got " + releaseAngle);
        }
        if (!Double.isFinite(releaseVelocity)) {
            throw new InvalidValueException("releaseVelocity must be finite, got " + releaseVelocity);
        }
        if (!(band > 0) || Double.isInfinite(band)) {
            throw new InvalidValueException("band must be a finite angle > 0 rad, got " + band);
        }
        if (Double.isInfinite(passAngle)) {
            throw new InvalidValueException("passAngle must be finite or NaN, got " + passAngle);
        }
        if (!Double.isNaN(radius) && (!(radius >= 0) || Double.isInfinite(radius))) {
            throw new InvalidValueException("radius must be a finite distance >= 0 m or NaN, got " + radius);
        }
    }

    /**
     * A release from rest with no passage asked for.
     *
     * @param releaseAngle release angle from the hanging equilibrium (rad)
     * @param band         half-width of the settle band (rad)
     * @return the request
     */
    public static ForecastRequest fromRest(double releaseAngle, double band) {
        return new ForecastRequest(releaseAngle, 0, band, Double.NaN, Double.NaN);
    }
}
