package dev.penduline.physics.population;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.stat.descriptive.rank.Median;
import org.junit.jupiter.api.Test;

class PopulationStatisticsTest {

    /**
     * NIST/SEMATECH e-Handbook of Statistical Methods, §6.3.2.2, the individuals chart example
     * (values from memory): mean 50.81, MR̄ 1.8778, UCL 55.8041, LCL 45.8159.
     */
    @Test
    void individualsLimitsOfTheNistHandbookExample() {
        double[] x = {49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6, 52.4, 53.6, 52.1};
        PopulationStatistics s = PopulationStatistics.of(x);
        assertEquals(50.81, s.center(), 1e-9);
        assertEquals(1.8778, s.movingRange(), 5e-5);
        assertEquals(55.8041, s.ucl(), 5e-4);
        assertEquals(45.8159, s.lcl(), 5e-4);
        assertEquals(List.of(), s.beyondLimits());
    }

    /**
     * Montgomery, Introduction to Statistical Quality Control, 6th ed., Example 6.5, the loan
     * processing costs (values from memory): mean 300.5, MR̄ = 148/19 = 7.79, UCL 321.22, LCL 279.78.
     */
    @Test
    void individualsLimitsOfMontgomerysLoanCostExample() {
        double[] x = {310, 288, 297, 298, 307, 303, 294, 297, 308, 306, 294, 299, 297, 299, 314, 295, 293, 306, 301, 304};
        PopulationStatistics s = PopulationStatistics.of(x);
        assertEquals(300.5, s.center(), 1e-9);
        assertEquals(148.0 / 19, s.movingRange(), 1e-12);
        assertEquals(321.22, s.ucl(), 5e-3);
        assertEquals(279.78, s.lcl(), 5e-3);
        assertEquals(List.of(), s.beyondLimits());
    }

    /** A value far off is beyond the limits; its neighbours widen MR̄ but not enough to hide it. */
    @Test
    void aShiftedUnitIsBeyondTheLimits() {
        double[] x = {49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6, 52.4, 53.6, 52.1, 49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6,
            52.4, 53.6, 52.1, 75.0};
        PopulationStatistics s = PopulationStatistics.of(x);
        assertEquals(List.of(20), s.beyondLimits());
        assertTrue(s.ucl() < 75.0);
    }

    /**
     * Median and raw MAD by hand: 1 1 2 2 4 6 9 has median 2, absolute deviations 1 1 0 0 2 4 7,
     * whose median is 1 (the usual textbook example of the MAD); Hipparchus' own Median agrees.
     */
    @Test
    void medianAndMadByHand() {
        double[] x = {1, 1, 2, 2, 4, 6, 9};
        PopulationStatistics s = PopulationStatistics.of(x);
        assertEquals(2, s.median(), 0);
        assertEquals(1, s.mad(), 0);
        assertEquals(new Median().evaluate(x), s.median(), 0);
        double[] even = {4, 1, 3, 2};
        assertEquals(2.5, PopulationStatistics.of(even).median(), 0);
    }

    /**
     * R-7 percentiles by hand: for 1..10, h = (n − 1)·p: p05 at h = 0.45 is 1.45, p95 at h = 8.55
     * is 9.55 (R's default quantile type gives the same, from memory).
     */
    @Test
    void percentilesAreR7() {
        double[] x = {7, 3, 9, 1, 5, 10, 2, 8, 4, 6};
        PopulationStatistics s = PopulationStatistics.of(x);
        assertEquals(1.45, s.p05(), 1e-12);
        assertEquals(9.55, s.p95(), 1e-12);
    }

    /**
     * Modified z-score by hand (Iglewicz &amp; Hoaglin's rule, common practice): 10 11 12 13 14 100
     * has median 12.5 and MAD 1.5, so 100 scores 0.6745·87.5/1.5 = 39.35 (an outlier) and 10 scores
     * −1.124 (not).
     */
    @Test
    void modifiedZScoreFlagsTheFarValue() {
        double[] x = {10, 11, 12, 13, 14, 100};
        PopulationStatistics s = PopulationStatistics.of(x);
        assertEquals(1.5, s.mad(), 1e-12);
        assertEquals(0.6745 * 87.5 / 1.5, s.scores()[5], 1e-9);
        assertEquals(-0.6745 * 2.5 / 1.5, s.scores()[0], 1e-9);
        assertEquals(List.of(5), s.outliers());
    }

    @Test
    void aZeroMadFlagsNothingAndOneValueHasNoLimits() {
        PopulationStatistics same = PopulationStatistics.of(new double[] {3, 3, 3, 3, 8});
        assertEquals(0, same.mad(), 0);
        assertEquals(List.of(), same.outliers());
        assertTrue(Double.isNaN(same.scores()[4]));
        PopulationStatistics one = PopulationStatistics.of(new double[] {2});
        assertTrue(Double.isNaN(one.ucl()) && Double.isNaN(one.lcl()));
        assertEquals(2, one.median(), 0);
        assertThrows(IllegalArgumentException.class, () -> PopulationStatistics.of(new double[0]));
        assertThrows(IllegalArgumentException.class, () -> PopulationStatistics.of(new double[] {1, Double.NaN}));
    }
}
