package dev.penduline.physics.forecast;

import java.util.Arrays;

import org.hipparchus.stat.descriptive.rank.Percentile;

/**
 * A predicted figure with its band: the nominal value (from the best estimates) and the
 * {@value #LOW_PERCENT}th and {@value #HIGH_PERCENT}th percentiles of the same figure over the
 * drawn parameter sets.
 *
 * @param value   the nominal figure
 * @param low     the {@value #LOW_PERCENT}th percentile over the draws, NaN when none is finite
 * @param high    the {@value #HIGH_PERCENT}th percentile over the draws, NaN when none is finite
 * @param counted how many draws gave a finite figure
 */
public record FigureBand(double value, double low, double high, int counted) {

    /** Lower percentile of a band. */
    public static final double LOW_PERCENT = 5;
    /** Upper percentile of a band. */
    public static final double HIGH_PERCENT = 95;

    /**
     * The band of a figure over the draws; draws where the figure is not finite (a draw that
     * does not settle, say) are left out and not counted.
     *
     * @param value the nominal figure
     * @param draws the figure for each draw
     * @return the band
     */
    public static FigureBand of(double value, double[] draws) {
        final double[] finite = Arrays.stream(draws).filter(Double::isFinite).toArray();
        if (finite.length == 0) {
            return new FigureBand(value, Double.NaN, Double.NaN, 0);
        }
        final Percentile p = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        p.setData(finite);
        return new FigureBand(value, p.evaluate(LOW_PERCENT), p.evaluate(HIGH_PERCENT), finite.length);
    }
}
