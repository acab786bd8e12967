/**
 * Identification of friction from recorded releases: time-domain nonlinear least squares of
 * the simulated swing against the measured angle, with uncertainties, model comparison and
 * the energy account that names the dominant loss.
 *
 * <h2>Where to start</h2>
 * Build a {@link dev.penduline.physics.identify.FrictionProblem} from the calculated
 * {@link dev.penduline.physics.MechanismProperties} and one or more
 * {@link dev.penduline.physics.identify.ReleaseSession}s (times, angles and a
 * {@link dev.penduline.physics.identify.SessionGuess} of θ0, t_r and offset, usually from the
 * swing analysis), choose the {@link dev.penduline.physics.identify.FrictionTerm}s, give
 * starting values, and call {@link dev.penduline.physics.identify.FrictionIdentifier#fit} for
 * one term set or {@link dev.penduline.physics.identify.FrictionIdentifier#compare} to let
 * the records choose. Read the {@link dev.penduline.physics.identify.FrictionFit}: status
 * first, then warnings, then estimates.
 *
 * <h2>The model of a session</h2>
 * Before the release the body is held at θ0 (from the hanging equilibrium); from t_r it swings
 * from rest: {@code θ_model(t) = offset + x(t − t_r)}, x integrated with the equilibrium at zero
 * (the offset is the sensor's reading at the hanging equilibrium, so the mechanism's θeq is not
 * used). Residual = measured − model at every sample.
 *
 * <h2>Parameters and why these</h2>
 * Physical, shared by all sessions: b, Tc, c and J0; per session: θ0, t_r, offset. The inertia
 * is fitted as J0 itself, not as ωn: the gravity stiffness K = m g cos α Lc is taken as
 * calculated, so fitting J0 and fitting ωn are the same thing, and J0 is what the user compares
 * with the parts list (and b, Tc, c keep their physical units). Fitting it at all keeps a
 * parts-list error from masquerading as friction. Non-negativity (and J0 ≥ m Lc²) is kept by
 * projection onto the bounds (Hipparchus' ParameterValidator), not by a transform: a log or
 * square transform cannot reach zero, or has zero slope there, yet zero is exactly what a
 * term the record does not show should come out as, and the standard errors stay in SI units
 * where they are linear. A parameter stuck on its bound is reported as such, given no σ, and
 * warned about. The optimiser moves shifted and scaled parameters (J0 in units of the
 * calculated J0; friction in units of a 1 % damping ratio's equivalent; t_r and offset relative
 * to their guesses), since in SI they span 1e-5 to 1e1 (and t_r may be 1.7e9 s).
 *
 * <h2>The Jacobian: sensitivity equations</h2>
 * The derivatives of the trajectory are integrated with it (variational equations, error
 * control on θ and ω only, see {@code SensitivitySwing}) as a secondary equation of the
 * simulator's integration of the simulator's equation
 * ({@link dev.penduline.physics.motion.SwingIntegration},
 * {@link dev.penduline.physics.motion.SwingEquation}): the fit and the simulator share one
 * model and agree to the integration tolerance. Compared with finite differences
 * they cost one augmented run instead of 2p runs, and they are as accurate as the trajectory
 * rather than limited by a step-size compromise — which matters because the friction sign
 * switches make difference quotients noisy. Each reversal is an event whose time depends on
 * the parameters; the jump condition of hybrid-system sensitivities carries them across it,
 * {@code ∂ω/∂p⁺ = ∂ω/∂p⁻ · ω'⁺/ω'⁻}, and zeroes ∂ω/∂p when the body sticks. {@code ∂θ/∂t_r =
 * −ω} and {@code ∂θ/∂offset = 1} are analytic. A test checks every column against central
 * differences.
 *
 * <h2>Stiction</h2>
 * Ts only decides whether the body sticks at a reversal: the trajectory is piecewise constant
 * in Ts and its gradient is zero almost everywhere, so it is kept out of Levenberg–Marquardt.
 * From one run without extra stiction the cost of stopping at each reversal follows from
 * running sums; the best stop gives the band {@code K|sin x_stop| ≤ Ts < K|sin x_previous|}
 * (intersected over sessions), reported as a {@link dev.penduline.physics.identify.StictionBand};
 * the fit is repeated with Ts at its middle until the band settles. The data bound Ts; they do
 * not pin it.
 *
 * <h2>Stages</h2>
 * Lock (the first three periods, decimated, friction held: θ0, t_r, offset, J0), motion (up to
 * the final rest, decimated to about 100 samples per period, all parameters), full (every
 * sample), then the stiction rounds. Each stage is Hipparchus' Levenberg–Marquardt with
 * explicit iteration and evaluation limits; limits, cancellation (checked at every integration
 * step) and failures end in a {@link dev.penduline.physics.identify.FitStatus} with the
 * iterations, evaluations and the best point reached — never in a hang.
 *
 * <h2>Uncertainty</h2>
 * Two estimates, both reported: from the Jacobian at the optimum, in the sandwich form
 * {@code (JᵀJ)⁻¹ M (JᵀJ)⁻¹} with M from batch means of the score (White 1980; Newey &amp; West
 * 1987), which allows for correlated residuals and for the unequal variance of rounded
 * readings; and the spread of block-bootstrap refits (Künsch 1989), each started at the optimum
 * and stopped when it has arrived ({@code OptimumRefit}: the Gauss–Newton step on the optimum's
 * Jacobian, corrected by values-only model runs to a hundredth of a standard error; a refit that
 * reaches a bound or does not settle goes through Levenberg–Marquardt). The bootstrap σ is quoted
 * when it exceeds the Jacobian's by more than its own sampling error
 * ({@link dev.penduline.physics.identify.ParameterEstimate#sigma()}). The coverage of the quoted σ
 * is tested in both directions on white, AR(1) and quantised records. Correlations above 0.95
 * involving a physical parameter are warned about, with the test that would separate them.
 *
 * <h2>Trust</h2>
 * Nested term sets seed each other and a guard refuses a richer set that fits worse than one it
 * contains ({@code NestedFits}; the sets of one nesting depth are fitted side by side on the
 * machine's cores, with the same result as one after the other); the residuals are held against each record's model-free noise
 * floor ({@link dev.penduline.physics.identify.NoiseFloor}, {@link dev.penduline.physics.identify.Goodness}),
 * and above it the status is {@link dev.penduline.physics.identify.FitStatus#MISFIT}; the verdict
 * names a dominant loss only with a clear lead ({@link dev.penduline.physics.identify.FrictionVerdict});
 * a coarsely quantised record is fitted with its rounding in the measurement model
 * ({@code EncoderRounding}).
 *
 * <h2>Model comparison</h2>
 * Candidate sets V, C, V+C, V+D, V+C+D (and, when a record ends at rest, each with Coulomb
 * also with stiction) are ranked by AIC and BIC computed on the effective sample size
 * {@code n_eff = n (1 − ρ1)/(1 + ρ1)}, ρ1 the lag-1 autocorrelation of the richest candidate's
 * residuals: correlated samples are not independent evidence, and counting them so makes every
 * extra term look significant. The selection is the lowest BIC among candidates whose every
 * term is at least two standard errors clear of zero, so a term the data cannot support is not
 * added. The dominant loss is the one with the largest share of the energy dissipated over the
 * records at the fitted parameters.
 *
 * <h2>Units and traps</h2>
 * SI throughout: s, rad, N·m, kg·m². Traps: undithered encoder quantisation makes a
 * deterministic error (b about 0.2 % off at 4096 counts/rev in our tests) unless the rounding
 * is modelled, as the fit does when the noise is below one count; a record starting after the
 * release has no held segment, so θ0 and offset correlate strongly (the warning is suppressed
 * for nuisance-only pairs); one release cannot separate
 * viscous from Coulomb friction unless its amplitude range is wide.
 *
 * <p>Caution: results are estimates to be confirmed by test; for doors, hatches, gates and
 * lifting gear, follow local codes and licensed engineering practice.
 */
package dev.penduline.physics.identify;
