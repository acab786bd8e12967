package dev.penduline.physics.inertia;

import java.util.OptionalDouble;

import dev.penduline.physics.InvalidValueException;

/**
 * A shape known only by its centroidal inertia tensor, as a CAD mass-property report gives it.
 *
 * <p>The tensor belongs to a body of {@code referenceMass}; asked for another mass (a
 * tolerance study, a changed material) it scales in proportion, as for the same geometry at
 * another density. Build one from a raw export with {@link CadMassProperties}.
 *
 * @param tensor        the inertia tensor about the centroid, in the part's frame (kg·m²)
 * @param referenceMass the mass the tensor was computed for (kg), strictly positive
 */
public record GivenTensor(InertiaTensor tensor, double referenceMass) implements PartShape {

    /**
     * Checks the inputs.
     *
     * @throws IllegalArgumentException when the tensor is missing or the mass not positive
     */
    public GivenTensor {
        if (tensor == null) {
            throw new IllegalArgumentException("inertia tensor is missing");
        }
        if (!(referenceMass > 0) || !Double.isFinite(referenceMass)) {
            throw new InvalidValueException("tensor's reference mass must be positive, got " + referenceMass + " kg");
        }
    }

    @Override
    public InertiaTensor centroidalInertia(double mass) {
        return mass == referenceMass ? tensor : tensor.times(mass / referenceMass);
    }

    @Override
    public OptionalDouble volume() {
        return OptionalDouble.empty();
    }

    @Override
    public String kind() {
        return "tensor";
    }
}
