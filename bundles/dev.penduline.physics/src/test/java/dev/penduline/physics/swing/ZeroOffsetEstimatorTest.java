package dev.penduline.physics.swing;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.swing.MeasuredTurningPoint.Kind;

/**
 * The equilibrium from the symmetry of the swings, on the closed-form turning points of a
 * Coulomb-damped oscillator (Den Hartog, Mechanical Vibrations, "Coulomb damping"): each
 * half-swing is harmonic about a centre shifted by ±Tc/K towards where it started, so the
 * amplitude falls by 2 Tc/K per half-swing and the turning points alternate about the
 * equilibrium without being symmetric about it.
 */
class ZeroOffsetEstimatorTest {

    private static final double EQUILIBRIUM = 0.05;
    /** Tc/K (rad). */
    private static final double SHIFT = 0.004;
    private static final double HALF_PERIOD = 0.6;

    /** Release at +0.1 rad from the equilibrium, then {@code reversals} turning points. */
    private static List<MeasuredTurningPoint> coulomb(int reversals) {
        final List<MeasuredTurningPoint> points = new ArrayList<>();
        double x = 0.1;
        points.add(new MeasuredTurningPoint(0, EQUILIBRIUM + x, Double.NaN, Kind.RELEASE));
        for (int i = 1; i <= reversals; i++) {
            x = -(x - Math.signum(x) * 2 * SHIFT);
            points.add(new MeasuredTurningPoint(i * HALF_PERIOD, EQUILIBRIUM + x, Double.NaN, Kind.REVERSAL));
        }
        return points;
    }

    @Test
    void theWeightedRunsCancelTheDryFrictionShift() {
        final ZeroOffset offset = ZeroOffsetEstimator.estimate(coulomb(6), Double.NaN, 1e-5);
        // Den Hartog's turning points: (p0 + 2 p1 + p2)/4 is the equilibrium exactly
        assertEquals(EQUILIBRIUM, offset.value(), 1e-12);
        assertEquals(ZeroOffset.Method.SWING_SYMMETRY, offset.method());
    }

    @Test
    void aStopAtTheNextReversalCountsAsOne() {
        final List<MeasuredTurningPoint> points = coulomb(2);
        final double x2 = points.get(2).angle() - EQUILIBRIUM;
        final double x3 = -(x2 - Math.signum(x2) * 2 * SHIFT);
        points.add(new MeasuredTurningPoint(3 * HALF_PERIOD, EQUILIBRIUM + x3, Double.NaN, Kind.STOP));
        // the body stuck where the next reversal of Den Hartog's sequence falls: a run like the others
        assertEquals(EQUILIBRIUM, ZeroOffsetEstimator.estimate(points, EQUILIBRIUM + x3, 1e-5).value(), 1e-12);
    }

    @Test
    void aRestAfterUnlistedHalfSwingsDoesNotPullTheEquilibrium() {
        final List<MeasuredTurningPoint> points = coulomb(2);
        // two small half-swings went unlisted, then the body rested 0.03 rad out: the rest is no reversal of
        // the listed sequence; with it the run (p1 + 2 p2 + rest)/4 reads 0.0265 rad off, and the median of the two
        // runs 0.013 rad
        points.add(new MeasuredTurningPoint(5 * HALF_PERIOD, EQUILIBRIUM + 0.03, Double.NaN, Kind.STOP));
        final ZeroOffset offset = ZeroOffsetEstimator.estimate(points, EQUILIBRIUM + 0.03, 1e-5);
        assertEquals(EQUILIBRIUM, offset.value(), 1e-12);
        assertEquals(ZeroOffset.Method.SWING_SYMMETRY, offset.method());
    }
}
