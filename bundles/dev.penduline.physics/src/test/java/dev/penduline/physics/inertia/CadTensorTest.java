package dev.penduline.physics.inertia;

import static org.hipparchus.geometry.euclidean.threed.RotationConvention.VECTOR_OPERATOR;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/** Tensors as CAD exports them: rotated frames, products of inertia, and the reference point. */
class CadTensorTest {

    private static final double TOL = 1e-14;

    /** Box 12 kg, 0.3 × 0.2 × 0.1 m: principal 0.05, 0.10, 0.13 kg·m² (Meriam & Kraige Table D/4). */
    private static final Box BOX = new Box(0.3, 0.2, 0.1);

    @Test
    void boxTurnedAboutZMatchesTheRotationOfAxesFormulas() {
        // Rotation of axes in the plane (Beer & Johnston, Vector Mechanics for Engineers,
        // moments and products of inertia about rotated axes / Mohr's circle), for a turn φ = 30°:
        //   Ix' = Ix cos²φ + Iy sin²φ = 0.05×0.75 + 0.10×0.25 = 0.0625
        //   Iy' = Ix sin²φ + Iy cos²φ = 0.05×0.25 + 0.10×0.75 = 0.0875
        //   tensor element Ix'y' = (Ix − Iy) sinφ cosφ = −0.05 × √3/4 = −0.0216506351
        final InertiaTensor t = Part.of("box", BOX, 12, Vector3D.ZERO)
                .withOrientation(new Rotation(Vector3D.PLUS_K, Math.toRadians(30), VECTOR_OPERATOR))
                .centroidalInertia();
        assertEquals(0.0625, t.xx(), TOL);
        assertEquals(0.0875, t.yy(), TOL);
        assertEquals(0.13, t.zz(), TOL);
        assertEquals(-0.05 * Math.sqrt(3) / 4, t.xy(), TOL);
        assertEquals(0, t.xz(), TOL);
        assertEquals(0, t.yz(), TOL);
    }

