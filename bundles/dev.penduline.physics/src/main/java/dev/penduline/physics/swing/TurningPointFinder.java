package dev.penduline.physics.swing;

import java.util.ArrayList;
import java.util.List;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.swing.MeasuredTurningPoint.Kind;

/**
 * Finds the turning points of a trimmed record, one per half-swing.
 *
 * <p>The record is cut into sides by hysteresis crossings of its centre (a crossing counts only
 * once the angle is farther than a noise band past the centre), so noise and encoder flicker
 * cannot make extra turning points: between two crossings lies exactly one extremum. It is
 * located at the largest sample and refined by a least-squares quadratic over ±1/12 of a period
 * (±30° of phase), re-centred until the vertex sits near the middle. A parabola fitted to a
 * cosine peak over ±30° reads it about 3·10⁻⁴ of the amplitude low (the x⁴ term of the cosine
 * projects onto the constant: −(3/35)·X⁴/24 for a window ±X); the same fit is therefore made to
 * a unit cosine of the estimated period on the same sample times, and the amplitude about the
 * centre is divided by what that fit reads. An encoder's flat top is thus one point at
 * the vertex of the parabola through the steps on both sides, not many points.
 */
final class TurningPointFinder {

    private TurningPointFinder() {
    }

    static SwingOutline find(double[] t, double[] theta, Release release) {
        final int n = t.length;
        final double band = 4 * release.noise() + 2 * release.quantum();
        final double start = release.fromRest() ? release.stillLevel() : theta[0];
        double centre = RobustStatistics.median(theta, 0, n);
        double hysteresis = 1.5 * band + 0.002 * Math.abs(start - centre);
        List<Integer> crossings = crossings(theta, centre, hysteresis, start);
        if (crossings.isEmpty()) {
            throw new InvalidValueException("the angle never swings through its centre (" + RobustStatistics.degrees(centre)
                    + ") by more than the noise band " + RobustStatistics.degrees(hysteresis) + ": no swing to analyse");
        }
        double period = period(t, crossings);
        // with a single crossing, the first comes about a quarter period after the release
        final double rough = Double.isFinite(period) ? period : 4 * (t[crossings.get(0)] - t[0]);
        final StopFinder.Stop stop = StopFinder.find(t, theta, release.quantum(), rough);
        if (stop != null && stop.index() > 0) {
            centre = RobustStatistics.median(theta, 0, stop.index());
            hysteresis = 1.5 * band + 0.002 * Math.abs(start - centre);
            crossings = crossings(theta, centre, hysteresis, start);
            period = period(t, crossings);
        }
        final List<MeasuredTurningPoint> points = new ArrayList<>();
        final double halfWindow = Double.isFinite(period) ? period / 12 : 5 * RobustStatistics.medianStep(t);
        if (release.fromRest()) {
            points.add(new MeasuredTurningPoint(release.time(), release.stillLevel(), Double.NaN, Kind.RELEASE));
        } else {
            final double side = Math.signum(start - centre);
            final int first = crossings.isEmpty() ? n : crossings.get(0);
            final int idx = argExtreme(theta, 0, first, side);
            if (idx > 0) {
                points.add(refine(t, theta, idx, side, halfWindow, 0, first, release.quantum(), period, centre));
            }
        }
        for (int k = 0; k < crossings.size(); k++) {
            final int from = crossings.get(k);
            final boolean last = k + 1 == crossings.size();
            final int to = last ? n : crossings.get(k + 1);
            final double side = Math.signum(theta[from] - centre);
            final int idx = argExtreme(theta, from, to, side);
            if (stop != null && t[idx] > stop.time() - 0.25 * rough) {
                // the extreme lies in the final arrival or the rest: the stop takes its place
                break;
            }
            if (last && stop == null && !reverses(theta, idx, side, band)) {
                break;
            }
            points.add(refine(t, theta, idx, side, halfWindow, from, to, release.quantum(), period, centre));
        }
        if (stop != null) {
            final MeasuredTurningPoint lastListed = points.isEmpty() ? null : points.get(points.size() - 1);
            if (lastListed == null || lastListed.time() < stop.previousTime() - rough / 8) {
                // the last half-swing was too small for the crossings: the stop search found its start
                points.add(new MeasuredTurningPoint(stop.previousTime(), stop.previousAngle(), Double.NaN,
                        Kind.REVERSAL));
            }
            points.add(new MeasuredTurningPoint(stop.time(), stop.level(), Double.NaN, Kind.STOP));
        }
        return new SwingOutline(points, period, stop, band);
    }

    /** Indices where the angle passes beyond centre ± h on the side opposite to the last one. */
    private static List<Integer> crossings(double[] theta, double centre, double h, double start) {
        final List<Integer> out = new ArrayList<>();
        double state = Math.signum(start - centre);
        for (int i = 0; i < theta.length; i++) {
            final double d = theta[i] - centre;
            if (state >= 0 && d < -h) {
                state = -1;
                out.add(i);
            } else if (state <= 0 && d > h) {
                state = 1;
                out.add(i);
            }
        }
        return out;
    }

