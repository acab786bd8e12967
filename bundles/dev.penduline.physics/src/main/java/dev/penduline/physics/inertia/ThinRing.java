package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

/**
 * A thin circular ring (hoop): {@code m r²} about its axis, {@code m r²/2} about a diameter.
 *
 * @param radius the ring's radius (m)
 * @param axis   the axis of the part's frame normal to the ring's plane
 */
public record ThinRing(double radius, Axis axis) implements PartShape {

    /**
     * Checks the dimensions.
     *
     * @throws IllegalArgumentException when the radius is negative or the axis missing
     */
    public ThinRing {
        PartShape.requireDimension("ring radius", radius);
        if (axis == null) {
            throw new IllegalArgumentException("ring axis is missing");
        }
    }

    @Override
    public InertiaTensor centroidalInertia(double mass) {
        final double r2 = radius * radius;
        return InertiaTensor.axisymmetric(axis, mass * r2, mass * r2 / 2);
    }

    @Override
    public OptionalDouble volume() {
        return OptionalDouble.empty();
    }

    @Override
    public String kind() {
        return "ring";
    }
}
