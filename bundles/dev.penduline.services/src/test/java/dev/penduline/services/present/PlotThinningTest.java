package dev.penduline.services.present;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Thinning for drawing keeps the record's extremes, its ends and its time order. Every check is
 * made against the full array, searched by brute force in the test itself; the per-column rule
 * (first, lowest, highest, last of each pixel column) is the M4 aggregation of Jugel et al.,
 * PVLDB 7(10), 2014, which shows that a line through those four covers the same pixels.
 */
class PlotThinningTest {

    @Test
    void aShortRecordIsDrawnWhole() {
        double[] x = {0, 1, 2, 3, 4};
        double[] y = {3, 1, 4, 1, 5};
        PlotThinning.Points p = PlotThinning.keepExtremes(x, y, 10);
        assertArrayEquals(x, p.x());
        assertArrayEquals(y, p.y());
    }

    @Test
    void aLongSwingKeepsEveryPeakWithinTheLimit() {
        // A decaying swing of 100 000 samples, 1 kHz, period 1.3 s: its peaks are compared with
        // a brute-force search of the full record, run by run.
        int n = 100_000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 1e-3;
            y[i] = 20 * Math.exp(-0.02 * x[i]) * Math.cos(2 * Math.PI * x[i] / 1.3);
        }
        PlotThinning.Points p = PlotThinning.keepExtremes(x, y, 2000);
        assertTrue(p.size() <= 2000, "kept " + p.size());
        assertEquals(x[0], p.x()[0]);
        assertEquals(x[n - 1], p.x()[p.size() - 1]);
        for (int i = 1; i < p.size(); i++) {
            assertTrue(p.x()[i] > p.x()[i - 1], "time order broken at " + i);
        }
        assertEquals(Arrays.stream(y).max().orElseThrow(), Arrays.stream(p.y()).max().orElseThrow());
        assertEquals(Arrays.stream(y).min().orElseThrow(), Arrays.stream(p.y()).min().orElseThrow());
        // every peak of the full record (a sample above both neighbours) survives
        int peaks = 0;
        for (int i = 1; i < n - 1; i++) {
            if (y[i] > y[i - 1] && y[i] > y[i + 1]) {
                int at = Arrays.binarySearch(p.x(), x[i]);
                assertTrue(at >= 0, "the peak at " + x[i] + " s was dropped");
                peaks++;
            }
        }
        assertTrue(peaks > 70, "the test swing should have about 77 peaks, found " + peaks);
    }

    @Test
    void mismatchedArraysAreRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> PlotThinning.keepExtremes(new double[3], new double[2], 10));
    }

    @Test
    void perColumnKeepsTheFirstLowestHighestAndLastOfEveryColumn() {
        // random noise on uneven steps: the four samples of each column, found here by brute force
        Random random = new Random(20_261_203L);
        int n = 50_000;
        double[] x = new double[n];
        double[] y = new double[n];
        double t = 0;
        for (int i = 0; i < n; i++) {
            t += random.nextDouble() * 2e-3;
            x[i] = t;
            y[i] = random.nextGaussian();
        }
        double xMin = x[0];
        double xMax = x[n - 1];
        int columns = 300;
        PlotThinning.Points p = PlotThinning.perColumn(x, y, xMin, xMax, columns);
        assertTrue(p.size() <= 4 * columns, "kept " + p.size());
        for (int i = 1; i < p.size(); i++) {
            assertTrue(p.x()[i] >= p.x()[i - 1], "time order broken at " + i);
        }
        int checked = 0;
        for (int c = 0; c < columns; c++) {
            int first = -1;
            int last = -1;
            int lo = -1;
            int hi = -1;
            for (int i = 0; i < n; i++) {
                if (column(x[i], xMin, xMax, columns) != c) {
                    continue;
                }
                if (first < 0) {
                    first = i;
                    lo = i;
                    hi = i;
                }
                last = i;
                lo = y[i] < y[lo] ? i : lo;
                hi = y[i] > y[hi] ? i : hi;
            }
            if (first < 0) {
                continue;
            }
            for (int i : new int[] {first, lo, hi, last}) {
                assertTrue(kept(p, x[i], y[i]), "column " + c + " lost the sample at x = " + x[i]);
            }
            checked++;
        }
        assertTrue(checked > 290, "most columns hold samples, checked " + checked);
    }

    @Test
    void aLongDampedSineKeepsItsPeaksWithinFourPointsAColumn() {
        // 300 000 samples of a damped sine (10 kHz, 30 s, period 0.7 s), thinned to 800 columns
        int n = 300_000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 1e-4;
            y[i] = 40 * Math.exp(-0.05 * x[i]) * Math.sin(2 * Math.PI * x[i] / 0.7 + 0.3);
        }
        int columns = 800;
        double xMin = x[0];
        double xMax = x[n - 1];
        PlotThinning.Points p = PlotThinning.perColumn(x, y, xMin, xMax, columns);
        assertTrue(p.size() <= 3_200, "kept " + p.size());
        assertEquals(Arrays.stream(y).max().orElseThrow(), Arrays.stream(p.y()).max().orElseThrow());
        assertEquals(Arrays.stream(y).min().orElseThrow(), Arrays.stream(p.y()).min().orElseThrow());
        int turns = 0;
        for (int i = 1; i < n - 1; i++) {
            boolean peak = y[i] > y[i - 1] && y[i] >= y[i + 1];
            boolean trough = y[i] < y[i - 1] && y[i] <= y[i + 1];
            if (!peak && !trough) {
                continue;
            }
            turns++;
            int column = column(x[i], xMin, xMax, columns);
            double best = peak ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
            for (int k = 0; k < p.size(); k++) {
                if (column(p.x()[k], xMin, xMax, columns) == column) {
                    best = peak ? Math.max(best, p.y()[k]) : Math.min(best, p.y()[k]);
                }
            }
            if (peak) {
                assertTrue(best >= y[i], "the peak " + y[i] + " at " + x[i] + " s is lost from its column");
            } else {
                assertTrue(best <= y[i], "the trough " + y[i] + " at " + x[i] + " s is lost from its column");
            }
        }
        assertTrue(turns > 80, "30 s at 0.7 s a period has about 85 turning points, found " + turns);
    }

    @Test
    void perColumnDropsWhatLiesOutsideTheSpanAndKeepsAShortRecordWhole() {
        double[] x = {0, 1, 2, 3, 4, 5, 6};
        double[] y = {9, 1, Double.NaN, 3, 4, 5, -9};
        PlotThinning.Points p = PlotThinning.perColumn(x, y, 1, 5, 2);
        assertArrayEquals(new double[] {1, 3, 4, 5}, p.x());
        assertArrayEquals(new double[] {1, 3, 4, 5}, p.y());
    }

    @Test
    void perColumnRefusesWhatItCannotThin() {
        assertThrows(IllegalArgumentException.class,
                () -> PlotThinning.perColumn(new double[3], new double[2], 0, 1, 10));
        assertThrows(IllegalArgumentException.class,
                () -> PlotThinning.perColumn(new double[] {0, 2, 1}, new double[3], 0, 2, 10));
        assertThrows(IllegalArgumentException.class,
                () -> PlotThinning.perColumn(new double[3], new double[3], 1, 1, 10));
        assertThrows(IllegalArgumentException.class,
                () -> PlotThinning.perColumn(new double[3], new double[3], 0, 1, 0));
    }

    /** The pixel column of an abscissa: equal widths, the right edge in the last column. */
    private static int column(double x, double xMin, double xMax, int columns) {
        return Math.min(columns - 1, (int) ((x - xMin) * (columns / (xMax - xMin))));
    }

    private static boolean kept(PlotThinning.Points p, double x, double y) {
        for (int k = 0; k < p.size(); k++) {
            if (p.x()[k] == x && p.y()[k] == y) {
                return true;
            }
        }
        return false;
    }
}
