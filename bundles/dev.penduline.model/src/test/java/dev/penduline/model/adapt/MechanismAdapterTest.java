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
import dev.penduline.physics.inertia.InertiaTensor;

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
    void fileAnglesTurnAGivenTensorAsRIRTransposedByHand() {
        // rotationX = 90°, then rotationZ = 90°, both about fixed mechanism axes: R = Rz·Rx.
        //   Rx(90°) = [[1, 0, 0], [0, 0, −1], [0, 1, 0]], Rz(90°) = [[0, −1, 0], [1, 0, 0], [0, 0, 1]]
        //   Rz·Rx = [[0, 0, 1], [1, 0, 0], [0, 1, 0]]: the part's x lies along mechanism y, its y
        //   along z, its z along x.
        // A tensor turns as I' = R I Rᵀ (Goldstein, Classical Mechanics, ch. 5, the inertia tensor
        // under a change of axes); with this permutation, for I = [[a, d, e], [d, b, f], [e, f, c]],
        // by hand: I' = [[c, e, f], [e, a, d], [f, d, b]]. (Turned the other way round, Rx·Rz, the
        // moment about mechanism x would be b, not c.)
        final double a = 1.2e-4;
        final double b = 2.1e-4;
        final double c = 2.6e-4;
        final double d = -1.5e-5;
        final double e = 0.8e-5;
        final double f = -0.6e-5;
        final Mechanism m = NamedElements.mechanism("Latch");
        final Part latch = NamedElements.addPart(m, "Latch");
        latch.setShape(ShapeKind.MASS_PROPERTIES);
        latch.setMass(0.25);
        latch.setIxx(a);
        latch.setIyy(b);
        latch.setIzz(c);
        latch.setIxy(d);
        latch.setIxz(e);
        latch.setIyz(f);
        latch.setRotationX(Math.PI / 2);
        latch.setRotationZ(Math.PI / 2);
        final InertiaTensor t = MechanismAdapter.part(latch).centroidalInertia();
        final double tol = 1e-15;
        assertEquals(c, t.xx(), tol);
        assertEquals(a, t.yy(), tol);
        assertEquals(b, t.zz(), tol);
        assertEquals(e, t.xy(), tol);
        assertEquals(f, t.xz(), tol);
        assertEquals(d, t.yz(), tol);
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
    void wholeHatchMatchesAHandSumOfItsParts() {
        final InertiaSummary s = MechanismAdapter.inertia(InspectionHatch.create());
        // By hand, part by part, about the hinge (the z axis through the origin): each part's own
        // moment about the z axis through its centroid, plus m (x² + y²) (parallel-axis theorem,
        // Meriam & Kraige, Engineering Mechanics: Dynamics, Appendix B); a part's z offset along
        // the hinge adds nothing. Moments from Machinery's Handbook, "Moments of Inertia" table.
        // Lid: box t × a × L (x, y, z) from the density; about z: m (t² + a²)/12, at (0, −a/2, 0).
        final double lidMass = RHO * T * A * L;
        final double lid = lidMass * (T * T + A * A) / 12 + lidMass * (A / 2) * (A / 2);
        // Rib, two copies: slender rod 0.38 m along y, 0.45 kg each; about z: m l²/12, at (0.012, −0.2, 0).
        final double rib = 2 * (0.45 * 0.38 * 0.38 / 12 + 0.45 * (0.012 * 0.012 + 0.2 * 0.2));
        // Handle: point mass 0.3 kg at (0.035, −0.37, 0).
        final double handle = 0.3 * (0.035 * 0.035 + 0.37 * 0.37);
        // Hinge pin: tube r = 6 mm, ri = 3 mm along z, 0.1 kg, on the axis; about its own axis m (r² + ri²)/2.
        final double pin = 0.1 * (0.006 * 0.006 + 0.003 * 0.003) / 2;
        // Inspection hole, cut out: solid cylinder r = 0.05 m, h = t along x, steel; about z (a
        // diameter): m (3r² + h²)/12, at (0, −0.25, 0.15); subtracted.
        final double holeMass = RHO * Math.PI * 0.05 * 0.05 * T;
        final double hole = holeMass * (3 * 0.05 * 0.05 + T * T) / 12 + holeMass * 0.25 * 0.25;
        // Latch: given tensor about its centroid, Izz = 2.6e-4 kg·m², 0.25 kg at (0.02, −0.39, 0.2).
        final double latch = 2.6e-4 + 0.25 * (0.02 * 0.02 + 0.39 * 0.39);
        final double mass = lidMass + 2 * 0.45 + 0.3 + 0.1 - holeMass + 0.25;
        // Composite centroid: Σ m c / Σ m (definition).
        final double cx = (2 * 0.45 * 0.012 + 0.3 * 0.035 + 0.25 * 0.02) / mass;
        final double cy = (lidMass * -A / 2 + 2 * 0.45 * -0.2 + 0.3 * -0.37 - holeMass * -0.25 + 0.25 * -0.39) / mass;
        final double cz = (-holeMass * 0.15 + 0.25 * 0.2) / mass;
        final double j0 = lid + rib + handle + pin - hole + latch;
        // (The same sums on a calculator: M = 8.83938498 kg, centroid (0.00297532, −0.20748573,
        // 0.00147157) m, Lc = 0.20750706 m, J0 = 0.51314650 kg·m².)
        assertEquals(mass, s.totalMass(), 1e-12 * mass);
        assertEquals(cx, s.centroid().getX(), 1e-15);
        assertEquals(cy, s.centroid().getY(), 1e-15);
        assertEquals(cz, s.centroid().getZ(), 1e-15);
        assertEquals(Math.hypot(cx, cy), s.centroidDistance(), 1e-15);
        assertEquals(j0, s.pivotInertia(), 1e-12 * j0);
        assertEquals(j0 - mass * (cx * cx + cy * cy), s.centroidalInertia(), 1e-12 * j0);
        assertEquals(6, s.contributions().size(), "one contribution per part");
        assertEquals(lid, s.contributions().get(0).pivotInertia(), 1e-12 * lid);
        assertEquals(-hole, s.contributions().get(4).pivotInertia(), 1e-12 * hole);
    }
}
