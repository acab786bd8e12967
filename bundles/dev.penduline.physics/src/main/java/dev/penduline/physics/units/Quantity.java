package dev.penduline.physics.units;

/** The kinds of physical quantity Penduline reads and shows, each with its SI unit. */
public enum Quantity {
    /** Length, SI unit m. */
    LENGTH("m"),
    /** Mass, SI unit kg. */
    MASS("kg"),
    /** Mass moment of inertia, SI unit kg·m². */
    INERTIA("kg·m²"),
    /** Plane angle, SI unit rad. */
    ANGLE("rad"),
    /** Time, SI unit s. */
    TIME("s"),
    /** Angular velocity, SI unit rad/s. */
    ANGULAR_VELOCITY("rad/s"),
    /** Torque, SI unit N·m. */
    TORQUE("N·m"),
    /** Viscous friction coefficient: torque per angular velocity. */
    VISCOUS_COEFFICIENT("N·m·s/rad"),
    /** Quadratic drag coefficient: torque per square of the angular velocity. */
    DRAG_COEFFICIENT("N·m·s²/rad²"),
    /** Mass density, SI unit kg/m³. */
    DENSITY("kg/m³");

    private final String siSymbol;

    Quantity(String siSymbol) {
        this.siSymbol = siSymbol;
    }

    /**
     * The symbol of the SI unit this quantity is held in.
     *
     * @return the symbol, e.g. "kg·m²"
     */
    public String siSymbol() {
        return siSymbol;
    }

    /**
     * Lower-case name for messages ("angular velocity").
     *
     * @return the readable name
     */
    public String readableName() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
    }
}
