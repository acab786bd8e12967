package dev.penduline.physics.population;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.stat.descriptive.moment.Mean;
import org.hipparchus.stat.descriptive.rank.Percentile;
import org.hipparchus.stat.descriptive.rank.Percentile.EstimationType;

import dev.penduline.physics.InvalidValueException;

/**
 * The statistics of one quantity over a population of units, taken in the units' order.
 *
 * <ul>
 * <li><b>Median</b>, <b>p05</b>, <b>p95</b>: Hipparchus' {@link Percentile} with estimation type
 * {@link EstimationType#R_7} (linear interpolation between the order statistics at
 * {@code (n − 1)·p}, the default of R and of spreadsheets' {@code PERCENTILE.INC}); the median is
 * its 50th percentile, the usual middle value (mean of the two middle ones for an even count).</li>
 * <li><b>MAD</b>: the raw median absolute deviation, {@code median(|xᵢ − median|)}, not scaled
 * by 1.4826 (the factor that makes it estimate σ of a normal population).</li>
 * <li><b>Robust score</b>: the modified z-score {@code 0.6745·(x − median)/MAD}; a unit is an
 * outlier when {@code |score| > 3.5} (Iglewicz &amp; Hoaglin, "How to Detect and Handle
 * Outliers", ASQC 1993 — common practice). With a MAD of zero (more than half the values equal)
 * no score is defined and no unit is called an outlier.</li>
 * <li><b>Individuals chart</b> (Shewhart's chart of individual values with the moving range of
 * two): center = mean, {@code MR̄} = mean of {@code |xᵢ − xᵢ₋₁|} over neighbours in order,
 * {@code UCL/LCL = center ± 3·MR̄/d₂} with {@code d₂ = 1.128} for a range of two; a unit beyond
 * them lies strictly above the UCL or below the LCL. With fewer than two values there is no
 * moving range and the limits are NaN.</li>
 * </ul>
 *
 * @param count        how many values
 * @param median       the median
 * @param mad          the raw median absolute deviation (not scaled)
 * @param p05          the 5th percentile
 * @param p95          the 95th percentile
 * @param center       the individuals chart's center line: the mean
 * @param movingRange  the mean moving range MR̄ (NaN with fewer than two values)
 * @param lcl          the lower control limit (NaN with fewer than two values)
 * @param ucl          the upper control limit (NaN with fewer than two values)
 * @param scores       each value's modified z-score, in order (NaN when the MAD is zero)
 * @param outliers     the indices whose |score| exceeds {@link #OUTLIER_SCORE}
 * @param beyondLimits the indices above the UCL or below the LCL
 */
public record PopulationStatistics(int count, double median, double mad, double p05, double p95, double center,
        double movingRange, double lcl, double ucl, double[] scores, List<Integer> outliers, List<Integer> beyondLimits) {

    /** d₂ for a moving range of two neighbours (the expected range of two normal values in σ). */
    public static final double D2 = 1.128;

    /** The factor of the modified z-score: the 0.75 quantile of the standard normal distribution. */
    public static final double SCORE_FACTOR = 0.6745;

    /** |modified z-score| above which a value is called an outlier. */
    public static final double OUTLIER_SCORE = 3.5;

    /** Copies the arrays and lists. */
    public PopulationStatistics {
        scores = scores.clone();
        outliers = List.copyOf(outliers);
        beyondLimits = List.copyOf(beyondLimits);
    }

    /**
     * The statistics of values in the units' order.
     *
     * @param values the values (finite), in order; at least one
     * @return the statistics
     * @throws IllegalArgumentException when there is no value or one is not finite
     */
    public static PopulationStatistics of(double[] values) {
        if (values.length == 0) {
            throw new InvalidValueException("no values");
        }
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new InvalidValueException("a value is not finite: " + v);
            }
        }
        double median = percentile(values, 50);
        double[] deviations = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            deviations[i] = Math.abs(values[i] - median);
        }
        double mad = percentile(deviations, 50);
        double[] scores = new double[values.length];
        List<Integer> outliers = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            scores[i] = mad > 0 ? SCORE_FACTOR * (values[i] - median) / mad : Double.NaN;
            if (Math.abs(scores[i]) > OUTLIER_SCORE) {
                outliers.add(i);
            }
        }
        double center = new Mean().evaluate(values);
        double movingRange = Double.NaN;
        double lcl = Double.NaN;
        double ucl = Double.NaN;
        List<Integer> beyond = new ArrayList<>();
        if (values.length > 1) {
            double sum = 0;
            for (int i = 1; i < values.length; i++) {
                sum += Math.abs(values[i] - values[i - 1]);
            }
            movingRange = sum / (values.length - 1);
            ucl = center + 3 * movingRange / D2;
            lcl = center - 3 * movingRange / D2;
            for (int i = 0; i < values.length; i++) {
                if (values[i] > ucl || values[i] < lcl) {
                    beyond.add(i);
                }
            }
        }
        return new PopulationStatistics(values.length, median, mad, percentile(values, 5), percentile(values, 95), center,
                movingRange, lcl, ucl, scores, outliers, beyond);
    }

    /**
     * A percentile by Hipparchus' R-7 estimate.
     *
     * @param values the values
     * @param p      the percentile, above 0 and at most 100
     * @return the estimate
     */
    public static double percentile(double[] values, double p) {
        return new Percentile(p).withEstimationType(EstimationType.R_7).evaluate(values);
    }
}
