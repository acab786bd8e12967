package dev.penduline.physics.swing;

/**
 * One full cycle, from a turning point to the next-but-one on the same side.
 *
 * @param index              0 for the cycle that starts at the release
 * @param startTime          start, in the record's time base (s)
 * @param period             measured period (s)
 * @param amplitude          cycle amplitude {@code (A0 + 2 A1 + A2)/4} (rad)
 * @param decrement          amplitude lost over the cycle, {@code A0 − A2} (rad)
 * @param predictedPeriod    undamped large-amplitude period of the mechanism at this amplitude,
 *                           {@code 4 sqrt(J0/(m g Lc)) K(sin(A/2))} (s); NaN when the mechanism is
 *                           unknown
 * @param relativeDifference measured / predicted − 1 (dimensionless); NaN when unknown
 */
public record SwingCycle(int index, double startTime, double period, double amplitude, double decrement,
        double predictedPeriod, double relativeDifference) {
}
