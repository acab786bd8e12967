package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

import dev.penduline.physics.InvalidValueException;

/**
 * The geometry of a part, as far as its inertia goes: a standard handbook body or a tensor
 * exported by CAD. Dimensions are in metres, in the part's own frame (which the part's
 * orientation, a Hipparchus {@link org.hipparchus.geometry.euclidean.threed.Rotation}, places in the
 * mechanism frame).
 */
public sealed interface PartShape permits PointMass, SlenderRod, Box, Cylinder, Sphere, ThinRing, GivenTensor {

    /**
     * The inertia tensor about the shape's centroid, in the shape's own frame, for a body of the
     * given mass.
     *
     * @param mass the body's mass (kg)
     * @return the centroidal tensor (kg·m²)
     */
    InertiaTensor centroidalInertia(double mass);

    /**
     * The solid volume, for parts whose mass comes from a density.
     *
     * @return the volume (m³), empty for idealised shapes (point, slender rod, thin ring, tensor)
     *         that have none
     */
    OptionalDouble volume();

    /**
     * The short name of the shape's kind, as used in parts lists ("rod", "cylinder", ...).
     *
     * @return the kind
     */
    String kind();

    /**
     * Checks that a dimension is a finite, non-negative number.
     *
     * @param name  the dimension's name, for the message
     * @param value the value (m)
     * @throws IllegalArgumentException naming the dimension and value
     */
    static void requireDimension(String name, double value) {
        if (!Double.isFinite(value) || value < 0) {
            throw new InvalidValueException(name + " must be a finite length ≥ 0 m, got " + value);
        }
    }
}
