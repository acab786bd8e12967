package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

/**
 * A solid sphere: {@code 2 m r²/5} about every axis through its centre.
 *
 * @param radius the radius (m)
 */
public record Sphere(double radius) implements PartShape {

    /**
     * Checks the radius.
     *
     * @throws IllegalArgumentException when the radius is negative or not finite
     */
    public Sphere {
        PartShape.requireDimension("sphere radius", radius);
    }

    @Override
    public InertiaTensor centroidalInertia(double mass) {
        final double i = 0.4 * mass * radius * radius;
        return InertiaTensor.diagonal(i, i, i);
    }

    @Override
    public OptionalDouble volume() {
        return OptionalDouble.of(4.0 / 3.0 * Math.PI * radius * radius * radius);
    }

    @Override
    public String kind() {
        return "sphere";
    }
}
