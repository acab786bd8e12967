package dev.penduline.physics.swing;

import java.util.List;

/**
 * What the turning-point search learned about a trimmed record.
 *
 * @param points    turning points in time order, the release (when from rest) first, the stop
 *                  (when the body came to rest) last
 * @param period    period estimated from the spacing of the crossings (s), NaN with too few
 * @param stop      where the body came to rest for good, null when it is still moving at the end
 * @param noiseBand half-width of the band taken as "not moving" (rad)
 */
record SwingOutline(List<MeasuredTurningPoint> points, double period, StopFinder.Stop stop, double noiseBand) {

    /**
     * Index of the first sample at or after the stop.
     *
     * @return the index, −1 when the record does not settle
     */
    int settledFrom() {
        return stop == null ? -1 : stop.index();
    }

    /**
     * The rest reading.
     *
     * @return angle in the sensor's frame (rad), NaN when not settled
     */
    double settledLevel() {
        return stop == null ? Double.NaN : stop.level();
    }
}
