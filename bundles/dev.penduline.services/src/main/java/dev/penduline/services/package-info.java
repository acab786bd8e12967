/**
 * The use cases that the command line and the workbench share, so that neither recomputes:
 * load a mechanism from whatever the user has (a mechanism file, a parts list, or lumped
 * properties) and compute its inertia; later, analyse a swing record and identify friction.
 *
 * <p>Start from {@link dev.penduline.services.MechanismLoader}. Errors the user can cause come
 * as {@link dev.penduline.services.InputException}, whose message names the file, line and
 * field; they are never stack traces.
 */
package dev.penduline.services;
