package dev.penduline.physics.units;

import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.physics.InvalidValueException;

/**
 * A unit of measurement: its display symbol, the suffix it carries in column names, the quantity
 * it measures and how many SI units one of it makes. The one place in Penduline where values
 * change units; everything inside is SI.
 *
 * <p>Factors are exact by definition where the definition is exact: the international inch is
 * 25.4 mm and the international avoirdupois pound 0.45359237 kg (international yard and pound
 * agreement of 1959, as tabulated in NIST Special Publication 811, Appendix B). Compound factors
 * (lb·in², g·mm², ...) are multiplied out in decimal and rounded to a double once. A degree is
 * π/180 rad, which no double holds exactly.
 *
 * @param symbol    display symbol, e.g. "mm" or "kg·m²"
 * @param suffix    the column-name suffix, lower case, e.g. "mm" or "kg_m2"
 * @param quantity  the quantity measured
 * @param siPerUnit how many SI units one of this unit is; NaN for encoder counts whose
 *                  counts per revolution are not yet known
 */
public record Unit(String symbol, String suffix, Quantity quantity, double siPerUnit) {

    private static final BigDecimal INCH = new BigDecimal("0.0254");
    private static final BigDecimal FOOT = new BigDecimal("0.3048");
    private static final BigDecimal POUND = new BigDecimal("0.45359237");

    /** Metre. */
    public static final Unit METRE = new Unit("m", "m", Quantity.LENGTH, 1);
    /** Millimetre. */
    public static final Unit MILLIMETRE = new Unit("mm", "mm", Quantity.LENGTH, 1e-3);
    /** Centimetre. */
    public static final Unit CENTIMETRE = new Unit("cm", "cm", Quantity.LENGTH, 1e-2);
    /** International inch, 25.4 mm exactly. */
    public static final Unit INCH_UNIT = new Unit("in", "in", Quantity.LENGTH, INCH.doubleValue());
    /** International foot, 0.3048 m exactly. */
    public static final Unit FOOT_UNIT = new Unit("ft", "ft", Quantity.LENGTH, FOOT.doubleValue());

    /** Kilogram. */
    public static final Unit KILOGRAM = new Unit("kg", "kg", Quantity.MASS, 1);
    /** Gram. */
    public static final Unit GRAM = new Unit("g", "g", Quantity.MASS, 1e-3);
    /** International avoirdupois pound, 0.45359237 kg exactly. */
    public static final Unit POUND_MASS = new Unit("lb", "lb", Quantity.MASS, POUND.doubleValue());

    /** Kilogram square metre. */
    public static final Unit KG_M2 = new Unit("kg·m²", "kg_m2", Quantity.INERTIA, 1);
    /** Gram square millimetre, 1e-9 kg·m². */
    public static final Unit G_MM2 = new Unit("g·mm²", "g_mm2", Quantity.INERTIA, product("0.001", "0.001", "0.001"));
    /** Gram square centimetre, 1e-7 kg·m². */
    public static final Unit G_CM2 = new Unit("g·cm²", "g_cm2", Quantity.INERTIA, product("0.001", "0.01", "0.01"));
    /** Kilogram square millimetre, 1e-6 kg·m². */
    public static final Unit KG_MM2 = new Unit("kg·mm²", "kg_mm2", Quantity.INERTIA, product("0.001", "0.001"));
    /** Pound square inch. */
    public static final Unit LB_IN2 = new Unit("lb·in²", "lb_in2", Quantity.INERTIA,
            POUND.multiply(INCH).multiply(INCH).doubleValue());
    /** Pound square foot. */
    public static final Unit LB_FT2 = new Unit("lb·ft²", "lb_ft2", Quantity.INERTIA,
            POUND.multiply(FOOT).multiply(FOOT).doubleValue());

    /** Radian. */
    public static final Unit RADIAN = new Unit("rad", "rad", Quantity.ANGLE, 1);
    /** Degree, π/180 rad. */
    public static final Unit DEGREE = new Unit("°", "deg", Quantity.ANGLE, Math.PI / 180);
    /** Encoder counts before the counts per revolution are known; see {@link #encoderCounts}. */
    public static final Unit ENCODER_COUNT = new Unit("counts", "counts", Quantity.ANGLE, Double.NaN);

    /** Second. */
    public static final Unit SECOND = new Unit("s", "s", Quantity.TIME, 1);
    /** Millisecond. */
    public static final Unit MILLISECOND = new Unit("ms", "ms", Quantity.TIME, 1e-3);
    /** Microsecond. */
    public static final Unit MICROSECOND = new Unit("µs", "us", Quantity.TIME, 1e-6);

    /** Radian per second. */
    public static final Unit RAD_PER_S = new Unit("rad/s", "rad_s", Quantity.ANGULAR_VELOCITY, 1);
    /** Degree per second. */
    public static final Unit DEG_PER_S = new Unit("°/s", "deg_s", Quantity.ANGULAR_VELOCITY, Math.PI / 180);

    /** Newton metre. */
    public static final Unit NEWTON_METRE = new Unit("N·m", "n_m", Quantity.TORQUE, 1);
    /** Newton millimetre. */
    public static final Unit NEWTON_MILLIMETRE = new Unit("N·mm", "n_mm", Quantity.TORQUE, 1e-3);

