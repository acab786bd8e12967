package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Point fits of term sets that know their nested subsets, with the guard that keeps a local
 * minimum from passing for a result.
 *
 * <p>A term set contains each of its subsets (set the extra terms to zero), so its best fit
 * can never be worse than theirs. Each set is therefore started from the analysis' estimates
 * and from the optimum of every subset already fitted, and the best start is kept. The guard:
 * if the set still ends with a larger residual than a subset, it is refitted from that
 * subset's optimum (from where the optimiser, which only accepts steps that lower the cost,
 * cannot end worse); if even that fails, the set's fit is marked {@link FitStatus#FAILED} as
 * an optimiser failure, never reported as a result.
 *
 * <p>One instance serves one comparison. {@link #fitAll} may fit the sets of one depth on
 * several threads: each set needs only the results of its smaller subsets, fitted in an earlier
 * wave, so the results do not depend on the threads or their order.
 */
final class NestedFits {

    /** Relative excess of the residual sum of squares over a subset's that the guard tolerates (rounding). */
    static final double GUARD_TOLERANCE = 1e-6;

    private final FrictionProblem problem;
    private final FitSettings settings;
    private final FitControl control;
    private final List<Set<FrictionTerm>> family;
    private final boolean cheapSubsets;
    private final double noiseVariance;
    private final Map<Set<FrictionTerm>, PointFit> points = new ConcurrentHashMap<>();
    private final Map<Set<FrictionTerm>, Double> costs = new ConcurrentHashMap<>();

    /**
     * @param family the term sets that may serve as subsets (candidates), smaller ones first
     */
    NestedFits(FrictionProblem problem, FitSettings settings, FitControl control, List<Set<FrictionTerm>> family,
            List<NoiseFloor.Estimate> floors) {
        this(problem, settings, control, family, false, floors);
    }

    /**
     * @param family       the term sets that may serve as subsets, smaller ones first
     * @param cheapSubsets fit the subsets of an asked-for set only through the cheap motion
     *                     stage (enough for a seed); the guard then holds the set against every
     *                     sample's residual at each subset's point, one model evaluation each
     */
    NestedFits(FrictionProblem problem, FitSettings settings, FitControl control, List<Set<FrictionTerm>> family,
            boolean cheapSubsets, List<NoiseFloor.Estimate> floors) {
        this.problem = problem;
        this.settings = settings;
        this.control = control;
        this.family = List.copyOf(family);
        this.cheapSubsets = cheapSubsets;
        this.noiseVariance = NoiseFloor.variance(problem.sessions(), floors);
    }

    /**
     * Fits every set of the family in waves by depth (a set's depth is one more than its deepest
     * subset's in the family): the sets of a wave on the common pool's threads when parallel.
     *
     * @param parallel whether a wave may run on several threads
     */
    void fitAll(boolean parallel) {
        final Map<Set<FrictionTerm>, Integer> depth = new HashMap<>();
        int deepest = 0;
        for (Set<FrictionTerm> set : family) {
            int d = 0;
            for (Set<FrictionTerm> smaller : family) {
                if (set.containsAll(smaller) && !set.equals(smaller) && depth.containsKey(smaller)) {
                    d = Math.max(d, depth.get(smaller) + 1);
                }
            }
            depth.put(set, d);
            deepest = Math.max(deepest, d);
        }
        for (int level = 0; level <= deepest; level++) {
            final List<Set<FrictionTerm>> wave = new ArrayList<>();
            for (Set<FrictionTerm> set : family) {
                if (depth.get(set) == level) {
                    wave.add(set);
                }
            }
            if (parallel && wave.size() > 1) {
                wave.parallelStream().forEach(this::point);
            } else {
                wave.forEach(this::point);
            }
        }
    }

    /**
     * The point fit of a term set, fitting its subsets in the family first.
     *
     * @param terms the term set
     * @return the guarded point fit
     */
    PointFit point(Set<FrictionTerm> terms) {
        return point(terms, false);
    }

    private PointFit point(Set<FrictionTerm> terms, boolean asSubset) {
        final PointFit known = points.get(terms);
        if (known != null) {
            return known;
        }
        if (cheapSubsets && !asSubset) {
            // an asked-for set that fits to the noise floor from the analysis' start has no
            // local minimum to escape: no smaller set can fit clearly better
            final PointFit direct = StagedFit.run(problem, terms, settings, control, List.of(), false, noiseVariance);
            if (direct.outcome().status() == FitStatus.CANCELLED
                    || StagedFit.atNoise(direct.outcome(), problem.samples(), noiseVariance)) {
                points.put(EnumSet.copyOf(terms), direct);
                return direct;
            }
        }
        final List<PointFit> subsets = new ArrayList<>();
        final List<Double> subsetCosts = new ArrayList<>();
        final List<Set<FrictionTerm>> subsetSets = new ArrayList<>();
        for (Set<FrictionTerm> s : family) {
            if (terms.containsAll(s) && !terms.equals(s)) {
                subsetSets.add(s);
                subsets.add(point(s, true));
                subsetCosts.add(costs.get(s));
            }
        }
        final List<double[]> seeds = new ArrayList<>();
        for (PointFit p : subsets) {
            if (p.outcome().status() == FitStatus.CONVERGED) {
                seeds.add(p.outcome().full());
            }
        }
        final boolean cheap = cheapSubsets && asSubset;
        PointFit fit = null;
        Set<FrictionTerm> startedFrom = null;
        if (!cheapSubsets && terms.contains(FrictionTerm.STICTION)) {
            // (with cheap subsets the base is only a motion-stage seed, not a full-stage optimum)
            final Set<FrictionTerm> without = EnumSet.copyOf(terms);
            without.remove(FrictionTerm.STICTION);
            final PointFit base = subsets.isEmpty() ? null : points.get(without);
            if (base != null && base.band() == null && !Double.isNaN(costs.getOrDefault(without, Double.NaN))) {
                fit = StagedFit.withStiction(problem, terms, settings, control, base.outcome());
                startedFrom = fit == null ? null : without;
            }
        }
        if (fit == null) {
            fit = StagedFit.run(problem, terms, settings, control, seeds, cheap, noiseVariance);
        }
        final EnumSet<FrictionTerm> key = EnumSet.copyOf(terms);
        if (cheap) {
            points.put(key, fit);
            // a seed only: its cost over every sample is what the richer set is held against
            costs.put(key, fit.outcome().status() == FitStatus.CONVERGED
                    ? StagedFit.cost(problem, terms, fit.outcome().full(), fit.stiction(), settings)
                    : Double.NaN);
            return fit;
        }
        for (int k = 0; k < subsets.size(); k++) {
            if (fit.outcome().status() == FitStatus.CANCELLED) {
                break;
            }
            // a set started from this subset's optimum has had the refit the guard would run
            if (violates(fit, subsetCosts.get(k)) && !subsetSets.get(k).equals(startedFrom)) {
                final PointFit again = StagedFit.refine(problem, terms, settings, control,
                        subsets.get(k).outcome().full());
                if (StagedFit.better(again.outcome(), fit.outcome())) {
                    fit = again;
                }
            }
        }
        for (int k = 0; k < subsets.size(); k++) {
            if (violates(fit, subsetCosts.get(k))) {
                fit = failed(fit, terms, subsetCosts.get(k));
                break;
            }
        }
        points.put(key, fit);
        costs.put(key, fit.outcome().status() == FitStatus.CONVERGED ? fit.outcome().rss() : Double.NaN);
        return fit;
    }

    /** Whether a fit ends worse than a subset's cost over every sample (NaN: the subset failed). */
    private static boolean violates(PointFit fit, double subsetCost) {
        if (Double.isNaN(subsetCost)) {
            return false;
        }
        return !(fit.outcome().rss() <= subsetCost * (1 + GUARD_TOLERANCE));
    }

    private static PointFit failed(PointFit fit, Set<FrictionTerm> terms, double subsetCost) {
        final StageOutcome o = fit.outcome();
        final int n = o.residuals() == null ? 1 : o.residuals().length;
        final String message = String.format(Locale.ROOT, "optimiser failure: the terms %s fit worse (rms %.4g rad)"
                + " than the smaller set they contain (rms %.4g rad), even when started from its optimum",
                terms, Math.sqrt(o.rss() / n), Math.sqrt(subsetCost / n));
        final StageOutcome marked = new StageOutcome(o.full(), FitStatus.FAILED, message, o.iterations(),
                o.evaluations(), o.rss(), o.residuals(), o.jacobian());
        return new PointFit(fit.layout(), marked, fit.data(), fit.stiction(), fit.band(), fit.iterations(),
                fit.evaluations());
    }
}
