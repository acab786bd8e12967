/**
 * The problems of mechanism files as workspace markers of the type {@code dev.penduline.ui.problem}, shown by
 * the platform's Problems view: what the mechanism file's loader and validation and the check of the sessions'
 * records find ({@code MechanismProblems}, no second validator), written onto the file
 * ({@code ProblemMarkers}) and kept current as files and records change ({@code ProblemMarkerUpdater}).
 */
package dev.penduline.ui.internal.problems;
