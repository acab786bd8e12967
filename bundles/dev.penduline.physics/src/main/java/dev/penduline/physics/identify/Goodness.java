package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Whether a fit describes its records: the residuals held against each record's model-free
 * noise floor ({@link NoiseFloor}), in level and in structure.
 *
 * <p>The test: a model that describes a record leaves residuals at the level of the sensor's
 * noise, so the ratio of the residual rms to the noise floor is near 1 (a little below, since
 * fitting takes up a few degrees of freedom). A ratio above {@link FitSettings#misfitRatio()}
 * (default 2, "common practice": a residual variance four times the noise variance is far
 * beyond what estimating the floor from a few hundred samples can explain) in any record means
 * the model does not describe that record: the loss law, the inertia or the record itself is
 * wrong, and no verdict may be drawn. The lag-1 correlation of the residuals is reported
 * beside it as the structure: white noise gives about 0, a model that misses a systematic
 * motion about 1.
 *
 * @param sessions      the check of each record, in the problem's order
 * @param rms           residual rms over all records (rad)
 * @param floor         noise floor over all records, the sample-weighted rms of the floors (rad)
 * @param ratio         the largest per-record ratio of residual rms to noise floor, each divided by
 *                      {@code 1 + 3 u} with u the floor's relative standard error
 *                      ({@link NoiseFloor.Estimate#relativeError()}), so that a roughly known floor
 *                      is not taken for a misfit
 * @param lag1          lag-1 autocorrelation of all residuals
 * @param limit         the ratio above which the model is said not to describe a record
 * @param passed        whether every record's ratio is within the limit
 * @param test          the test, in words
 */
public record Goodness(List<SessionGoodness> sessions, double rms, double floor, double ratio, double lag1,
        double limit, boolean passed, String test) {

    /** Ratio above which a warning says the residuals are above the noise (below the misfit limit). */
    static final double NOTICE_RATIO = 1.3;

    /**
     * The check of one record.
     *
     * @param name   the record
     * @param rms    its residual rms (rad)
     * @param noise  its noise floor
     * @param ratio  rms / noise floor / (1 + 3 u), u the floor's relative standard error
     * @param lag1   lag-1 autocorrelation of its residuals
     */
    public record SessionGoodness(String name, double rms, NoiseFloor.Estimate noise, double ratio, double lag1) {
    }

    /** Freezes the list. */
    public Goodness {
        sessions = List.copyOf(sessions);
    }

    /**
     * Holds the residuals of a fit against the noise floors of its records.
     *
     * @param sessions  the records, in the order of the residuals
     * @param floors    their noise floors, in the same order
     * @param residuals measured − model, all sessions concatenated (rad); null when the fit has none
     * @param limit     misfit limit of the rms-to-floor ratio
     * @return the check; passed when there are no residuals to judge (a cancelled fit)
     */
    static Goodness of(List<ReleaseSession> sessions, List<NoiseFloor.Estimate> floors, double[] residuals,
            double limit) {
        final List<SessionGoodness> rows = new ArrayList<>();
        double sum = 0;
        double floorSquares = 0;
        int n = 0;
        double worst = 0;
        int row = 0;
        for (int k = 0; k < sessions.size(); k++) {
            final ReleaseSession s = sessions.get(k);
            final NoiseFloor.Estimate noise = floors.get(k);
            final int size = s.size();
            double rss = Double.NaN;
            double lag1 = Double.NaN;
            if (residuals != null) {
                rss = 0;
                for (int i = row; i < row + size; i++) {
                    rss += residuals[i] * residuals[i];
                }
                lag1 = RecordSignals.lag1(residuals, row, row + size);
                sum += rss;
            }
            final double rms = Math.sqrt(rss / size);
            // the floor's own uncertainty widens the limit: a short or correlated still segment
            // measures the noise only roughly
            final double ratio = rms / noise.sigma() / (1 + 3 * noise.relativeError());
            if (ratio > worst || Double.isNaN(ratio) && residuals != null) {
                worst = ratio;
            }
            floorSquares += noise.sigma() * noise.sigma() * size;
            n += size;
            rows.add(new SessionGoodness(s.name(), rms, noise, ratio, lag1));
            row += size;
        }
        final double lag1 = residuals == null ? Double.NaN : RecordSignals.lag1(residuals, 0, residuals.length);
        final boolean passed = residuals == null || worst <= limit;
        final String test = String.format(Locale.ROOT, "residual rms of each record against its model-free noise"
                + " floor (still segment or fourth differences); the model describes a record when the ratio is at"
                + " most %.3g", limit);
        return new Goodness(rows, Math.sqrt(sum / n), Math.sqrt(floorSquares / n), worst, lag1, limit, passed, test);
    }

    /**
     * The evidence against the model, in a sentence per record that fails, with the likely causes.
     *
     * @return sentences; empty when the check passed
     */
    public List<String> evidence() {
        final List<String> lines = new ArrayList<>();
        for (SessionGoodness s : sessions) {
            if (s.ratio() > limit || Double.isNaN(s.ratio())) {
                lines.add(String.format(Locale.ROOT, "%s: residual rms %.3g° is %.3g times its noise floor %.3g°"
                        + " (%s, known to ±%.0f %%), residual lag-1 correlation %.2f", s.name(),
                        Math.toDegrees(s.rms()), s.rms() / s.noise().sigma(), Math.toDegrees(s.noise().sigma()),
                        s.noise().method(), 100 * s.noise().relativeError(), s.lag1()));
            }
        }
        return lines;
    }

    /**
     * Whether the residuals are above the noise floor without reaching the misfit limit.
     *
     * @return true when some record's ratio lies between {@value #NOTICE_RATIO} and the limit
     */
    public boolean aboveNoise() {
        return passed && ratio > NOTICE_RATIO;
    }
}
