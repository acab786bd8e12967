package dev.penduline.physics.inertia;

import java.util.Locale;

/** One of the three axes of a shape's own frame, for shapes with a long or symmetry axis. */
public enum Axis {
    /** The x axis. */
    X(Vector3.PLUS_X),
    /** The y axis. */
    Y(Vector3.PLUS_Y),
    /** The z axis. */
    Z(Vector3.PLUS_Z);

    private final Vector3 unit;

    Axis(Vector3 unit) {
        this.unit = unit;
    }

    /**
     * The unit vector along this axis.
     *
     * @return the unit vector
     */
    public Vector3 unit() {
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
            default -> throw new IllegalArgumentException("'" + text + "' is not an axis: use x, y or z");
        };
    }
}
