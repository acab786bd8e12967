package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

class FrictionTorquesTest {

    @Test
    void stictionZeroMeansTheSameAsCoulomb() {
        assertEquals(0.3, new FrictionTorques(0, 0.3, 0, 0).staticTorque(), 0);
        assertEquals(0.5, new FrictionTorques(0, 0.3, 0.5, 0).staticTorque(), 0);
        assertEquals(0, FrictionTorques.none().staticTorque(), 0);
    }

    @Test
    void badTorquesAreRejectedWithTheirNameAndValue() {
        final IllegalArgumentException negative =
                assertThrows(IllegalArgumentException.class, () -> new FrictionTorques(-1, 0, 0, 0));
        assertTrue(negative.getMessage().contains("viscous") && negative.getMessage().contains("-1"));
        final IllegalArgumentException stiction =
                assertThrows(IllegalArgumentException.class, () -> new FrictionTorques(0, 0.3, 0.2, 0));
        assertTrue(stiction.getMessage().contains("stiction 0.2"));
        assertThrows(IllegalArgumentException.class, () -> new FrictionTorques(0, Double.NaN, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new FrictionTorques(0, 0, 0, Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> FrictionTorques.coulombOnly(0.3).withStiction(0.1));
    }

    @Test
    void badRunArgumentsAreRejected() {
        final SwingSimulator simulator = new SwingSimulator(SwingFixtures.ARM, FrictionTorques.none());
        assertThrows(IllegalArgumentException.class, () -> simulator.simulate(0.1, 0, -1, 100));
        assertThrows(IllegalArgumentException.class, () -> simulator.simulate(0.1, 0, 1, 0));
        assertThrows(IllegalArgumentException.class, () -> simulator.simulate(Double.NaN, 0, 1, 100));
        assertThrows(IllegalArgumentException.class, () -> simulator.simulate(0.1, 0, new double[0]));
        final IllegalArgumentException order = assertThrows(IllegalArgumentException.class,
                () -> simulator.simulate(0.1, 0, new double[] {0, 0.2, 0.1}));
        assertTrue(order.getMessage().contains("sampleTimes[2]"));
        assertThrows(IllegalArgumentException.class, () -> simulator.withTolerance(0));
        assertThrows(IllegalArgumentException.class, () -> simulator.withSmoothing(-1));
        assertThrows(IllegalArgumentException.class,
                () -> new EllipticSwing(SwingFixtures.ARM, SwingFixtures.ARM.equilibriumAngle() + Math.PI));
        assertThrows(IllegalArgumentException.class,
                () -> new LinearViscousDecay(MechanismProperties.of(1, 0, 1), 0.1));
    }

    @Test
    void constantRateSamplingCoversTheDuration() {
        final SwingRun run = new SwingSimulator(SwingFixtures.ARM, FrictionTorques.none())
                .simulate(0.2, 0, 1.0, 1000);
        final double[] t = run.times();
        assertEquals(1001, t.length);
        assertEquals(0, t[0], 0);
        assertEquals(1.0, t[1000], 1e-15);
        // the first sample is the release itself
        assertEquals(0.2, run.angles()[0], 0);
    }
}
