package dev.penduline.physics.identify;

import dev.penduline.physics.InvalidValueException;

/**
 * The numerical settings of a fit, all plain values so that they can be stored beside the
 * result. Start from {@link #defaults()} and change what you need with the {@code withX}
 * copies.
 *
 * @param maxIterations        Levenberg–Marquardt iterations allowed per stage, ≥ 1
 * @param maxEvaluations       model evaluations allowed per stage, ≥ 1
 * @param costTolerance        relative change of the residual sum of squares at which the
 *                             optimiser stops, in (0, 1e-2]
 * @param parameterTolerance   relative (scaled) step length at which the optimiser stops, in (0, 1e-2]
 * @param integrationTolerance relative tolerance of the trajectory integration, in [1e-13, 1e-5]
 * @param lockCycles           length of the first, locking stage in calculated periods after
 *                             the release (0 skips the stage)
 * @param lockSamplesPerPeriod samples per period kept in the locking stage (decimation), ≥ 8
 * @param resamples            block-bootstrap refits for the resampling uncertainty (0 skips), ≥ 0
 * @param seed                 seed of the resampling, for reproducible results
 * @param parallel             whether the resampling refits may run on several threads (the
 *                             result does not depend on it)
 * @param correlationLimit     |correlation| above which a warning is raised, in (0, 1)
 * @param inertiaLimitPercent  fitted-versus-calculated inertia difference above which a
 *                             warning is raised (%), &gt; 0
 * @param verdictMargin        lead in energy share (a fraction, 0.15 = 15 percentage points) one loss
 *                             needs over the next to be called dominant, in [0, 1)
 * @param misfitRatio          residual rms over noise floor above which the model is said not to
 *                             describe a record, &gt; 1
 */
