package dev.penduline.physics.inertia;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;

/** The equilibrium angle of an off-centre centroid and the tilt of the pivot axis. */
class EquilibriumAndTiltTest {

    @Test
    void centroidOffTheVerticalHangsAtItsAngle() {
        // Point mass at (0.3, −0.4): a 3-4-5 right triangle, so Lc = 0.5 m exactly and the
        // centroid lies atan(3/4) = 0.6435011088 rad from straight down, turned positively about
        // +z (from −y toward +x). J0 = m Lc² for a point mass (definition).
        final Part p = Part.of("weight", new PointMass(), 2, new Vector3D(0.3, -0.4, 0));
        final InertiaSummary s = PivotInertia.DEFAULT.compute(List.of(p));
        assertEquals(0.5, s.centroidDistance(), 1e-15);
        assertEquals(0.6435011088, s.equilibriumAngle(), 1e-10);
        assertEquals(0.5, s.pivotInertia(), 1e-15);
        assertEquals(0.6435011088, s.toMechanismProperties().equilibriumAngle(), 1e-10);
    }

    @Test
    void reversingTheAxisReversesTheAngle() {
        // Right-hand rule: the same turn seen about −z has the opposite sign.
        final Part p = Part.of("weight", new PointMass(), 2, new Vector3D(0.3, -0.4, 0));
        final PivotInertia reversed = PivotInertia.DEFAULT.withAxis(new PivotAxis(Vector3D.ZERO, new Vector3D(0, 0, -1)));
        assertEquals(-0.6435011088, reversed.compute(List.of(p)).equilibriumAngle(), 1e-10);
    }

    @Test
    void aPartOffThePlaneOfSwingDoesNotTurnTheEquilibrium() {
        // Moving a part along the axis changes neither its perpendicular offset nor θeq
        // (perpendicular distance in the parallel-axis theorem, Meriam & Kraige Appendix B).
        final Part a = Part.of("arm", new PointMass(), 1, new Vector3D(0.1, -0.5, 0));
        final Part b = Part.of("counterweight", new PointMass(), 1, new Vector3D(-0.1, -0.5, 0.4));
        final InertiaSummary s = PivotInertia.DEFAULT.compute(List.of(a, b));
        assertEquals(0, s.equilibriumAngle(), 1e-15);
        assertEquals(0.5, s.centroidDistance(), 1e-15);
        assertEquals(0.2, s.centroid().getZ(), 1e-15);
        // 2 × (0.1² + 0.5²) = 0.52 kg·m²
        assertEquals(0.52, s.pivotInertia(), 1e-15);
    }

    @Test
    void centroidAboveThePivotIsHalfATurn() {
        // An inverted body has its centroid straight up: θeq = ±π.
        final Part p = Part.of("mast", new PointMass(), 1, new Vector3D(0, 0.3, 0));
        assertEquals(Math.PI, Math.abs(PivotInertia.DEFAULT.compute(List.of(p)).equilibriumAngle()), 1e-15);
    }

    @Test
    void tiltedAxisWeakensGravityByTheCosine() {
        // Axis tilted α = 30° from horizontal in the y–z plane. A point mass L = 0.5 m from the
        // axis along the in-plane "down" direction hangs at θeq = 0 with J0 = m L², and its
        // small-angle period is 2π sqrt(L / (g cos α)) (inclined-plane pendulum: Kibble &
        // Berkshire, Classical Mechanics).
        final double alpha = Math.toRadians(30);
        final Vector3D n = new Vector3D(0, Math.sin(alpha), Math.cos(alpha));
        final Vector3D g = Vector3D.MINUS_J;
        final Vector3D down = g.subtract(n.scalarMultiply(g.dotProduct(n))).normalize();
        final Part p = Part.of("bob", new PointMass(), 1.5, down.scalarMultiply(0.5));
        final PivotInertia tilted = PivotInertia.DEFAULT.withAxis(new PivotAxis(Vector3D.ZERO, n));
        final InertiaSummary s = tilted.compute(List.of(p));
        assertEquals(alpha, s.axisTilt(), 1e-15);
        assertEquals(0, s.equilibriumAngle(), 1e-15);
        assertEquals(0.375, s.pivotInertia(), 1e-15);
        final MechanismProperties mp = s.toMechanismProperties();
        assertEquals(alpha, mp.axisTilt(), 1e-15);
        assertEquals(2 * Math.PI * Math.sqrt(0.5 / (MechanismProperties.STANDARD_GRAVITY * Math.cos(alpha))),
                s.smallAnglePeriod(), 1e-12);
    }

    @Test
    void localGravityIsPassedOn() {
        final Part p = Part.of("bob", new PointMass(), 1, new Vector3D(0, -1, 0));
        assertEquals(9.81, PivotInertia.DEFAULT.withGravity(9.81).compute(List.of(p)).toMechanismProperties().gravity(), 0);
    }

    @Test
    void verticalAxisHasNoEquilibriumAndNoRestoringTerm() {
        // A door on a vertical hinge: gravity exerts no torque about it (statics).
        final Part door = Part.of("door", new Box(0.8, 2.0, 0.04), 30, new Vector3D(0.4, 0, 0));
        final PivotInertia hinge = PivotInertia.DEFAULT.withAxis(new PivotAxis(Vector3D.ZERO, Vector3D.PLUS_J));
        final InertiaSummary s = hinge.compute(List.of(door));
        assertTrue(Double.isNaN(s.equilibriumAngle()));
        assertEquals(Math.PI / 2, s.axisTilt(), 1e-15);
        // Plate about its edge: m(a² + c²)/12 + m (a/2)² = 30 × (0.64 + 0.0016)/12 + 30 × 0.16
        // = 1.604 + 4.8 = 6.404 kg·m² (Machinery's Handbook plate formula + parallel axis).
        assertEquals(6.404, s.pivotInertia(), 1e-12);
        assertThrows(IllegalArgumentException.class, s::toMechanismProperties);
        assertTrue(hinge.problems(List.of(door)).stream().anyMatch(m -> m.contains("parallel to gravity")));
    }
}
