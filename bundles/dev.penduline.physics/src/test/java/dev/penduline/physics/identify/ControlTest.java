package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * Fits end, always: limits and cancellation give the documented status with diagnostics, and
 * bad input is refused with the field named. The converged reference for comparison is the
 * recovery of the generating parameters of a synthesised record (see {@link SyntheticRelease}).
 */
class ControlTest {

    private static FrictionProblem problem() {
        final SyntheticRelease truth = SyntheticRelease.of(new FrictionTorques(0.03, 0.01, 0, 0)).withNoise(1e-3, 51);
        return FrictionProblem.of(SyntheticRelease.ARM.withPivotInertia(Recovered.CALCULATED_INERTIA),
                List.of(truth.session("a"))).withStart(new FrictionTorques(0.01, 0.03, 0, 0));
    }

    @Test
    void iterationLimitGivesStatusAndWhereItStopped() {
        final FrictionFit fit = new FrictionIdentifier(FitSettings.defaults().withLimits(1, 100)
                .withResampling(0, 1, false)).fit(problem());
        assertEquals(FitStatus.MAX_ITERATIONS, fit.status(), fit.message());
        assertFalse(fit.converged());
        assertTrue(fit.hasWarning(FitWarning.Kind.NOT_CONVERGED));
        assertTrue(fit.evaluations() > 0 && fit.iterations() > 0);
        assertTrue(Double.isFinite(fit.rms()) && fit.rms() > 0);
        assertTrue(fit.message().contains("iteration limit 1"), fit.message());
    }

    @Test
    void evaluationLimitGivesStatus() {
        final FrictionFit fit = new FrictionIdentifier(FitSettings.defaults().withLimits(100, 2)
                .withResampling(0, 1, false)).fit(problem());
        assertEquals(FitStatus.MAX_EVALUATIONS, fit.status(), fit.message());
    }

    @Test
    void cancellationStopsAtOnceWithStatus() {
        final AtomicInteger asked = new AtomicInteger();
        final AtomicInteger evaluations = new AtomicInteger();
        final FitControl control = new FitControl(() -> asked.incrementAndGet() > 50,
                (stage, count, rms) -> evaluations.incrementAndGet());
        final FrictionFit fit = new FrictionIdentifier().fit(problem(), control);
        assertEquals(FitStatus.CANCELLED, fit.status());
        assertTrue(evaluations.get() < 10, evaluations.get() + " evaluations after cancelling");
    }

    @Test
    void cancellationDuringModelComparisonEndsEveryCandidate() {
        final AtomicInteger asked = new AtomicInteger();
        final ModelComparison c = new FrictionIdentifier().compare(problem(),
                FitControl.cancelledWhen(() -> asked.incrementAndGet() > 20));
        for (CandidateScore s : c.candidates()) {
            assertEquals(FitStatus.CANCELLED, s.status(), s.toString());
        }
    }

    @Test
    void resamplingIsReproducibleWhateverTheThreads() {
        // each replicate draws from its own seeded generator (Künsch 1989 block bootstrap):
        // parallel and sequential runs must agree to the last bit
        final FitSettings settings = FitSettings.defaults().withResampling(8, 99, true);
        final FrictionFit parallel = new FrictionIdentifier(settings).fit(problem());
        final FrictionFit sequential = new FrictionIdentifier(settings.withResampling(8, 99, false)).fit(problem());
        assertEquals(8, parallel.resamplesUsed());
        assertEquals(parallel.parameter("b").orElseThrow().sigmaResampling(),
                sequential.parameter("b").orElseThrow().sigmaResampling(), 0);
        assertTrue(parallel.parameter("b").orElseThrow().sigmaResampling() > 0);
    }

    @Test
    void comparisonIsTheSameWhateverTheThreads() {
        // the candidate sets of one depth are fitted side by side; each needs only its smaller
        // subsets' results, so a parallel and a sequential comparison agree to the last bit
        final FitSettings sequential = FitSettings.defaults().withResampling(0, 1, false);
        final ModelComparison one = new FrictionIdentifier(sequential).compare(problem());
        final ModelComparison two = new FrictionIdentifier(sequential.withResampling(0, 1, true)).compare(problem());
        assertEquals(one.selected(), two.selected());
        assertEquals(one.candidates().size(), two.candidates().size());
        for (int i = 0; i < one.candidates().size(); i++) {
            assertEquals(one.candidates().get(i).rss(), two.candidates().get(i).rss(),
                    0, one.candidates().get(i).toString());
        }
        assertTrue(one.candidates().size() >= 5);
    }

    @Test
    void badInputIsRefusedNamingTheField() {
        final double[] t = {0, 1, 2, 2, 4, 5, 6, 7, 8, 9};
        final double[] y = new double[10];
        final SessionGuess guess = new SessionGuess(0.3, 0.5, 0);
        final IllegalArgumentException times = assertThrows(IllegalArgumentException.class,
                () -> new ReleaseSession("rec.csv", t, y, guess));
        assertTrue(times.getMessage().contains("rec.csv") && times.getMessage().contains("times[3]"),
                times.getMessage());
        final IllegalArgumentException angle = assertThrows(IllegalArgumentException.class,
                () -> new SessionGuess(0, 0.5, 0));
        assertTrue(angle.getMessage().contains("releaseAngle"), angle.getMessage());
        final IllegalArgumentException limit = assertThrows(IllegalArgumentException.class,
                () -> FitSettings.defaults().withLimits(0, 10));
        assertTrue(limit.getMessage().contains("maxIterations"), limit.getMessage());
        final IllegalArgumentException terms = assertThrows(IllegalArgumentException.class,
                () -> problem().withTerms(EnumSet.noneOf(FrictionTerm.class)));
        assertTrue(terms.getMessage().contains("friction term"), terms.getMessage());
    }
}
