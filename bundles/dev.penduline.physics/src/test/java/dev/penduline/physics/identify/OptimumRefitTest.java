package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * The resampling refits' fast path ({@link OptimumRefit}) reaches the point a full refit
 * reaches. The reference is Hipparchus' Levenberg–Marquardt optimiser (the MINPACK algorithm, a
 * general-purpose implementation that shares nothing with the chord steps), run from the same
 * optimum on the same resampled data with tolerances far tighter than the default.
 */
class OptimumRefitTest {

    private static final Set<FrictionTerm> VC = EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB);

    @Test
    void agreesWithLevenbergMarquardtToAFewHundredthsOfAStandardError() {
        final FrictionProblem problem = problem(new FrictionTorques(0.04, 0.01, 0, 0), VC);
        final FitSettings settings = FitSettings.defaults().withResampling(0, 1, false);
        final PointFit point = StagedFit.run(problem, VC, settings, FitControl.none());
        final StageOutcome o = point.outcome();
        assertEquals(FitStatus.CONVERGED, o.status(), o.message());
        final OptimumRefit chord = OptimumRefit.at(point.layout(), o.full(), o.jacobian(),
                LevenbergStage.sumOfSquares(o.residuals()));
        assertNotNull(chord);
        final double[] sigma = jacobianSigma(point, o);
        final double k = problem.mechanism().gravityStiffness();
        final FitSettings tight = settings.withTolerances(1e-14, 1e-12);
        for (int shift : new int[] {97, 331, 1201, 2503}) {
            final List<StageSamples> data = shifted(point, o, shift);
            // as the bootstrap calls it: the model at the optimum is the readings minus the residuals
            final double[] fast = chord.refit(data, fitted(point, o), k, point.stiction(), settings,
                    FitControl.none(), "test", new double[1]);
            assertNotNull(fast, "the chord steps settle for a residual shift of " + shift);
            // and the same when the refit runs the model at the optimum itself
            final double[] run = chord.refit(data, null, k, point.stiction(), settings, FitControl.none(), "test",
                    new double[1]);
            assertNotNull(run);
            final StageOutcome full = LevenbergStage.run("reference", point.layout(), o.full(), data, k,
                    point.stiction(), tight, FitControl.none());
            assertEquals(FitStatus.CONVERGED, full.status(), full.message());
            boolean moved = false;
            for (int c = 0; c < point.layout().freeCount(); c++) {
                final int i = point.layout().fullIndex(c);
                // the refit moves each parameter by about one σ; the two must agree to 5 % of it
                assertEquals(full.full()[i], fast[i], 0.05 * sigma[c],
                        point.layout().name(i) + " after a shift of " + shift);
                assertEquals(run[i], fast[i], 1e-6 * sigma[c], point.layout().name(i) + ": given or run at the optimum");
                moved |= Math.abs(fast[i] - o.full()[i]) > 0.1 * sigma[c];
            }
            assertTrue(moved, "the resampled data moved the estimate (shift " + shift + ")");
        }
    }

    @Test
    void leavesARefitThatReachesABoundToTheFullRefit() {
        // drag is absent from the truth: its optimum is on or near zero, and a resampled
        // record's Gauss–Newton step pushes it below zero about half the time
        final Set<FrictionTerm> vcd = EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB, FrictionTerm.DRAG);
        final FrictionProblem problem = problem(new FrictionTorques(0.04, 0.01, 0, 0), vcd);
        final FitSettings settings = FitSettings.defaults().withResampling(0, 1, false);
        final PointFit point = StagedFit.run(problem, vcd, settings, FitControl.none());
        final StageOutcome o = point.outcome();
        assertEquals(FitStatus.CONVERGED, o.status(), o.message());
        final OptimumRefit chord = OptimumRefit.at(point.layout(), o.full(), o.jacobian(),
                LevenbergStage.sumOfSquares(o.residuals()));
        assertNotNull(chord);
        final int drag = ParameterLayout.index(ParameterKind.DRAG);
        int handedOver = 0;
        for (int shift = 101; shift < 101 + 12 * 397; shift += 397) {
            final double[] fast = chord.refit(shifted(point, o, shift), fitted(point, o),
                    problem.mechanism().gravityStiffness(), point.stiction(), settings, FitControl.none(), "test",
                    new double[1]);
            if (fast == null) {
                handedOver++;
            } else {
                assertTrue(fast[drag] >= 0, "a fast refit never stands for a point outside the bounds: " + fast[drag]);
            }
        }
        assertTrue(handedOver > 0, "some refits reach the bound and go to the full refit");
    }

    private static FrictionProblem problem(FrictionTorques truth, Set<FrictionTerm> terms) {
        final SyntheticRelease large = SyntheticRelease.of(truth).withTheta0(0.5).withDuration(8, 200)
                .withNoise(2e-3, 41);
        final SyntheticRelease small = SyntheticRelease.of(truth).withTheta0(0.15).withDuration(8, 200)
                .withNoise(2e-3, 42);
        return FrictionProblem.of(SyntheticRelease.ARM.withPivotInertia(Recovered.CALCULATED_INERTIA),
                List.of(large.session("large"), small.session("small"))).withTerms(terms)
                .withStart(new FrictionTorques(0.03, 0.02, 0, 0.001));
    }

    /** The fitted trajectory plus the residuals moved cyclically by a shift: a resampled record. */
    private static List<StageSamples> shifted(PointFit point, StageOutcome o, int shift) {
        final List<StageSamples> out = new ArrayList<>();
        int from = 0;
        for (StageSamples d : point.data()) {
            final int n = d.size();
            final double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                y[i] = d.angles()[i] - o.residuals()[from + i] + o.residuals()[from + (i + shift) % n];
            }
            out.add(d.withAngles(y));
            from += n;
        }
        return out;
    }

    /** The model at the optimum: each session's readings minus its residuals, concatenated. */
    private static double[] fitted(PointFit point, StageOutcome o) {
        final double[] f = new double[o.residuals().length];
        int from = 0;
        for (StageSamples d : point.data()) {
            for (int i = 0; i < d.size(); i++) {
                f[from + i] = d.angles()[i] - o.residuals()[from + i];
            }
            from += d.size();
        }
        return f;
    }

    /** σ of each free column from the Jacobian, in the units of the full vector. */
    private static double[] jacobianSigma(PointFit point, StageOutcome o) {
        final RealMatrix j = o.jacobian();
        final RealMatrix inverse = new QRDecomposition(
                j.transpose().multiply(j)).getSolver().getInverse();
        final int n = j.getRowDimension();
        final int p = j.getColumnDimension();
        final double variance = LevenbergStage.sumOfSquares(o.residuals()) / (n - p);
        final double[] sigma = new double[p];
        for (int c = 0; c < p; c++) {
            sigma[c] = Math.sqrt(variance * inverse.getEntry(c, c)) * point.layout().scale(point.layout().fullIndex(c));
        }
        return sigma;
    }
}
