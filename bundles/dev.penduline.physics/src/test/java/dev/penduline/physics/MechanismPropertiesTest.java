package dev.penduline.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MechanismPropertiesTest {

    @Test
    void simplePendulumOfOneMetreHasTheTextbookPeriod() {
        // Simple pendulum T0 = 2π sqrt(L/g); for L = 1 m in standard gravity T0 = 2.00641 s
        // (Halliday, Resnick & Walker, Fundamentals of Physics, ch. 15: T = 2π sqrt(L/g);
        // the 4-decimal value 2.0064 s evaluated by hand with g = 9.80665 m/s²).
        MechanismProperties p = MechanismProperties.of(2.0, 1.0, 2.0 * 1.0 * 1.0);
        assertEquals(2.0064, p.smallAnglePeriod(), 5e-5);
        assertEquals(1.0, p.equivalentLength(), 1e-15);
        assertEquals(0.0, p.simplePendulumPeriodError(), 1e-15);
    }

    @Test
    void uniformRodHungFromItsEndSwingsLikeTwoThirdsOfItsLength() {
        // Uniform slender rod of length L pivoted at one end: J0 = m L²/3, Lc = L/2, so the
        // equivalent simple pendulum is 2L/3 (Meriam & Kraige, Engineering Mechanics: Dynamics,
        // compound pendulum sample problem; also Den Hartog, Mechanical Vibrations, §2.2).
        double m = 3.0;
        double l = 1.2;
        MechanismProperties p = MechanismProperties.of(m, l / 2, m * l * l / 3);
        assertEquals(2 * l / 3, p.equivalentLength(), 1e-14);
        assertEquals(2 * Math.PI * Math.sqrt(2 * l / (3 * MechanismProperties.STANDARD_GRAVITY)),
                p.smallAnglePeriod(), 1e-14);
        // sqrt(Leq/Lc) − 1 = sqrt(4/3) − 1
        assertEquals(Math.sqrt(4.0 / 3.0) - 1, p.simplePendulumPeriodError(), 1e-14);
        assertEquals(l / Math.sqrt(3), p.radiusOfGyration(), 1e-14);
    }

    @Test
    void tiltedAxisSoftensGravityByTheCosineOfTheTilt() {
        // Inclined-plane pendulum: only g cos α acts in the plane of swing (textbook result,
        // e.g. Kibble & Berkshire, Classical Mechanics, the pendulum on an inclined plane).
        MechanismProperties level = MechanismProperties.of(1.0, 0.5, 0.3);
        MechanismProperties tilted = new MechanismProperties(1.0, 0.5, 0.3, 0, MechanismProperties.STANDARD_GRAVITY,
                Math.toRadians(60));
        assertEquals(level.smallAnglePeriod() * Math.sqrt(2), tilted.smallAnglePeriod(), 1e-12);
    }

    @Test
    void inertiaBelowThePointMassBoundIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MechanismProperties.of(1.0, 0.5, 0.2));
        assertTrue(e.getMessage().contains("pivotInertia"), e.getMessage());
    }

    @Test
    void nonPhysicalInputsAreRefusedWithTheirName() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> MechanismProperties.of(0, 0.5, 1))
                .getMessage().contains("mass"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> MechanismProperties.of(1, Double.NaN, 1))
                .getMessage().contains("centroidDistance"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> MechanismProperties.of(1, 0.5, 1).withGravity(-1)).getMessage().contains("gravity"));
    }
}
