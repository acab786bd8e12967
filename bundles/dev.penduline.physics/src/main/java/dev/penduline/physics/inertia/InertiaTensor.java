package dev.penduline.physics.inertia;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

import dev.penduline.physics.InvalidValueException;

/**
 * A symmetric 3×3 mass-moment-of-inertia tensor (kg·m²), immutable.
 *
 * <p><b>Sign convention of the products of inertia.</b> The off-diagonal components are the
 * <em>elements of the tensor</em>: {@code xy = Ixy = −∫ x y dm}, {@code xz = −∫ x z dm},
 * {@code yz = −∫ y z dm}, so that the moment about a unit axis {@code n} is simply
 * {@code nᵀ I n} and the tensor rotates as {@code R I Rᵀ}. Some CAD programs and textbooks list
 * the positive integrals {@code Pxy = +∫ x y dm} instead; those must be negated before they are
 * put here (see {@link #fromProductIntegrals}).
 *
 * @param xx moment about the x axis, ∫(y² + z²) dm (kg·m²)
 * @param yy moment about the y axis, ∫(x² + z²) dm (kg·m²)
 * @param zz moment about the z axis, ∫(x² + y²) dm (kg·m²)
 * @param xy tensor element Ixy = −∫ x y dm (kg·m²)
 * @param xz tensor element Ixz = −∫ x z dm (kg·m²)
 * @param yz tensor element Iyz = −∫ y z dm (kg·m²)
 */
public record InertiaTensor(double xx, double yy, double zz, double xy, double xz, double yz) {

    /** The zero tensor (a point mass about its own centroid). */
    public static final InertiaTensor ZERO = new InertiaTensor(0, 0, 0, 0, 0, 0);

    /** Relative asymmetry tolerated by {@link #fromMatrix(double[][])}. */
    private static final double SYMMETRY_SLACK = 1e-9;

    /**
     * Checks that every component is finite.
     *
     * @throws IllegalArgumentException naming the component
     */
    public InertiaTensor {
        final double[] v = {xx, yy, zz, xy, xz, yz};
        final String[] n = {"xx", "yy", "zz", "xy", "xz", "yz"};
        for (int i = 0; i < v.length; i++) {
            if (!Double.isFinite(v[i])) {
                throw new InvalidValueException("inertia tensor component I" + n[i] + " must be finite, got " + v[i]);
            }
        }
    }

    /**
     * A diagonal tensor (principal axes along the frame axes).
     *
     * @param xx moment about x (kg·m²)
     * @param yy moment about y (kg·m²)
     * @param zz moment about z (kg·m²)
     * @return the tensor
     */
    public static InertiaTensor diagonal(double xx, double yy, double zz) {
        return new InertiaTensor(xx, yy, zz, 0, 0, 0);
    }

    /**
     * The tensor of a body symmetric about one of its frame axes.
     *
     * @param axis       the symmetry axis
     * @param axial      moment about the symmetry axis (kg·m²)
     * @param transverse moment about any axis through the centroid normal to it (kg·m²)
     * @return the diagonal tensor
     */
    public static InertiaTensor axisymmetric(Axis axis, double axial, double transverse) {
        return switch (axis) {
            case X -> diagonal(axial, transverse, transverse);
            case Y -> diagonal(transverse, axial, transverse);
            case Z -> diagonal(transverse, transverse, axial);
        };
    }

    /**
     * A tensor from moments and the <em>positive</em> product integrals {@code Pxy = +∫ x y dm}
     * (the form some CAD mass-property reports use); they are negated into tensor elements.
     *
     * @param xx  moment about x (kg·m²)
     * @param yy  moment about y (kg·m²)
     * @param zz  moment about z (kg·m²)
     * @param pxy +∫ x y dm (kg·m²)
     * @param pxz +∫ x z dm (kg·m²)
     * @param pyz +∫ y z dm (kg·m²)
     * @return the tensor
     */
    public static InertiaTensor fromProductIntegrals(double xx, double yy, double zz,
            double pxy, double pxz, double pyz) {
        return new InertiaTensor(xx, yy, zz, -pxy, -pxz, -pyz);
    }

    /**
     * A tensor from a full symmetric 3×3 matrix.
     *
     * @param m the matrix (kg·m²); must be symmetric to 1e-9 relative to its largest entry
     * @return the tensor
     * @throws IllegalArgumentException when the matrix is not 3×3 or not symmetric (use
     *         {@link TensorCheck} first to list what is wrong with a user-given matrix)
     */
    public static InertiaTensor fromMatrix(double[][] m) {
        if (m == null || m.length != 3 || m[0].length != 3 || m[1].length != 3 || m[2].length != 3) {
            throw new IllegalArgumentException("an inertia tensor must be a 3×3 matrix");
        }
        double scale = 0;
        for (double[] row : m) {
            for (double e : row) {
                scale = Math.max(scale, Math.abs(e));
            }
        }
        final double slack = SYMMETRY_SLACK * scale;
        if (Math.abs(m[0][1] - m[1][0]) > slack || Math.abs(m[0][2] - m[2][0]) > slack
                || Math.abs(m[1][2] - m[2][1]) > slack) {
            throw new InvalidValueException("inertia tensor is not symmetric");
        }
        return new InertiaTensor(m[0][0], m[1][1], m[2][2],
                0.5 * (m[0][1] + m[1][0]), 0.5 * (m[0][2] + m[2][0]), 0.5 * (m[1][2] + m[2][1]));
    }

