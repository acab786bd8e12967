package dev.penduline.physics.inertia;

import static org.hipparchus.geometry.euclidean.threed.RotationConvention.VECTOR_OPERATOR;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/**
 * Independent numerical cross-check: every closed-form shape, turned and placed off the axis,
 * against the same body integrated by Gauss–Legendre quadrature (Hipparchus, an independent
 * general-purpose library) and summed as point masses, about a skew pivot axis.
 */
class QuadratureCrossCheckTest {

    private static final double REL = 1e-6;

    /** A skew axis through an off-origin point, so every tensor component matters. */
    private static final PivotInertia SKEW = PivotInertia.DEFAULT
            .withAxis(new PivotAxis(new Vector3D(0.05, 0.1, -0.02), new Vector3D(0.3, -0.2, 1.0)));

    /** An arbitrary turn, so the shape's own frame is not the mechanism frame. */
    private static final Rotation TURN = new Rotation(new Vector3D(1, 2, 0.5), 0.7, VECTOR_OPERATOR);

    private static final Vector3D WHERE = new Vector3D(0.2, -0.45, 0.07);

    private static void assertSameBody(PartShape shape, double mass, GaussCloud.Sample cloud) {
        final Part part = Part.of("closed form", shape, mass, WHERE).withOrientation(TURN);
        final InertiaSummary closed = SKEW.compute(List.of(part));
        final InertiaSummary numeric = SKEW.compute(cloud.place("slice", WHERE, TURN));
        assertEquals(numeric.totalMass(), closed.totalMass(), REL * mass);
        assertEquals(numeric.pivotInertia(), closed.pivotInertia(), REL * numeric.pivotInertia());
        assertEquals(numeric.centroidDistance(), closed.centroidDistance(), REL * numeric.centroidDistance());
        final InertiaTensor a = closed.centroidalTensor();
        final InertiaTensor b = numeric.centroidalTensor();
        final double scale = b.trace();
        assertEquals(b.xx(), a.xx(), REL * scale);
        assertEquals(b.yy(), a.yy(), REL * scale);
        assertEquals(b.zz(), a.zz(), REL * scale);
        assertEquals(b.xy(), a.xy(), REL * scale);
        assertEquals(b.xz(), a.xz(), REL * scale);
        assertEquals(b.yz(), a.yz(), REL * scale);
    }

    @Test
    void slenderRodMatchesQuadrature() {
        assertSameBody(new SlenderRod(0.9, Axis.Y), 1.7, GaussCloud.rod(1.7, 0.9, Axis.Y));
    }

    @Test
    void boxMatchesQuadrature() {
        assertSameBody(new Box(0.3, 0.12, 0.05), 4.2, GaussCloud.box(4.2, 0.3, 0.12, 0.05));
    }

    @Test
    void solidCylinderMatchesQuadrature() {
        assertSameBody(Cylinder.solid(0.08, 0.25, Axis.Z), 3.1, GaussCloud.cylinderAlongZ(3.1, 0.08, 0, 0.25));
    }

    @Test
    void hollowCylinderMatchesQuadrature() {
        assertSameBody(new Cylinder(0.08, 0.06, 0.4, Axis.Z), 2.4, GaussCloud.cylinderAlongZ(2.4, 0.08, 0.06, 0.4));
    }

    @Test
    void cylinderAlongXMatchesQuadratureTurnedOntoX() {
        // The cloud is built along z; turning it by +90° about y carries its z axis onto x.
        final Rotation zOntoX = new Rotation(Vector3D.PLUS_J, Math.PI / 2, VECTOR_OPERATOR);
        final Part part = Part.of("closed form", new Cylinder(0.05, 0.02, 0.3, Axis.X), 1.3, WHERE);
        final InertiaSummary closed = SKEW.compute(List.of(part));
        final InertiaSummary numeric = SKEW.compute(GaussCloud.cylinderAlongZ(1.3, 0.05, 0.02, 0.3)
                .place("slice", WHERE, zOntoX));
        assertEquals(numeric.pivotInertia(), closed.pivotInertia(), REL * numeric.pivotInertia());
        assertEquals(numeric.centroidalTensor().xx(), closed.centroidalTensor().xx(),
                REL * numeric.centroidalTensor().trace());
    }

    @Test
    void sphereMatchesQuadrature() {
        assertSameBody(new Sphere(0.11), 5.0, GaussCloud.sphere(5.0, 0.11));
    }

    @Test
    void thinRingMatchesQuadrature() {
        assertSameBody(new ThinRing(0.2, Axis.Z), 0.8, GaussCloud.ringAboutZ(0.8, 0.2));
    }
}
