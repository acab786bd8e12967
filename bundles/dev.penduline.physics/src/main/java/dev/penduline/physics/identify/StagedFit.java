package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.util.Pair;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;

/**
 * The staged point fit of one term set.
 *
 * <ol>
 * <li><b>Lock</b>: the first few periods after the release, decimated, with the friction held
 * at its starting values: θ0, t_r, offset per session and J0. Phase and frequency are what a
 * far-off start gets wrong, and a short window has no room for a wrong phase to build up.</li>
 * <li><b>Motion</b>: the record up to where the body comes to rest, decimated to about 100
 * samples per period, every free parameter. Leaving out the final rest matters: which reversal
 * the model stops at is a discrete decision, and a model that stops one reversal early or late
 * leaves a constant misfit over the whole rest that gradients cannot see; fitted on the
 * motion alone, the parameters arrive close enough to stop where the record does. Decimation
 * makes this stage cheap, so the full stage needs only a few iterations.</li>
 * <li><b>Full</b>: every sample, every free parameter, warm-started from the motion stage.</li>
 * <li><b>Stiction</b> (when fitted): Ts bracketed from the stops ({@link StictionBracket}),
 * fixed at the middle of its band, and the full stage repeated, until the band settles.</li>
 * </ol>
 */
final class StagedFit {

    /** Reference damping ratio for the friction scales (ζ = 1 %). */
    private static final double REFERENCE_DAMPING = 0.01;
    private static final int STICTION_ROUNDS = 3;
    /**
     * Limits of one stiction round. A round starts at the optimum with only Ts moved: a term set
     * that describes its records settles in a few evaluations (1 to 3 per round seen on the
     * sample hatch's richer sets); one that does not thrashes against the stop decisions (about
     * 20 evaluations of every sample per round were seen for its coulomb+stiction, which ended
     * worse than coulomb alone and failed the nested guard anyway) and ends at the limit,
     * reported as not converged, which also keeps it from being selected.
     */
    private static final int STICTION_ITERATIONS = 6;
    private static final int STICTION_EVALUATIONS = 10;
    /** Decimation of the motion stage: enough samples per period to resolve every term. */
    private static final int MOTION_SAMPLES_PER_PERIOD = 100;

    /** The fitted friction terms and their places in the full vector, in the same order. */
    private static final FrictionTerm[] DISSIPATIVE = {FrictionTerm.VISCOUS, FrictionTerm.COULOMB, FrictionTerm.DRAG};
    private static final ParameterKind[] DISSIPATIVE_KINDS = {ParameterKind.VISCOUS, ParameterKind.COULOMB,
        ParameterKind.DRAG};

    private StagedFit() {
    }

    static PointFit run(FrictionProblem problem, Set<FrictionTerm> terms, FitSettings settings,
            FitControl control) {
        return run(problem, terms, settings, control, List.of());
    }

    /**
     * The staged fit from the analysis' starting values and from every seed: each start runs
     * the cheap motion stage (or the full stage when there is nothing to thin), and the start
     * that reaches the lowest cost goes on to the full stage.
     *
     * @param seeds full vectors (SI) to start from besides the analysis estimates, usually the
     *              optima of nested term sets; terms of this set that a seed lacks (zero) are
     *              started at half the analysis' value, terms outside this set are zeroed
     */
    static PointFit run(FrictionProblem problem, Set<FrictionTerm> terms, FitSettings settings,
            FitControl control, List<double[]> seeds) {
        return run(problem, terms, settings, control, seeds, false, Double.NaN);
    }

    /**
     * Residual rms, in noise floors, at or below which a start has reached what any model can:
     * the seeds are then not tried (they could not do clearly better).
     */
    static final double NOISE_LEVEL = Goodness.NOTICE_RATIO;

    /** Whether a stage's residual per sample is at the noise floor (NaN floor: never). */
    static boolean atNoise(StageOutcome o, int rows, double noiseVariance) {
        return o.status() == FitStatus.CONVERGED && o.rss() / rows <= NOISE_LEVEL * NOISE_LEVEL * noiseVariance;
    }

