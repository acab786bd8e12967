package dev.penduline.physics.identify;

import org.hipparchus.linear.RealMatrix;

/**
 * The end of one Levenberg–Marquardt stage.
 *
 * @param full        the full parameter vector reached (SI)
 * @param status      how the stage ended
 * @param message     why, when not converged
 * @param iterations  optimiser iterations
 * @param evaluations model evaluations
 * @param rss         residual sum of squares (rad²)
 * @param residuals   measured − model, all sessions concatenated (rad)
 * @param jacobian    Jacobian of the model with respect to the scaled free parameters at {@code full}
 */
record StageOutcome(double[] full, FitStatus status, String message, int iterations, int evaluations,
        double rss, double[] residuals, RealMatrix jacobian) {
}
