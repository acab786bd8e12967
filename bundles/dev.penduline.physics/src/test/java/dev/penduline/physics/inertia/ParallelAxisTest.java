package dev.penduline.physics.inertia;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/** The parallel-axis theorem in the engine, against published worked examples. */
class ParallelAxisTest {

    private static final PivotInertia ENGINE = PivotInertia.DEFAULT;

    @Test
    void rodAboutItsEndIsOneThirdMLSquared() {
        // Uniform slender rod about one end: m L²/3 (classic result, Meriam & Kraige Table D/4;
        // = m L²/12 + m (L/2)²). m = 3 kg, L = 1.2 m → 1.44 kg·m².
        final Part rod = Part.of("rod", new SlenderRod(1.2, Axis.Y), 3.0, new Vector3D(0, -0.6, 0));
        assertEquals(1.44, ENGINE.compute(List.of(rod)).pivotInertia(), 1e-14);
    }

    @Test
    void pendulumOfRodAndSphere() {
        // Published worked example (Hibbeler, Engineering Mechanics: Dynamics, ch. 17, the
        // pendulum example; numbers from memory): slender rod 10 kg, 0.45 m, pivoted at O, with
        // a 15 kg sphere of radius 0.1 m at its end (centre 0.55 m from O).
        // I_O = (1/3)(10)(0.45²) + (2/5)(15)(0.1²) + 15(0.55²) = 5.27 kg·m² (book value, 3 s.f.).
        // The book's sum itself is exact: 0.675 + 0.06 + 4.5375 = 5.2725 kg·m²; its printed
        // 5.27 is that to three figures (±0.005, half a unit in the last place).
        final Part rod = Part.of("rod", new SlenderRod(0.45, Axis.Y), 10, new Vector3D(0, -0.225, 0));
        final Part ball = Part.of("sphere", new Sphere(0.1), 15, new Vector3D(0, -0.55, 0));
        final double j0 = ENGINE.compute(List.of(rod, ball)).pivotInertia();
        assertEquals(10 * 0.45 * 0.45 / 3 + 0.4 * 15 * 0.1 * 0.1 + 15 * 0.55 * 0.55, j0, 1e-14);
        assertEquals(5.27, j0, 0.005);
    }

    @Test
    void discWithBoredHoleAboutItsRim() {
        // Published worked example (Hibbeler, Engineering Mechanics: Dynamics, ch. 17, the plate
        // with a hole; numbers from memory): steel 8000 kg/m³, disc r = 250 mm, 10 mm thick, a
        // concentric hole r = 125 mm, axis normal to the disc through O on the rim (0.25 m from
        // the centre). Book: m_d = 15.71 kg, m_h = 3.93 kg,
        // I_O = [½(15.71)(0.25²) + 15.71(0.25²)] − [½(3.93)(0.125²) + 3.93(0.25²)] = 1.20 kg·m².
        // Exactly, with m = ρ π r² t: m_d = 15.70796 kg, m_h = 3.92699 kg, I_O = 1.196505 kg·m²;
        // the book's figures are these to the places it prints (±half a unit in the last place).
        final Vector3D centre = new Vector3D(0, -0.25, 0);
        final Part disc = Part.ofDensity("disc", Cylinder.solid(0.25, 0.01, Axis.Z), 8000, centre);
        final Part hole = Part.ofDensity("hole", Cylinder.solid(0.125, 0.01, Axis.Z), 8000, centre).withCutout(true);
        final double md = 8000 * Math.PI * 0.25 * 0.25 * 0.01;
        final double mh = 8000 * Math.PI * 0.125 * 0.125 * 0.01;
        assertEquals(md, disc.mass(), 1e-13);
        assertEquals(mh, hole.mass(), 1e-13);
        assertEquals(15.71, disc.mass(), 0.005);
        assertEquals(3.93, hole.mass(), 0.005);
        final InertiaSummary s = ENGINE.compute(List.of(disc, hole));
        final double exact = (0.5 * md * 0.25 * 0.25 + md * 0.25 * 0.25) - (0.5 * mh * 0.125 * 0.125 + mh * 0.25 * 0.25);
        assertEquals(exact, s.pivotInertia(), 1e-14);
        assertEquals(1.20, s.pivotInertia(), 0.005);
        assertEquals(md - mh, s.totalMass(), 1e-13);
    }

    @Test
    void distanceAlongTheAxisAddsNothing() {
        // The parallel-axis term uses the distance perpendicular to the axis (Meriam & Kraige,
        // Dynamics, Appendix B, parallel-axis theorem): sliding a part along the axis leaves J0.
        final Part near = Part.of("disc", Cylinder.solid(0.1, 0.02, Axis.Z), 2.0, new Vector3D(0.1, -0.3, 0));
        final Part far = near.withCentroid(new Vector3D(0.1, -0.3, 0.8));
        assertEquals(ENGINE.compute(List.of(near)).pivotInertia(), ENGINE.compute(List.of(far)).pivotInertia(), 1e-15);
        // 2 × 0.01/2 + 2 × (0.1² + 0.3²) = 0.01 + 0.2 = 0.21 kg·m²
        assertEquals(0.21, ENGINE.compute(List.of(far)).pivotInertia(), 1e-14);
    }

    @Test
    void quantityAndCutoutScaleContributions() {
        // Three identical 0.5 kg point masses at 0.4 m: 3 × 0.5 × 0.16 = 0.24 kg·m² (definition of
        // the moment of inertia of point masses, Σ m r²), and a cut-out of one removes a third.
        final Part three = Part.of("bolt", new PointMass(), 0.5, new Vector3D(0, -0.4, 0)).withQuantity(3);
        final Part minusOne = Part.of("relief", new PointMass(), 0.5, new Vector3D(0, -0.4, 0)).withCutout(true);
        assertEquals(0.24, ENGINE.compute(List.of(three)).pivotInertia(), 1e-15);
        final InertiaSummary s = ENGINE.compute(List.of(three, minusOne));
        assertEquals(0.16, s.pivotInertia(), 1e-15);
        assertEquals(1.0, s.totalMass(), 1e-15);
        assertEquals(1.5, s.contributions().get(0).share(), 1e-12);
        assertEquals(-0.5, s.contributions().get(1).share(), 1e-12);
    }
}