    private static double period(double[] t, List<Integer> crossings) {
        if (crossings.size() < 2) {
            return Double.NaN;
        }
        final double[] half = new double[crossings.size() - 1];
        for (int k = 1; k < crossings.size(); k++) {
            half[k - 1] = t[crossings.get(k)] - t[crossings.get(k - 1)];
        }
        return 2 * RobustStatistics.medianInPlace(half);
    }

    private static int argExtreme(double[] theta, int from, int to, double side) {
        int best = from;
        for (int i = from; i < to; i++) {
            if (side * theta[i] > side * theta[best]) {
                best = i;
            }
        }
        return best;
    }

    private static boolean reverses(double[] theta, int idx, double side, double band) {
        for (int j = idx + 1; j < theta.length; j++) {
            if (side * (theta[idx] - theta[j]) > band) {
                return true;
            }
        }
        return false;
    }

    static MeasuredTurningPoint refine(double[] t, double[] theta, int idx, double side, double halfWindow,
            int segFrom, int segTo, double quantum, double period, double centre) {
        for (double hw = halfWindow; hw <= 2.01 * halfWindow; hw *= 2) {
            final MeasuredTurningPoint p = vertex(t, theta, idx, side, hw, segFrom, segTo);
            if (p != null) {
                if (!Double.isFinite(period)) {
                    return p;
                }
                final double reading = cosineReading(t, p.time(), hw, 2 * Math.PI / period);
                return reading > 0.9 && reading <= 1
                        ? new MeasuredTurningPoint(p.time(), centre + (p.angle() - centre) / reading, Double.NaN,
                                p.kind())
                        : p;
            }
        }
        return plateauCentre(t, theta, idx, side, quantum);
    }

    private static MeasuredTurningPoint vertex(double[] t, double[] theta, int idx, double side, double hw,
            int segFrom, int segTo) {
        final LocalPolynomial fit = new LocalPolynomial(2);
        double centre = t[idx];
        for (int iter = 0; iter < 5; iter++) {
            int from = lowerIndex(t, centre - hw);
            int to = lowerIndex(t, centre + hw) + 1;
            while (to - from < 5 && (from > 0 || to < t.length)) {
                from = Math.max(0, from - 1);
                to = Math.min(t.length, to + 1);
            }
            if (to - from < 3 || !fit.fit(t, theta, from, to, centre, hw)) {
                return null;
            }
            final double curvature = fit.curvature();
            if (!(side * curvature < 0)) {
                return null;
            }
            final double shift = -fit.slope() / curvature;
            final double vertexAngle = fit.value() + 0.5 * fit.slope() * shift;
            if (Math.abs(shift) < 0.2 * hw) {
                final double time = centre + shift;
                if (time < t[Math.max(0, segFrom - 1)] || time > t[Math.min(t.length - 1, segTo)]) {
                    return null;
                }
                return new MeasuredTurningPoint(time, vertexAngle, Double.NaN, Kind.REVERSAL);
            }
            centre = Math.max(t[segFrom], Math.min(t[segTo - 1], centre + shift));
        }
        return null;
    }

    /** What the vertex fit reads for a unit cosine peaking at {@code peak}, on the same samples. */
    private static double cosineReading(double[] t, double peak, double hw, double omega) {
        int from = lowerIndex(t, peak - hw);
        int to = lowerIndex(t, peak + hw) + 1;
        while (to - from < 5 && (from > 0 || to < t.length)) {
            from = Math.max(0, from - 1);
            to = Math.min(t.length, to + 1);
        }
        final double[] unit = new double[to - from];
        final double[] times = new double[to - from];
        for (int j = from; j < to; j++) {
            times[j - from] = t[j];
            unit[j - from] = Math.cos(omega * (t[j] - peak));
        }
        final LocalPolynomial fit = new LocalPolynomial(2);
        if (!fit.fit(times, unit, 0, unit.length, peak, hw) || !(fit.curvature() < 0)) {
            return Double.NaN;
        }
        final double shift = -fit.slope() / fit.curvature();
        return fit.value() + 0.5 * fit.slope() * shift;
    }

    /** Last index with t[i] ≤ time (0 when none). */
    static int lowerIndex(double[] t, double time) {
        int lo = 0;
        int hi = t.length - 1;
        if (t[0] > time) {
            return 0;
        }
        while (lo < hi) {
            final int mid = (lo + hi + 1) >>> 1;
            if (t[mid] <= time) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    private static MeasuredTurningPoint plateauCentre(double[] t, double[] theta, int idx, double side,
            double quantum) {
        final double tolerance = 0.5 * quantum;
        int a = idx;
        int b = idx;
        while (a > 0 && side * (theta[idx] - theta[a - 1]) <= tolerance) {
            a--;
        }
        while (b + 1 < theta.length && side * (theta[idx] - theta[b + 1]) <= tolerance) {
            b++;
        }
        return new MeasuredTurningPoint(0.5 * (t[a] + t[b]), theta[idx], Double.NaN, Kind.REVERSAL);
    }
}
