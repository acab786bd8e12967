/**
 * The physics of a rigid body swinging about a fixed axis (a compound pendulum), free of any
 * user interface, file format or OSGi service so that it runs and tests headless.
 *
 * <p>Start from {@link dev.penduline.physics.MechanismProperties}: the handful of numbers
 * (mass, pivot-to-centroid distance, inertia about the pivot, equilibrium offset, gravity)
 * that everything else in Penduline reduces a mechanism to. Sub-packages hold the inertia
 * engine, the motion simulator, the analysis of swing records and the identification of
 * friction.
 *
 * <p>Units are SI throughout: kilograms, metres, seconds, radians, newton-metres. Conversion
 * to degrees, millimetres or encoder counts happens only at the edges (import and display).
 *
 * <p>The physics and the methods are written out with their published sources in the
 * repository's {@code docs/physics.md} and {@code docs/methods.md}; the layers in
 * {@code docs/architecture.md}.
 */
package dev.penduline.physics;
