/**
 * Reading parts lists (bills of materials with geometry) into the inertia engine's
 * {@link dev.penduline.physics.inertia.Part}s.
 *
 * <p><b>Where to start.</b> {@link dev.penduline.records.parts.PartsListReader} reads a
 * comma-separated file and returns a {@link dev.penduline.records.parts.PartsList}: the parts,
 * in SI units, and the warnings about what it ignored. Its Javadoc is the file format's
 * specification.
 *
 * <p><b>Units.</b> Every number column carries its unit as a suffix ({@code mass_kg},
 * {@code x_mm}, {@code ixx_g_mm2}); conversion to SI happens here, on import, through
 * {@link dev.penduline.physics.units.Unit}.
 *
 * <p><b>Traps.</b>
 * <ul>
 * <li>The frame: pivot along z through the origin, gravity along −y; a part below the pivot has
 * a negative y.</li>
 * <li>Products of inertia are tensor elements, {@code ixy = −∫ x y dm}; many CAD reports print
 * {@code +∫ x y dm}.</li>
 * <li>A hole is a line of its own with {@code cutout=true} and the positive mass (or the
 * density) of the removed material.</li>
 * <li>The reader never writes to the file it reads.</li>
 * </ul>
 */
package dev.penduline.records.parts;
