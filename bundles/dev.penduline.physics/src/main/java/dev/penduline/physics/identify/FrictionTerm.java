package dev.penduline.physics.identify;

import java.util.Locale;

import dev.penduline.physics.units.Unit;

/**
 * The friction and damping terms a fit may include (torques opposing the motion): the one
 * source of each term's word, parameter symbol and unit.
 */
public enum FrictionTerm {
    /** Linear viscous torque {@code b ω}; b in N·m·s/rad. */
    VISCOUS("b", Unit.N_M_S_PER_RAD),
    /** Dry (kinetic) Coulomb torque {@code Tc sgn ω}; Tc in N·m. */
    COULOMB("Tc", Unit.NEWTON_METRE),
    /** Static (breakaway) torque Ts ≥ Tc holding the body at rest; N·m. */
    STICTION("Ts", Unit.NEWTON_METRE),
    /** Quadratic (air) drag {@code c ω|ω|}; c in N·m·s²/rad². */
    DRAG("c", Unit.N_M_S2_PER_RAD2);

    private final String symbol;
    private final Unit unit;

    FrictionTerm(String symbol, Unit unit) {
        this.symbol = symbol;
        this.unit = unit;
    }

    /**
     * The term's word, as the command line's options and {@code --terms}, the JSON, the
     * mechanism file's term identifiers and the stored fits spell it.
     *
     * @return "viscous", "coulomb", "stiction" or "drag"
     */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
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
     * @return the unit's symbol
     */
    public String unit() {
        return unit.symbol();
    }

    /**
     * The parameter's SI unit from the unit catalogue.
     *
     * @return the unit
     */
    public Unit siUnit() {
        return unit;
    }
}
