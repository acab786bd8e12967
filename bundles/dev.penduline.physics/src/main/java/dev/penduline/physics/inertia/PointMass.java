package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

/** A mass concentrated at a point: no inertia about its own centroid. */
public record PointMass() implements PartShape {

    @Override
    public InertiaTensor centroidalInertia(double mass) {
        return InertiaTensor.ZERO;
    }

    @Override
    public OptionalDouble volume() {
        return OptionalDouble.empty();
    }

    @Override
    public String kind() {
        return "point";
    }
}
