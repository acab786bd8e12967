package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * A record that cannot separate two terms must say so rather than answer confidently.
 */
class IdentifiabilityTest {

    @Test
    void tinyAmplitudeWithViscousAndCoulombFreeWarnsOfCorrelation() {
        // At small amplitude both terms lower the amplitude by nearly the same amount per cycle
        // (Coulomb 4 Tc/K, viscous 2π ζ A: Den Hartog, Mechanical Vibrations; Thomson, Theory of
        // Vibration): one release at 0.02 rad cannot tell them apart.
        final SyntheticRelease truth = SyntheticRelease.of(new FrictionTorques(0.02, 0.002, 0, 0)).withTheta0(0.02)
                .withNoise(2e-4, 41);
        final FrictionProblem problem = FrictionProblem.of(
                SyntheticRelease.ARM.withPivotInertia(Recovered.CALCULATED_INERTIA), List.of(truth.session("tiny")))
                .withTerms(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB))
                .withStart(new FrictionTorques(0.01, 0.004, 0, 0));
        final FrictionFit fit = new FrictionIdentifier(FitSettings.defaults().withResampling(0, 1, false)).fit(problem);
        assertTrue(fit.hasWarning(FitWarning.Kind.STRONG_CORRELATION), fit.warnings().toString());
        assertTrue(fit.warnings().stream().anyMatch(w -> w.message().contains("different amplitudes")),
                fit.warnings().toString());
        assertTrue(Math.abs(fit.correlation().get("b", "Tc")) > 0.95, "ρ(b, Tc) = " + fit.correlation().get("b", "Tc"));
        // and no confident wrong answer: its σ, inflated by the correlation, still covers the truth
        // (an honest σ does so at 2σ in 95 % of records, the normal distribution's coverage; this
        // one lies 0.3 σ from it)
        final ParameterEstimate b = fit.parameter("b").orElseThrow();
        assertTrue(Math.abs(b.value() - 0.02) <= 2 * b.sigma(), b.toString());
    }
}
