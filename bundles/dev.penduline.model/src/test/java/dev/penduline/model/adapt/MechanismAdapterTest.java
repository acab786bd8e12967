package dev.penduline.model.adapt;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.penduline.model.InspectionHatch;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.ShapeAxis;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.TensorReference;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.inertia.InertiaSummary;

class MechanismAdapterTest {

    private static final double T = InspectionHatch.LID_THICKNESS;
    private static final double A = InspectionHatch.LID_HEIGHT;
    private static final double L = InspectionHatch.LID_LENGTH;
    private static final double RHO = InspectionHatch.STEEL_DENSITY;

    private static Mechanism lidOnly() {
        final Mechanism m = NamedElements.mechanism("Lid");
        InspectionHatch.addLid(m);
        return m;
    }

    @Test
    void uniformLidHungFromItsEdgeMatchesTheHandbookPlate() {
        final MechanismProperties p = MechanismAdapter.properties(lidOnly());
        final double mass = RHO * T * A * L;
        // Rectangular prism about its centroidal axis normal to the t×a face: m(t² + a²)/12
        // (Machinery's Handbook, "Moments of Inertia" table, rectangular prism), moved to the
        // hinge edge by the parallel-axis theorem, + m(a/2)²; for t → 0 this is the plate's m a²/3.
        final double j0 = mass * (T * T + A * A) / 12 + mass * (A / 2) * (A / 2);
        assertEquals(mass, p.mass(), 1e-12 * mass);
        assertEquals(A / 2, p.centroidDistance(), 1e-15);
        assertEquals(j0, p.pivotInertia(), 1e-12 * j0);
        assertEquals(0, p.equilibriumAngle(), 1e-15);
        assertEquals(MechanismProperties.STANDARD_GRAVITY, p.gravity(), 0);
    }

    @Test
    void inspectionHoleSubtractsItsCylinderAboutADiameter() {
        final Mechanism m = lidOnly();
        final Part hole = NamedElements.addPart(m, "Hole");
        hole.setShape(ShapeKind.CYLINDER);
        hole.setShapeAxis(ShapeAxis.X);
        hole.setRadius(0.05);
        hole.setLength(T);
        hole.setDensity(RHO);
        hole.setCentroidY(-0.25);
        hole.setCentroidZ(0.15);
        hole.setCutout(true);
        final double plateMass = RHO * T * A * L;
        final double plateJ = plateMass * (T * T + A * A) / 12 + plateMass * (A / 2) * (A / 2);
        final double holeMass = RHO * Math.PI * 0.05 * 0.05 * T;
        // Solid cylinder about a diameter through its centroid: m(3r² + h²)/12 (Machinery's
        // Handbook, "Moments of Inertia" table, solid cylinder); its offset along the hinge (z)
        // adds nothing, its distance 0.25 m below the hinge adds m d² (parallel-axis theorem).
        final double holeJ = holeMass * (3 * 0.05 * 0.05 + T * T) / 12 + holeMass * 0.25 * 0.25;
        final InertiaSummary s = MechanismAdapter.inertia(m);
        assertEquals(plateMass - holeMass, s.totalMass(), 1e-12);
        assertEquals(plateJ - holeJ, s.pivotInertia(), 1e-12 * plateJ);
        assertEquals((plateMass * A / 2 - holeMass * 0.25) / (plateMass - holeMass), s.centroidDistance(), 1e-12);
    }

    @Test
    void slenderRodOnItsEndSwingsWithAThirdOfMLSquared() {
        final Mechanism m = NamedElements.mechanism("Rod");
        final Part rod = NamedElements.addPart(m, "Rod");
        rod.setShape(ShapeKind.SLENDER_ROD);
        rod.setShapeAxis(ShapeAxis.Y);
        rod.setLength(1.2);
        rod.setMass(3.0);
        rod.setCentroidY(-0.6);
        // Uniform slender rod about one end: m L²/3 (Meriam & Kraige, Engineering Mechanics:
        // Dynamics, Appendix B, Table D/4).
        assertEquals(3.0 * 1.2 * 1.2 / 3, MechanismAdapter.properties(m).pivotInertia(), 1e-12);
    }

