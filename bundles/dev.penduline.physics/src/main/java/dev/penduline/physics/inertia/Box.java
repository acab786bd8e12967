package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

/**
 * A rectangular block (a plate when one edge is zero): principal moments
 * {@code m(b²+c²)/12}, {@code m(a²+c²)/12}, {@code m(a²+b²)/12}.
 *
 * @param lengthX edge along the part's x axis (m)
 * @param widthY  edge along the part's y axis (m)
 * @param heightZ edge along the part's z axis (m)
 */
public record Box(double lengthX, double widthY, double heightZ) implements PartShape {

    /**
     * Checks the dimensions.
     *
     * @throws IllegalArgumentException naming a negative or non-finite edge
     */
    public Box {
        PartShape.requireDimension("box length (x)", lengthX);
        PartShape.requireDimension("box width (y)", widthY);
        PartShape.requireDimension("box height (z)", heightZ);
    }

    @Override
    public InertiaTensor centroidalInertia(double mass) {
        final double a2 = lengthX * lengthX;
        final double b2 = widthY * widthY;
        final double c2 = heightZ * heightZ;
        return InertiaTensor.diagonal(mass * (b2 + c2) / 12, mass * (a2 + c2) / 12, mass * (a2 + b2) / 12);
    }

    @Override
    public OptionalDouble volume() {
        return OptionalDouble.of(lengthX * widthY * heightZ);
    }

    @Override
    public String kind() {
        return "box";
    }
}
