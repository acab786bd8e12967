package dev.penduline.physics.inertia;

/**
 * An immutable vector or point in the mechanism frame (components in m when it is a position).
 *
 * <p>Kept deliberately small: the inertia engine needs sums, dot and cross products and norms,
 * nothing more, and the physics bundle does not depend on a geometry library.
 *
 * @param x component along the mechanism x axis
 * @param y component along the mechanism y axis (up, against gravity, by default)
 * @param z component along the mechanism z axis (the default pivot axis)
 */
public record Vector3(double x, double y, double z) {

    /** The zero vector (the origin when read as a point). */
    public static final Vector3 ZERO = new Vector3(0, 0, 0);
    /** Unit vector along +x. */
    public static final Vector3 PLUS_X = new Vector3(1, 0, 0);
    /** Unit vector along +y. */
    public static final Vector3 PLUS_Y = new Vector3(0, 1, 0);
    /** Unit vector along +z. */
    public static final Vector3 PLUS_Z = new Vector3(0, 0, 1);
    /** Unit vector along −y, the default direction of gravity. */
    public static final Vector3 MINUS_Y = new Vector3(0, -1, 0);

    /**
     * Shorthand constructor.
     *
     * @param x x component
     * @param y y component
     * @param z z component
     * @return the vector
     */
    public static Vector3 of(double x, double y, double z) {
        return new Vector3(x, y, z);
    }

    /**
     * Sum of this and another vector.
     *
     * @param o the other vector
     * @return this + o
     */
    public Vector3 plus(Vector3 o) {
        return new Vector3(x + o.x, y + o.y, z + o.z);
    }

    /**
     * Difference of this and another vector.
     *
     * @param o the other vector
     * @return this − o
     */
    public Vector3 minus(Vector3 o) {
        return new Vector3(x - o.x, y - o.y, z - o.z);
    }

    /**
     * This vector scaled.
     *
     * @param s the scale factor (dimensionless, or the unit it carries)
     * @return s · this
     */
    public Vector3 times(double s) {
        return new Vector3(s * x, s * y, s * z);
    }

    /**
     * Scalar product.
     *
     * @param o the other vector
     * @return this · o
     */
    public double dot(Vector3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    /**
     * Vector product.
     *
     * @param o the other vector
     * @return this × o
     */
    public Vector3 cross(Vector3 o) {
        return new Vector3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    /**
     * Euclidean length.
     *
     * @return |this|
     */
    public double norm() {
        return Math.sqrt(dot(this));
    }

    /**
     * Component {@code i} (0 = x, 1 = y, 2 = z).
     *
     * @param i the index, 0 to 2
     * @return the component
     */
    public double get(int i) {
        return switch (i) {
            case 0 -> x;
            case 1 -> y;
            case 2 -> z;
            default -> throw new IndexOutOfBoundsException("component index " + i + " is not 0, 1 or 2");
        };
    }

    /**
     * The unit vector in this direction.
     *
     * @return this / |this|
     * @throws IllegalArgumentException if this vector is zero or not finite
     */
    public Vector3 normalized() {
        final double n = norm();
        if (!(n > 0) || !Double.isFinite(n)) {
            throw new IllegalArgumentException("cannot take the direction of the vector " + this);
        }
        return times(1 / n);
    }

    /**
     * Whether all three components are finite numbers.
     *
     * @return true when no component is NaN or infinite
     */
    public boolean isFinite() {
        return Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z);
    }
}
