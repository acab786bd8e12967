package dev.penduline.physics.swing;

import java.util.Arrays;
import java.util.List;

import dev.penduline.physics.InvalidValueException;

/**
 * Estimates the equilibrium reading from the turning points and, failing those, from a settled
 * tail.
 *
 * <p>Why symmetry first: for turning points {@code p_i = θeq ± A_i} of alternating sign, the
 * midpoint of a half-swing is {@code θeq ± (A_i − A_{i+1})/2}, off by half the decrement with
 * a sign that alternates; with dry friction this is the familiar centre shift ±Tc/K of each
 * half-swing (Den Hartog, Mechanical Vibrations, "Coulomb damping"). The weighted run
 * {@code (p_i + 2 p_{i+1} + p_{i+2})/4 = θeq ± (A_i − 2 A_{i+1} + A_{i+2})/4} leaves only the
 * second difference of the amplitudes: zero for a constant (Coulomb) decrement and
 * second-order small for a geometric (viscous) one. The median over the record is used.
 *
 * <p>Why not the rest angle: a body held by stiction stops anywhere within
 * {@code ±asin(Ts/K)} of the equilibrium; its rest angle says where friction held it, not
 * where gravity would. The stop enters a run only as the reversal it is: the end of a half-swing
 * of about the usual length after a listed reversal. A run across a gap (a small last half-swing
 * that the turning-point search did not list) is left out, so the rest cannot pull the estimate.
 */
final class ZeroOffsetEstimator {

    private ZeroOffsetEstimator() {
    }

    static ZeroOffset estimate(List<MeasuredTurningPoint> points, double settledLevel, double noise) {
        final int n = points.size();
        final double[] runs = runs(points);
        if (runs.length > 0) {
            final double value = RobustStatistics.median(runs, 0, runs.length);
            final double spread = runs.length >= 3
                    ? RobustStatistics.MAD_TO_SIGMA * RobustStatistics.mad(runs, 0, runs.length, value)
                    : Math.abs(runs[0] - runs[runs.length - 1]) / 2;
            // the median's standard error is about 1.25 σ/√n for Gaussian scatter
            final double uncertainty = Math.max(1.2533 * spread / Math.sqrt(runs.length), noise / Math.sqrt(n));
            String note = "from the symmetry of " + n + " turning points ((p0 + 2 p1 + p2)/4 over "
                    + runs.length + " runs of consecutive half-swings, which cancels the alternating dry-friction"
                    + " shift)";
            if (Double.isFinite(settledLevel)) {
                note += "; the body settled at " + RobustStatistics.degrees(settledLevel) + ", "
                        + RobustStatistics.degrees(settledLevel - value)
                        + " from it: with dry friction or stiction the rest angle is not the equilibrium";
            }
            return new ZeroOffset(value, uncertainty, ZeroOffset.Method.SWING_SYMMETRY, note);
        }
        if (Double.isFinite(settledLevel)) {
            return new ZeroOffset(settledLevel, Double.NaN, ZeroOffset.Method.SETTLED_TAIL,
                    "from the settled tail, too few turning points for the symmetry estimate; with dry friction"
                            + " or stiction the body rests anywhere within ±Ts/K of the equilibrium, so this may be"
                            + " off by up to that dead band");
        }
        if (n == 2) {
            final double value = 0.5 * (points.get(0).angle() + points.get(1).angle());
            final double bias = 0.5 * Math.abs(points.get(0).angle() - points.get(1).angle());
            return new ZeroOffset(value, Double.NaN, ZeroOffset.Method.SINGLE_HALF_SWING,
                    "midpoint of the only half-swing, biased by half its decrement (the half-swing spans "
                            + RobustStatistics.degrees(2 * bias) + ")");
        }
        throw new InvalidValueException("a single turning point and no settled tail: the equilibrium cannot"
                + " be estimated from this record");
    }

    /**
     * The runs (p0 + 2 p1 + p2)/4 of three turning points whose two half-swings both last about
     * as long as the median half-swing (within a quarter of it). A run across a gap, where a
     * small half-swing went unseen, or one that ends at a rest not reached by a half-swing of its
     * own, is left out: its points are not consecutive reversals and would pull the estimate.
     */
    private static double[] runs(List<MeasuredTurningPoint> points) {
        final int n = points.size();
        if (n < 3) {
            return new double[0];
        }
        final double[] durations = new double[n - 1];
        for (int i = 0; i + 1 < n; i++) {
            durations[i] = points.get(i + 1).time() - points.get(i).time();
        }
        final double typical = RobustStatistics.median(durations, 0, durations.length);
        final double[] runs = new double[n - 2];
        int count = 0;
        for (int i = 0; i + 2 < n; i++) {
            if (Math.abs(durations[i] / typical - 1) <= 0.25 && Math.abs(durations[i + 1] / typical - 1) <= 0.25) {
                runs[count++] = 0.25 * (points.get(i).angle() + 2 * points.get(i + 1).angle()
                        + points.get(i + 2).angle());
            }
        }
        return Arrays.copyOf(runs, count);
    }
}
