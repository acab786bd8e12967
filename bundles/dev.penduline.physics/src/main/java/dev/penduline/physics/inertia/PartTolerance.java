package dev.penduline.physics.inertia;

import dev.penduline.physics.InvalidValueException;

/**
 * Symmetric (±) tolerances of a part, carried as data for a later uncertainty estimate; the
 * inertia engine itself uses the nominal values.
 *
 * @param mass      ± tolerance on the part's mass (kg), ≥ 0
 * @param dimension ± tolerance on each of the shape's dimensions and on the centroid position (m), ≥ 0
 */
public record PartTolerance(double mass, double dimension) {

    /** No tolerance given. */
    public static final PartTolerance NONE = new PartTolerance(0, 0);

    /**
     * Checks that both tolerances are finite and non-negative.
     *
     * @throws IllegalArgumentException naming the tolerance
     */
    public PartTolerance {
        if (!Double.isFinite(mass) || mass < 0) {
            throw new InvalidValueException("mass tolerance must be a finite value ≥ 0 kg, got " + mass);
        }
        if (!Double.isFinite(dimension) || dimension < 0) {
            throw new InvalidValueException("dimension tolerance must be a finite value ≥ 0 m, got " + dimension);
        }
    }

    /**
     * Whether any tolerance was given.
     *
     * @return true when both tolerances are zero
     */
    public boolean isNone() {
        return mass == 0 && dimension == 0;
    }
}
