package dev.penduline.physics.swing;

import dev.penduline.physics.InvalidValueException;

/**
 * Finds the instant a body held at rest is let go.
 *
 * <p>Steps: (1) the still level and noise from the first samples, as median and MAD (robust to
 * a stray encoder step); (2) the first <em>sustained</em> departure: {@code sustain} samples in
 * a row farther than {@code k·σ + q} from the still level, σ the noise and q the quantisation
 * step; the still statistics are then recomputed over the whole still segment and the search
 * repeated once; (3) refinement: released from rest, the body starts with constant angular
 * acceleration, {@code θ ≈ θs − a (t − tr)²} (Taylor expansion of the equation of motion at
 * ω = 0, with or without dry friction): a still level joined at tr to that parabola (with a
 * quartic correction) is fitted to the samples up to a tenth of the swing, see
 * {@link ReleaseFit}; the fit up to a twentieth is compared to bound the model's bias, and both
 * enter the uncertainty.
 *
 * <p>Immutable; {@code withX} return copies.
 */
public final class ReleaseDetector {

    private final double threshold;
    private final int sustain;

    /** A detector with k = 5 and 5 samples of sustained departure. */
    public ReleaseDetector() {
        this(5, 5);
    }

    private ReleaseDetector(double threshold, int sustain) {
        if (!(threshold > 0) || Double.isInfinite(threshold)) {
            throw new IllegalArgumentException("threshold must be a finite number > 0 (noise σ), got " + threshold);
        }
        if (sustain < 1) {
            throw new IllegalArgumentException("sustain must be at least 1 sample, got " + sustain);
        }
        this.threshold = threshold;
        this.sustain = sustain;
    }

    /**
     * Returns a copy with another departure threshold.
     *
     * @param k departure threshold in noise standard deviations (dimensionless), &gt; 0
     * @return the copy
     */
    public ReleaseDetector withThreshold(double k) {
        return new ReleaseDetector(k, sustain);
    }

    /**
     * Returns a copy with another persistence requirement.
     *
     * @param samples how many consecutive samples must lie beyond the threshold, ≥ 1
     * @return the copy
     */
    public ReleaseDetector withSustain(int samples) {
        return new ReleaseDetector(threshold, samples);
    }

    /**
     * Detects the release.
     *
     * @param t     sample times (s), strictly increasing
     * @param theta angles (rad)
     * @return the release
     * @throws IllegalArgumentException for fewer than 10 samples or arrays of different length
     */
    public Release detect(double[] t, double[] theta) {
        if (t.length != theta.length || t.length < 10) {
            throw new InvalidValueException("need at least 10 samples with one time each, got "
                    + t.length + " times and " + theta.length + " angles");
        }
        final int n = t.length;
        final double q = RobustStatistics.quantum(theta);
        double range = 0;
        for (double v : theta) {
            range = Math.max(range, Math.abs(v - theta[0]));
        }
        final double floor = Math.max(q / Math.sqrt(12), 1e-9 * range);
        int window = Math.max(5, Math.min(n / 20, 50));
        int departure = -1;
        double level = 0;
        double sigma = 0;
        for (int pass = 0; pass < 3; pass++) {
            level = RobustStatistics.median(theta, 0, window);
            sigma = Math.max(floor, RobustStatistics.MAD_TO_SIGMA * RobustStatistics.mad(theta, 0, window, level));
            if (threshold * sigma + q > 0.25 * range) {
                // the first samples already spread over a good part of the swing: no still segment
                departure = 0;
            } else {
                departure = firstDeparture(theta, level, threshold * sigma + q);
            }
            if (departure < 0 || range == 0) {
                throw new InvalidValueException("the angle never leaves its starting level by more than "
                        + RobustStatistics.degrees(threshold * sigma + q) + ": the record shows no release");
            }
            if (departure < 3) {
                // no still segment to measure the noise on: the first samples are already the swing
                final double highPass = RobustStatistics.highPassSigma(theta);
                sigma = Math.max(floor, Double.isFinite(highPass) ? highPass : sigma);
                return new Release(t[0], 0, 0, theta[0], sigma, q, 0, false,
                        "no still segment: the record starts moving; release taken at the first sample");
            }
            final int next = departure;
            if (next == window) {
                break;
            }
            window = next;
        }
        return refine(t, theta, departure, trimmedMean(theta, departure, level, Math.max(4 * sigma, 2.5 * q)), sigma, q);
    }

    /**
     * Mean of the still samples within a band of their median: the median of quantised readings
     * snaps to a whole count, while noise dithers the mean towards the true level.
     */
    private static double trimmedMean(double[] theta, int count, double median, double band) {
        double sum = 0;
        int n = 0;
        for (int i = 0; i < count; i++) {
            if (Math.abs(theta[i] - median) <= band) {
                sum += theta[i];
                n++;
            }
        }
        return n > 0 ? sum / n : median;
    }

    private int firstDeparture(double[] theta, double level, double limit) {
        int run = 0;
        for (int i = 0; i < theta.length; i++) {
            if (Math.abs(theta[i] - level) > limit) {
                run++;
                if (run == sustain) {
                    return i - sustain + 1;
                }
            } else {
                run = 0;
            }
        }
        return -1;
    }

    private Release refine(double[] t, double[] theta, int departure, double level, double sigma, double q) {
        final double direction = Math.signum(level - theta[departure]);
        double swing = 0;
        for (int i = departure; i < theta.length; i++) {
            swing = Math.max(swing, direction * (level - theta[i]));
        }
        final int end = earlyEnd(theta, departure, level, direction, 0.1 * swing);
        final int motion = end - departure;
        final int from = Math.max(0, departure - Math.max(20, 2 * motion));
        final double[] full = ReleaseFit.fit(t, theta, from, end, t[from], t[departure], motion);
        final double lastStill = t[departure - 1];
        if (full == null) {
            final double tr = 0.5 * (lastStill + t[departure]);
            return new Release(tr, 0.5 * (t[departure] - lastStill), departure, level, sigma, q, departure, true,
                    "first sustained departure beyond " + threshold + "σ; too few early samples to refine");
        }
        final double tr = full[0];
        double variance = full[1] * full[1];
        final int halfEnd = earlyEnd(theta, departure, level, direction, 0.05 * swing);
        final double[] half = ReleaseFit.fit(t, theta, from, halfEnd, t[from], t[departure], halfEnd - departure);
        if (half != null) {
            variance += (half[0] - tr) * (half[0] - tr);
        }
        int index = departure;
        while (index > 0 && t[index - 1] >= tr) {
            index--;
        }
        return new Release(tr, Math.sqrt(variance), index, level, sigma, q, index, true,
                "first sustained departure beyond " + threshold + "σ, refined by fitting a still level joined at tr"
                        + " to θ = L − a (t − tr)² + c (t − tr)⁴ over " + (end - from) + " samples (motion from rest)");
    }

    /** One past the last early sample whose displacement from the still level is within the limit. */
    private static int earlyEnd(double[] theta, int departure, double level, double direction, double limit) {
        int i = departure;
        while (i < theta.length && direction * (level - theta[i]) <= limit) {
            i++;
        }
        return i;
    }
}
