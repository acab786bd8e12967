package dev.penduline.physics.inertia;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * The inertia engine's result for a parts list about one pivot axis.
 *
 * @param totalMass         total mass M (kg)
 * @param centroid          composite centroid in the mechanism frame (m)
 * @param centroidDistance  Lc, perpendicular distance of the centroid from the pivot axis (m)
 * @param equilibriumAngle  θeq, angle about the axis from straight down to the centroid's offset
 *                          (rad, right-hand rule about the axis direction); 0 when the centroid
 *                          lies on the axis, NaN when the axis is vertical
 * @param pivotInertia      J0, moment of inertia about the pivot axis (kg·m²)
 * @param centroidalInertia moment of inertia about the parallel axis through the centroid, J0 − M Lc² (kg·m²)
 * @param centroidalTensor  composite inertia tensor about the centroid, mechanism axes (kg·m²)
 * @param axis              the pivot axis used
 * @param gravity           local gravitational acceleration g (m/s²)
 * @param axisTilt          tilt α of the axis from horizontal (rad, 0 to π/2)
 * @param contributions     per-part contributions, in parts-list order
 */
public record InertiaSummary(double totalMass, Vector3D centroid, double centroidDistance, double equilibriumAngle,
        double pivotInertia, double centroidalInertia, InertiaTensor centroidalTensor, PivotAxis axis,
        double gravity, double axisTilt, List<PartContribution> contributions) {

    /**
     * Freezes the contribution list.
     */
    public InertiaSummary {
        contributions = List.copyOf(contributions);
    }

    /**
     * The lumped properties the equation of motion needs.
     *
     * @return the mechanism properties (m, Lc, J0, θeq, g, α)
     * @throws IllegalArgumentException when the axis is vertical (gravity exerts no restoring
     *         torque about it) or the properties are inconsistent
     */
    public MechanismProperties toMechanismProperties() {
        if (Double.isNaN(equilibriumAngle)) {
            throw new InvalidValueException("the pivot axis is parallel to gravity (tilt "
                    + Math.toDegrees(axisTilt) + "°): gravity exerts no restoring torque about it");
        }
        return new MechanismProperties(totalMass, centroidDistance, pivotInertia, equilibriumAngle, gravity, axisTilt);
    }

    /**
     * Radius of gyration about the pivot axis, sqrt(J0 / M).
     *
     * @return the radius of gyration (m)
     */
    public double radiusOfGyration() {
        return Math.sqrt(pivotInertia / totalMass);
    }

    /**
     * Length of the simple pendulum with the same small-angle period, J0 / (M Lc).
     *
     * @return Leq (m)
     */
    public double equivalentLength() {
        return toMechanismProperties().equivalentLength();
    }

    /**
     * Small-angle period, with the tilt of the axis taken into account.
     *
     * @return T0 (s)
     */
    public double smallAnglePeriod() {
        return toMechanismProperties().smallAnglePeriod();
    }

    /**
     * Relative period error of treating the mechanism as a point mass at its centroid.
     *
     * @return sqrt(Leq / Lc) − 1 (dimensionless)
     */
    public double simplePendulumPeriodError() {
        return toMechanismProperties().simplePendulumPeriodError();
    }
}
