package dev.penduline.physics.identify;

import java.util.List;

/**
 * The ranking of candidate term sets, and the selected one fitted with full uncertainties.
 *
 * @param candidates       one row per candidate, in the order fitted
 * @param selected         index of the selected candidate in {@code candidates}
 * @param effectiveSamples n_eff = n (1 − ρ1)/(1 + ρ1) used in the criteria
 * @param lag1             lag-1 autocorrelation ρ1 of the richest candidate's residuals
 * @param samples          number of samples n
 * @param best             the selected candidate's fit, with resampling
 */
public record ModelComparison(List<CandidateScore> candidates, int selected, double effectiveSamples, double lag1,
        int samples, FrictionFit best) {

    /**
     * Freezes the list.
     */
    public ModelComparison {
        candidates = List.copyOf(candidates);
    }

    /**
     * The selected candidate's row.
     *
     * @return the row
     */
    public CandidateScore selectedScore() {
        return candidates.get(selected);
    }

    /**
     * The dominant loss of the selected fit, by its share of the dissipated energy.
     *
     * @return the dominant term
     */
    public FrictionTerm dominantLoss() {
        return best.energy().dominant();
    }
}
