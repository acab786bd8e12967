/**
 * Reading a free-release swing record: find the release, trim, find the equilibrium, locate the
 * turning points, and read the decay for its losses — the first estimates that the full
 * identification starts from.
 *
 * <h2>Where to start</h2>
 * {@link dev.penduline.physics.swing.SwingAnalyzer}: {@code prepare(t, θ)} gives a
 * {@link dev.penduline.physics.swing.PreparedSwing} (trimmed arrays, release, zero offset, turning
 * points, Savitzky–Golay velocity); {@code analyse(...)} gives a
 * {@link dev.penduline.physics.swing.SwingAnalysis}: half-swings and cycles, period against the
 * large-amplitude prediction, the three envelopes, the decrement regression
 * {@code ΔA = a0 + a1 Ā + a2 Ā²}, a {@link dev.penduline.physics.swing.LossVerdict verdict} on the
 * dominant loss with its evidence, friction estimates when the
 * {@link dev.penduline.physics.MechanismProperties mechanism} is known, and where the body
 * stopped.
 *
 * <h2>The steps and why</h2>
 * <ol>
 * <li>{@link dev.penduline.physics.swing.ReleaseDetector}: noise from the still segment's MAD,
 * the first sustained departure beyond k·σ, then a still level joined to the parabola of motion
 * from rest, fitted for the instant of release with an uncertainty.</li>
 * <li>Turning points between hysteresis crossings of the centre, one per half-swing, refined by
 * a local quadratic (an encoder's flat top gives one point).</li>
 * <li>The zero offset from the symmetry of the swings, not from the rest angle: dry friction
 * shifts each half-swing's centre by ±Tc/K and stiction holds the body anywhere in its dead
 * band.</li>
 * <li>The stop ({@link dev.penduline.physics.swing.StopInfo}): the last reversal after which the
 * body does not move again, found from where the smoothed angle stops spanning more than the
 * noise over half a period and timed by a fit of the last cycle; the rest angle and the reversal
 * before it bound the static friction from below and above.</li>
 * <li>Energy balance per half-swing links a0, a1, a2 to Tc, b, c (see
 * {@link dev.penduline.physics.swing.DecrementRegression}).</li>
 * </ol>
 *
 * <h2>Units</h2>
 * SI throughout: s, rad, rad/s, N·m. Times stay in the record's own time base; angles are in the
 * sensor's frame unless named "amplitude" or "from the equilibrium".
 *
 * <h2>Traps</h2>
 * <ul>
 * <li>Never differentiate quantised angles by finite differences: use
 * {@link dev.penduline.physics.swing.SavitzkyGolay}.</li>
 * <li>A quantised still level rounds to a whole count unless noise dithers it; the release fit
 * therefore fits the level too.</li>
 * <li>The decrement terms 1, Ā and Ā² are strongly correlated over a narrow amplitude range:
 * releases from several amplitudes separate them; the verdict is a first reading, the model
 * comparison of the full fit decides.</li>
 * <li>Estimates of b, Tc and c are small-angle energy-balance values: starting points for the
 * time-domain fit, a few percent off at large amplitude.</li>
 * </ul>
 */
package dev.penduline.physics.swing;
