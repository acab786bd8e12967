package dev.penduline.physics.inertia;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InvalidValueException;

/**
 * The axis a mechanism turns about: a point on it and its direction, in the mechanism frame.
 *
 * @param point     any point on the axis (m)
 * @param direction the axis direction; stored as a unit vector. Angles about the axis are
 *                  positive by the right-hand rule about this direction.
 */
public record PivotAxis(Vector3D point, Vector3D direction) {

    /** The default axis: z through the origin. */
    public static final PivotAxis Z_THROUGH_ORIGIN = new PivotAxis(Vector3D.ZERO, Vector3D.PLUS_K);

    /**
     * Checks the axis and normalises its direction.
     *
     * @throws IllegalArgumentException for a zero or non-finite direction or point
     */
    public PivotAxis {
        if (point == null || point.isNaN() || point.isInfinite()) {
            throw new InvalidValueException("pivot axis point must be a finite position, got " + point);
        }
        if (direction == null || direction.isNaN() || direction.isInfinite() || !(direction.getNorm() > 0)) {
            throw new InvalidValueException("pivot axis direction must be a non-zero finite vector, got " + direction);
        }
        direction = direction.normalize();
    }

    /**
     * The component of {@code p − point} perpendicular to the axis: the offset of {@code p} from
     * the axis.
     *
     * @param p a position in the mechanism frame (m)
     * @return the perpendicular offset (m)
     */
    public Vector3D perpendicularOffset(Vector3D p) {
        final Vector3D r = p.subtract(point);
        return r.subtract(direction.scalarMultiply(r.dotProduct(direction)));
    }

    /**
     * Perpendicular distance of a point from the axis.
     *
     * @param p a position in the mechanism frame (m)
     * @return the distance (m)
     */
    public double distanceTo(Vector3D p) {
        return perpendicularOffset(p).getNorm();
    }
}
