package dev.penduline.records.parts;

import java.util.List;
import java.util.Locale;

import dev.penduline.physics.units.Quantity;
import dev.penduline.physics.units.Unit;

/**
 * The columns a parts list may have. Text columns have a bare name; number columns a base name
 * and a unit suffix of the right quantity ({@code mass_kg}, {@code mass_g}, {@code mass_lb}).
 */
enum PartsColumn {
    NAME("name", null),
    SHAPE("shape", null),
    AXIS("axis", null),
    CUTOUT("cutout", null),
    QUANTITY("quantity", null, "qty"),
    MASS("mass", Quantity.MASS),
    DENSITY("density", Quantity.DENSITY),
    X("x", Quantity.LENGTH),
    Y("y", Quantity.LENGTH),
    Z("z", Quantity.LENGTH),
    LENGTH("length", Quantity.LENGTH),
    WIDTH("width", Quantity.LENGTH),
    HEIGHT("height", Quantity.LENGTH),
    RADIUS("radius", Quantity.LENGTH),
    INNER_RADIUS("inner_radius", Quantity.LENGTH),
    IXX("ixx", Quantity.INERTIA),
    IYY("iyy", Quantity.INERTIA),
    IZZ("izz", Quantity.INERTIA),
    IXY("ixy", Quantity.INERTIA),
    IXZ("ixz", Quantity.INERTIA),
    IYZ("iyz", Quantity.INERTIA),
    MASS_TOL("mass_tol", Quantity.MASS, "mass_tolerance"),
    DIM_TOL("dim_tol", Quantity.LENGTH, "dimension_tolerance");

    private final String base;
    private final Quantity quantity;
    private final List<String> aliases;

    PartsColumn(String base, Quantity quantity, String... aliases) {
        this.base = base;
        this.quantity = quantity;
        this.aliases = List.of(aliases);
    }

    String base() {
        return base;
    }

    /** The quantity of a number column, null for a text column. */
    Quantity quantity() {
        return quantity;
    }

    /**
     * The largest magnitude a value of this column can have on a pivoted mechanism, in SI, with a
     * wide margin (common practice, not a standard): 10 km for lengths and coordinates, 1 000 t for
     * masses, 10⁵ kg/m³ for densities (the densest element is about 2.26·10⁴ kg/m³), 10¹² kg·m² for
     * inertias. A larger value is a unit mistake, and it would overflow the inertia sums.
     */
    double maxMagnitude() {
        return switch (quantity) {
            case LENGTH -> 1e4;
            case MASS -> 1e6;
            case DENSITY -> 1e5;
            case INERTIA -> 1e12;
            default -> Double.MAX_VALUE;
        };
    }

    boolean isText() {
        return quantity == null;
    }

    /** The name in SI units, as the documentation writes it ("mass_kg", "name"). */
    String canonicalName() {
        return isText() ? base : base + "_" + Unit.si(quantity).suffix();
    }

    static PartsColumn byBase(String base) {
        final String b = base.toLowerCase(Locale.ROOT);
        for (PartsColumn c : values()) {
            if (c.base.equals(b) || c.aliases.contains(b)) {
                return c;
            }
        }
        return null;
    }
}
