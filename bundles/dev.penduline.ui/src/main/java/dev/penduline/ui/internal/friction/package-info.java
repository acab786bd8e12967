/**
 * The Friction view: the friction fits stored in the mechanism file selected in Project Files,
 * and the Friction Fit wizard ("Fit Friction…") that adds one. Start from
 * {@link dev.penduline.ui.internal.friction.FrictionPart}; what it shows of a file is a
 * {@link dev.penduline.ui.internal.friction.FrictionSheet} (read from the model, most recent fit
 * first) holding {@link dev.penduline.services.StoredFitText}s; the wizard is
 * {@link dev.penduline.ui.internal.friction.FitWizard} (pages {@code FitSetupPage} and
 * {@code FitResultsPage}), which calls {@code FrictionIdentification.sessionsOf}, {@code identify}
 * (forked in the wizard's container, cancellable) and, on Finish, {@code FitRecorder.addTo} in one
 * command of the mechanism's document — the same calls as {@code penduline fit FILE}; the words
 * of the verdict, estimates and comparison come from {@code FitWording}, as the CLI's report.
 *
 * <p>Units: the stored values are SI; the view shows friction terms and inertia in SI with
 * their units, angles and residuals in degrees (converted with {@code Unit.DEGREE}), shares
 * and the inertia difference in percent. Traps: never fit or estimate here — the view shows
 * what the services stored, and the quoted σ follows the physics layer's rule
 * ({@code ParameterEstimate.sigma()}); the fit monitor is called from worker threads after every
 * evaluation, so progress is throttled ({@code FitProgress}) before it reaches the monitor; a
 * fit that did not converge stores nothing and says so.
 */
package dev.penduline.ui.internal.friction;
