/**
 * The workbench's side of the user's defaults ({@link dev.penduline.services.Defaults}): the
 * Penduline preference page (Window › Preferences › Penduline), the store behind it, which reads
 * and atomically writes the same per-user file the command line reads with
 * {@code --use-preferences}, and the values the workbench uses now (fit resamples and verdict
 * margin, the gravity of new mechanisms, the display precision).
 */
package dev.penduline.ui.internal.preferences;
