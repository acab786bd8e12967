/**
 * The Mechanism view: what the services compute for the mechanism file or parts list selected
 * in Project Files. Start from {@link dev.penduline.ui.internal.mechanism.MechanismPart}; the
 * data it shows is a {@link dev.penduline.ui.internal.mechanism.MechanismSheet}, built in a job
 * from {@code MechanismLoader} — the same call as {@code penduline inertia}.
 *
 * <p>Units: SI throughout except the equilibrium angle (degrees) and the period error (percent);
 * each total carries its unit ({@link dev.penduline.ui.internal.mechanism.InertiaTotal}) and
 * conversions go through {@code Unit}. Traps: never compute here — a number that is not in
 * {@code InertiaSummary} belongs in the physics layer first; touch widgets only on the UI
 * thread (the job hands its sheet over with {@code UISynchronize}); a selection the view cannot
 * show is ignored rather than clearing the view.
 */
package dev.penduline.ui.internal.mechanism;
