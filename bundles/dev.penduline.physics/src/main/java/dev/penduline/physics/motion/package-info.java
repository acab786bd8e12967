/**
 * The motion of a pivoted body: an event-driven simulator of the swing with viscous, Coulomb,
 * stiction and quadratic-drag friction, and the closed-form solutions that check it.
 *
 * <h2>Where to start</h2>
 * {@link dev.penduline.physics.motion.SwingSimulator}: give it the
 * {@link dev.penduline.physics.MechanismProperties} and the
 * {@link dev.penduline.physics.motion.FrictionTorques}, call {@code simulate(θ0, ω0, duration,
 * sampleRate)} and read the {@link dev.penduline.physics.motion.SwingRun}: sampled angles and
 * velocities, {@link dev.penduline.physics.motion.TurningPoint turning points}, half-swing
 * durations and periods, where and when the body stopped, and the
 * {@link dev.penduline.physics.motion.SwingEnergy energy account}. The closed forms
 * {@link dev.penduline.physics.motion.LinearViscousDecay},
 * {@link dev.penduline.physics.motion.LinearCoulombDecay} and
 * {@link dev.penduline.physics.motion.EllipticSwing} give quick estimates and reference
 * answers.
 *
 * <h2>The equation and its discontinuity</h2>
 * {@code J0 θ'' = − m g cos α Lc sin(θ − θeq) − b ω − Tc sgn ω − c ω|ω| + T_applied}.
 * It is defined once, in {@link dev.penduline.physics.motion.SwingEquation}: the right-hand side
 * of a half-swing, the reversal event and its settings, the stick test, and the accelerations
 * and partial derivatives that the identification's sensitivities need.
 * {@link dev.penduline.physics.motion.SwingIntegration} integrates it half-swing by half-swing
 * for both the simulator and the identification; a
 * {@link dev.penduline.physics.motion.SwingCompanion} (the identification's sensitivities)
 * rides along as a secondary equation over the same steps, outside the error control, and a
 * {@link dev.penduline.physics.motion.SwingSampler} records the samples.
 * The Coulomb term jumps by {@code 2 Tc} when ω changes sign. An adaptive integrator that
 * steps across the jump sees a right-hand side that is not smooth: its error estimate fails,
 * it shrinks the step again and again, and the reversal time comes out wrong by up to a
 * step. A fixed-step integrator is worse: it chatters around ω = 0 and never lets the body
 * stop, because the sign flips every step.
 *
 * <h2>Why event-driven</h2>
 * Within a half-swing the sign of ω is constant, so the simulator integrates each half-swing
 * with that sign frozen: the right-hand side is then smooth (even past ω = 0, which the root
 * finder needs). An event on {@code ω = 0} stops the integrator at the reversal, located to a
 * small fraction of the period. The integrator is then restarted with the new sign, or not at
 * all.
 *
 * <h2>The stick test</h2>
 * At each reversal, and at a release from rest, the body is momentarily at rest. It stays at
 * rest when the torque that friction must resist there, {@code |−K sin(θ − θeq) + T_applied|},
 * does not exceed the static torque Ts; it swings on, in the direction of that torque,
 * otherwise. A body released inside the static band never moves. With Ts &gt; Tc the body can
 * stop one reversal earlier than with Ts = Tc. With a time-varying applied torque the
 * simulator keeps watching a resting body (a second event on {@code Ts − |net torque|}) and
 * lets it break away when the torque exceeds Ts. Smoothing {@code sgn} with {@code tanh} is
 * offered for comparison only, when asked; a smoothed run says so, models no stiction and
 * never stops exactly.
 *
 * <h2>Tolerance advice</h2>
 * The default relative tolerance 1e-10 keeps the energy balance to about 1e-9 of the initial
 * energy (1e-8 over minutes for swings within a few degrees of upright) and costs a few
 * milliseconds for a minute of swinging. Like every integrator's, the phase error grows with
 * the number of cycles: up to about ten times tolerance × amplitude per cycle. For identification, 1e-8 is
 * usually enough (the measured angle is far noisier); for reference checks use 1e-11 or
 * less. The event checks are spaced at an eighth of the small-angle period and located to
 * {@code 0.01 × tolerance × period}; Hipparchus' defaults (600 s, 1e-6 s) would step over
 * whole swings. An applied torque that changes much faster than an eighth of a period may
 * break a resting body away later than it should.
 *
 * <h2>Units and frames</h2>
 * SI throughout: s, rad, rad/s, N·m, J. Angles are in the sensor's frame: the initial angle
 * and all results include θeq; gravity acts on {@code θ − θeq}; potential energy is measured
 * from the hanging equilibrium.
 */
package dev.penduline.physics.motion;
