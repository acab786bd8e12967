package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Optional;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;

/** The overdamped refusal and the sample limit of a simulated swing. */
class SwingPredictionTest {

    private static final double G = 9.80665;
    private static final MechanismProperties BODY = new MechanismProperties(2, 0.4, 0.5, 0, G, 0);

    @Test
    void overdampedFromADampingRatioAboveOne() {
        // critical damping of J θ'' + b θ' + K θ = 0 is b = 2 √(J K) (any dynamics text, from memory)
        double critical = 2 * Math.sqrt(0.5 * 2 * G * 0.4);
        assertTrue(SwingPrediction.overdamped(BODY, new FrictionTorques(0.99 * critical, 0, 0, 0)).isEmpty());
        Optional<String> over = SwingPrediction.overdamped(BODY, new FrictionTorques(1.01 * critical, 0, 0, 0));
        assertTrue(over.isPresent() && over.get().startsWith("no swing: the motion is overdamped (damping ratio 1.01"),
                over.toString());
    }

    @Test
    void creepTimeFromTheSlowRootOfTheCharacteristicEquation() {
        double j = 0.5;
        double k = 2 * G * 0.4;
        double b = 400;
        // the slow root of J s² + b s + K = 0 by the quadratic formula (from memory), then e^(λt) = 1/100
        double slow = (b - Math.sqrt(b * b - 4 * j * k)) / (2 * j);
        double creep = Math.log(100) / slow;
        String message = SwingPrediction.overdamped(BODY, new FrictionTorques(b, 0, 0, 0)).orElseThrow();
        assertTrue(message.contains(String.format(Locale.ROOT, "in about %.3g s", creep)), message + " vs " + creep);
    }

    @Test
    void simulateRefusesTheOverdampedCaseAndTooManySamplesBeforeIntegrating() throws Exception {
        MechanismSource m = MechanismLoader.lumped(2, 0.4, 0.5, G);
        InputException creep = assertThrows(InputException.class,
                () -> SwingPrediction.simulate(m, new FrictionTorques(1e9, 0, 0, 0), 0.3, 0, 20, 1000));
        assertTrue(creep.getMessage().contains("overdamped"), creep.getMessage());
        InputException many = assertThrows(InputException.class,
                () -> SwingPrediction.simulate(m, FrictionTorques.none(), 0.3, 0, 1e5, 1e6));
        assertTrue(many.getMessage().contains("more than the 10000000"), many.getMessage());
        assertEquals(20_001, SwingPrediction.simulate(m, new FrictionTorques(0.01, 0, 0, 0), 0.3, 0, 20, 1000).size());
    }
}
