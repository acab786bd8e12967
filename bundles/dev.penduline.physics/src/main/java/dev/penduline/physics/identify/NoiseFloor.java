package dev.penduline.physics.identify;

import java.util.List;

import dev.penduline.physics.swing.RobustStatistics;

/**
 * The measurement noise of one record, estimated without any model of the motion, so that a
 * fit's residuals can be held against it.
 *
 * <p>Two model-free looks; the still segment sets the floor when the record has one, the
 * high-pass look otherwise:
 * <ul>
 * <li><b>Still segment</b>: the samples before the release (at least {@value #MIN_STILL}),
 * where the body is held and the record shows the sensor alone. Spread: the MAD about the
 * median, scaled to a standard deviation (Rousseeuw &amp; Croux, JASA 88, 1993).</li>
 * <li><b>High-pass</b>: fourth differences of the whole record. A smooth motion sampled at
 * a step h contributes about {@code A (ω h)⁴} to them, which is negligible at any sensible
 * rate, while white noise of standard deviation σ gives differences of standard deviation
 * {@code σ √70} (70 = C(8, 4), the sum of the squared binomial weights). Robust spread:
 * {@code MAD(Δ⁴y) · 1.4826 / √70}. It is reported beside the still segment's: a record that
 * is much rougher in motion than at rest (a loose sensor, vibration, or no free swing at all)
 * is not described by a swing model, and holding it to the sensor's still noise says so.</li>
 * </ul>
 * An encoder whose noise is small against one count shows a still segment of one or two
 * counts only, yet the rounding error of a moving record is spread over one count: at least
 * {@code q/√12} (the variance of a uniform error over one step, Widrow &amp; Kollár,
 * Quantization Noise, 2008) is taken then.
 */
public final class NoiseFloor {

    /** Still samples needed for the still-segment look. */
    static final int MIN_STILL = 30;

    private NoiseFloor() {
    }

    /**
     * How a record's noise floor was found.
     *
     * @param sigma       the noise floor: the still segment's, else the high-pass look, and at least
     *                    {@code q/√12} (rad)
     * @param still       standard deviation of the still segment (rad), NaN when it is too short
     * @param highPass    standard deviation from the fourth differences (rad), NaN for fewer than 10 samples
     * @param quantum     encoder step found in the record (rad), 0 when not quantised
     * @param stillLag1   lag-1 autocorrelation of the still segment (the sensor's own correlation), NaN when short
     * @param method      which look set the floor: "still segment", "high-pass" or "encoder step"
     * @param samples     effective number of independent samples behind the floor,
     *                    {@code n (1 − ρ1)/(1 + ρ1)} for the still segment
     */
    public record Estimate(double sigma, double still, double highPass, double quantum, double stillLag1,
            String method, double samples) {

        /**
         * The relative standard error of the floor, {@code 1/√(2 n_eff)} (the standard error of a
         * standard deviation from n_eff independent normal samples).
         *
         * @return the relative error (dimensionless)
         */
        public double relativeError() {
            return 1 / Math.sqrt(2 * Math.max(1, samples));
        }
    }

    /**
     * Estimates the noise floor of a session.
     *
     * @param session the record, with its guessed release time
     * @return the estimate
     */
    public static Estimate of(ReleaseSession session) {
        final double[] t = session.timesView();
        final double[] y = session.anglesView();
        final double release = session.guess().releaseTime();
        // leave a margin before the release: the hand lets go over a few samples
        int still = 0;
        while (still < t.length && t[still] < release) {
            still++;
        }
        still = Math.max(0, still - Math.max(2, still / 20));
        double stillSigma = Double.NaN;
        double stillLag1 = Double.NaN;
        if (still >= MIN_STILL) {
            final double centre = RobustStatistics.median(y, 0, still);
            stillSigma = RobustStatistics.MAD_TO_SIGMA * RobustStatistics.mad(y, 0, still, centre);
            stillLag1 = RecordSignals.lag1(y, 0, still);
            if (stillSigma == 0) {
                // a MAD of zero (more than half the samples on one count): fall back to the
                // ordinary standard deviation, which still sees the flips between counts
                stillSigma = standardDeviation(y, 0, still);
            }
        }
        final double high = RobustStatistics.highPassSigma(y);
        final double q = RobustStatistics.quantum(y);
        double sigma = high;
        String method = "high-pass";
        if (Double.isFinite(stillSigma)) {
            sigma = stillSigma;
            method = "still segment";
        }
        if (q > 0 && !(q / Math.sqrt(12) <= sigma)) {
            sigma = q / Math.sqrt(12);
            method = "encoder step";
        }
        double effective = y.length;
        if (method.equals("still segment")) {
            final double rho = Math.max(0, Math.min(0.99, stillLag1));
            effective = still * (1 - rho) / (1 + rho);
        }
        return new Estimate(sigma, stillSigma, high, q, stillLag1, method, effective);
    }

    /**
     * The noise floor of several records as one variance per sample: the sample-weighted mean of
     * their squared floors.
     *
     * @param sessions the records
     * @param floors   their floors, in order
     * @return the variance (rad²)
     */
    static double variance(List<ReleaseSession> sessions, List<Estimate> floors) {
        double sum = 0;
        int n = 0;
        for (int k = 0; k < sessions.size(); k++) {
            final double sigma = floors.get(k).sigma();
            sum += sigma * sigma * sessions.get(k).size();
            n += sessions.get(k).size();
        }
        return sum / n;
    }

    /**
     * The floors of several records, in order.
     *
     * @param sessions the records
     * @return one estimate per record
     */
    static List<Estimate> of(List<ReleaseSession> sessions) {
        return sessions.stream().map(NoiseFloor::of).toList();
    }

    private static double standardDeviation(double[] y, int from, int to) {
        double mean = 0;
        for (int i = from; i < to; i++) {
            mean += y[i];
        }
        mean /= to - from;
        double sum = 0;
        for (int i = from; i < to; i++) {
            sum += (y[i] - mean) * (y[i] - mean);
        }
        return Math.sqrt(sum / (to - from - 1));
    }
}