    @Test
    void rotationsTurnAboutFixedXThenYThenZ() {
        final Mechanism m = NamedElements.mechanism("Rod");
        final Part rod = NamedElements.addPart(m, "Rod");
        rod.setShape(ShapeKind.SLENDER_ROD);
        rod.setShapeAxis(ShapeAxis.X);
        rod.setLength(0.8);
        rod.setMass(2.0);
        rod.setCentroidY(-0.5);
        final double offset = 2.0 * 0.5 * 0.5;
        // Slender rod about a transverse axis through its centre: m L²/12 (Machinery's Handbook,
        // "Moments of Inertia" table); about its own axis: 0 for a slender rod.
        assertEquals(2.0 * 0.8 * 0.8 / 12 + offset, MechanismAdapter.properties(m).pivotInertia(), 1e-12);
        // 90° about x keeps the rod along x; then 90° about y sends x to −z, along the hinge.
        // (Applied in the other order the rod would end along +y, across the hinge.)
        rod.setRotationX(Math.PI / 2);
        rod.setRotationY(Math.PI / 2);
        assertEquals(offset, MechanismAdapter.properties(m).pivotInertia(), 1e-12);
    }

    @Test
    void tensorAboutTheOriginGivesTheSameInertiaAsTheShape() {
        final double mass = 2.0;
        final double r = 0.05;
        final double cx = 0.1;
        final double cy = -0.3;
        final double cz = 0.05;
        final double icg = 0.4 * mass * r * r;
        final Mechanism m = NamedElements.mechanism("Ball");
        final Part cad = NamedElements.addPart(m, "Ball from CAD");
        cad.setShape(ShapeKind.MASS_PROPERTIES);
        cad.setTensorReference(TensorReference.FRAME_ORIGIN);
        cad.setMass(mass);
        cad.setCentroidX(cx);
        cad.setCentroidY(cy);
        cad.setCentroidZ(cz);
        // Solid sphere 2/5 m r² (Machinery's Handbook table), moved to the origin with the
        // three-dimensional parallel-axis theorem I_O = I_G + m(|c|² E − c cᵀ) (Meriam & Kraige,
        // Dynamics, Appendix B); products are tensor elements −∫xy dm.
        cad.setIxx(icg + mass * (cy * cy + cz * cz));
        cad.setIyy(icg + mass * (cx * cx + cz * cz));
        cad.setIzz(icg + mass * (cx * cx + cy * cy));
        cad.setIxy(-mass * cx * cy);
        cad.setIxz(-mass * cx * cz);
        cad.setIyz(-mass * cy * cz);
        final double j0 = MechanismAdapter.properties(m).pivotInertia();
        // About the z axis through the origin, J0 is the tensor's Izz by definition.
        assertEquals(cad.getIzz(), j0, 1e-14);

        final Mechanism shape = NamedElements.mechanism("Ball");
        final Part ball = NamedElements.addPart(shape, "Ball");
        ball.setShape(ShapeKind.SPHERE);
        ball.setRadius(r);
        ball.setMass(mass);
        ball.setCentroidX(cx);
        ball.setCentroidY(cy);
        ball.setCentroidZ(cz);
        assertEquals(j0, MechanismAdapter.properties(shape).pivotInertia(), 1e-14);
    }

    @Test
    void axisTiltWeakensGravityByItsCosine() {
        final Mechanism m = lidOnly();
        final MechanismProperties level = MechanismAdapter.properties(m);
        m.setAxisTilt(Math.toRadians(60));
        final MechanismProperties tilted = MechanismAdapter.properties(m);
        assertEquals(Math.toRadians(60), tilted.axisTilt(), 1e-12);
        assertEquals(level.pivotInertia(), tilted.pivotInertia(), 1e-12 * level.pivotInertia());
        // Pendulum on an inclined axis: only g cos α acts in the plane of swing, so cos 60° = 1/2
        // lengthens the period by √2 (Kibble & Berkshire, Classical Mechanics, inclined pendulum).
        assertEquals(level.smallAnglePeriod() * Math.sqrt(2), tilted.smallAnglePeriod(), 1e-12);
    }

    @Test
    void unusablePartIsNamedInTheError() {
        final Mechanism m = lidOnly();
        final Part rib = NamedElements.addPart(m, "rib");
        rib.setMass(-0.2);
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MechanismAdapter.properties(m));
        assertTrue(e.getMessage().startsWith("part 'rib': "), e.getMessage());
    }

    @Test
    void wholeHatchIsPlausible() {
        final InertiaSummary s = MechanismAdapter.inertia(InspectionHatch.create());
        // Radius of gyration at least Lc (docs/physics.md §2 "Inertia about the pivot"; follows from the parallel-axis
        // theorem).
        assertTrue(s.radiusOfGyration() >= s.centroidDistance());
        assertEquals(6, s.contributions().size(), "one contribution per part");
    }
}
