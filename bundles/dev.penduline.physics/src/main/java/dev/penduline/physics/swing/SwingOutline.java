package dev.penduline.physics.swing;

import java.util.List;

/**
 * What the turning-point search learned about a trimmed record.
 *
 * @param points       turning points in time order, the release (when from rest) first
 * @param period       period estimated from the spacing of the crossings (s), NaN with too few
 * @param settledFrom  index of the first sample of the settled tail, −1 when there is none
 * @param settledLevel median angle of the settled tail (rad), NaN when none
 * @param noiseBand    half-width of the band taken as "not moving" (rad)
 */
record SwingOutline(List<MeasuredTurningPoint> points, double period, int settledFrom, double settledLevel,
        double noiseBand) {
}
