package dev.penduline.physics.inertia;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

/** Composite mechanisms against values worked by hand from handbook formulas. */
class CompositeTest {

    @Test
    void swingArmOfBarAndDisc() {
        // Bar 1.2 kg, 0.8 m, hanging from the pivot (centre 0.4 m below); disc 3 kg, r = 0.1 m,
        // 20 mm thick, axis parallel to the pivot, centre 0.8 m below. Handbook formulas
        // (Meriam & Kraige Table D/4) with the parallel-axis theorem, by hand:
        //   bar  1.2×0.64/12 + 1.2×0.16 = 0.064 + 0.192 = 0.256
        //   disc 3×0.01/2    + 3×0.64   = 0.015 + 1.920 = 1.935      J0 = 2.191 kg·m²
        //   M = 4.2 kg, Lc = (1.2×0.4 + 3×0.8)/4.2 = 0.6857142857 m
        //   Jcg = J0 − M Lc² = 2.191 − 1.9748571429 = 0.2161428571 kg·m²
        //   Leq = J0/(M Lc) = 0.7607638889 m, T0 = 2π sqrt(Leq/g) = 1.750026 s (g = 9.80665)
        //   simple-pendulum error sqrt(Leq/Lc) − 1 = 0.0533031
        final Part bar = Part.of("bar", new SlenderRod(0.8, Axis.Y), 1.2, new Vector3D(0, -0.4, 0));
        final Part disc = Part.of("disc", Cylinder.solid(0.1, 0.02, Axis.Z), 3.0, new Vector3D(0, -0.8, 0));
        final InertiaSummary s = PivotInertia.DEFAULT.compute(List.of(bar, disc));
        assertEquals(4.2, s.totalMass(), 1e-15);
        assertEquals(2.191, s.pivotInertia(), 1e-13);
        assertEquals(0.6857142857, s.centroidDistance(), 1e-10);
        assertEquals(0.2161428571, s.centroidalInertia(), 1e-10);
        assertEquals(0.7607638889, s.equivalentLength(), 1e-10);
        assertEquals(1.750026, s.smallAnglePeriod(), 1e-6);
        assertEquals(0.0533031, s.simplePendulumPeriodError(), 1e-7);
        assertEquals(Math.sqrt(2.191 / 4.2), s.radiusOfGyration(), 1e-15);
        assertEquals(0, s.equilibriumAngle(), 0);
        // per-part: bar 0.256/2.191, disc 1.935/2.191
        assertEquals(0.256 / 2.191, s.contributions().get(0).share(), 1e-13);
        assertEquals(0.8, s.contributions().get(1).axisDistance(), 1e-15);
        assertEquals(1.935, s.contributions().get(1).pivotInertia(), 1e-13);

        final MechanismProperties p = s.toMechanismProperties();
        assertEquals(2.191, p.pivotInertia(), 1e-13);
        assertEquals(MechanismProperties.STANDARD_GRAVITY, p.gravity(), 0);
    }

    @Test
    void hatchPlateWithABoredHole() {
        // Steel hatch plate 600 (x) × 400 (y) × 10 (z) mm, 7850 kg/m³, hinged along its top edge
        // (pivot = z axis through the middle of the top edge, plate centre at y = −0.2 m), with a
        // Ø100 mm hole bored through at x = 0.15, y = −0.25 m. By hand (Machinery's Handbook plate
        // and disc formulas, parallel-axis theorem):
        //   plate m = 7850×0.6×0.4×0.01 = 18.84 kg; J = 18.84×(0.36+0.16)/12 + 18.84×0.04 = 1.57
        //   hole  m = 7850×π×0.05²×0.01 = 0.6165375583 kg;
        //         J = m×0.05²/2 + m×(0.15² + 0.25²) = m×0.08625 = 0.0531763644
        //   J0 = 1.57 − 0.0531763644 = 1.5168236356 kg·m², M = 18.2234624417 kg
        //   centroid x = −0.6165375583×0.15/M = −0.0050748113, y = (−3.768 + 0.1541343896)/M
        //   = −0.1983083962 m; Lc = 0.1983733191 m; θeq = atan2(x, −y) = −0.0255849176 rad
        //   (the centroid moves away from the hole, to −x: a negative turn about +z).
        final Part plate = Part.ofDensity("plate", new Box(0.6, 0.4, 0.01), 7850, new Vector3D(0, -0.2, 0));
        final Part hole = Part.ofDensity("bore", Cylinder.solid(0.05, 0.01, Axis.Z), 7850, new Vector3D(0.15, -0.25, 0))
                .withCutout(true);
        final InertiaSummary s = PivotInertia.DEFAULT.compute(List.of(plate, hole));
        assertEquals(18.2234624417, s.totalMass(), 1e-9);
        assertEquals(1.5168236356, s.pivotInertia(), 1e-10);
        assertEquals(-0.0050748113, s.centroid().getX(), 1e-10);
        assertEquals(-0.1983083962, s.centroid().getY(), 1e-10);
        assertEquals(0.1983733191, s.centroidDistance(), 1e-10);
        assertEquals(-0.0255849176, s.equilibriumAngle(), 1e-10);
        assertEquals(-0.0531763644, s.contributions().get(1).pivotInertia(), 1e-10);
        assertEquals(-0.6165375583, s.contributions().get(1).mass(), 1e-10);
    }
}
