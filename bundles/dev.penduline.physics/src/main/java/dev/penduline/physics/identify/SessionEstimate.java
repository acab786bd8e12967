package dev.penduline.physics.identify;

/**
 * The fitted nuisance parameters and the residual of one session.
 *
 * @param name         the session's name
 * @param releaseAngle θ0 from the hanging equilibrium (rad)
 * @param releaseTime  t_r on the record's time base (s)
 * @param offset       sensor reading at the hanging equilibrium (rad)
 * @param rms          root-mean-square residual of the session (rad)
 * @param samples      number of samples fitted
 */
public record SessionEstimate(String name, ParameterEstimate releaseAngle, ParameterEstimate releaseTime,
        ParameterEstimate offset, double rms, int samples) {
}
