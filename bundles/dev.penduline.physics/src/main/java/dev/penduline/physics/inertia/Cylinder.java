package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

import dev.penduline.physics.InvalidValueException;

/**
 * A solid cylinder ({@code innerRadius = 0}) or a thick-walled tube. About its axis
 * {@code m(ro² + ri²)/2}; about a diameter through its centroid {@code m(3(ro² + ri²) + h²)/12}.
 *
 * @param radius      outer radius ro (m)
 * @param innerRadius inner radius ri (m), 0 for a solid cylinder, below {@code radius}
 * @param length      length h along the axis (m); 0 gives a flat disc or annulus
 * @param axis        the axis of the part's frame the cylinder's axis lies along
 */
public record Cylinder(double radius, double innerRadius, double length, Axis axis) implements PartShape {

    /**
     * Checks the dimensions.
     *
     * @throws IllegalArgumentException naming a negative dimension or an inner radius not below
     *         the outer one
     */
    public Cylinder {
        PartShape.requireDimension("cylinder radius", radius);
        PartShape.requireDimension("cylinder inner radius", innerRadius);
        PartShape.requireDimension("cylinder length", length);
        if (innerRadius > 0 && innerRadius >= radius) {
            throw new InvalidValueException("cylinder inner radius " + innerRadius
                    + " m must be less than its radius " + radius + " m");
        }
        if (axis == null) {
            throw new IllegalArgumentException("cylinder axis is missing");
        }
    }

    /**
     * A solid cylinder.
     *
     * @param radius the radius (m)
     * @param length the length along the axis (m)
     * @param axis   the axis of the part's frame the cylinder lies along
     * @return the shape
     */
    public static Cylinder solid(double radius, double length, Axis axis) {
        return new Cylinder(radius, 0, length, axis);
    }

    @Override
    public InertiaTensor centroidalInertia(double mass) {
        final double rr = radius * radius + innerRadius * innerRadius;
        return InertiaTensor.axisymmetric(axis, mass * rr / 2, mass * (3 * rr + length * length) / 12);
    }

    @Override
    public OptionalDouble volume() {
        return OptionalDouble.of(Math.PI * (radius * radius - innerRadius * innerRadius) * length);
    }

    @Override
    public String kind() {
        return "cylinder";
    }
}
