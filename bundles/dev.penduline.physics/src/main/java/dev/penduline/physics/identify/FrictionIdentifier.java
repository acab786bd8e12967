package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.stream.IntStream;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;

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
        final List<NoiseFloor.Estimate> floors = NoiseFloor.of(problem.sessions());
        final NestedFits nested = new NestedFits(problem, quick, control,
                TermSelection.candidates(terms.contains(FrictionTerm.STICTION)), true, floors);
        return finish(problem, terms, nested.point(terms), settings, control, floors);
    }

    /**
     * The reported fit of a term set from its guarded point fit: refitted from a small spread
     * of starts around the optimum (friction halved and doubled), resampled for the second
     * uncertainty and the σ of the energy shares, held against the noise floor, judged.
     */
    static FrictionFit finish(FrictionProblem problem, Set<FrictionTerm> terms, PointFit guarded,
            FitSettings settings, FitControl control, List<NoiseFloor.Estimate> floors) {
        PointFit point = guarded;
        final StageOutcome o0 = point.outcome();
        if (o0.status() == FitStatus.CONVERGED
                && !StagedFit.atNoise(o0, problem.samples(), NoiseFloor.variance(problem.sessions(), floors))) {
            // at the noise floor no start can do clearly better; above it, the spread runs the
            // cheap stage from the optimum and from friction halved and doubled; only a start
            // that ends clearly lower there goes on to the full stage
            final FitSettings quick = settings.withResampling(0, settings.seed(), settings.parallel());
            final List<StageOutcome> tried = StagedFit.firstStage(problem, terms, quick, control,
                    List.of(o0.full(), scaledFriction(o0.full(), 0.5), scaledFriction(o0.full(), 2)));
            StageOutcome lowest = tried.get(0);
            for (StageOutcome t : tried.subList(1, tried.size())) {
                if (t.status() == FitStatus.CONVERGED
                        && t.rss() < lowest.rss() * (1 - NestedFits.GUARD_TOLERANCE)) {
                    lowest = t;
                }
            }
            if (lowest != tried.get(0)) {
                final PointFit spread = StagedFit.refine(problem, terms, quick, control, lowest.full());
                if (spread.outcome().status() == FitStatus.CONVERGED
                        && spread.outcome().rss() < o0.rss() * (1 - NestedFits.GUARD_TOLERANCE)) {
                    point = new PointFit(spread.layout(), spread.outcome(), spread.data(), spread.stiction(),
                            spread.band(), point.iterations() + spread.iterations(),
                            point.evaluations() + spread.evaluations());
                }
            }
        }
        point = withEncoderRounding(problem, point, settings, control);
        List<double[]> replicates = null;
        double[] resampled = null;
        int used = 0;
        final StageOutcome o = point.outcome();
        if (settings.resamples() > 0 && o.status() == FitStatus.CONVERGED) {
            replicates = BlockBootstrap.run(point.layout(), o.full(), point.stiction(),
                    point.data(), o.residuals(), o.jacobian(), problem.mechanism().gravityStiffness(), settings, control);
            used = replicates.size();
            resampled = BlockBootstrap.spread(replicates, point.layout().size());
            if (control.cancelled().getAsBoolean()) {
                final StageOutcome cancelled = new StageOutcome(o.full(), FitStatus.CANCELLED,
                        "cancelled by the caller during resampling", o.iterations(), o.evaluations(), o.rss(),
                        o.residuals(), o.jacobian());
                return FitReport.build(problem, terms, new PointFit(point.layout(), cancelled, point.data(),
                        point.stiction(), point.band(), point.iterations(), point.evaluations()), null, null, 0,
                        settings, floors);
            }
        }
        return FitReport.build(problem, terms, point, replicates, resampled, used, settings, floors);
    }

    /** Relative accuracy of the noise scale found by the profile over σ. */
    private static final double NOISE_SCALE_ACCURACY = 0.02;
    private static final int NOISE_SCALE_EVALUATIONS = 12;

    /**
     * Refits records that are quantised coarsely for their noise with the encoder's rounding in
     * the measurement model ({@link EncoderRounding}).
     *
     * <p>The noise before rounding, σ, is first estimated by maximum likelihood at the plain
     * fit; that fit is biased, and its errors inflate σ. The mean function g(μ; σ) identifies σ
     * as well: the expected squared residual is the readings' own variance (which does not
     * depend on the model's σ) plus {@code (g_true − g_σ)²}, least at the true σ. So the
     * residual sum of squares is profiled over a common scale of the sessions' σ (Brent's
     * method, each point a warm-started refit), and the best refit is kept.
     */
    static PointFit withEncoderRounding(FrictionProblem problem, PointFit point, FitSettings settings,
            FitControl control) {
        final StageOutcome o = point.outcome();
        if (o.status() != FitStatus.CONVERGED || o.residuals() == null) {
            return point;
        }
        // each session's σ by maximum likelihood, the sessions side by side when parallel
        final List<StageSamples> sessions = point.data();
        final int[] firstRow = new int[sessions.size()];
        for (int s = 1; s < firstRow.length; s++) {
            firstRow[s] = firstRow[s - 1] + sessions.get(s - 1).size();
        }
        IntStream indices = IntStream.range(0, sessions.size());
        if (settings.parallel()) {
            indices = indices.parallel();
        }
        final List<EncoderRounding> roundings = Arrays.asList(indices.mapToObj(s -> {
            final StageSamples d = sessions.get(s);
            final double[] model = new double[d.size()];
            for (int i = 0; i < model.length; i++) {
                model[i] = d.angles()[i] - o.residuals()[firstRow[s] + i];
            }
            return EncoderRounding.of(d.angles(), model);
        }).toArray(EncoderRounding[]::new));
        if (roundings.stream().allMatch(Objects::isNull)) {
            return point;
        }
        final double k = problem.mechanism().gravityStiffness();
        final FitSettings refit = settings.withLimits(Math.min(settings.maxIterations(), 20),
                Math.min(settings.maxEvaluations(), 40));
        // Levenberg–Marquardt at the first scale; at the others the chord steps of OptimumRefit
        // on the Jacobian of the last Levenberg–Marquardt point (values-only model runs), and
        // Levenberg–Marquardt again only where they do not settle; the best scale is polished
        // by Levenberg–Marquardt for its Jacobian and residuals
        final StageOutcome[] anchor = {null};
        final List<List<StageSamples>> anchorData = new ArrayList<>();
        anchorData.add(null);
        final StageOutcome[] bestOutcome = {null};
        final double[][] bestFull = {null};
        final double[] bestCost = {Double.POSITIVE_INFINITY};
        final List<List<StageSamples>> bestData = new ArrayList<>();
        bestData.add(null);
        final UnivariateFunction cost = scale -> {
            final List<StageSamples> data = new ArrayList<>();
            for (int s = 0; s < roundings.size(); s++) {
                final EncoderRounding r = roundings.get(s);
                data.add(point.data().get(s).withRounding(r == null ? null : r.withSigma(scale * r.sigma())));
            }
            final OptimumRefit chord = anchor[0] == null ? null : OptimumRefit.at(point.layout(), anchor[0].full(),
                    anchor[0].jacobian(), anchor[0].rss());
            if (chord != null) {
                final double[] reached = {Double.NaN};
                // another noise scale is another measurement model: the model runs at the anchor too
                final double[] full = chord.refit(data, null, k, point.stiction(), settings, control,
                        "encoder rounding", reached);
                if (full != null && Double.isFinite(reached[0])) {
                    if (reached[0] < bestCost[0]) {
                        bestCost[0] = reached[0];
                        bestFull[0] = full;
                        bestOutcome[0] = null;
                        bestData.set(0, data);
                    }
                    return reached[0];
                }
            }
            final double[] from = bestFull[0] == null ? o.full() : bestFull[0];
            final StageOutcome out = LevenbergStage.run("encoder rounding", point.layout(), from, data, k,
                    point.stiction(), refit, control);
            if (out.status() != FitStatus.CONVERGED) {
                return Double.MAX_VALUE;
            }
            anchor[0] = out;
            anchorData.set(0, data);
            if (out.rss() < bestCost[0]) {
                bestCost[0] = out.rss();
                bestFull[0] = out.full();
                bestOutcome[0] = out;
                bestData.set(0, data);
            }
            return out.rss();
        };
        try {
            new BrentOptimizer(NOISE_SCALE_ACCURACY, 1e-3).optimize(new MaxEval(NOISE_SCALE_EVALUATIONS),
                    new UnivariateObjectiveFunction(cost), GoalType.MINIMIZE, new SearchInterval(0.3, 1.1, 0.8));
        } catch (MathIllegalStateException e) {
            // the evaluation limit: the best refit so far stands
        }
        if (bestFull[0] == null) {
            return point;
        }
        StageOutcome chosen = bestOutcome[0];
        if (chosen == null) {
            final StageOutcome polished = LevenbergStage.run("encoder rounding", point.layout(), bestFull[0],
                    bestData.get(0), k, point.stiction(), refit, control);
            if (polished.status() != FitStatus.CONVERGED) {
                // the last converged Levenberg–Marquardt point stands (there is one: the chords need it)
                return new PointFit(point.layout(), anchor[0], anchorData.get(0), point.stiction(), point.band(),
                        point.iterations() + anchor[0].iterations(), point.evaluations() + anchor[0].evaluations());
            }
            chosen = polished;
        }
        return new PointFit(point.layout(), chosen, bestData.get(0), point.stiction(), point.band(),
                point.iterations() + chosen.iterations(), point.evaluations() + chosen.evaluations());
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