public record FitSettings(int maxIterations, int maxEvaluations, double costTolerance,
        double parameterTolerance, double integrationTolerance, double lockCycles,
        int lockSamplesPerPeriod, int resamples, long seed, boolean parallel, double correlationLimit,
        double inertiaLimitPercent, double verdictMargin, double misfitRatio) {

    private static final FitSettings DEFAULTS = new FitSettings(100, 200, 1e-9, 1e-8, 1e-9, 3, 40, 40,
            0x5EED_1DL, true, 0.95, 5, 0.15, 2);

    /**
     * Checks every setting.
     *
     * @throws IllegalArgumentException naming the offending setting and value
     */
    public FitSettings {
        require(maxIterations >= 1, "maxIterations", maxIterations, "≥ 1");
        require(maxEvaluations >= 1, "maxEvaluations", maxEvaluations, "≥ 1");
        require(costTolerance > 0 && costTolerance <= 1e-2, "costTolerance", costTolerance, "in (0, 1e-2]");
        require(parameterTolerance > 0 && parameterTolerance <= 1e-2, "parameterTolerance", parameterTolerance,
                "in (0, 1e-2]");
        require(integrationTolerance >= 1e-13 && integrationTolerance <= 1e-5, "integrationTolerance",
                integrationTolerance, "in [1e-13, 1e-5]");
        require(lockCycles >= 0 && lockCycles <= 1e3, "lockCycles", lockCycles, "in [0, 1000]");
        require(lockSamplesPerPeriod >= 8, "lockSamplesPerPeriod", lockSamplesPerPeriod, "≥ 8");
        require(resamples >= 0 && resamples <= 10_000, "resamples", resamples, "in [0, 10000]");
        require(correlationLimit > 0 && correlationLimit < 1, "correlationLimit", correlationLimit, "in (0, 1)");
        require(inertiaLimitPercent > 0 && Double.isFinite(inertiaLimitPercent), "inertiaLimitPercent",
                inertiaLimitPercent, "> 0");
        require(verdictMargin >= 0 && verdictMargin < 1, "verdictMargin", verdictMargin, "in [0, 1)");
        require(misfitRatio > 1 && Double.isFinite(misfitRatio), "misfitRatio", misfitRatio, "> 1");
    }

    private static void require(boolean ok, String name, double value, String range) {
        if (!ok) {
            throw new InvalidValueException(name + " must be " + range + ", got " + value);
        }
    }

    /**
     * The defaults: 100 iterations and 200 evaluations per stage, cost tolerance 1e-9,
     * parameter tolerance 1e-8, integration tolerance 1e-9, a locking stage of 3 periods at 40
     * samples per period, 40 seeded resamples in parallel, warnings above |ρ| = 0.95 and 5 %
     * inertia difference, a dominant loss only with a lead of 15 percentage points, and a
     * misfit above twice the noise floor.
     *
     * @return the default settings
     */
    public static FitSettings defaults() {
        return DEFAULTS;
    }

    /**
     * Returns a copy with other limits.
     *
     * @param iterations  iterations per stage
     * @param evaluations evaluations per stage
     * @return the copy
     */
    public FitSettings withLimits(int iterations, int evaluations) {
        return new FitSettings(iterations, evaluations, costTolerance, parameterTolerance, integrationTolerance,
                lockCycles, lockSamplesPerPeriod, resamples, seed, parallel, correlationLimit, inertiaLimitPercent, verdictMargin,
                misfitRatio);
    }

    /**
     * Returns a copy with other optimiser tolerances.
     *
     * @param cost      relative cost tolerance
     * @param parameter relative parameter tolerance
     * @return the copy
     */
    public FitSettings withTolerances(double cost, double parameter) {
        return new FitSettings(maxIterations, maxEvaluations, cost, parameter, integrationTolerance,
                lockCycles, lockSamplesPerPeriod, resamples, seed, parallel, correlationLimit, inertiaLimitPercent, verdictMargin,
                misfitRatio);
    }

    /**
     * Returns a copy with another integration tolerance.
     *
     * @param relative relative tolerance of the trajectory integration
     * @return the copy
     */
    public FitSettings withIntegrationTolerance(double relative) {
        return new FitSettings(maxIterations, maxEvaluations, costTolerance, parameterTolerance, relative,
                lockCycles, lockSamplesPerPeriod, resamples, seed, parallel, correlationLimit, inertiaLimitPercent, verdictMargin,
                misfitRatio);
    }

    /**
     * Returns a copy with another locking stage.
     *
     * @param cycles           periods after release, 0 to skip the stage
     * @param samplesPerPeriod decimation target (samples per period)
     * @return the copy
     */
    public FitSettings withLockStage(double cycles, int samplesPerPeriod) {
        return new FitSettings(maxIterations, maxEvaluations, costTolerance, parameterTolerance,
                integrationTolerance, cycles, samplesPerPeriod, resamples, seed, parallel, correlationLimit,
                inertiaLimitPercent, verdictMargin, misfitRatio);
    }

    /**
     * Returns a copy with another resampling.
     *
     * @param count       number of block-bootstrap refits, 0 to skip
     * @param randomSeed  seed of the resampling
     * @param multithread whether to run refits in parallel
     * @return the copy
     */
    public FitSettings withResampling(int count, long randomSeed, boolean multithread) {
        return new FitSettings(maxIterations, maxEvaluations, costTolerance, parameterTolerance,
                integrationTolerance, lockCycles, lockSamplesPerPeriod, count, randomSeed, multithread,
                correlationLimit, inertiaLimitPercent, verdictMargin,
                misfitRatio);
    }

    /**
     * Returns a copy with other warning thresholds.
     *
     * @param correlation    |correlation| limit
     * @param inertiaPercent inertia difference limit (%)
     * @return the copy
     */
    public FitSettings withWarningLimits(double correlation, double inertiaPercent) {
        return new FitSettings(maxIterations, maxEvaluations, costTolerance, parameterTolerance,
                integrationTolerance, lockCycles, lockSamplesPerPeriod, resamples, seed, parallel, correlation,
                inertiaPercent, verdictMargin, misfitRatio);
    }

    /**
     * Returns a copy with other verdict rules.
     *
     * @param margin lead in energy share needed to name one loss dominant (fraction), in [0, 1)
     * @param misfit residual rms over noise floor above which the model does not describe a record, &gt; 1
     * @return the copy
     */
    public FitSettings withVerdictRules(double margin, double misfit) {
        return new FitSettings(maxIterations, maxEvaluations, costTolerance, parameterTolerance,
                integrationTolerance, lockCycles, lockSamplesPerPeriod, resamples, seed, parallel, correlationLimit,
                inertiaLimitPercent, margin, misfit);
    }
}
