/**
 * The inertia engine: from a parts list to the mass, centroid and moment of inertia of a
 * mechanism about its pivot axis.
 *
 * <p><b>Where to start.</b> Describe each part as a {@link dev.penduline.physics.inertia.Part}:
 * a {@link dev.penduline.physics.inertia.PartShape} (point mass, slender rod, box or plate, solid
 * or hollow cylinder, sphere, thin ring, or a tensor from a CAD report via
 * {@link dev.penduline.physics.inertia.CadMassProperties}), its mass (or a density), its centroid
 * and orientation in the mechanism frame, a cut-out flag and a quantity. Then call
 * {@link dev.penduline.physics.inertia.PivotInertia#compute} and read the
 * {@link dev.penduline.physics.inertia.InertiaSummary}; its
 * {@code toMechanismProperties()} feeds the equation of motion.
 *
 * <p><b>Frame and units.</b> SI throughout (kg, m, kg·m², rad). The default mechanism frame has
 * the pivot axis along z through the origin and gravity along −y, so a part hanging below the
 * pivot has negative y. Positions and directions are Hipparchus'
 * {@link org.hipparchus.geometry.euclidean.threed.Vector3D}. A shape's dimensions are in its own
 * frame; the part's orientation, a Hipparchus
 * {@link org.hipparchus.geometry.euclidean.threed.Rotation} {@code R} (its {@code applyTo} carries
 * a vector from the part's frame into the mechanism frame), turns them into the mechanism frame,
 * and its centroidal tensor becomes {@code R Icg Rᵀ}.
 *
 * <p><b>Products of inertia</b> are the tensor's off-diagonal elements, {@code Ixy = −∫ x y dm}
 * (see {@link dev.penduline.physics.inertia.InertiaTensor}); CAD reports that print
 * {@code +∫ x y dm} must be negated on the way in.
 *
 * <p><b>Traps.</b>
 * <ul>
 * <li>A hole is not a negative mass entered by hand: mark it as a cut-out with the positive
 * mass of the removed material (same density), at the hole's centroid.</li>
 * <li>Parts off the plane of swing still count: the engine uses the full three-dimensional
 * parallel-axis theorem, so a part's distance along the axis does not add to its inertia but
 * its products of inertia do when the axis is skew to its principal axes.</li>
 * <li>{@code J0 ≥ M Lc²} always; when it fails, a cut-out is usually larger than the solid it
 * is cut from, or a hand-typed tensor is not physical ({@link dev.penduline.physics.inertia.TensorCheck}).</li>
 * <li>An axis that is not horizontal weakens gravity's restoring torque to {@code g cos α};
 * a vertical axis has none, and has no equilibrium angle.</li>
 * </ul>
 */
package dev.penduline.physics.inertia;