    /**
     * The staged fit, or only its cheap part.
     *
     * @param motionOnly    stop after the motion stage (decimated, the final rest left out): the
     *                      point serves as a seed and a guard for a richer set, not as a result
     * @param noiseVariance the records' noise floor as a variance per sample (rad²); when the
     *                      analysis' start already fits to the floor the seeds are skipped; NaN
     *                      tries them always
     */
    static PointFit run(FrictionProblem problem, Set<FrictionTerm> terms, FitSettings settings,
            FitControl control, List<double[]> seeds, boolean motionOnly, double noiseVariance) {
        final Plan plan = new Plan(problem, terms);
        final Tally tally = new Tally();
        double[] current = plan.initial;
        if (settings.lockCycles() > 0) {
            final List<StageSamples> window = plan.lockWindow(settings);
            final StageOutcome lock = tally.add(LevenbergStage.run("lock", plan.layout.withFree(plan.lockFree),
                    current, window, plan.stiffness, plan.start.stiction(), settings, control));
            if (lock.status() == FitStatus.CANCELLED) {
                return tally.point(plan.layout, lock, window, plan.start.stiction(), null);
            }
            current = lock.full();
        }
        final List<double[]> starts = new ArrayList<>();
        starts.add(current);
        for (double[] seed : seeds) {
            starts.add(seeded(seed, terms, plan.start));
        }
        // with nothing to thin, the "motion" stage would be the full stage itself
        final String firstStage = plan.thinned ? "motion" : "full";
        final List<StageSamples> firstData = plan.thinned ? plan.motion : plan.all;
        if (starts.size() > 1 && !Double.isNaN(noiseVariance)) {
            // lowest cost first: a start that reaches the noise floor ends the search, and the
            // most promising start is the likeliest to; the best start wins whatever the order
            orderByCost(starts, plan, firstData, settings);
        }
        StageOutcome best = null;
        for (double[] from : starts) {
            final StageOutcome moving = tally.add(LevenbergStage.run(firstStage, plan.layout, from, firstData,
                    plan.stiffness, plan.start.stiction(), settings, control));
            if (moving.status() == FitStatus.CANCELLED) {
                return tally.point(plan.layout, moving, firstData, plan.start.stiction(), null);
            }
            if (best == null || better(moving, best)) {
                best = moving;
            }
            if (atNoise(best, rows(firstData), noiseVariance)) {
                break;
            }
        }
        if (!plan.thinned) {
            return stiction(plan, best, settings, control, tally);
        }
        if (motionOnly) {
            return tally.point(plan.layout, best, plan.motion, plan.start.stiction(), null);
        }
        return refine(plan, best.full(), settings, control, tally);
    }

    /** Sorts starts by their residual sum of squares over the data (one evaluation each, stable). */
    private static void orderByCost(List<double[]> starts, Plan plan, List<StageSamples> data, FitSettings settings) {
        final JointModel model = new JointModel(plan.layout, starts.get(0), data, plan.stiffness,
                plan.start.stiction(), settings.integrationTolerance(), null);
        final double[] target = model.target().toArray();
        final double[] values = new double[target.length];
        final double[] costs = new double[starts.size()];
        final Integer[] order = new Integer[starts.size()];
        for (int k = 0; k < costs.length; k++) {
            order[k] = k;
            try {
                model.evaluate(starts.get(k), values, null);
                double sum = 0;
                for (int i = 0; i < target.length; i++) {
                    sum += (target[i] - values[i]) * (target[i] - values[i]);
                }
                costs[k] = Double.isFinite(sum) ? sum : Double.POSITIVE_INFINITY;
            } catch (RuntimeException e) {
                // a start the model cannot run is tried last, where the stage reports it
                costs[k] = Double.POSITIVE_INFINITY;
            }
        }
        Arrays.sort(order, (a, b) -> Double.compare(costs[a], costs[b]));
        final List<double[]> sorted = new ArrayList<>();
        for (Integer k : order) {
            sorted.add(starts.get(k));
        }
        starts.clear();
        starts.addAll(sorted);
    }

