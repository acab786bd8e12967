package dev.penduline.physics.inertia;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InvalidValueException;

/**
 * A mass-property report as CAD programs export it: mass, centroid and a full inertia tensor,
 * all in the report's output frame, the tensor taken either about the centroid or about the
 * output frame's origin.
 *
 * <p>The products of inertia are tensor elements ({@code Ixy = −∫ x y dm}, see
 * {@link InertiaTensor}); a report listing the positive integrals must be converted with
 * {@link InertiaTensor#fromProductIntegrals}.
 *
 * @param mass      the body's mass (kg), &gt; 0
 * @param centroid  the centroid in the output frame (m)
 * @param tensor    the inertia tensor in the output frame's axes (kg·m²)
 * @param reference the point the tensor is taken about
 */
public record CadMassProperties(double mass, Vector3D centroid, InertiaTensor tensor, TensorReference reference) {

    /**
     * Checks the report.
     *
     * @throws IllegalArgumentException naming the missing or non-physical field
     */
    public CadMassProperties {
        if (!(mass > 0) || !Double.isFinite(mass)) {
            throw new InvalidValueException("mass must be positive, got " + mass + " kg");
        }
        if (centroid == null || centroid.isNaN() || centroid.isInfinite()) {
            throw new InvalidValueException("centroid must be a finite position, got " + centroid);
        }
        if (tensor == null || reference == null) {
            throw new IllegalArgumentException("tensor and its reference point are required");
        }
    }

    /**
     * The tensor about the centroid; a tensor given about the frame origin is shifted with the
     * parallel-axis theorem {@code Icg = IO − m(|c|² E − c cᵀ)}, products of inertia included.
     *
     * @return the centroidal tensor in the output frame's axes (kg·m²)
     */
    public InertiaTensor centroidalTensor() {
        return reference == TensorReference.CENTROID ? tensor : tensor.toCentroid(mass, centroid);
    }

    /**
     * The part when the report's output frame is the mechanism frame.
     *
     * @param name the part's name
     * @return the part
     */
    public Part toPart(String name) {
        return Part.ofTensor(name, mass, centroid, centroidalTensor());
    }

    /**
     * The part when the report's output frame sits elsewhere in the mechanism frame.
     *
     * @param name        the part's name
     * @param frame       orientation of the output frame in the mechanism frame: {@code frame.applyTo}
     *                    carries a vector from the output frame's axes into the mechanism's
     * @param frameOrigin the output frame's origin in the mechanism frame (m)
     * @return the part, its tensor kept in the output frame and turned by {@code frame}
     */
    public Part toPart(String name, Rotation frame, Vector3D frameOrigin) {
        return Part.ofTensor(name, mass, frameOrigin.add(frame.applyTo(centroid)), centroidalTensor())
                .withOrientation(frame);
    }
}