    /**
     * The inertia of a point mass about a reference point: {@code m (|r|² E − r rᵀ)}, the
     * transfer term of the three-dimensional parallel-axis theorem.
     *
     * @param mass the mass (kg), may be negative for a cut-out
     * @param r    position of the mass relative to the reference point (m)
     * @return the transfer tensor (kg·m²)
     */
    public static InertiaTensor transfer(double mass, Vector3D r) {
        final double x = r.getX();
        final double y = r.getY();
        final double z = r.getZ();
        return new InertiaTensor(mass * (y * y + z * z), mass * (x * x + z * z), mass * (x * x + y * y),
                -mass * x * y, -mass * x * z, -mass * y * z);
    }

    /**
     * The same body's tensor about another point, given this tensor about its centroid
     * (parallel-axis theorem, keeping the products of inertia).
     *
     * @param mass               the body's mass (kg)
     * @param centroidFromPoint  the centroid's position relative to the new point (m)
     * @return the tensor about the new point (kg·m²)
     */
    public InertiaTensor aboutPoint(double mass, Vector3D centroidFromPoint) {
        return plus(transfer(mass, centroidFromPoint));
    }

    /**
     * The same body's tensor about its centroid, given this tensor about some other point
     * (parallel-axis theorem in reverse).
     *
     * @param mass              the body's mass (kg)
     * @param centroidFromPoint the centroid's position relative to the point this tensor is about (m)
     * @return the centroidal tensor (kg·m²)
     */
    public InertiaTensor toCentroid(double mass, Vector3D centroidFromPoint) {
        return plus(transfer(-mass, centroidFromPoint));
    }

    /**
     * Component-wise sum.
     *
     * @param o the other tensor (same reference point and frame)
     * @return this + o
     */
    public InertiaTensor plus(InertiaTensor o) {
        return new InertiaTensor(xx + o.xx, yy + o.yy, zz + o.zz, xy + o.xy, xz + o.xz, yz + o.yz);
    }

    /**
     * This tensor scaled (quantity of copies, sign of a cut-out, or a mass ratio).
     *
     * @param s the factor (dimensionless)
     * @return s · this
     */
    public InertiaTensor times(double s) {
        return new InertiaTensor(s * xx, s * yy, s * zz, s * xy, s * xz, s * yz);
    }

    /**
     * This tensor expressed in the mechanism frame when it was given in a frame oriented by
     * {@code r}: {@code R I Rᵀ}, with {@code R = r.getMatrix()} the matrix for which
     * {@code r.applyTo(v) = R v} (a vector in that frame carried into the mechanism frame).
     *
     * @param r the orientation of the frame this tensor is given in
     * @return the rotated tensor (kg·m²)
     */
    public InertiaTensor rotated(Rotation r) {
        if (r.getAngle() == 0) {
            return this;
        }
        final RealMatrix m = MatrixUtils.createRealMatrix(r.getMatrix());
        return fromMatrix(m.multiply(toRealMatrix()).multiplyTransposed(m).getData());
    }

    /**
     * Moment of inertia about an axis through the tensor's reference point: {@code nᵀ I n}.
     *
     * @param direction the axis direction (any non-zero length; it is normalised)
     * @return the moment (kg·m²)
     */
    public double momentAbout(Vector3D direction) {
        if (direction.isNaN() || direction.isInfinite() || !(direction.getNorm() > 0)) {
            throw new IllegalArgumentException("cannot take the direction of the vector " + direction);
        }
        final Vector3D n = direction.normalize();
        final double x = n.getX();
        final double y = n.getY();
        final double z = n.getZ();
        return x * x * xx + y * y * yy + z * z * zz + 2 * (x * y * xy + x * z * xz + y * z * yz);
    }

    /**
     * The full matrix.
     *
     * @return a new 3×3 array (kg·m²)
     */
    public double[][] toMatrix() {
        return new double[][] {{xx, xy, xz}, {xy, yy, yz}, {xz, yz, zz}};
    }

    /**
     * The full matrix as a Hipparchus matrix.
     *
     * @return the matrix (kg·m²)
     */
    public RealMatrix toRealMatrix() {
        return MatrixUtils.createRealMatrix(toMatrix());
    }

    /**
     * The principal moments, largest first.
     *
     * @return the three eigenvalues (kg·m²)
     */
    public double[] principalMoments() {
        return new EigenDecompositionSymmetric(toRealMatrix()).getEigenvalues();
    }

    /**
     * Sum of the diagonal, {@code 2 ∫ |r|² dm}, invariant under rotation.
     *
     * @return the trace (kg·m²)
     */
    public double trace() {
        return xx + yy + zz;
    }
}