    /**
     * The staged fit of a set with stiction from the point fit of the same set without it: the
     * stages before the stiction rounds do not depend on Ts when the set starts with Ts "as
     * Coulomb" (0), and the set without stiction has run them from every start this set would
     * try but its own optimum; so the rounds start from that optimum.
     *
     * @param base the converged full-stage outcome of {@code terms} without stiction
     * @return the point fit, or null when this set starts with its own Ts (the plain staged fit
     *         is needed)
     */
    static PointFit withStiction(FrictionProblem problem, Set<FrictionTerm> terms, FitSettings settings,
            FitControl control, StageOutcome base) {
        final Plan plan = new Plan(problem, terms);
        if (!terms.contains(FrictionTerm.STICTION) || plan.start.stiction() != 0
                || base.status() != FitStatus.CONVERGED) {
            return null;
        }
        return stiction(plan, base, settings, control, new Tally());
    }

    /** Samples in a stage's data. */
    static int rows(List<StageSamples> data) {
        int n = 0;
        for (StageSamples d : data) {
            n += d.size();
        }
        return n;
    }

    /**
     * The residual sum of squares of a full vector over every sample (one model evaluation).
     *
     * @param stiction holding torque (N·m), 0 meaning "as Coulomb"
     */
    static double cost(FrictionProblem problem, Set<FrictionTerm> terms, double[] full, double stiction,
            FitSettings settings) {
        final Plan plan = new Plan(problem, terms);
        final JointModel model = new JointModel(plan.layout, full, plan.all, plan.stiffness, stiction,
                settings.integrationTolerance(), null);
        final double[] values = new double[model.rows()];
        model.evaluate(full, values, null);
        final double[] target = model.target().toArray();
        double sum = 0;
        for (int i = 0; i < values.length; i++) {
            sum += (target[i] - values[i]) * (target[i] - values[i]);
        }
        return sum;
    }

    /**
     * The cheap first stage (motion, decimated; the full stage when there is nothing to thin)
     * from each of several starts, for a spread of starts around an optimum.
     *
     * @param starts full vectors (SI), used as they are
     * @return the outcome of each start, in order
     */
    static List<StageOutcome> firstStage(FrictionProblem problem, Set<FrictionTerm> terms, FitSettings settings,
            FitControl control, List<double[]> starts) {
        final Plan plan = new Plan(problem, terms);
        final List<StageOutcome> outcomes = new ArrayList<>();
        for (double[] from : starts) {
            outcomes.add(LevenbergStage.run(plan.thinned ? "spread" : "full", plan.layout, from,
                    plan.thinned ? plan.motion : plan.all, plan.stiffness, plan.start.stiction(), settings, control));
        }
        return outcomes;
    }

    /**
     * The full stage (and the stiction rounds) from a given point, as the guard of nested term
     * sets uses it: from the optimum of a subset, with the terms it lacks at exactly zero, the
     * richer set starts at the subset's cost, and the optimiser, which accepts only steps that
     * lower the cost, cannot end above it.
     *
     * @param from full vector (SI); terms outside this set are zeroed, the others kept as they are
     */
    static PointFit refine(FrictionProblem problem, Set<FrictionTerm> terms, FitSettings settings,
            FitControl control, double[] from) {
        return refine(new Plan(problem, terms), withinSet(from, terms), settings, control, new Tally());
    }

    private static PointFit refine(Plan plan, double[] from, FitSettings settings, FitControl control, Tally tally) {
        final StageOutcome held = heldAtBound(plan, from, settings, control, tally);
        final StageOutcome outcome = held != null ? held : tally.add(LevenbergStage.run("full", plan.layout, from,
                plan.all, plan.stiffness, plan.start.stiction(), settings, control));
        return stiction(plan, outcome, settings, control, tally);
    }

