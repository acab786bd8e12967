package dev.penduline.physics.identify;

import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Identifies friction from recorded releases: the entry point of this package.
 *
 * <p>{@link #fit} fits one term set; {@link #compare} fits the candidate term sets, ranks them
 * by information criteria and returns the selected one fully fitted. The identifier is
 * immutable and thread-safe; each call keeps its own state.
 */
public final class FrictionIdentifier {

    private final FitSettings settings;

    /**
     * An identifier with {@link FitSettings#defaults()}.
     */
    public FrictionIdentifier() {
        this(FitSettings.defaults());
    }

    /**
     * An identifier with the given settings.
     *
     * @param settings numerical settings
     */
    public FrictionIdentifier(FitSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /**
     * The settings used.
     *
     * @return the settings
     */
    public FitSettings settings() {
        return settings;
    }

    /**
     * Returns a copy with other settings.
     *
     * @param newSettings numerical settings
     * @return the copy
     */
    public FrictionIdentifier withSettings(FitSettings newSettings) {
        return new FrictionIdentifier(newSettings);
    }

    /**
     * Fits the problem's term set, without cancellation or progress.
     *
     * @param problem what to identify
     * @return the fit; check {@link FrictionFit#status()}
     */
    public FrictionFit fit(FrictionProblem problem) {
        return fit(problem, FitControl.none());
    }

    /**
     * Fits the problem's term set.
     *
     * @param problem what to identify
     * @param control cancellation and progress
     * @return the fit; check {@link FrictionFit#status()}
     */
    public FrictionFit fit(FrictionProblem problem, FitControl control) {
        Objects.requireNonNull(problem, "problem");
        Objects.requireNonNull(control, "control");
        final Set<FrictionTerm> terms = problem.terms();
        final FitSettings quick = settings.withResampling(0, settings.seed(), settings.parallel());
        final NestedFits nested = new NestedFits(problem, quick, control,
                TermSelection.candidates(terms.contains(FrictionTerm.STICTION)));
        return finish(problem, terms, nested.point(terms), settings, control);
    }

    /**
     * The reported fit of a term set from its guarded point fit: refitted from a small spread
     * of starts around the optimum (friction halved and doubled), resampled for the second
     * uncertainty and the σ of the energy shares, held against the noise floor, judged.
     */
    static FrictionFit finish(FrictionProblem problem, Set<FrictionTerm> terms, PointFit guarded,
            FitSettings settings, FitControl control) {
        PointFit point = guarded;
        final StageOutcome o0 = point.outcome();
        if (o0.status() == FitStatus.CONVERGED) {
            final FitSettings quick = settings.withResampling(0, settings.seed(), settings.parallel());
            final PointFit spread = StagedFit.run(problem, terms, quick, control,
                    List.of(o0.full(), scaledFriction(o0.full(), 0.5), scaledFriction(o0.full(), 2)));
            if (spread.outcome().status() == FitStatus.CONVERGED
                    && spread.outcome().rss() < o0.rss() * (1 - NestedFits.GUARD_TOLERANCE)) {
                point = new PointFit(spread.layout(), spread.outcome(), spread.data(), spread.stiction(),
                        spread.band(), point.iterations() + spread.iterations(),
                        point.evaluations() + spread.evaluations());
            }
        }
        List<double[]> replicates = null;
        double[] resampled = null;
        int used = 0;
        final StageOutcome o = point.outcome();
        if (settings.resamples() > 0 && o.status() == FitStatus.CONVERGED) {
            replicates = BlockBootstrap.run(point.layout(), o.full(), point.stiction(),
                    point.data(), o.residuals(), problem.mechanism().gravityStiffness(), settings, control);
            used = replicates.size();
            resampled = BlockBootstrap.spread(replicates, point.layout().size());
            if (control.cancelled().getAsBoolean()) {
                final StageOutcome cancelled = new StageOutcome(o.full(), FitStatus.CANCELLED,
                        "cancelled by the caller during resampling", o.iterations(), o.evaluations(), o.rss(),
                        o.residuals(), o.jacobian());
                return FitReport.build(problem, terms, new PointFit(point.layout(), cancelled, point.data(),
                        point.stiction(), point.band(), point.iterations(), point.evaluations()), null, null, 0,
                        settings, true);
            }
        }
        return FitReport.build(problem, terms, point, replicates, resampled, used, settings, true);
    }

    /** The full vector with the friction terms scaled (a start for the spread). */
    private static double[] scaledFriction(double[] full, double factor) {
        final double[] x = full.clone();
        for (ParameterKind k : new ParameterKind[] {ParameterKind.VISCOUS, ParameterKind.COULOMB,
            ParameterKind.DRAG}) {
            x[ParameterLayout.index(k)] *= factor;
        }
        return x;
    }

    /**
     * Fits the candidate term sets and selects one, without cancellation or progress.
     *
     * @param problem what to identify (its term set is ignored; its start values are used)
     * @return the comparison with the selected fit
     */
    public ModelComparison compare(FrictionProblem problem) {
        return compare(problem, FitControl.none());
    }

    /**
     * Fits the candidate term sets (viscous; Coulomb; viscous + Coulomb; viscous + drag;
     * viscous + Coulomb + drag; each also with stiction when a record ends at rest), ranks them
     * by AIC and BIC on the effective sample size and refits the selected set with resampling.
     *
     * @param problem what to identify (its term set is ignored; its start values are used)
     * @param control cancellation and progress
     * @return the comparison with the selected fit
     */
    public ModelComparison compare(FrictionProblem problem, FitControl control) {
        return TermSelection.compare(problem, settings, control);
    }
}
