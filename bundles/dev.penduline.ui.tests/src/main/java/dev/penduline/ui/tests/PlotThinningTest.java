package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.junit.jupiter.api.Test;

import dev.penduline.ui.internal.chart.PlotThinning;

/** Thinning for drawing keeps the record's extremes, its ends and its time order. */
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
}
