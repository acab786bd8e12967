package dev.penduline.physics.identify;

import java.util.List;

import org.hipparchus.exception.LocalizedCoreFormats;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.ConvergenceChecker;
import org.hipparchus.optim.LocalizedOptimFormats;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer.Optimum;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem.Evaluation;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.MultivariateJacobianFunction;
import org.hipparchus.util.Pair;
import org.hipparchus.util.Precision;

/**
 * Runs one Levenberg–Marquardt stage on a {@link JointModel} and turns every way it can end
 * (convergence, a limit, cancellation, a failing model) into a {@link StageOutcome}: a fit
 * never hangs and never ends in an unexplained exception.
 *
 * <p>Convergence: Hipparchus' own tests on the relative cost reduction and the scaled step
 * (MINPACK's ftol and xtol), plus an RMS checker that stops once a successful iteration
 * changes the RMS residual by less than 1e-7 of itself: a change that small moves every
 * parameter by a few hundredths of its standard error, far below what matters.
 */
final class LevenbergStage {

    private static final double RMS_RELATIVE = 1e-7;

    private LevenbergStage() {
    }

    /**
     * Fits the free parameters of a layout.
     *
     * @param stage     name reported to the monitor
     * @param layout    which parameters are free, their scales and bounds
     * @param base      starting full vector (SI)
     * @param data      the samples of each session in this stage
     * @param stiffness gravity stiffness K (N·m/rad)
     * @param stiction  holding torque at rest (N·m), 0 meaning "as Coulomb"
     * @param settings  limits and tolerances
     * @param control   cancellation and progress
     * @return the outcome, whatever happened
     */
    static StageOutcome run(String stage, ParameterLayout layout, double[] base, List<StageSamples> data,
            double stiffness, double stiction, FitSettings settings, FitControl control) {
        final JointModel model = new JointModel(layout, base, data, stiffness, stiction,
                settings.integrationTolerance(), control.cancelled());
        final int rows = model.rows();
        // many more samples than parameters (always, in practice): the optimiser works on the
        // reduced problem of p + 1 rows, the same steps at a fraction of the cost
        final ReducedProblem reduced = rows > layout.freeCount() + 1 ? new ReducedProblem(model) : null;
        final MultivariateJacobianFunction reporting = point -> {
            final Pair<RealVector, RealMatrix> value = reduced != null ? reduced.value(point) : model.value(point);
            control.monitor().evaluated(stage, model.evaluations(), Math.sqrt(model.bestCost() / rows));
            return value;
        };
        double amplitude = 0;
        for (int s = 0; s < layout.sessions(); s++) {
            amplitude = Math.max(amplitude, Math.abs(base[ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE)]));
        }
        // Hipparchus' problem hands out fresh counters, so the stage counts for itself: the
        // checker is asked once per successful iteration, the model once per evaluation
        final int[] iterations = {0};
        // the RMS over the samples (the reduced problem's own RMS divides by p + 1 rows)
        final double absolute = 1e-12 * amplitude;
        final ConvergenceChecker<Evaluation> checker = (iteration, previous, current) -> {
            iterations[0] = iteration;
            final double before = rms(previous.getCost(), rows);
            final double now = rms(current.getCost(), rows);
            return Precision.equals(before, now, absolute) || Precision.equalsWithRelativeTolerance(before, now, RMS_RELATIVE);
        };
        final LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(layout.scaled(base))
                .model(reporting)
                .target(reduced != null ? reduced.target() : model.target())
                .parameterValidator(layout.validator())
                .checker(checker)
                .maxIterations(settings.maxIterations())
                .maxEvaluations(settings.maxEvaluations())
                .lazyEvaluation(false)
                .build();
        final LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(settings.costTolerance())
                .withParameterRelativeTolerance(settings.parameterTolerance());
        try {
            final Optimum optimum = optimizer.optimize(problem);
            if (reduced != null) {
                final double[] residuals = reduced.residualsAt(optimum.getPoint());
                if (residuals == null) {
                    // not the lowest-cost point evaluated (it always is): evaluate it in full
                    return stopped(model, layout, layout.expand(optimum.getPoint(), base), FitStatus.CONVERGED,
                            "converged", optimum.getIterations());
                }
                return new StageOutcome(layout.expand(optimum.getPoint(), base), FitStatus.CONVERGED, "converged",
                        optimum.getIterations(), optimum.getEvaluations(), sumOfSquares(residuals), residuals,
                        reduced.jacobianAt(optimum.getPoint()));
            }
            final double[] full = layout.expand(optimum.getPoint(), base);
            final double[] residuals = optimum.getResiduals().toArray();
            return new StageOutcome(full, FitStatus.CONVERGED, "converged", optimum.getIterations(),
                    optimum.getEvaluations(), sumOfSquares(residuals), residuals, optimum.getJacobian());
        } catch (FitCancelledException e) {
            return stopped(model, layout, base, FitStatus.CANCELLED, "cancelled by the caller", iterations[0]);
        } catch (MathIllegalStateException e) {
            if (e.getSpecifier() == LocalizedCoreFormats.MAX_COUNT_EXCEEDED) {
                final boolean evaluations = model.evaluations() >= settings.maxEvaluations();
                return stopped(model, layout, base,
                        evaluations ? FitStatus.MAX_EVALUATIONS : FitStatus.MAX_ITERATIONS,
                        (evaluations ? "evaluation limit " + settings.maxEvaluations()
                                : "iteration limit " + settings.maxIterations()) + " reached in stage " + stage,
                        evaluations ? iterations[0] : settings.maxIterations());
            }
            if (e.getSpecifier() == LocalizedOptimFormats.TOO_SMALL_COST_RELATIVE_TOLERANCE
                    || e.getSpecifier() == LocalizedOptimFormats.TOO_SMALL_PARAMETERS_RELATIVE_TOLERANCE
                    || e.getSpecifier() == LocalizedOptimFormats.TOO_SMALL_ORTHOGONALITY_TOLERANCE) {
                // the tolerances are below what rounding allows: the point is as good as this
                // arithmetic gets, which is convergence for our purpose
                return stopped(model, layout, base, FitStatus.CONVERGED, e.getMessage(), iterations[0]);
            }
            return stopped(model, layout, base, FitStatus.FAILED, "stage " + stage + " failed: " + e.getMessage(),
                    iterations[0]);
        } catch (MathRuntimeException | IllegalStateException | IllegalArgumentException e) {
            return stopped(model, layout, base, FitStatus.FAILED,
                    "stage " + stage + " failed: " + e.getMessage(), iterations[0]);
        }
    }

    /** The outcome at the best point seen, evaluated once more for its residuals and Jacobian. */
    private static StageOutcome stopped(JointModel model, ParameterLayout layout, double[] base, FitStatus status,
            String message, int iterations) {
        final double[] full = model.bestFull() == null ? base.clone() : model.bestFull();
        final int evaluations = model.evaluations();
        if (status == FitStatus.CANCELLED) {
            return new StageOutcome(full, status, message, iterations, evaluations, model.bestCost(), null, null);
        }
        try {
            final Pair<RealVector, RealMatrix> value = model.value(layout.scaled(full));
            final double[] residuals = model.target().subtract(value.getFirst()).toArray();
            return new StageOutcome(full, status, message, iterations, evaluations, sumOfSquares(residuals),
                    residuals, value.getSecond());
        } catch (FitCancelledException e) {
            return new StageOutcome(full, FitStatus.CANCELLED, "cancelled by the caller", iterations, evaluations,
                    model.bestCost(), null, null);
        } catch (MathRuntimeException | IllegalStateException | IllegalArgumentException e) {
            return new StageOutcome(full, FitStatus.FAILED, message + "; " + e.getMessage(), iterations,
                    evaluations, model.bestCost(), null, null);
        }
    }

    /** The RMS residual over the samples from a cost (the residuals' norm), as Hipparchus writes it. */
    private static double rms(double cost, int rows) {
        return Math.sqrt(cost * cost / rows);
    }

    static double sumOfSquares(double[] r) {
        double sum = 0;
        for (double v : r) {
            sum += v * v;
        }
        return sum;
    }
}
