package dev.penduline.physics;

/**
 * What the equation of motion needs to know about a pivoted body: the lumped properties that a
 * parts list or a CAD export reduces to.
 *
 * <p>The equation of motion about the pivot is
 * {@code J0 θ'' = − m g cos(α) Lc sin(θ − θeq) − T_friction + T_applied}, with α the tilt of
 * the axis from horizontal. A point-mass (simple) pendulum is the special case
 * {@code J0 = m Lc²}.
 *
 * @param mass             total mass m (kg), strictly positive
 * @param centroidDistance perpendicular distance Lc from the pivot axis to the centroid (m), ≥ 0
 * @param pivotInertia     moment of inertia J0 about the pivot axis (kg·m²), ≥ m·Lc²
 * @param equilibriumAngle θeq, the angle at which the body hangs at rest in the sensor's frame (rad)
 * @param gravity          local gravitational acceleration g (m/s²), strictly positive
 * @param axisTilt         tilt α of the pivot axis from horizontal (rad), |α| &lt; π/2
 */
public record MechanismProperties(double mass, double centroidDistance, double pivotInertia,
        double equilibriumAngle, double gravity, double axisTilt) {

    /** Standard gravity (m/s²), the conventional value adopted by the 3rd CGPM (1901). */
    public static final double STANDARD_GRAVITY = 9.80665;

    /** Relative slack allowed when checking J0 ≥ m·Lc², to absorb rounding of exported data. */
    private static final double INERTIA_SLACK = 1e-9;

    /**
     * Checks the invariants that make the properties physical.
     *
     * @throws IllegalArgumentException naming the offending property and value
     */
    public MechanismProperties {
        requireFinite("mass", mass);
        requireFinite("centroidDistance", centroidDistance);
        requireFinite("pivotInertia", pivotInertia);
        requireFinite("equilibriumAngle", equilibriumAngle);
        requireFinite("gravity", gravity);
        requireFinite("axisTilt", axisTilt);
        if (mass <= 0) {
            throw new InvalidValueException("mass must be positive, got " + mass + " kg");
        }
        if (centroidDistance < 0) {
            throw new InvalidValueException(
                    "centroidDistance must not be negative, got " + centroidDistance + " m");
        }
        if (gravity <= 0) {
            throw new InvalidValueException("gravity must be positive, got " + gravity + " m/s²");
        }
        if (Math.abs(axisTilt) >= Math.PI / 2) {
            throw new InvalidValueException(
                    "axisTilt must be less than 90° in magnitude, got " + Math.toDegrees(axisTilt) + "°");
        }
        final double pointMassInertia = mass * centroidDistance * centroidDistance;
        if (pivotInertia < pointMassInertia * (1 - INERTIA_SLACK)) {
            throw new InvalidValueException("pivotInertia " + pivotInertia
                    + " kg·m² is below m·Lc² = " + pointMassInertia
                    + " kg·m²: the inputs are inconsistent (no body has less inertia about an axis"
                    + " than its mass concentrated at its centroid)");
        }
    }

    /**
     * Properties of a level axis in standard gravity with the centroid hanging straight below.
     *
     * @param mass             total mass (kg)
     * @param centroidDistance pivot-to-centroid distance (m)
     * @param pivotInertia     inertia about the pivot axis (kg·m²)
     * @return the properties
     */
    public static MechanismProperties of(double mass, double centroidDistance, double pivotInertia) {
        return new MechanismProperties(mass, centroidDistance, pivotInertia, 0, STANDARD_GRAVITY, 0);
    }

    /**
     * Returns a copy with another local gravity.
     *
     * @param g local gravitational acceleration (m/s²)
     * @return the copy
     */
    public MechanismProperties withGravity(double g) {
        return new MechanismProperties(mass, centroidDistance, pivotInertia, equilibriumAngle, g, axisTilt);
    }

    /**
     * Returns a copy with another pivot inertia (used when a fit corrects the calculated one).
     *
     * @param j0 inertia about the pivot axis (kg·m²)
     * @return the copy
     */
    public MechanismProperties withPivotInertia(double j0) {
        return new MechanismProperties(mass, centroidDistance, j0, equilibriumAngle, gravity, axisTilt);
    }

    /**
     * The gravity stiffness m·g·cos(α)·Lc: restoring torque per radian at small angles.
     *
     * @return the gravity stiffness (N·m/rad)
     */
    public double gravityStiffness() {
        return mass * gravity * Math.cos(axisTilt) * centroidDistance;
    }

    /**
     * Small-angle natural angular frequency ωn = sqrt(m g cos α Lc / J0).
     *
     * @return ωn (rad/s); zero when the centroid lies on the axis
     */
    public double naturalFrequency() {
        return Math.sqrt(gravityStiffness() / pivotInertia);
    }

    /**
     * Small-angle period T0 = 2π / ωn.
     *
     * @return T0 (s); positive infinity when the body is balanced on its axis
     */
    public double smallAnglePeriod() {
        return 2 * Math.PI / naturalFrequency();
    }

    /**
     * Length of the simple pendulum with the same small-angle period, Leq = J0 / (m Lc).
     *
     * @return Leq (m); positive infinity when the centroid lies on the axis
     */
    public double equivalentLength() {
        return pivotInertia / (mass * centroidDistance);
    }

    /**
     * Radius of gyration about the pivot axis, sqrt(J0 / m).
     *
     * @return the radius of gyration (m)
     */
    public double radiusOfGyration() {
        return Math.sqrt(pivotInertia / mass);
    }

    /**
     * Relative period error made by treating the body as a point mass at its centroid:
     * {@code sqrt(Leq / Lc) − 1}, the true small-angle period over the simple-pendulum one
     * (length Lc) less one. Zero for a point mass; grows as mass spreads away from the centroid.
     *
     * @return the relative error (dimensionless, ≥ 0)
     */
    public double simplePendulumPeriodError() {
        return Math.sqrt(equivalentLength() / centroidDistance) - 1;
    }

    private static void requireFinite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new InvalidValueException(name + " must be a finite number, got " + value);
        }
    }
}
