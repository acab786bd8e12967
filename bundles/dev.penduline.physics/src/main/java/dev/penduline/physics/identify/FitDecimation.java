package dev.penduline.physics.identify;

import java.util.Locale;

/**
 * Thins long records before the fit so that every record up to the readers' maximum is fitted
 * in bounded time inside the memory budget: the fit's Jacobian alone holds a row of doubles per
 * sample and parameter, and each resampling refit a residual vector of every sample.
 *
 * <p><b>The rule.</b> When the sessions hold more than {@link #TARGET_SAMPLES} samples in all,
 * each session keeps every k-th sample, with the smallest whole k that brings the total to the
 * target, but never fewer than {@link #MIN_SAMPLES_PER_PERIOD} samples per small-angle period
 * (a session already that coarse is left as it is).
 *
 * <p><b>Why plain thinning, not averaging.</b> The swing lies far below the thinned Nyquist
 * frequency (at least 25 times lower), so nothing of the motion aliases; what aliases is the
 * broadband sensor noise, which stays noise of the same variance. Every kept value is a real
 * reading, so the encoder-rounding model (readings on the count grid), the noise floor from the
 * still segment or from fourth differences and the residual-to-noise test keep their meaning;
 * averaging would move readings off the grid, lower the noise by an unknown factor where samples
 * are correlated, and flatten the turning points. The price is information: the standard errors
 * are those of the kept samples, larger (about √k for white noise), never optimistic.
 */
public final class FitDecimation {

    /** Most samples, over all sessions, that the fit uses. */
    public static final int TARGET_SAMPLES = 100_000;
    /** Fewest samples per small-angle period a thinned session keeps. */
    public static final int MIN_SAMPLES_PER_PERIOD = 50;

    private FitDecimation() {
    }

    /**
     * How one session was thinned.
     *
     * @param session the session's name
     * @param before  samples in the record
     * @param after   samples the fit uses
     * @param stride  every stride-th sample was kept (1: none dropped)
     */
    public record Thinning(String session, int before, int after, int stride) {

        /**
         * Whether samples were dropped.
         *
         * @return stride &gt; 1
         */
        public boolean thinned() {
            return stride > 1;
        }

        /**
         * The note for reports.
         *
         * @return "decimated from N to M samples ..." with the reason
         */
        public String note() {
            return String.format(Locale.ROOT, "%s: decimated from %d to %d samples (every %d%s sample kept) for the fit: "
                    + "the records hold more than the %d samples a fit uses within the memory budget (README, \"Limits\"); "
                    + "at least %d samples per period remain, and the uncertainties are those of the kept samples",
                    session, before, after, stride, ordinal(stride), TARGET_SAMPLES, MIN_SAMPLES_PER_PERIOD);
        }

        private static String ordinal(int k) {
            final int tens = k % 100;
            if (tens >= 11 && tens <= 13) {
                return "th";
            }
            return switch (k % 10) {
                case 1 -> "st";
                case 2 -> "nd";
                case 3 -> "rd";
                default -> "th";
            };
        }
    }

    /**
     * The stride for one session.
     *
     * @param totalSamples     samples of all sessions together
     * @param sessionSamples   samples of this session
     * @param sessionDuration  time from its first to its last sample (s)
     * @param period           the mechanism's small-angle period (s)
     * @return the stride, at least 1
     */
    public static int stride(long totalSamples, int sessionSamples, double sessionDuration, double period) {
        if (totalSamples <= TARGET_SAMPLES || sessionSamples < 2 || !(sessionDuration > 0) || !(period > 0)) {
            return 1;
        }
        final long wanted = (totalSamples + TARGET_SAMPLES - 1) / TARGET_SAMPLES;
        final double perPeriod = period * (sessionSamples - 1) / sessionDuration;
        final long allowed = (long) Math.floor(perPeriod / MIN_SAMPLES_PER_PERIOD);
        return (int) Math.max(1, Math.min(wanted, allowed));
    }

    /**
     * Every stride-th value, from the first.
     *
     * @param values the values
     * @param stride the stride, at least 1
     * @return the kept values (the array itself when stride is 1)
     */
    public static double[] keep(double[] values, int stride) {
        if (stride <= 1) {
            return values;
        }
        final double[] kept = new double[(values.length + stride - 1) / stride];
        for (int i = 0; i < kept.length; i++) {
            kept[i] = values[i * stride];
        }
        return kept;
    }
}
