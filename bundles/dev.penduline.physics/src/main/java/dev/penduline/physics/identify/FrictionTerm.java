package dev.penduline.physics.identify;

/**
 * The friction and damping terms a fit may include (torques opposing the motion).
 */
public enum FrictionTerm {
    /** Linear viscous torque {@code b ω}; b in N·m·s/rad. */
    VISCOUS("b", "N·m·s/rad"),
    /** Dry (kinetic) Coulomb torque {@code Tc sgn ω}; Tc in N·m. */
    COULOMB("Tc", "N·m"),
    /** Static (breakaway) torque Ts ≥ Tc holding the body at rest; N·m. */
    STICTION("Ts", "N·m"),
    /** Quadratic (air) drag {@code c ω|ω|}; c in N·m·s²/rad². */
    DRAG("c", "N·m·s²/rad²");

    private final String symbol;
    private final String unit;

    FrictionTerm(String symbol, String unit) {
        this.symbol = symbol;
        this.unit = unit;
    }

    /**
     * The parameter's symbol in reports.
     *
     * @return b, Tc, Ts or c
     */
    public String symbol() {
        return symbol;
    }

    /**
     * The parameter's SI unit.
     *
     * @return the unit text
     */
    public String unit() {
        return unit;
    }
}
