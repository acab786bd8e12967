package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

/**
 * Checks shared by the recovery tests: an estimate against the truth that generated the
 * record (see {@link SyntheticRelease}), within two of its own standard errors and within a
 * relative tolerance.
 */
final class Recovered {

    /** The calculated inertia handed to every fit: 3 % above the truth, so J0 must move. */
    static final double CALCULATED_INERTIA = 0.515;

    private Recovered() {
    }

    /** The truth within 2σ (the larger of the two σ's) and within a relative tolerance. */
    static void within(FrictionFit fit, String name, double truth, double relative) {
        final ParameterEstimate p = fit.parameter(name).orElseThrow(() -> new AssertionError(name + " not fitted"));
        final double sigma = p.sigma();
        assertTrue(sigma > 0, name + ": σ = " + sigma);
        assertTrue(Math.abs(p.value() - truth) <= 2 * sigma,
                name + " = " + p.value() + " ± " + sigma + " misses the truth " + truth + " by more than 2σ");
        assertEquals(truth, p.value(), relative * Math.abs(truth), name + " relative error");
    }

    /** Converged, inertia within 0.5 % of the truth, dominant loss as expected. */
    static void sound(FrictionFit fit, double trueInertia, FrictionTerm dominant) {
        assertEquals(FitStatus.CONVERGED, fit.status(), fit.message());
        assertEquals(trueInertia, fit.inertia().fitted(), 0.005 * trueInertia, "fitted inertia");
        assertEquals(CALCULATED_INERTIA, fit.inertia().calculated(), 0);
        assertNotNull(fit.energy().dominant());
        assertEquals(dominant, fit.energy().dominant(), "dominant loss, shares " + fit.energy());
        assertEquals(1, fit.energy().viscous() + fit.energy().coulomb() + fit.energy().drag(), 1e-12);
    }

    /**
     * The session's nuisance parameters within 3σ of the truth. Three, not two: the recovery
     * tests check some thirty nuisance parameters, and at 2σ one or two would miss by plain
     * chance (4.55 % each, A&S Table 26.1); at 3σ each misses with 0.27 %.
     */
    static void nuisance(SessionEstimate s, SyntheticRelease truth) {
        for (Object[] pair : List.of(new Object[] {s.releaseAngle(), truth.theta0()},
                new Object[] {s.releaseTime(), truth.release()}, new Object[] {s.offset(), truth.offset()})) {
            final ParameterEstimate p = (ParameterEstimate) pair[0];
            final double t = (Double) pair[1];
            assertTrue(Math.abs(p.value() - t) <= 3 * p.sigma(), p.name() + " = " + p.value() + " ± " + p.sigma()
                    + " vs " + t);
        }
    }
}
