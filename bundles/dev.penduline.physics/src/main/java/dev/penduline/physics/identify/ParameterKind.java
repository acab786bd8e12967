package dev.penduline.physics.identify;

import dev.penduline.physics.units.Unit;

/**
 * What each entry of the least-squares parameter vector is. The first four are physical and
 * shared by every session, at the index {@link #index()} of the full vector; the last three are
 * nuisance parameters, one set per session, at {@link #index()} within the session's set. The
 * friction coefficients take their symbol and unit from {@link FrictionTerm}.
 */
enum ParameterKind {
    /** Viscous coefficient b (N·m·s/rad). */
    VISCOUS(FrictionTerm.VISCOUS, 0),
    /** Coulomb torque Tc (N·m). */
    COULOMB(FrictionTerm.COULOMB, 1),
    /** Quadratic drag coefficient c (N·m·s²/rad²). */
    DRAG(FrictionTerm.DRAG, 2),
    /** Pivot inertia J0 (kg·m²). */
    INERTIA("J0", Unit.KG_M2, true, 3),
    /** Release angle θ0, measured from the hanging equilibrium (rad). */
    RELEASE_ANGLE("theta0", Unit.RADIAN, false, 0),
    /** Release time t_r on the record's time base (s). */
    RELEASE_TIME("tRelease", Unit.SECOND, false, 1),
    /** Sensor reading at the hanging equilibrium (rad). */
    OFFSET("offset", Unit.RADIAN, false, 2);

    private final String symbol;
    private final Unit unit;
    private final boolean physical;
    private final int index;

    ParameterKind(FrictionTerm term, int index) {
        this(term.symbol(), term.siUnit(), true, index);
    }

    ParameterKind(String symbol, Unit unit, boolean physical, int index) {
        this.symbol = symbol;
        this.unit = unit;
        this.physical = physical;
        this.index = index;
    }

    String symbol() {
        return symbol;
    }

    String unit() {
        return unit.symbol();
    }

    boolean physical() {
        return physical;
    }

    /** Index in the full vector (physical) or within a session's set (nuisance). */
    int index() {
        return index;
    }

    /** Whether the trajectory's sensitivity to this parameter is integrated with the state. */
    boolean integrated() {
        return this != RELEASE_TIME && this != OFFSET;
    }
}
