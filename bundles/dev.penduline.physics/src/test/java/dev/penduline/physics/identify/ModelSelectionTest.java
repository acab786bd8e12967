package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * Model comparison picks the generating term set and adds no term the data cannot support.
 * Criteria: AIC (Akaike 1974) and BIC (Schwarz 1978) on the effective sample size; truth =
 * the generating term set of a record synthesised by our simulator (see {@link SyntheticRelease}).
 */
class ModelSelectionTest {

    private static final FitSettings QUICK = FitSettings.defaults().withResampling(0, 1, false);

    private static ModelComparison compare(FrictionTorques start, SyntheticRelease... truths) {
        final List<ReleaseSession> sessions = new java.util.ArrayList<>();
        for (int i = 0; i < truths.length; i++) {
            sessions.add(truths[i].session("s" + i));
        }
        final FrictionProblem problem = FrictionProblem.of(
                SyntheticRelease.ARM.withPivotInertia(Recovered.CALCULATED_INERTIA), sessions).withStart(start);
        return new FrictionIdentifier(QUICK).compare(problem);
    }

    private static Set<FrictionTerm> selected(ModelComparison c) {
        return EnumSet.copyOf(c.selectedScore().terms());
    }

    @Test
    void pureViscousTruthAddsNeitherCoulombNorDrag() {
        final ModelComparison c = compare(FrictionTorques.viscousOnly(0.02),
                SyntheticRelease.of(FrictionTorques.viscousOnly(0.04)).withNoise(1e-3, 31));
        assertEquals(EnumSet.of(FrictionTerm.VISCOUS), selected(c), c.candidates().toString());
        assertEquals(FrictionTerm.VISCOUS, c.dominantLoss());
        // the richer candidates fit no better than noise: their BIC is higher (Schwarz 1978)
        for (CandidateScore s : c.candidates()) {
            if (s.terms().size() > 1 && s.terms().contains(FrictionTerm.VISCOUS)) {
                assertTrue(s.bic() > c.selectedScore().bic(), s.toString());
            }
        }
        // white noise residuals: n_eff close to n
        assertTrue(c.effectiveSamples() > 0.8 * c.samples(), "n_eff " + c.effectiveSamples());
    }

    @Test
    void pureCoulombTruthIsRecognised() {
        final ModelComparison c = compare(FrictionTorques.viscousOnly(0.02),
                SyntheticRelease.of(FrictionTorques.coulombOnly(0.02)).withNoise(1e-3, 32),
                SyntheticRelease.of(FrictionTorques.coulombOnly(0.02)).withTheta0(0.7).withNoise(1e-3, 33));
        assertEquals(EnumSet.of(FrictionTerm.COULOMB), selected(c), c.candidates().toString());
        assertEquals(FrictionTerm.COULOMB, c.dominantLoss());
    }

    @Test
    void mixedTruthFromTwoAmplitudesNeedsBothTerms() {
        final FrictionTorques truth = new FrictionTorques(0.02, 0.015, 0, 0);
        final ModelComparison c = compare(FrictionTorques.viscousOnly(0.03),
                SyntheticRelease.of(truth).withTheta0(0.12).withNoise(5e-4, 34),
                SyntheticRelease.of(truth).withTheta0(0.7).withNoise(5e-4, 35));
        assertEquals(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB), selected(c), c.candidates().toString());
    }

    @Test
    void dragTruthAtLargeAmplitudeSelectsDrag() {
        final ModelComparison c = compare(FrictionTorques.viscousOnly(0.03),
                SyntheticRelease.of(new FrictionTorques(0.004, 0, 0, 0.03)).withTheta0(1.2).withNoise(5e-4, 36));
        assertEquals(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.DRAG), selected(c), c.candidates().toString());
        assertEquals(FrictionTerm.DRAG, c.dominantLoss());
    }
}
