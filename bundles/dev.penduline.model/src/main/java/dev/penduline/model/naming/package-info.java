/**
 * Stable, readable identifiers for the elements of a mechanism file.
 *
 * <p>Parts, friction hypotheses and terms, sessions and fit results each carry an {@code id}
 * derived from their name when created ({@link dev.penduline.model.naming.StableIds}); fit results
 * refer to sessions and terms by it. <b>Start</b> with
 * {@link dev.penduline.model.naming.NamedElements}, which creates an element with its identifier.
 *
 * <p><b>Traps.</b> Identifiers are unique among siblings only (a term {@code coulomb} exists in
 * every hypothesis that has one). Renaming keeps the identifier, so old fit results stay valid.
 * Never derive an identifier from a clock or a random source: the file must save identically.
 */
package dev.penduline.model.naming;
