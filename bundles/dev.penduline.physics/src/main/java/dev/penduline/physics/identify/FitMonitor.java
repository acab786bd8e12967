package dev.penduline.physics.identify;

/**
 * Receives progress while a fit runs: called after every model evaluation, from the fitting
 * thread (or from a pool thread during resampling), so implementations must be quick and
 * thread-safe.
 */
@FunctionalInterface
public interface FitMonitor {

    /**
     * Reports one evaluation.
     *
     * @param stage       what is running ("lock", "full", "stiction", "resample 7", a candidate's terms)
     * @param evaluations evaluations so far in that stage
     * @param rms         lowest root-mean-square residual reached so far in that stage (rad)
     */
    void evaluated(String stage, int evaluations, double rms);
}
