package dev.penduline.physics.identify;

import java.util.List;

/**
 * One row of a model comparison.
 *
 * @param terms      the friction terms of the candidate
 * @param parameters number of fitted parameters k (friction, inertia, nuisance, and Ts when bracketed)
 * @param rss        residual sum of squares (rad²)
 * @param rms        root-mean-square residual (rad)
 * @param aic        Akaike's criterion on the effective sample size
 * @param bic        Schwarz's criterion on the effective sample size
 * @param status     how the candidate's fit ended
 * @param supported  whether every term is clear of zero by two standard errors (and Ts above Tc)
 */
public record CandidateScore(List<FrictionTerm> terms, int parameters, double rss, double rms, double aic,
        double bic, FitStatus status, boolean supported) {

    /**
     * Freezes the term list.
     */
    public CandidateScore {
        terms = List.copyOf(terms);
    }

    /**
     * Whether the candidate's fit converged.
     *
     * @return true when converged
     */
    public boolean converged() {
        return status == FitStatus.CONVERGED;
    }
}
