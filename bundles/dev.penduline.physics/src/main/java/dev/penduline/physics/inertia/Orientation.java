package dev.penduline.physics.inertia;

import java.util.Arrays;

/**
 * An immutable proper rotation: how a part's own frame sits in the mechanism frame.
 *
 * <p>The matrix {@code R} carries a vector given in the part's own frame into the mechanism
 * frame ({@code v_mech = R v_own}); its columns are the part's own x, y and z axes written in
 * mechanism coordinates. A tensor given in the part's frame therefore reads {@code R I Rᵀ} in the
 * mechanism frame.
 */
public final class Orientation {

    /** The part's frame is parallel to the mechanism frame. */
    public static final Orientation IDENTITY = new Orientation(new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}});

    /** How far from orthonormal (entry-wise) a user-given matrix may be. */
    private static final double ORTHONORMAL_SLACK = 1e-9;

    private final double[][] m;

    private Orientation(double[][] m) {
        this.m = m;
    }

    /**
     * The rotation by {@code angle} about {@code axis}, positive by the right-hand rule
     * (Rodrigues' rotation formula).
     *
     * @param axis  the rotation axis (any non-zero length)
     * @param angle the rotation angle (rad)
     * @return the orientation
     */
    public static Orientation about(Vector3 axis, double angle) {
        if (!Double.isFinite(angle)) {
            throw new IllegalArgumentException("rotation angle must be finite, got " + angle);
        }
        final Vector3 k = axis.normalized();
        final double c = Math.cos(angle);
        final double s = Math.sin(angle);
        final double t = 1 - c;
        return new Orientation(new double[][] {
            {c + t * k.x() * k.x(), t * k.x() * k.y() - s * k.z(), t * k.x() * k.z() + s * k.y()},
            {t * k.y() * k.x() + s * k.z(), c + t * k.y() * k.y(), t * k.y() * k.z() - s * k.x()},
            {t * k.z() * k.x() - s * k.y(), t * k.z() * k.y() + s * k.x(), c + t * k.z() * k.z()}});
    }

    /**
     * An orientation from its rotation matrix (columns = the part's axes in mechanism coordinates).
     *
     * @param matrix a 3×3 proper orthonormal matrix (dimensionless)
     * @return the orientation
     * @throws IllegalArgumentException when the matrix is not 3×3, not orthonormal or a reflection
     */
    public static Orientation ofMatrix(double[][] matrix) {
        if (matrix == null || matrix.length != 3) {
            throw new IllegalArgumentException("an orientation matrix must be 3×3");
        }
        final double[][] c = new double[3][];
        for (int i = 0; i < 3; i++) {
            if (matrix[i] == null || matrix[i].length != 3) {
                throw new IllegalArgumentException("an orientation matrix must be 3×3 (row " + i + ")");
            }
            c[i] = matrix[i].clone();
        }
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double dot = 0;
                for (int k = 0; k < 3; k++) {
                    dot += c[k][i] * c[k][j];
                }
                if (!(Math.abs(dot - (i == j ? 1 : 0)) <= ORTHONORMAL_SLACK)) {
                    throw new IllegalArgumentException("orientation matrix " + Arrays.deepToString(matrix)
                            + " is not orthonormal (columns " + i + " and " + j + ")");
                }
            }
        }
        final Orientation o = new Orientation(c);
        if (o.determinant() < 0) {
            throw new IllegalArgumentException("orientation matrix " + Arrays.deepToString(matrix)
                    + " is a reflection (determinant −1), not a rotation");
        }
        return o;
    }

    /**
     * Carries a vector from the part's frame into the mechanism frame.
     *
     * @param v the vector in the part's frame
     * @return R v
     */
    public Vector3 apply(Vector3 v) {
        return new Vector3(
                m[0][0] * v.x() + m[0][1] * v.y() + m[0][2] * v.z(),
                m[1][0] * v.x() + m[1][1] * v.y() + m[1][2] * v.z(),
                m[2][0] * v.x() + m[2][1] * v.y() + m[2][2] * v.z());
    }

    /**
     * The orientation obtained by first applying this one, then {@code next}.
     *
     * @param next the rotation applied afterwards
     * @return next · this
     */
    public Orientation then(Orientation next) {
        final double[][] p = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                for (int k = 0; k < 3; k++) {
                    p[i][j] += next.m[i][k] * m[k][j];
                }
            }
        }
        return new Orientation(p);
    }

    /**
     * Entry of the rotation matrix.
     *
     * @param row    row index 0..2
     * @param column column index 0..2
     * @return R[row][column]
     */
    public double entry(int row, int column) {
        return m[row][column];
    }

    /**
     * A copy of the rotation matrix.
     *
     * @return the 3×3 matrix R
     */
    public double[][] matrix() {
        return new double[][] {m[0].clone(), m[1].clone(), m[2].clone()};
    }

    /**
     * Whether this is (to rounding) the identity.
     *
     * @return true when every entry is within 1e-15 of the identity's
     */
    public boolean isIdentity() {
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                if (Math.abs(m[i][j] - (i == j ? 1 : 0)) > 1e-15) {
                    return false;
                }
            }
        }
        return true;
    }

    private double determinant() {
        return m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1])
                - m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0])
                + m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Orientation other && Arrays.deepEquals(m, other.m);
    }

    @Override
    public int hashCode() {
        return Arrays.deepHashCode(m);
    }

    @Override
    public String toString() {
        return "Orientation" + Arrays.deepToString(m);
    }
}
