package dev.penduline.services;

import java.util.List;
import java.util.Optional;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.inertia.InertiaSummary;

/**
 * A mechanism as the user supplied it, reduced to what the physics needs.
 *
 * @param label      where it came from (a file name, or "lumped properties")
 * @param properties mass, centroid distance, pivot inertia, equilibrium angle, gravity, tilt
 * @param inertia    the full inertia breakdown when the mechanism came from parts; empty for
 *                   lumped properties given directly
 * @param warnings   things the user should know (ignored columns, assumptions)
 */
public record MechanismSource(String label, MechanismProperties properties, Optional<InertiaSummary> inertia,
        List<String> warnings) {

    /** Copies the lists so the record stays immutable. */
    public MechanismSource {
        warnings = List.copyOf(warnings);
    }
}
