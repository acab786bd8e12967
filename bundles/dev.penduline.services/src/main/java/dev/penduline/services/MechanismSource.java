package dev.penduline.services;

import java.util.List;
import java.util.Optional;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PivotInertia;
import dev.penduline.physics.inertia.ToleranceSpread;

/**
 * A mechanism as the user supplied it, reduced to what the physics needs.
 *
 * @param label      where it came from (a file name, or "lumped properties")
 * @param properties mass, centroid distance, pivot inertia, equilibrium angle, gravity, tilt
 * @param inertia    the full inertia breakdown when the mechanism came from parts; empty for
 *                   lumped properties given directly
 * @param warnings   things the user should know (ignored columns, assumptions)
 * @param parts      the parts (with their tolerances) when it came from parts, else empty
 * @param frame      the inertia engine (axis, gravity) the parts were computed with, or null
 */
public record MechanismSource(String label, MechanismProperties properties, Optional<InertiaSummary> inertia,
        List<String> warnings, List<Part> parts, PivotInertia frame) {

    /** Copies the lists so the record stays immutable. */
    public MechanismSource {
        warnings = List.copyOf(warnings);
        parts = List.copyOf(parts);
    }

    /**
     * A mechanism without parts (lumped properties).
     *
     * @param label      where it came from
     * @param properties its properties
     * @param inertia    its inertia breakdown, if any
     * @param warnings   things the user should know
     */
    public MechanismSource(String label, MechanismProperties properties, Optional<InertiaSummary> inertia,
            List<String> warnings) {
        this(label, properties, inertia, warnings, List.of(), null);
    }

    /**
     * The same mechanism with other lumped properties (a fitted J0, say), parts kept.
     *
     * @param newProperties the properties
     * @return the copy
     */
    public MechanismSource withProperties(MechanismProperties newProperties) {
        return new MechanismSource(label, newProperties, inertia, warnings, parts, frame);
    }

    /**
     * Whether the parts carry tolerances, so that the lumped properties have a spread.
     *
     * @return true when a part has a mass or dimension tolerance
     */
    public boolean hasTolerances() {
        return frame != null && ToleranceSpread.applies(parts);
    }
}