    @Test
    void turnAboutTheBodyDiagonalPermutesTheAxes() {
        // A 120° turn about (1,1,1) carries x→y, y→z, z→x (rotation group of the cube, any
        // linear-algebra text), so the moment about mechanism y is the box's own Ixx, and so on.
        final Rotation cyclic = new Rotation(new Vector3D(1, 1, 1), 2 * Math.PI / 3, VECTOR_OPERATOR);
        final InertiaTensor t = BOX.centroidalInertia(12).rotated(cyclic);
        assertEquals(0.13, t.xx(), TOL);
        assertEquals(0.05, t.yy(), TOL);
        assertEquals(0.10, t.zz(), TOL);
        assertEquals(0, t.xy(), TOL);
        // Hipparchus' matrix of the turn has the part's own axes as columns (x → y, y → z, z → x),
        // the R of R I Rᵀ that InertiaTensor.rotated applies.
        final double[][] permutation = {{0, 0, 1}, {1, 0, 0}, {0, 1, 0}};
        final double[][] matrix = cyclic.getMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertEquals(permutation[i][j], matrix[i][j], 1e-15);
            }
        }
    }

    @Test
    void quarterTurnAboutXCarriesAFullTensorAsRIRTransposedByHand() {
        // A tensor with all six elements, turned +90° about x. The turn carries the part's x to
        // mechanism x, its y to mechanism z and its z to mechanism −y, so (columns = the part's
        // axes) R = [[1, 0, 0], [0, 0, −1], [0, 1, 0]]. The transformation rule of a second-order
        // tensor, I' = R I Rᵀ (Goldstein, Classical Mechanics, ch. 5, the inertia tensor under a
        // change of axes), multiplied out by hand for I = [[a, d, e], [d, b, f], [e, f, c]]:
        //   R I  = [[a, d, e], [−e, −f, −c], [d, b, f]]
        //   R I Rᵀ = [[a, −e, d], [−e, c, −f], [d, −f, b]]
        // (the moment about mechanism y is the part's own Izz, as the part's z now lies along −y).
        // Here a, b, c = 0.05, 0.10, 0.13 and d, e, f = −0.004, 0.003, −0.002 kg·m².
        final InertiaTensor own = new InertiaTensor(0.05, 0.10, 0.13, -0.004, 0.003, -0.002);
        final InertiaTensor t = Part.ofTensor("bracket", 12, Vector3D.ZERO, own)
                .withOrientation(new Rotation(Vector3D.PLUS_I, Math.PI / 2, VECTOR_OPERATOR)).centroidalInertia();
        final double[][] byHand = {{0.05, -0.003, -0.004}, {-0.003, 0.13, 0.002}, {-0.004, 0.002, 0.10}};
        final double[][] turned = t.toMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertEquals(byHand[i][j], turned[i][j], TOL, "element " + i + j);
            }
        }
    }

    @Test
    void tensorAboutTheOriginAndAboutTheCentroidGiveTheSameJ0() {
        // The box above turned 30° about z, centroid c = (0.2, −0.5, 0.1) m, m = 12 kg. About the
        // CAD origin, by hand with the parallel-axis theorem for moments and products (Meriam &
        // Kraige, Dynamics, Appendix B; products of inertia there are +∫xy dm, here negated):
        //   |c|² = 0.30; transfer m(|c|²E − c cᵀ): xx 3.12, yy 0.60, zz 3.48, xy 1.2, xz −0.24, yz 0.6
        //   I_O = (3.1825, 0.6875, 3.61, 1.1783493649, −0.24, 0.6)
        final InertiaTensor atCentroid = new InertiaTensor(0.0625, 0.0875, 0.13, -0.05 * Math.sqrt(3) / 4, 0, 0);
        final InertiaTensor atOrigin = new InertiaTensor(3.1825, 0.6875, 3.61, 1.2 - 0.05 * Math.sqrt(3) / 4, -0.24, 0.6);
        final Vector3D c = new Vector3D(0.2, -0.5, 0.1);
        final CadMassProperties byCentroid = new CadMassProperties(12, c, atCentroid, TensorReference.CENTROID);
        final CadMassProperties byOrigin = new CadMassProperties(12, c, atOrigin, TensorReference.FRAME_ORIGIN);
        final InertiaTensor shifted = byOrigin.centroidalTensor();
        assertEquals(atCentroid.xx(), shifted.xx(), TOL);
        assertEquals(atCentroid.yy(), shifted.yy(), TOL);
        assertEquals(atCentroid.zz(), shifted.zz(), TOL);
        assertEquals(atCentroid.xy(), shifted.xy(), TOL);
        assertEquals(0, shifted.xz(), TOL);
        assertEquals(0, shifted.yz(), TOL);

        // About a skew axis through the origin, n = (1, 0, 1)/√2, J0 = nᵀ I_O n
        //   = (Ixx + Izz + 2 Ixz)/2 = (3.1825 + 3.61 − 0.48)/2 = 3.15625 kg·m² by hand.
        final PivotInertia skew = PivotInertia.DEFAULT.withAxis(new PivotAxis(Vector3D.ZERO, new Vector3D(1, 0, 1)));
        final double j1 = skew.compute(List.of(byCentroid.toPart("cover"))).pivotInertia();
        final double j2 = skew.compute(List.of(byOrigin.toPart("cover"))).pivotInertia();
        assertEquals(3.15625, j1, 1e-13);
        assertEquals(3.15625, j2, 1e-13);
        assertEquals(3.61, PivotInertia.DEFAULT.compute(List.of(byOrigin.toPart("cover"))).pivotInertia(), 1e-13);
    }

    @Test
    void positiveProductIntegralsAreNegatedIntoTensorElements() {
        // A point mass m at (x, y, 0) has +∫xy dm = m x y and tensor element −m x y (definition).
        final InertiaTensor t = InertiaTensor.fromProductIntegrals(1, 2, 3, 0.4, 0.5, 0.6);
        assertEquals(-0.4, t.xy(), 0);
        assertEquals(-0.5, t.xz(), 0);
        assertEquals(-0.6, t.yz(), 0);
        assertEquals(-2 * 0.3 * 0.5, InertiaTensor.transfer(2, new Vector3D(0.3, 0.5, 0)).xy(), 1e-16);
    }

    @Test
    void reportFramePlacedInTheMechanism() {
        // A report frame turned +90° about z (its x along mechanism y) with origin at (1, 0, 0):
        // a centroid at (0.2, 0, 0) in the report sits at (1, 0.2, 0), and the report's Ixx
        // becomes the mechanism's Iyy (rotation of axes, as above).
        final CadMassProperties report = new CadMassProperties(2, new Vector3D(0.2, 0, 0),
                InertiaTensor.diagonal(0.01, 0.02, 0.03), TensorReference.CENTROID);
        final Part p = report.toPart("lid", new Rotation(Vector3D.PLUS_K, Math.PI / 2, VECTOR_OPERATOR),
                new Vector3D(1, 0, 0));
        assertEquals(1, p.centroid().getX(), TOL);
        assertEquals(0.2, p.centroid().getY(), TOL);
        assertEquals(0.02, p.centroidalInertia().xx(), TOL);
        assertEquals(0.01, p.centroidalInertia().yy(), TOL);
    }
}
