package dev.penduline.physics.inertia;

import java.util.Objects;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InvalidValueException;

/**
 * One line of a parts list: a shape of a given mass placed in the mechanism frame.
 *
 * <p>The mass is that of <em>one</em> copy and always positive; {@code quantity} identical
 * copies sit at the same place, and a cut-out (a bore, a pocket, a lightening hole) counts with
 * negative mass, so its mass and inertia are subtracted from the solid it was cut from.
 *
 * @param name        the part's name, used in messages and per-part results
 * @param shape       its shape, in its own frame
 * @param mass        the mass of one copy (kg), &gt; 0 (for a cut-out: the mass of the removed material)
 * @param centroid    the part's centroid in the mechanism frame (m)
 * @param orientation how the shape's own frame sits in the mechanism frame: {@code applyTo} carries a
 *                    vector from the shape's frame into the mechanism frame ({@link Rotation#IDENTITY}
 *                    when the frames are parallel)
 * @param cutout      true for material removed (negative mass of the same density)
 * @param quantity    number of identical copies at the same place, ≥ 1
 * @param tolerance   ± tolerances on mass and dimensions (data only, for uncertainty studies)
 */
public record Part(String name, PartShape shape, double mass, Vector3D centroid, Rotation orientation,
        boolean cutout, int quantity, PartTolerance tolerance) {

    /**
     * Checks the part.
     *
     * @throws IllegalArgumentException naming the part and the offending field
     */
    public Part {
        Objects.requireNonNull(name, "part name");
        if (shape == null) {
            throw new IllegalArgumentException("part '" + name + "': shape is missing");
        }
        if (!(mass > 0) || !Double.isFinite(mass)) {
            throw new InvalidValueException("part '" + name + "': mass must be positive and finite, got "
                    + mass + " kg (mark a hole as a cut-out instead of giving it negative mass)");
        }
        if (centroid == null || centroid.isNaN() || centroid.isInfinite()) {
            throw new InvalidValueException("part '" + name + "': centroid must be a finite position, got " + centroid);
        }
        if (orientation == null) {
            throw new IllegalArgumentException("part '" + name + "': orientation is missing");
        }
        if (quantity < 1) {
            throw new InvalidValueException("part '" + name + "': quantity must be at least 1, got " + quantity);
        }
        if (tolerance == null) {
            throw new IllegalArgumentException("part '" + name + "': tolerance is missing (use PartTolerance.NONE)");
        }
    }

    /**
     * A single solid part with its frame parallel to the mechanism frame.
     *
     * @param name     the part's name
     * @param shape    its shape
     * @param mass     its mass (kg)
     * @param centroid its centroid in the mechanism frame (m)
     * @return the part
     */
    public static Part of(String name, PartShape shape, double mass, Vector3D centroid) {
        return new Part(name, shape, mass, centroid, Rotation.IDENTITY, false, 1, PartTolerance.NONE);
    }

    /**
     * A single solid part whose mass is its density times its shape's volume.
     *
     * @param name     the part's name
     * @param shape    its shape; must have a volume (not a point, slender rod, thin ring or tensor)
     * @param density  the material's density (kg/m³)
     * @param centroid its centroid in the mechanism frame (m)
     * @return the part
     * @throws IllegalArgumentException when the shape has no volume or the density is not positive
     */
    public static Part ofDensity(String name, PartShape shape, double density, Vector3D centroid) {
        if (!(density > 0) || !Double.isFinite(density)) {
            throw new InvalidValueException("part '" + name + "': density must be positive, got " + density + " kg/m³");
        }
        final double volume = shape.volume().orElseThrow(() -> new InvalidValueException("part '" + name
                + "': a " + shape.kind() + " has no volume, so its mass cannot come from a density; give the mass"));
        return of(name, shape, density * volume, centroid);
    }

    /**
     * A single part known by its centroidal tensor in the mechanism frame.
     *
     * @param name     the part's name
     * @param mass     its mass (kg)
     * @param centroid its centroid in the mechanism frame (m)
     * @param tensor   its inertia tensor about the centroid, mechanism axes (kg·m²)
     * @return the part
     */
    public static Part ofTensor(String name, double mass, Vector3D centroid, InertiaTensor tensor) {
        return of(name, new GivenTensor(tensor, mass), mass, centroid);
    }

    /**
     * The mass this line contributes: quantity × mass, negative for a cut-out.
     *
     * @return the signed mass (kg)
     */
    public double signedMass() {
        return (cutout ? -1 : 1) * quantity * mass;
    }

    /**
     * The inertia tensor this line contributes about its own centroid, in the mechanism frame:
     * {@code ± quantity · R Icg Rᵀ}.
     *
     * @return the signed centroidal tensor (kg·m²)
     */
    public InertiaTensor centroidalInertia() {
        return shape.centroidalInertia(mass).rotated(orientation).times((cutout ? -1 : 1) * quantity);
    }

    /**
     * The inertia tensor this line contributes about a point, in the mechanism frame
     * (three-dimensional parallel-axis theorem).
     *
     * @param point the reference point in the mechanism frame (m)
     * @return the signed tensor (kg·m²)
     */
    public InertiaTensor inertiaAbout(Vector3D point) {
        return centroidalInertia().aboutPoint(signedMass(), centroid.subtract(point));
    }

    /**
     * Copy with another name.
     *
     * @param newName the name
     * @return the copy
     */
    public Part withName(String newName) {
        return new Part(newName, shape, mass, centroid, orientation, cutout, quantity, tolerance);
    }

    /**
     * Copy with another shape (the mass is kept).
     *
     * @param newShape the shape
     * @return the copy
     */
    public Part withShape(PartShape newShape) {
        return new Part(name, newShape, mass, centroid, orientation, cutout, quantity, tolerance);
    }

    /**
     * Copy with another mass per copy.
     *
     * @param newMass the mass (kg)
     * @return the copy
     */
    public Part withMass(double newMass) {
        return new Part(name, shape, newMass, centroid, orientation, cutout, quantity, tolerance);
    }

    /**
     * Copy placed elsewhere.
     *
     * @param newCentroid the centroid in the mechanism frame (m)
     * @return the copy
     */
    public Part withCentroid(Vector3D newCentroid) {
        return new Part(name, shape, mass, newCentroid, orientation, cutout, quantity, tolerance);
    }

    /**
     * Copy turned to another orientation.
     *
     * @param newOrientation how the shape's frame sits in the mechanism frame
     * @return the copy
     */
    public Part withOrientation(Rotation newOrientation) {
        return new Part(name, shape, mass, centroid, newOrientation, cutout, quantity, tolerance);
    }

    /**
     * Copy marked as material removed, or as solid.
     *
     * @param isCutout true for a cut-out
     * @return the copy
     */
    public Part withCutout(boolean isCutout) {
        return new Part(name, shape, mass, centroid, orientation, isCutout, quantity, tolerance);
    }

    /**
     * Copy with another number of identical copies.
     *
     * @param newQuantity the quantity, ≥ 1
     * @return the copy
     */
    public Part withQuantity(int newQuantity) {
        return new Part(name, shape, mass, centroid, orientation, cutout, newQuantity, tolerance);
    }

    /**
     * Copy with tolerances.
     *
     * @param newTolerance the ± tolerances
     * @return the copy
     */
    public Part withTolerance(PartTolerance newTolerance) {
        return new Part(name, shape, mass, centroid, orientation, cutout, quantity, newTolerance);
    }
}
