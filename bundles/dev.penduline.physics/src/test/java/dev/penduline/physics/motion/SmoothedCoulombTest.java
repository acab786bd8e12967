package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

class SmoothedCoulombTest {

    private static final MechanismProperties ARM = SwingFixtures.ARM;

    @Test
    void smoothedRunSaysSoAndApproachesTheSharpClosedFormAwayFromTheStop() {
        // tanh(ω/ε) → sgn ω as ε → 0: with ε a thousandth of the peak velocity the first
        // reversals lie close to the piecewise closed form (Den Hartog, Mechanical Vibrations,
        // "Coulomb damping"); the smoothed model cannot hold the body, so it never "stops".
        final double tc = 0.007 * ARM.gravityStiffness();
        final double theta0 = ARM.equilibriumAngle() + 0.2;
        final double peakRate = 0.2 * ARM.naturalFrequency();
        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.coulombOnly(tc)).withLinearGravity(true)
                .withSmoothing(1e-3 * peakRate).simulate(theta0, 0, 5, 100);
        assertTrue(run.smoothed());
        assertFalse(run.stopped());
        final List<TurningPoint> expected = new LinearCoulombDecay(ARM, tc, 0).turningPoints(theta0);
        final List<TurningPoint> actual = run.turningPoints();
        for (int i = 0; i < 5; i++) {
            assertEquals(expected.get(i).angle(), actual.get(i).angle(), 2e-4, "reversal " + i);
            assertEquals(expected.get(i).time(), actual.get(i).time(), 2e-3, "reversal " + i);
        }
        // energy balance still holds, with ∫ Tc tanh(ω/ε) ω dt as the Coulomb loss (work–energy)
        assertEquals(0, run.energy().imbalance(), 1e-8 * run.energy().initial());
        final SwingRun sharp = new SwingSimulator(ARM, FrictionTorques.coulombOnly(tc)).simulate(theta0, 0, 5, 100);
        assertFalse(sharp.smoothed());
    }
}
