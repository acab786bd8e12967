package dev.penduline.physics.identify;

/**
 * The samples of one session that a fitting stage uses: all of them, or a decimated window.
 *
 * @param times    sample times on the record's time base (s), increasing
 * @param angles   measured angles in the sensor's frame (rad)
 * @param rounding the encoder's rounding, put into the model of this session's readings; null
 *                 when the readings are fitted as they are
 */
record StageSamples(double[] times, double[] angles, EncoderRounding rounding) {

    StageSamples(double[] times, double[] angles) {
        this(times, angles, null);
    }

    /** The same samples with other readings (a resampled record of the same sensor). */
    StageSamples withAngles(double[] newAngles) {
        return new StageSamples(times, newAngles, rounding);
    }

    /** The same samples with the encoder's rounding in their model. */
    StageSamples withRounding(EncoderRounding r) {
        return new StageSamples(times, angles, r);
    }

    /** Every sample. */
    static StageSamples all(ReleaseSession session) {
        return new StageSamples(session.timesView(), session.anglesView());
    }

    /** Every stride-th sample with time before tEnd (always keeping at least two). */
    static StageSamples window(ReleaseSession session, double tEnd, int stride) {
        final double[] t = session.timesView();
        final double[] y = session.anglesView();
        int n = 0;
        while (n < t.length && t[n] <= tEnd) {
            n++;
        }
        n = Math.max(n, Math.min(2, t.length));
        final int m = (n + stride - 1) / stride;
        final double[] ts = new double[m];
        final double[] ys = new double[m];
        for (int i = 0; i < m; i++) {
            ts[i] = t[i * stride];
            ys[i] = y[i * stride];
        }
        return new StageSamples(ts, ys);
    }

    int size() {
        return times.length;
    }
}
