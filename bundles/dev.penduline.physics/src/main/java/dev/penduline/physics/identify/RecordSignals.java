package dev.penduline.physics.identify;

import java.util.Arrays;

/**
 * Small statistics of records and residuals that steer the fit and its verdicts.
 */
final class RecordSignals {

    private RecordSignals() {
    }

    /**
     * Lag-1 autocorrelation of a series about its mean, {@code Σ r_i r_(i+1) / Σ r_i²}
     * (Box &amp; Jenkins, Time Series Analysis, the sample autocorrelation).
     */
    static double lag1(double[] r, int from, int to) {
        final int n = to - from;
        if (n < 3) {
            return 0;
        }
        double mean = 0;
        for (int i = from; i < to; i++) {
            mean += r[i];
        }
        mean /= n;
        double num = 0;
        double den = 0;
        for (int i = from; i < to; i++) {
            final double a = r[i] - mean;
            den += a * a;
            if (i + 1 < to) {
                num += a * (r[i + 1] - mean);
            }
        }
        return den > 0 ? num / den : 0;
    }

    /**
     * Noise level of a record from its second differences, which cancel the smooth motion:
     * {@code σ ≈ MAD(Δ²y) / (0.6745 √6)} (a robust scale; 0.6745 is the normal quartile).
     */
    static double noise(double[] y) {
        if (y.length < 5) {
            return 0;
        }
        final double[] d = new double[y.length - 2];
        for (int i = 0; i < d.length; i++) {
            d[i] = Math.abs(y[i + 2] - 2 * y[i + 1] + y[i]);
        }
        Arrays.sort(d);
        return d[d.length / 2] / (0.6745 * Math.sqrt(6));
    }

    /**
     * Whether a record ends at rest: over the last period (or last 5 % of the record, if
     * longer) the angle varies by no more than 2 % of the release amplitude plus six noise
     * standard deviations ("common practice" thresholds, chosen so that a moving swing of even
     * a few percent of the release amplitude is never taken for a stop).
     */
    static boolean showsStop(ReleaseSession session, double period) {
        final double[] t = session.timesView();
        final double[] y = session.anglesView();
        final double span = Math.max(period, 0.05 * (t[t.length - 1] - t[0]));
        final double from = t[t.length - 1] - span;
        if (from <= session.guess().releaseTime()) {
            return false;
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = t.length - 1; i >= 0 && t[i] >= from; i--) {
            min = Math.min(min, y[i]);
            max = Math.max(max, y[i]);
        }
        return max - min <= 0.02 * Math.abs(session.guess().releaseAngle()) + 6 * noise(y);
    }

    /**
     * Time at which the recorded motion ends: the last sample that departs from the final rest
     * level by more than the stop threshold of {@link #showsStop}; the last sample time when the
     * record does not end at rest (s).
     */
    static double motionEnd(ReleaseSession session) {
        final double[] t = session.timesView();
        final double[] y = session.anglesView();
        final int n = t.length;
        final int tail = Math.max(5, n / 20);
        final double[] last = Arrays.copyOfRange(y, n - Math.min(tail, n), n);
        Arrays.sort(last);
        final double rest = last[last.length / 2];
        final double band = 0.01 * Math.abs(session.guess().releaseAngle()) + 6 * noise(y);
        int i = n - 1;
        while (i > 0 && Math.abs(y[i] - rest) <= band) {
            i--;
        }
        return i >= n - tail ? t[n - 1] : t[i];
    }
}
