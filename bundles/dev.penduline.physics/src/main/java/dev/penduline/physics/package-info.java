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
 *
 * <p><b>Refusing a value.</b> Where a value can come from the user (a file or an option: a mass,
 * a length, a rate, a duration, a record's samples, a stored fit's figures) the physics refuses
 * it with {@link dev.penduline.physics.InvalidValueException}; where only a programming error
 * can give a wrong one (arrays of different lengths, a missing shape) with a plain
 * {@link java.lang.IllegalArgumentException}. The layer above catches the former only, and turns
 * it into its checked {@link dev.penduline.physics.UserInputException} with the file and field;
 * the command line takes one left untranslated as a usage or input error and every other
 * runtime exception as a defect of Penduline. The texts of the readers' and the option checks'
 * errors are {@link dev.penduline.physics.InputMessage}'s keys.
 */
package dev.penduline.physics;
