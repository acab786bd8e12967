package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * Model comparison: fit candidate term sets and pick the one the records support.
 *
 * <p>Criteria on a Gaussian likelihood: {@code AIC = n_eff ln(RSS/n) + 2k} (Akaike, "A new look
 * at the statistical model identification", IEEE Trans. Automatic Control 19, 1974) and
 * {@code BIC = n_eff ln(RSS/n) + k ln(n_eff)} (Schwarz, "Estimating the dimension of a model",
 * Annals of Statistics 6, 1978). Residuals of swing records are autocorrelated, and counting
 * n correlated samples as independent makes every extra term look significant. The criteria
 * therefore use the effective sample size of an AR(1) process,
 * {@code n_eff = n (1 − ρ1)/(1 + ρ1)} (Bayley &amp; Hammersley, "The effective number of
 * independent observations in an autocorrelated time series", JRSS Suppl. 8, 1946, from memory),
 * with ρ1 from the residuals of the richest candidate (the one least likely to leave model
 * error in its residuals).
 *
 * <p>Selection: the lowest BIC (the more conservative criterion) among the supported candidates,
 * those whose every friction term is at least two standard errors from zero (the larger of
 * the two σ's) and, with stiction, whose band lies above Tc. A term on its bound or
 * indistinguishable from zero is therefore never selected, whatever its criteria.
 */
final class TermSelection {

    private TermSelection() {
    }

    static List<Set<FrictionTerm>> candidates(boolean withStiction) {
        final List<Set<FrictionTerm>> sets = new ArrayList<>();
        sets.add(EnumSet.of(FrictionTerm.VISCOUS));
        sets.add(EnumSet.of(FrictionTerm.COULOMB));
        sets.add(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB));
        sets.add(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.DRAG));
        sets.add(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB, FrictionTerm.DRAG));
        if (withStiction) {
            for (Set<FrictionTerm> s : List.copyOf(sets)) {
                if (s.contains(FrictionTerm.COULOMB)) {
                    final Set<FrictionTerm> t = EnumSet.copyOf(s);
                    t.add(FrictionTerm.STICTION);
                    sets.add(t);
                }
            }
        }
        return sets;
    }

    static ModelComparison compare(FrictionProblem problem, FitSettings settings, FitControl control) {
        final double period = problem.mechanism().smallAnglePeriod();
        boolean stops = false;
        for (ReleaseSession s : problem.sessions()) {
            stops |= RecordSignals.showsStop(s, period);
        }
        final List<Set<FrictionTerm>> sets = candidates(stops);
        final FitSettings quick = settings.withResampling(0, settings.seed(), settings.parallel());
        final List<NoiseFloor.Estimate> floors = NoiseFloor.of(problem.sessions());
        final NestedFits nested = new NestedFits(problem, quick, control, sets, floors);
        nested.fitAll(settings.parallel());
        final List<FrictionFit> fits = new ArrayList<>();
        for (Set<FrictionTerm> terms : sets) {
            fits.add(FitReport.build(problem, terms, nested.point(terms), null, 0, quick));
        }
        int richest = 0;
        for (int i = 0; i < sets.size(); i++) {
            if (sets.get(i).size() >= sets.get(richest).size() && fits.get(i).converged()) {
                richest = i;
            }
        }
        final double rho = Math.max(0, Math.min(0.99, fits.get(richest).residualLag1()));
        final int n = problem.samples();
        final double effective = n * (1 - rho) / (1 + rho);
        final List<CandidateScore> scores = new ArrayList<>();
        int best = -1;
        int fallback = 0;
        for (int i = 0; i < sets.size(); i++) {
            final FrictionFit f = fits.get(i);
            final int k = f.freeParameters() + (sets.get(i).contains(FrictionTerm.STICTION) ? 1 : 0);
            final double fitTerm = effective * Math.log(f.residualSumOfSquares() / n);
            final double aic = fitTerm + 2 * k;
            final double bic = fitTerm + k * Math.log(effective);
            final boolean supported = f.converged() && supported(f);
            scores.add(new CandidateScore(List.copyOf(sets.get(i)), k, f.residualSumOfSquares(), f.rms(), aic, bic,
                    f.status(), supported));
            if (scores.get(fallback).bic() > bic || !scores.get(fallback).converged() && f.converged()) {
                fallback = i;
            }
            if (supported && (best < 0 || bic < scores.get(best).bic())) {
                best = i;
            }
        }
        final int selected = best >= 0 ? best : fallback;
        final FrictionFit chosen = FrictionIdentifier.finish(problem, sets.get(selected),
                nested.point(sets.get(selected)), settings, control, floors);
        return new ModelComparison(scores, selected, effective, rho, n, chosen);
    }

    /** Every friction term clear of zero by two standard errors; stiction above Coulomb. */
    private static boolean supported(FrictionFit f) {
        for (ParameterEstimate p : f.parameters()) {
            if (p.name().equals(ParameterKind.INERTIA.symbol())) {
                continue;
            }
            if (p.name().equals(FrictionTerm.STICTION.symbol())) {
                final double tc = f.friction().coulomb();
                if (f.stiction() == null || !(f.stiction().lower() > tc * (1 + 1e-6))) {
                    return false;
                }
                continue;
            }
            if (p.onBound() || !(p.value() > 2 * p.sigma())) {
                return false;
            }
        }
        return true;
    }
}
