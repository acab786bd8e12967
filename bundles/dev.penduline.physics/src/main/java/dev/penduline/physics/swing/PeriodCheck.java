package dev.penduline.physics.swing;

/**
 * The measured period set beside the mechanism's, so that a wrong inertia shows before any fit.
 *
 * <p>The measured small-angle period is each cycle's period divided by the large-amplitude
 * factor {@code 2 K(sin(A/2))/π}, then the median. Light damping lengthens the period by
 * {@code 1/sqrt(1 − ζ²)}, under 0.01 % for ζ &lt; 0.014, and dry friction not at all (each
 * half-swing is a cosine of the undamped frequency), so a larger difference points at the
 * inertia or the centroid distance.
 *
 * @param measuredSmallAnglePeriod  T0 from the record (s); NaN without a full cycle
 * @param predictedSmallAnglePeriod 2π sqrt(J0/(m g Lc)) of the mechanism (s); NaN when unknown
 * @param medianRelativeDifference  median over the cycles of measured/predicted − 1; NaN when
 *                                  unknown
 * @param impliedPivotInertia       the J0 that would give the measured period, since T ∝ sqrt(J0)
 *                                  (kg·m²); NaN when unknown
 */
public record PeriodCheck(double measuredSmallAnglePeriod, double predictedSmallAnglePeriod,
        double medianRelativeDifference, double impliedPivotInertia) {
}
