package dev.penduline.physics.forecast;

import java.util.Optional;

import dev.penduline.physics.motion.SwingEnergy;

/**
 * What the swing after a release does. Angles are from the hanging equilibrium (rad), times
 * from release (s).
 *
 * @param settled             whether the swing enters the settle band for good within the
 *                            simulated time
 * @param settleTime          when it enters the band for good (s); 0 when it never leaves it; NaN
 *                            when it does not settle
 * @param halfSwings          half-swings begun before it settles (counted up to the end of the
 *                            simulated time when it does not settle)
 * @param restBand            the angles at which static friction can hold it
 * @param restAngle           where it comes to rest, or NaN when it is still moving at the end
 * @param peakAngularVelocity the largest |ω| (rad/s)
 * @param peakTime            when |ω| is largest (s)
 * @param peakAngle           the angle at that moment (rad)
 * @param maxOvershoot        the largest excursion past the equilibrium on the side away from
 *                            the release (rad, ≥ 0); 0 when it never crosses
 * @param pass                the first passage through the chosen angle, when asked and reached
 * @param energy              the energy account up to the end of the simulated time
 * @param simulatedTime       how long was simulated (s)
 * @param note                why it does not settle, or empty
 */
public record SwingForecast(boolean settled, double settleTime, int halfSwings, RestBand restBand, double restAngle,
        double peakAngularVelocity, double peakTime, double peakAngle, double maxOvershoot, Optional<AnglePass> pass,
        SwingEnergy energy, double simulatedTime, String note) {
}
