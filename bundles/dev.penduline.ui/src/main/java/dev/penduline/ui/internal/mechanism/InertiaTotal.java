package dev.penduline.ui.internal.mechanism;

import java.util.function.ToDoubleFunction;

import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.units.Unit;

/**
 * The totals the Mechanism view lists, in the order of the command line's report, each with the
 * unit it is shown in. Values come from the inertia engine's summary; only units are converted
 * here, through {@link Unit}.
 */
public enum InertiaTotal {

    /** Total mass m. */
    MASS("total mass m", Unit.KILOGRAM.symbol(), InertiaSummary::totalMass),
    /** Distance Lc of the centroid from the pivot axis. */
    CENTROID_DISTANCE("centroid distance Lc", Unit.METRE.symbol(), InertiaSummary::centroidDistance),
    /** Equilibrium angle θeq: where the centroid hangs, from straight down. */
    EQUILIBRIUM_ANGLE("equilibrium angle θeq", Unit.DEGREE.symbol(),
            s -> Unit.DEGREE.fromSi(s.equilibriumAngle())),
    /** Inertia J0 about the pivot axis. */
    PIVOT_INERTIA("pivot inertia J0", Unit.KG_M2.symbol(), InertiaSummary::pivotInertia),
    /** Inertia about the parallel axis through the centroid. */
    CENTROIDAL_INERTIA("centroidal inertia Jc", Unit.KG_M2.symbol(), InertiaSummary::centroidalInertia),
    /** Radius of gyration about the pivot, sqrt(J0/m). */
    RADIUS_OF_GYRATION("radius of gyration k0", Unit.METRE.symbol(), InertiaSummary::radiusOfGyration),
    /** Length of the simple pendulum with the same small-angle period, J0/(m·Lc). */
    EQUIVALENT_LENGTH("equivalent length Leq", Unit.METRE.symbol(), InertiaSummary::equivalentLength),
    /** Small-angle period T0. */
    SMALL_ANGLE_PERIOD("small-angle period T0", Unit.SECOND.symbol(), InertiaSummary::smallAnglePeriod),
    /** Period error of treating the body as a point mass at its centroid. */
    SIMPLE_PENDULUM_ERROR("point-mass period error", "%", s -> 100 * s.simplePendulumPeriodError());

    private final String label;
    private final String unit;
    private final ToDoubleFunction<InertiaSummary> value;

    InertiaTotal(String label, String unit, ToDoubleFunction<InertiaSummary> value) {
        this.label = label;
        this.unit = unit;
        this.value = value;
    }

    /**
     * What the row is called in the view.
     *
     * @return the label, with the usual symbol
     */
    public String label() {
        return label;
    }

    /**
     * The unit the value is shown in.
     *
     * @return the unit's symbol
     */
    public String unit() {
        return unit;
    }

    /**
     * The value in the unit shown.
     *
     * @param summary the inertia engine's result
     * @return the value (in {@link #unit()}); NaN when it does not exist for this mechanism
     */
    public double valueOf(InertiaSummary summary) {
        try {
            return value.applyAsDouble(summary);
        } catch (IllegalArgumentException e) {
            // e.g. a vertical axis has no period; the view shows "n/a" and the warnings say why
            return Double.NaN;
        }
    }
}
