package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The thinning rule of long records, against figures worked out by hand from the rule. */
class FitDecimationTest {

    @Test
    void shortRecordsAreLeftWhole() {
        assertEquals(1, FitDecimation.stride(100_000, 100_000, 100, 1.6));
        double[] v = {1, 2, 3};
        assertSame(v, FitDecimation.keep(v, 1));
    }

    @Test
    void aMillionSamplesAtOneKilohertzKeepEveryTenth() {
        // 1 000 001 samples over 1000 s: ceil(1 000 001 / 100 000) = 11 would be needed for the target
        // by count; 1.6 s periods hold 1600 samples, so 32 is allowed: 11 it is (worked by hand)
        assertEquals(11, FitDecimation.stride(1_000_001, 1_000_001, 1000, 1.6));
        assertEquals(10, FitDecimation.stride(1_000_000, 1_000_000, 999.999, 1.6));
    }

    @Test
    void neverFewerThanFiftySamplesPerPeriod() {
        // 5 000 000 samples at 1 kHz, a 0.5 s period: 500 samples per period allow at most 10,
        // though the target would want 50 (worked by hand)
        int k = FitDecimation.stride(5_000_000, 5_000_000, 4999.999, 0.5);
        assertEquals(10, k);
        assertTrue(0.5 * 1000 / k >= FitDecimation.MIN_SAMPLES_PER_PERIOD);
        // a session already coarse is not thinned, whatever the total
        assertEquals(1, FitDecimation.stride(5_000_000, 1000, 100, 1.0));
    }

    @Test
    void keepsEveryKthFromTheFirst() {
        assertArrayEquals(new double[] {0, 3, 6, 9}, FitDecimation.keep(new double[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9}, 3));
        FitDecimation.Thinning t = new FitDecimation.Thinning("r", 10, 4, 3);
        assertTrue(t.note().contains("decimated from 10 to 4 samples (every 3rd sample kept)"), t.note());
    }
}
