/**
 * Validation of a mechanism with the core EMF {@code Diagnostician} (the EMF Validation
 * framework is not used).
 *
 * <p><b>Start</b> with {@link dev.penduline.model.validation.MechanismValidation#problems}: every
 * problem at once, one line each, naming its element, e.g.
 * {@code part 'rib': mass must be positive (got -0.2 kg)}. For a UI, use
 * {@link dev.penduline.model.validation.MechanismValidation#validate} and read each diagnostic's
 * data (element, feature) and code ({@link dev.penduline.model.validation.MechanismRule}).
 *
 * <p><b>Rules</b>: masses positive (cut-outs too: the flag subtracts), the dimensions a shape needs
 * positive, quantity ≥ 1, tolerances ≥ 0, a given inertia tensor admissible (positive
 * semi-definite, triangle inequalities, via the inertia engine's {@code TensorCheck}), the whole
 * mechanism physical (positive total mass and J0 ≥ m·Lc², via the engine), a non-zero axis not
 * parallel to gravity, friction bounds ≥ 0 with stiction ≥ Coulomb, record paths relative and
 * inside the project, column and unit mapping complete, SHA-256 well-formed, ISO-8601 fit time.
 *
 * <p><b>Traps.</b> The whole-mechanism inertia check runs only when every part converts; until
 * then the parts' own problems are what is reported. Dangling references from a fit result are
 * warnings, not errors: a fit stays the record of what was done.
 */
package dev.penduline.model.validation;
