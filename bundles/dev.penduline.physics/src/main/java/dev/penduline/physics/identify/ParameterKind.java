package dev.penduline.physics.identify;

/**
 * What each entry of the least-squares parameter vector is. The first four are physical and
 * shared by every session; the last three are nuisance parameters, one set per session.
 */
enum ParameterKind {
    /** Viscous coefficient b (N·m·s/rad). */
    VISCOUS("b", "N·m·s/rad", true),
    /** Coulomb torque Tc (N·m). */
    COULOMB("Tc", "N·m", true),
    /** Quadratic drag coefficient c (N·m·s²/rad²). */
    DRAG("c", "N·m·s²/rad²", true),
    /** Pivot inertia J0 (kg·m²). */
    INERTIA("J0", "kg·m²", true),
    /** Release angle θ0, measured from the hanging equilibrium (rad). */
    RELEASE_ANGLE("theta0", "rad", false),
    /** Release time t_r on the record's time base (s). */
    RELEASE_TIME("tRelease", "s", false),
    /** Sensor reading at the hanging equilibrium (rad). */
    OFFSET("offset", "rad", false);

    private final String symbol;
    private final String unit;
    private final boolean physical;

    ParameterKind(String symbol, String unit, boolean physical) {
        this.symbol = symbol;
        this.unit = unit;
        this.physical = physical;
    }

    String symbol() {
        return symbol;
    }

    String unit() {
        return unit;
    }

    boolean physical() {
        return physical;
    }

    /** Whether the trajectory's sensitivity to this parameter is integrated with the state. */
    boolean integrated() {
        return this != RELEASE_TIME && this != OFFSET;
    }
}