    /** Newton metre second per radian, the unit of a viscous coefficient. */
    public static final Unit N_M_S_PER_RAD = new Unit("N·m·s/rad", "n_m_s_rad", Quantity.VISCOUS_COEFFICIENT, 1);
    /** Newton metre second squared per radian squared, the unit of a drag coefficient. */
    public static final Unit N_M_S2_PER_RAD2 = new Unit("N·m·s²/rad²", "n_m_s2_rad2", Quantity.DRAG_COEFFICIENT, 1);

    /** Kilogram per cubic metre. */
    public static final Unit KG_PER_M3 = new Unit("kg/m³", "kg_m3", Quantity.DENSITY, 1);
    /** Gram per cubic centimetre, 1000 kg/m³. */
    public static final Unit G_PER_CM3 = new Unit("g/cm³", "g_cm3", Quantity.DENSITY, 1000);

    private static final List<Unit> ALL = List.of(METRE, MILLIMETRE, CENTIMETRE, INCH_UNIT, FOOT_UNIT,
            KILOGRAM, GRAM, POUND_MASS, KG_M2, G_MM2, G_CM2, KG_MM2, LB_IN2, LB_FT2,
            RADIAN, DEGREE, ENCODER_COUNT, SECOND, MILLISECOND, MICROSECOND, RAD_PER_S, DEG_PER_S,
            NEWTON_METRE, NEWTON_MILLIMETRE, N_M_S_PER_RAD, N_M_S2_PER_RAD2, KG_PER_M3, G_PER_CM3);

    /**
     * Checks the fields.
     *
     * @throws IllegalArgumentException for a missing name or a non-positive factor
     */
    public Unit {
        if (symbol == null || suffix == null || quantity == null) {
            throw new IllegalArgumentException("a unit needs a symbol, a suffix and a quantity");
        }
        if (!Double.isNaN(siPerUnit) && !(siPerUnit > 0 && Double.isFinite(siPerUnit))) {
            throw new IllegalArgumentException("unit '" + symbol + "' needs a positive factor, got " + siPerUnit);
        }
    }

    /**
     * Encoder counts as an angle unit.
     *
     * @param countsPerRevolution counts per full turn of the encoder shaft, &gt; 0 (after any
     *                            quadrature multiplication)
     * @return the unit, 2π / countsPerRevolution rad per count
     */
    public static Unit encoderCounts(double countsPerRevolution) {
        if (!(countsPerRevolution > 0) || !Double.isFinite(countsPerRevolution)) {
            throw new InvalidValueException("counts per revolution must be positive, got " + countsPerRevolution);
        }
        return new Unit("counts", "counts", Quantity.ANGLE, 2 * Math.PI / countsPerRevolution);
    }

    /**
     * The SI unit of a quantity.
     *
     * @param quantity the quantity
     * @return its SI unit (factor 1)
     */
    public static Unit si(Quantity quantity) {
        return ALL.stream().filter(u -> u.quantity == quantity && u.siPerUnit == 1).findFirst().orElseThrow();
    }

    /**
     * The unit a column-name suffix stands for ("mm", "kg_m2", "deg_s", any case).
     *
     * @param suffix the suffix without its leading underscore
     * @return the unit, or empty when the suffix is not a unit
     */
    public static Optional<Unit> forSuffix(String suffix) {
        final String s = suffix.toLowerCase(Locale.ROOT);
        return ALL.stream().filter(u -> u.suffix.equals(s)).findFirst();
    }

    /**
     * All units known to the catalogue.
     *
     * @return the units, immutable
     */
    public static List<Unit> all() {
        return ALL;
    }

    /**
     * Converts a value in this unit to SI.
     *
     * @param value the value in this unit
     * @return the value in the quantity's SI unit
     * @throws IllegalStateException for encoder counts whose counts per revolution are unknown
     */
    public double toSi(double value) {
        return value * factor();
    }

    /**
     * Converts an SI value to this unit.
     *
     * @param si the value in the quantity's SI unit
     * @return the value in this unit
     */
    public double fromSi(double si) {
        return si / factor();
    }

    /**
     * Converts a value from one unit to another of the same quantity.
     *
     * @param value the value in {@code from}
     * @param from  the unit of the value
     * @param to    the wanted unit
     * @return the value in {@code to}
     * @throws IllegalArgumentException when the units measure different quantities
     */
    public static double convert(double value, Unit from, Unit to) {
        if (from.quantity != to.quantity) {
            throw new InvalidValueException("cannot convert " + from.quantity.readableName() + " (" + from.symbol
                    + ") to " + to.quantity.readableName() + " (" + to.symbol + ")");
        }
        return to.fromSi(from.toSi(value));
    }

    private double factor() {
        if (Double.isNaN(siPerUnit)) {
            throw new IllegalStateException("encoder counts need the counts per revolution:"
                    + " use Unit.encoderCounts(countsPerRevolution)");
        }
        return siPerUnit;
    }

    private static double product(String... factors) {
        BigDecimal p = BigDecimal.ONE;
        for (String f : factors) {
            p = p.multiply(new BigDecimal(f));
        }
        return p.doubleValue();
    }
}
