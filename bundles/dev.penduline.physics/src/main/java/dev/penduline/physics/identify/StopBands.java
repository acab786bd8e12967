package dev.penduline.physics.identify;

/**
 * The static-friction band that the records' stops allow, given for every reported fit that
 * has a record ending at rest, whether or not stiction is in its term set.
 *
 * <p>A body at rest at x from the equilibrium is held against the gravity torque K sin x, so
 * {@code Ts ≥ K |sin x_rest|}; at the reversal before, it swung on, so {@code Ts < K |sin x|}
 * there. When stiction is fitted the band is the fit's own; otherwise it is bracketed at the
 * fitted parameters in the same way ({@link StictionBracket}).
 */
final class StopBands {

    /**
     * A band, or the reason there is none.
     *
     * @param band the band (N·m), null when none can be given
     * @param note how it was found, or why there is none
     */
    record Found(StictionBand band, String note) {
    }

    private StopBands() {
    }

    static Found of(FrictionProblem problem, PointFit point, FitSettings settings) {
        final double period = problem.mechanism().smallAnglePeriod();
        int stopping = 0;
        for (ReleaseSession s : problem.sessions()) {
            stopping += RecordSignals.showsStop(s, period) ? 1 : 0;
        }
        if (stopping == 0) {
            return new Found(null, "no record ends at rest, so the stops give no static-friction band; record"
                    + " until the body has stopped for a period or more");
        }
        if (point.outcome().status() == FitStatus.CANCELLED) {
            return new Found(null, "the fit was cancelled before the stops were examined");
        }
        final StictionBand band = point.band() != null ? point.band()
                : StictionBracket.of(StagedFit.level(problem.mechanism()), point.outcome().full(), point.data(),
                        settings.integrationTolerance());
        if (!band.resolved()) {
            return new Found(band, "the records' stops need different static torques (no common band): the"
                    + " friction may have changed between the records, or a stop was disturbed");
        }
        final String how = point.band() != null ? "from the fit's own stiction term"
                : "bracketed at the fitted parameters (stiction is not in the term set)";
        return new Found(band, stopping + " of " + problem.sessions().size() + " record(s) end at rest; the band is "
                + how + ": at rest Ts ≥ K|sin x_rest|, at the reversal before Ts < K|sin x|");
    }
}
