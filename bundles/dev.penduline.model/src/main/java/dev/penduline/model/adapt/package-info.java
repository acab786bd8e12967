/**
 * From the mechanism file's model to the physics engine's inputs (model → physics, never back).
 *
 * <p><b>Start</b> with {@link dev.penduline.model.adapt.MechanismAdapter#properties}: the
 * mechanism's m, Lc, J0, θeq, g and axis tilt as the equation of motion wants them, or
 * {@link dev.penduline.model.adapt.MechanismAdapter#inertia} for the per-part breakdown.
 *
 * <p><b>Conventions.</b> SI units as stored. A part's rotations are applied about the mechanism's
 * fixed x, then y, then z axes (R = Rz·Ry·Rx). Gravity is the mechanism's downward direction,
 * made perpendicular to the axis and leaned by the axis tilt α: {@code cos α·d̂ − sin α·n̂}.
 * A mass-properties tensor "about the frame origin" is about the mechanism's origin, along the
 * part frame's axes, and is moved to the centroid with the parallel-axis theorem.
 *
 * <p><b>Traps.</b> The adapter throws at the first unusable part; validate first
 * ({@code dev.penduline.model.validation}) to show the user every problem at once.
 */
package dev.penduline.model.adapt;