    /**
     * A friction term this close to zero, in its scale (the equivalent of a 1 % damping ratio),
     * starts the full stage held at zero: 1e-4 of damping ratio is far below what any record
     * resolves, and where the term is real the optimality condition below fails and the plain
     * stage runs.
     */
    private static final double NEAR_BOUND = 0.01;

    /**
     * The full stage when it starts with friction terms on or next to their zero bound: those
     * terms are held at zero and the others fitted, and the point is kept if it satisfies the bound's optimality
     * condition (Karush–Kuhn–Tucker: the cost rises into the feasible side of every held term,
     * {@code ∂S/∂p ≥ 0}, that is {@code (Jᵀ r)_p ≤ 0} with r the residual and J the model's
     * Jacobian), checked with one evaluation of the whole set's Jacobian there. Such a point is a
     * local optimum of the set, the one the projected Levenberg–Marquardt steps would creep
     * towards one shrinking step at a time; its terms are reported on their bound as any other.
     *
     * @return the outcome with the whole set's Jacobian, or null when no term starts on its bound
     *         or the condition fails (the plain full stage then runs)
     */
    private static StageOutcome heldAtBound(Plan plan, double[] from, FitSettings settings, FitControl control,
            Tally tally) {
        final boolean[] free = plan.layout.freeMask();
        final double[] start = from.clone();
        boolean any = false;
        for (ParameterKind k : DISSIPATIVE_KINDS) {
            final int i = ParameterLayout.index(k);
            if (free[i] && (plan.layout.onBound(i, from[i])
                    || from[i] - plan.layout.lower(i) < NEAR_BOUND * plan.layout.scale(i))) {
                free[i] = false;
                start[i] = plan.layout.lower(i);
                any = true;
            }
        }
        if (!any) {
            return null;
        }
        final StageOutcome inner = tally.add(LevenbergStage.run("full", plan.layout.withFree(free), start, plan.all,
                plan.stiffness, plan.start.stiction(), settings, control));
        if (inner.status() != FitStatus.CONVERGED) {
            return null;
        }
        final JointModel model = new JointModel(plan.layout, inner.full(), plan.all, plan.stiffness,
                plan.start.stiction(), settings.integrationTolerance(), control.cancelled());
        final Pair<RealVector, RealMatrix> value;
        try {
            value = model.value(plan.layout.scaled(inner.full()));
        } catch (FitCancelledException e) {
            return null;
        }
        final double[] residuals = model.target().subtract(value.getFirst()).toArray();
        final RealMatrix jacobian = value.getSecond();
        for (ParameterKind k : DISSIPATIVE_KINDS) {
            final int i = ParameterLayout.index(k);
            if (plan.layout.isFree(i) && !free[i]) {
                final double[] column = jacobian.getColumn(plan.layout.column(i));
                double gradient = 0;
                for (int r = 0; r < residuals.length; r++) {
                    gradient += column[r] * residuals[r];
                }
                if (!(gradient <= 0)) {
                    return null;
                }
            }
        }
        return new StageOutcome(inner.full(), FitStatus.CONVERGED, "converged with a term on its zero bound",
                inner.iterations(), inner.evaluations() + 1, LevenbergStage.sumOfSquares(residuals), residuals,
                jacobian);
    }

    /** Brackets Ts from the stops and refits with Ts at the band's middle, until the band settles. */
    private static PointFit stiction(Plan plan, StageOutcome first, FitSettings settings, FitControl control,
            Tally tally) {
        StageOutcome outcome = first;
        double stiction = plan.start.stiction();
        StictionBand band = null;
        if (plan.terms.contains(FrictionTerm.STICTION)) {
            final FitSettings limited = settings.withLimits(Math.min(settings.maxIterations(), STICTION_ITERATIONS),
                    Math.min(settings.maxEvaluations(), STICTION_EVALUATIONS));
            for (int round = 0; round < STICTION_ROUNDS && outcome.status() != FitStatus.CANCELLED; round++) {
                band = StictionBracket.of(plan.level, outcome.full(), plan.all, settings.integrationTolerance());
                final double next = band.middle();
                if (round > 0 && Math.abs(next - stiction) <= 1e-3 * next) {
                    break;
                }
                stiction = next;
                outcome = tally.add(LevenbergStage.run("stiction", plan.layout, outcome.full(), plan.all,
                        plan.stiffness, stiction, limited, control));
            }
        }
        return tally.point(plan.layout, outcome, plan.all, stiction, band);
    }

