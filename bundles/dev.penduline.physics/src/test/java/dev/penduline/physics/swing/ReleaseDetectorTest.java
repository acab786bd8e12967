package dev.penduline.physics.swing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class ReleaseDetectorTest {

    @Test
    void findsTheJoinOfALevelAndAParabolaThroughNoiseAndASpike() {
        // θ = L − a (t − tr)² after rest: the Taylor series of any motion released from rest (the equation of motion at ω = 0)
        final SplittableRandom random = new SplittableRandom(5);
        final double tr = 0.7321;
        final int n = 600;
        final double[] t = new double[n];
        final double[] theta = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i * 0.002;
            final double tau = Math.max(0, t[i] - tr);
            theta[i] = 0.3 - 2.0 * tau * tau + 1e-4 * random.nextGaussian();
        }
        theta[100] += 0.01; // a single spike in the still segment is not a release
        final Release r = new ReleaseDetector().detect(t, theta);
        assertEquals(tr, r.time(), 4 * r.uncertainty() + 1e-4);
        assertEquals(tr, r.time(), 2e-3);
        assertEquals(0.3, r.stillLevel(), 1e-4);
        assertEquals(1e-4, r.noise(), 3e-5);
    }

    @Test
    void aRecordThatStartsMovingHasNoStillSegment() {
        final double[] t = new double[200];
        final double[] theta = new double[200];
        for (int i = 0; i < t.length; i++) {
            t[i] = i * 0.01;
            theta[i] = 0.2 * Math.cos(4 * t[i] + 0.5);
        }
        final Release r = new ReleaseDetector().detect(t, theta);
        assertFalse(r.fromRest());
        assertEquals(0, r.index());
    }

    @Test
    void aRecordThatNeverMovesIsRefused() {
        final double[] t = new double[50];
        final double[] theta = new double[50];
        for (int i = 0; i < t.length; i++) {
            t[i] = i;
            theta[i] = 1.0;
        }
        assertThrows(IllegalArgumentException.class, () -> new ReleaseDetector().detect(t, theta));
    }
}
