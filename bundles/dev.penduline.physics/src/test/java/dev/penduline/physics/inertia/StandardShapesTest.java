package dev.penduline.physics.inertia;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/**
 * Every standard shape against the handbook formula, evaluated by hand for round numbers.
 * Formulas: Meriam &amp; Kraige, Engineering Mechanics: Dynamics, Table D/4 "Properties of
 * homogeneous solids"; the same entries appear in Machinery's Handbook, "Moments of inertia"
 * (radius of gyration of solids) and in Marks' Standard Handbook for Mechanical Engineers.
 */
class StandardShapesTest {

    private static final double TOL = 1e-14;

    private static void assertDiagonal(InertiaTensor t, double xx, double yy, double zz) {
        assertEquals(xx, t.xx(), TOL);
        assertEquals(yy, t.yy(), TOL);
        assertEquals(zz, t.zz(), TOL);
        assertEquals(0, t.xy(), 0);
        assertEquals(0, t.xz(), 0);
        assertEquals(0, t.yz(), 0);
    }

    @Test
    void pointMassHasNoCentroidalInertia() {
        // Point mass: zero inertia about its own centroid (definition of a point mass).
        assertDiagonal(new PointMass().centroidalInertia(3.0), 0, 0, 0);
    }

    @Test
    void slenderRodIsOneTwelfthMLSquaredAcross() {
        // Slender rod, m L²/12 about a transverse centroidal axis (Meriam & Kraige Table D/4):
        // m = 2 kg, L = 1.5 m → 2 × 2.25 / 12 = 0.375 kg·m²; zero about its own axis.
        assertDiagonal(new SlenderRod(1.5, Axis.X).centroidalInertia(2.0), 0, 0.375, 0.375);
        assertDiagonal(new SlenderRod(1.5, Axis.Z).centroidalInertia(2.0), 0.375, 0.375, 0);
    }

    @Test
    void boxHasThePrincipalMomentsOfARectangularPrism() {
        // Rectangular prism a×b×c, Ixx = m(b²+c²)/12 etc. (Meriam & Kraige Table D/4):
        // m = 12 kg, a = 0.3, b = 0.2, c = 0.1 m → Ixx = 0.05, Iyy = 0.10, Izz = 0.13 kg·m².
        final Box box = new Box(0.3, 0.2, 0.1);
        assertDiagonal(box.centroidalInertia(12.0), 0.05, 0.10, 0.13);
        assertEquals(0.006, box.volume().getAsDouble(), 1e-17);
    }

    @Test
    void thinPlateAboutItsNormal() {
        // Thin rectangular plate a×b about the normal axis, m(a²+b²)/12 (Machinery's Handbook):
        // m = 6 kg, 0.4 × 0.3 m → 6 × 0.25 / 12 = 0.125 kg·m².
        assertEquals(0.125, new Box(0.4, 0.3, 0).centroidalInertia(6.0).zz(), TOL);
    }

    @Test
    void solidCylinder() {
        // Solid cylinder: m r²/2 about its axis, m(3r² + h²)/12 about a diameter (Table D/4):
        // m = 4 kg, r = 0.1 m, h = 0.6 m → 0.02 and 4 × (0.03 + 0.36)/12 = 0.13 kg·m².
        assertDiagonal(Cylinder.solid(0.1, 0.6, Axis.Z).centroidalInertia(4.0), 0.13, 0.13, 0.02);
    }

    @Test
    void thickWalledTube() {
        // Thick-walled tube: m(ro² + ri²)/2 about its axis, m(3(ro² + ri²) + h²)/12 about a diameter
        // (Meriam & Kraige Table D/4, hollow circular cylinder): m = 3 kg, ro = 0.05, ri = 0.04,
        // h = 1.0 m → 3 × 0.0041/2 = 0.00615; 3 × (0.0123 + 1)/12 = 0.253075 kg·m².
        assertDiagonal(new Cylinder(0.05, 0.04, 1.0, Axis.Y).centroidalInertia(3.0), 0.253075, 0.00615, 0.253075);
    }

    @Test
    void solidSphere() {
        // Solid sphere 2 m r²/5 (Table D/4): m = 5 kg, r = 0.2 m → 0.08 kg·m²; V = 4πr³/3.
        final Sphere s = new Sphere(0.2);
        assertDiagonal(s.centroidalInertia(5.0), 0.08, 0.08, 0.08);
        assertEquals(4.0 / 3.0 * Math.PI * 0.008, s.volume().getAsDouble(), 1e-17);
    }

    @Test
    void thinRing() {
        // Thin circular ring: m r² about its axis, m r²/2 about a diameter (Table D/4):
        // m = 2 kg, r = 0.3 m → 0.18 and 0.09 kg·m².
        assertDiagonal(new ThinRing(0.3, Axis.X).centroidalInertia(2.0), 0.18, 0.09, 0.09);
    }

    @Test
    void densityGivesMassFromVolume() {
        // A 100 mm steel cube at 7850 kg/m³ (typical carbon steel, Machinery's Handbook
        // properties of metals) weighs 7850 × 0.001 = 7.85 kg.
        final Part cube = Part.ofDensity("cube", new Box(0.1, 0.1, 0.1), 7850, Vector3D.ZERO);
        assertEquals(7.85, cube.mass(), 1e-12);
    }

    @Test
    void shapesWithoutVolumeRefuseADensity() {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Part.ofDensity("link", new SlenderRod(1, Axis.X), 7850, Vector3D.ZERO));
        assertTrue(e.getMessage().contains("'link'") && e.getMessage().contains("rod"), e.getMessage());
    }

    @Test
    void badDimensionsAreRefusedByName() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new Box(0.1, -0.2, 0.1))
                .getMessage().contains("width"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new Cylinder(0.1, 0.1, 1, Axis.Z))
                .getMessage().contains("inner radius"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new Sphere(Double.NaN))
                .getMessage().contains("sphere radius"));
    }
}
