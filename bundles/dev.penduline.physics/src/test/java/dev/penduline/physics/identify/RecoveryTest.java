package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * Recovery of known parameters from synthesised records. Truth = the generating parameters of
 * a record synthesised by our simulator, whose accuracy is established against closed forms
 * (Den Hartog's Coulomb decay, the linear viscous decay, the elliptic-integral period) in the
 * dev.penduline.physics.motion tests. Every fit starts from a calculated inertia 3 % off and
 * from starting values well away from the truth.
 */
class RecoveryTest {

    private static final double J = SyntheticRelease.ARM.pivotInertia();
    private static final FitSettings QUICK = FitSettings.defaults().withResampling(0, 1, false);

    private static FrictionFit fit(Set<FrictionTerm> terms, FrictionTorques start, FitSettings settings,
            ReleaseSession... sessions) {
        final FrictionProblem problem = FrictionProblem.of(SyntheticRelease.ARM.withPivotInertia(
                Recovered.CALCULATED_INERTIA), List.of(sessions)).withTerms(terms).withStart(start);
        return new FrictionIdentifier(settings).fit(problem);
    }

    @Test
    void pureViscous() {
        final SyntheticRelease truth = SyntheticRelease.of(FrictionTorques.viscousOnly(0.04)).withNoise(5e-4, 11);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.VISCOUS), FrictionTorques.viscousOnly(0.06), QUICK,
                truth.session("v"));
        Recovered.sound(fit, J, FrictionTerm.VISCOUS);
        Recovered.within(fit, "b", 0.04, 0.03);
        Recovered.nuisance(fit.sessions().get(0), truth);
        assertEquals(5e-4, fit.rms(), 0.1 * 5e-4, "rms residual = noise level");
    }

    @Test
    void pureCoulomb() {
        final SyntheticRelease truth = SyntheticRelease.of(FrictionTorques.coulombOnly(0.02)).withNoise(5e-4, 12);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.COULOMB), FrictionTorques.coulombOnly(0.03), QUICK,
                truth.session("c"));
        Recovered.sound(fit, J, FrictionTerm.COULOMB);
        Recovered.within(fit, "Tc", 0.02, 0.03);
        Recovered.nuisance(fit.sessions().get(0), truth);
    }

    @Test
    void mixedFromTwoAmplitudesJointly() {
        // viscous and Coulomb separate through the amplitude dependence of the decrement:
        // two releases at different amplitudes share b, Tc, J0
        final FrictionTorques friction = new FrictionTorques(0.02, 0.015, 0, 0);
        final SyntheticRelease small = SyntheticRelease.of(friction).withTheta0(0.12).withNoise(5e-4, 13);
        final SyntheticRelease large = SyntheticRelease.of(friction).withTheta0(0.7).withNoise(5e-4, 14);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB),
                new FrictionTorques(0.03, 0.005, 0, 0), QUICK, small.session("small"), large.session("large"));
        Recovered.sound(fit, J, FrictionTerm.VISCOUS);
        Recovered.within(fit, "b", 0.02, 0.05);
        Recovered.within(fit, "Tc", 0.015, 0.05);
        Recovered.nuisance(fit.sessions().get(0), small);
        Recovered.nuisance(fit.sessions().get(1), large);
        assertFalse(fit.hasWarning(FitWarning.Kind.STRONG_CORRELATION), fit.warnings().toString());
    }

    @Test
    void largeAmplitude120Degrees() {
        // at 120° the period is 1.37 × the small-angle one (A&S Table 17.1, K(sin 60°) = 2.1565):
        // a small-angle model would misread it as a 88 % larger inertia
        final SyntheticRelease truth = SyntheticRelease.of(FrictionTorques.viscousOnly(0.03))
                .withTheta0(Math.toRadians(120)).withNoise(1e-3, 15);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.VISCOUS), FrictionTorques.viscousOnly(0.02), QUICK,
                truth.session("wide"));
        Recovered.sound(fit, J, FrictionTerm.VISCOUS);
        Recovered.within(fit, "b", 0.03, 0.03);
        Recovered.nuisance(fit.sessions().get(0), truth);
    }

    @Test
    void dragDominated() {
        final SyntheticRelease truth = SyntheticRelease.of(new FrictionTorques(0.004, 0, 0, 0.03))
                .withTheta0(1.2).withNoise(5e-4, 16);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.DRAG),
                new FrictionTorques(0.01, 0, 0, 0.01), QUICK, truth.session("drag"));
        Recovered.sound(fit, J, FrictionTerm.DRAG);
        Recovered.within(fit, "c", 0.03, 0.05);
        Recovered.within(fit, "b", 0.004, 0.15);
    }

    @Test
    void stictionAboveCoulombIsBracketedByTheStop() {
        // Ts = 0.25 N·m holds the arm once K|sin x| ≤ Ts, |x| ≤ 0.032 rad: the record stops
        // earlier than Coulomb alone (dead band 0.0038 rad) would let it
        final FrictionTorques friction = new FrictionTorques(0.01, 0.03, 0.25, 0);
        final SyntheticRelease truth = SyntheticRelease.of(friction).withDuration(30, 100).withNoise(5e-4, 17);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB, FrictionTerm.STICTION),
                new FrictionTorques(0.015, 0.02, 0, 0), QUICK, truth.session("stop"));
        Recovered.sound(fit, J, FrictionTerm.COULOMB);
        Recovered.within(fit, "Tc", 0.03, 0.05);
        Recovered.within(fit, "b", 0.01, 0.10);
        final StictionBand band = fit.stiction();
        assertNotNull(band);
        assertTrue(band.resolved());
        assertTrue(band.lower() <= 0.25 && 0.25 < band.upper(), "Ts = 0.25 outside the band " + band);
        assertTrue(band.lower() > fit.friction().coulomb(), "band " + band + " must lie above Tc");
        // Ts is the middle of the band of the last round; the rounds stop once that middle moves
        // by less than 1e-3 of itself, so the reported band may have moved that much since
        assertEquals(band.middle(), fit.friction().stiction(), 1e-3 * band.middle());
    }

    @Test
    void quantisedEncoder4096Counts() {
        // 4096 counts per revolution: steps q = 1.53 mrad over 1 mrad of sensor noise. With noise
        // of the order of a step the quantisation error is uniform, white and independent of the
        // signal, variance q²/12 (Widrow & Kollár, Quantization Noise, 2008, ch. 4-5). (Without
        // such noise the error is a deterministic function of the signal: b then comes out
        // about 0.2 % high, several of its white-noise σ; the fit cannot know.)
        final double q = 2 * Math.PI / 4096;
        final SyntheticRelease truth = SyntheticRelease.of(FrictionTorques.viscousOnly(0.04)).withNoise(1e-3, 21)
                .withCounts(4096);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.VISCOUS), FrictionTorques.viscousOnly(0.03), QUICK,
                truth.session("encoder"));
        Recovered.sound(fit, J, FrictionTerm.VISCOUS);
        Recovered.within(fit, "b", 0.04, 0.03);
        final double expected = Math.sqrt(1e-6 + q * q / 12);
        assertEquals(expected, fit.rms(), 0.1 * expected, "residual = noise and quantisation, sqrt(σ² + q²/12)");
    }

    @Test
    void noisyRecordWithResampling() {
        final SyntheticRelease truth = SyntheticRelease.of(new FrictionTorques(0.04, 0.01, 0, 0))
                .withTheta0(0.5).withNoise(5e-3, 18);
        final SyntheticRelease second = SyntheticRelease.of(new FrictionTorques(0.04, 0.01, 0, 0))
                .withTheta0(0.15).withNoise(5e-3, 19);
        final FrictionFit fit = fit(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB),
                new FrictionTorques(0.03, 0.02, 0, 0), FitSettings.defaults().withResampling(30, 5, true),
                truth.session("noisy"), second.session("small"));
        Recovered.sound(fit, J, FrictionTerm.VISCOUS);
        Recovered.within(fit, "b", 0.04, 0.10);
        assertEquals(30, fit.resamplesUsed());
        final ParameterEstimate b = fit.parameter("b").orElseThrow();
        // white noise: both σ estimate the same thing (Seber & Wild §2.1 vs Künsch 1989);
        // 30 refits give the bootstrap σ to about ±13 %, hence a factor 1.6 either way
        assertTrue(b.sigmaResampling() > b.sigmaJacobian() / 1.6 && b.sigmaResampling() < 1.6 * b.sigmaJacobian(),
                b.toString());
    }
}
