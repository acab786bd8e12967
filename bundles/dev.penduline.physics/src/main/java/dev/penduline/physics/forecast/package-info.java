/**
 * What a mechanism will do after release, computed from its simulated swing: when it settles
 * inside a band, how many half-swings that takes, the band of angles it can rest in, its peak
 * angular velocity, how fast it passes a chosen angle, its largest overshoot and where the
 * energy went; and the spread of those figures over parameter sets drawn from a fit's
 * uncertainty.
 *
 * <h2>Where to start</h2>
 * {@link dev.penduline.physics.forecast.Forecaster}: give it a configured
 * {@link dev.penduline.physics.motion.SwingSimulator} and a
 * {@link dev.penduline.physics.forecast.ForecastRequest}, read the
 * {@link dev.penduline.physics.forecast.SwingForecast}. For bands,
 * {@link dev.penduline.physics.forecast.ParameterDraws} draws correlated parameter sets and
 * {@link dev.penduline.physics.forecast.FigureBand} summarises a figure over the draws.
 *
 * <p>All angles here are measured from the hanging equilibrium θeq (rad); times from release (s).
 */
package dev.penduline.physics.forecast;