    /** Iterations and evaluations over the stages of one point fit. */
    private static final class Tally {
        private int iterations;
        private int evaluations;

        StageOutcome add(StageOutcome o) {
            iterations += o.iterations();
            evaluations += o.evaluations();
            return o;
        }

        PointFit point(ParameterLayout layout, StageOutcome o, List<StageSamples> data, double stiction,
                StictionBand band) {
            return new PointFit(layout, o, data, stiction, band, iterations, evaluations);
        }
    }

    /** The parameters, scales, bounds and data sets of one term set's fit. */
    private static final class Plan {
        final Set<FrictionTerm> terms;
        final MechanismProperties level;
        final double stiffness;
        final double period;
        final FrictionTorques start;
        final double[] initial;
        final ParameterLayout layout;
        final boolean[] lockFree;
        final List<ReleaseSession> sessions;
        final List<StageSamples> all = new ArrayList<>();
        final List<StageSamples> motion = new ArrayList<>();
        final boolean thinned;

        Plan(FrictionProblem problem, Set<FrictionTerm> terms) {
            this.terms = terms;
            final MechanismProperties mechanism = problem.mechanism();
            level = level(mechanism);
            stiffness = mechanism.gravityStiffness();
            final double j = mechanism.pivotInertia();
            final double wn = Math.sqrt(stiffness / j);
            period = 2 * Math.PI / wn;
            sessions = problem.sessions();
            final int count = sessions.size();
            double amplitude = 0;
            for (ReleaseSession s : sessions) {
                amplitude = Math.max(amplitude, Math.abs(s.guess().releaseAngle()));
            }
            start = StartingValues.forTerms(problem.start(), terms, stiffness, j, amplitude);
            final int size = ParameterLayout.PHYSICAL + ParameterLayout.PER_SESSION * count;
            initial = new double[size];
            final double[] scales = new double[size];
            final double[] shifts = new double[size];
            final double[] lower = new double[size];
            Arrays.fill(lower, Double.NEGATIVE_INFINITY);
            final double reference = 2 * REFERENCE_DAMPING * Math.sqrt(stiffness * j);
            final int v = ParameterLayout.index(ParameterKind.VISCOUS);
            final int c = ParameterLayout.index(ParameterKind.COULOMB);
            final int d = ParameterLayout.index(ParameterKind.DRAG);
            final int inertia = ParameterLayout.index(ParameterKind.INERTIA);
            initial[v] = start.viscous();
            initial[c] = start.coulomb();
            initial[d] = start.drag();
            initial[inertia] = j;
            scales[v] = reference;
            scales[c] = reference * Math.PI * wn * amplitude / 4;
            scales[d] = reference * 3 * Math.PI / (8 * wn * amplitude);
            scales[inertia] = j;
            lower[v] = 0;
            lower[c] = 0;
            lower[d] = 0;
            lower[inertia] = mechanism.mass() * mechanism.centroidDistance() * mechanism.centroidDistance();
            final List<String> names = new ArrayList<>();
            lockFree = new boolean[size];
            final boolean[] fullFree = new boolean[size];
            for (int s = 0; s < count; s++) {
                final SessionGuess g = sessions.get(s).guess();
                names.add(sessions.get(s).name());
                initial[ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE)] = g.releaseAngle();
                initial[ParameterLayout.index(s, ParameterKind.RELEASE_TIME)] = g.releaseTime();
                initial[ParameterLayout.index(s, ParameterKind.OFFSET)] = g.offset();
                scales[ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE)] = Math.abs(g.releaseAngle());
                scales[ParameterLayout.index(s, ParameterKind.RELEASE_TIME)] = 1 / wn;
                scales[ParameterLayout.index(s, ParameterKind.OFFSET)] = Math.abs(g.releaseAngle());
                shifts[ParameterLayout.index(s, ParameterKind.RELEASE_TIME)] = g.releaseTime();
                shifts[ParameterLayout.index(s, ParameterKind.OFFSET)] = g.offset();
                for (ParameterKind q : ParameterLayout.NUISANCE) {
                    lockFree[ParameterLayout.index(s, q)] = true;
                    fullFree[ParameterLayout.index(s, q)] = true;
                }
            }
            lockFree[inertia] = problem.inertiaFree();
            fullFree[inertia] = problem.inertiaFree();
            fullFree[v] = terms.contains(FrictionTerm.VISCOUS);
            fullFree[c] = terms.contains(FrictionTerm.COULOMB);
            fullFree[d] = terms.contains(FrictionTerm.DRAG);
            layout = new ParameterLayout(names, scales, shifts, lower, fullFree);
            boolean thin = false;
            for (ReleaseSession s : sessions) {
                all.add(StageSamples.all(s));
                final double[] t = s.timesView();
                final double spacing = (t[t.length - 1] - t[0]) / (t.length - 1);
                final int stride = (int) Math.max(1, Math.floor(period / spacing / MOTION_SAMPLES_PER_PERIOD));
                final double end = RecordSignals.motionEnd(s) + 0.5 * period;
                motion.add(StageSamples.window(s, end, stride));
                thin |= stride > 1 || end < t[t.length - 1];
            }
            thinned = thin;
        }

        /** The first periods after each release, decimated, for the locking stage. */
        List<StageSamples> lockWindow(FitSettings settings) {
            final List<StageSamples> window = new ArrayList<>();
            for (ReleaseSession s : sessions) {
                final double[] t = s.timesView();
                final double spacing = (t[t.length - 1] - t[0]) / (t.length - 1);
                final int stride = (int) Math.max(1, Math.floor(period / spacing / settings.lockSamplesPerPeriod()));
                window.add(StageSamples.window(s, s.guess().releaseTime() + settings.lockCycles() * period, stride));
            }
            return window;
        }
    }

    /**
     * Whether an outcome is better than another: a converged stage beats one that is not, then
     * the lower cost wins.
     */
    static boolean better(StageOutcome a, StageOutcome b) {
        final boolean ca = a.status() == FitStatus.CONVERGED;
        final boolean cb = b.status() == FitStatus.CONVERGED;
        if (ca != cb) {
            return ca;
        }
        return a.rss() < b.rss();
    }

    /**
     * A seed made to fit a term set: its terms kept, the set's terms it lacks started from the
     * analysis' value for this set (never from exactly zero, where the projection onto the bound
     * could keep them), terms outside the set zeroed.
     */
    private static double[] seeded(double[] seed, Set<FrictionTerm> terms, FrictionTorques start) {
        final double[] x = withinSet(seed, terms);
        final double[] given = {start.viscous(), start.coulomb(), start.drag()};
        for (int i = 0; i < DISSIPATIVE.length; i++) {
            final int at = ParameterLayout.index(DISSIPATIVE_KINDS[i]);
            if (terms.contains(DISSIPATIVE[i]) && !(x[at] > 0)) {
                x[at] = 0.5 * given[i];
            }
        }
        return x;
    }

    /** A copy of a full vector with the friction terms outside a set at zero. */
    private static double[] withinSet(double[] full, Set<FrictionTerm> terms) {
        final double[] x = full.clone();
        for (int i = 0; i < DISSIPATIVE.length; i++) {
            if (!terms.contains(DISSIPATIVE[i])) {
                x[ParameterLayout.index(DISSIPATIVE_KINDS[i])] = 0;
            }
        }
        return x;
    }

    /** The mechanism with its equilibrium at the sensor's zero: each session's offset carries it. */
    static MechanismProperties level(MechanismProperties m) {
        return new MechanismProperties(m.mass(), m.centroidDistance(), m.pivotInertia(), 0, m.gravity(),
                m.axisTilt());
    }
}
