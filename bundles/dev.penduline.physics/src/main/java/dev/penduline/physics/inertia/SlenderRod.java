package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

/**
 * A slender rod: its thickness is neglected. About any transverse axis through its centroid
 * {@code m L²/12}, about its own axis zero.
 *
 * @param length the rod's length (m)
 * @param axis   the axis of the part's frame the rod lies along
 */
public record SlenderRod(double length, Axis axis) implements PartShape {

    /**
     * Checks the dimensions.
     *
     * @throws IllegalArgumentException naming a negative or missing dimension
     */
    public SlenderRod {
        PartShape.requireDimension("rod length", length);
        if (axis == null) {
            throw new IllegalArgumentException("rod axis is missing");
        }
    }

    @Override
    public InertiaTensor centroidalInertia(double mass) {
        return InertiaTensor.axisymmetric(axis, 0, mass * length * length / 12);
    }

    @Override
    public OptionalDouble volume() {
        return OptionalDouble.empty();
    }

    @Override
    public String kind() {
        return "rod";
    }
}
