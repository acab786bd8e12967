package dev.penduline.physics.identify;

import java.util.List;

/**
 * The point estimate of a staged fit, before uncertainties and verdicts are attached.
 *
 * @param layout      the layout of the final stage (its free parameters)
 * @param outcome     the final stage's outcome
 * @param data        the samples of the final stage
 * @param stiction    the fixed holding torque (N·m), 0 meaning "as Coulomb"
 * @param band        the stiction band, or null when stiction was not fitted
 * @param iterations  iterations over all stages
 * @param evaluations evaluations over all stages
 */
record PointFit(ParameterLayout layout, StageOutcome outcome, List<StageSamples> data, double stiction,
        StictionBand band, int iterations, int evaluations) {
}
