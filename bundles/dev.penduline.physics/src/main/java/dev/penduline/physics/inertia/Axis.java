package dev.penduline.physics.inertia;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InvalidValueException;

/** One of the three axes of a shape's own frame, for shapes with a long or symmetry axis. */
public enum Axis {
    /** The x axis. */
    X(Vector3D.PLUS_I),
    /** The y axis. */
    Y(Vector3D.PLUS_J),
    /** The z axis. */
    Z(Vector3D.PLUS_K);

    private final Vector3D unit;

    Axis(Vector3D unit) {
        this.unit = unit;
    }

    /**
     * The unit vector along this axis.
     *
     * @return the unit vector
     */
    public Vector3D unit() {
        return unit;
    }

    /**
     * Index of the axis in a tensor (0, 1 or 2).
     *
     * @return the index
     */
    public int index() {
        return ordinal();
    }

    /**
     * Reads "x", "y" or "z" (any case, surrounding blanks ignored).
     *
     * @param text the axis letter
     * @return the axis
     * @throws IllegalArgumentException naming the text when it is not an axis letter
     */
    public static Axis parse(String text) {
        final String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        return switch (t) {
            case "x" -> X;
            case "y" -> Y;
            case "z" -> Z;
            default -> throw new InvalidValueException("'" + text + "' is not an axis: use x, y or z");
        };
    }
}
