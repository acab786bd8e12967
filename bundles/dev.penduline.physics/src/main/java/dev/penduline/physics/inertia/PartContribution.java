package dev.penduline.physics.inertia;

/**
 * What one line of the parts list adds to the mechanism.
 *
 * @param name         the part's name
 * @param mass         signed mass, quantity included, negative for a cut-out (kg)
 * @param axisDistance perpendicular distance of the part's centroid from the pivot axis (m)
 * @param pivotInertia signed inertia about the pivot axis, quantity included (kg·m²)
 * @param share        pivotInertia / J0 (dimensionless; negative for a cut-out; all shares sum to 1)
 */
public record PartContribution(String name, double mass, double axisDistance, double pivotInertia, double share) {
}
