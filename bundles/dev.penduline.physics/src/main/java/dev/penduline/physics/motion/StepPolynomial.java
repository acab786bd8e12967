package dev.penduline.physics.motion;

import org.hipparchus.ode.sampling.ODEStateInterpolator;

/**
 * Cheap dense output for steps that hold many samples.
 *
 * <p>The continuous extension of Dormand–Prince 8(5,3) is, within one step, a polynomial of
 * degree 7 in the step fraction (Hairer, Nørsett &amp; Wanner, Solving Ordinary Differential
 * Equations I, dense output of DOP853). Eight Chebyshev nodes therefore reproduce it exactly,
 * up to rounding: the interpolator is asked eight times per step, and each sample then costs
 * a Clenshaw recurrence instead of a full interpolation of the whole state. One instance per
 * run; it reuses its buffers.
 */
final class StepPolynomial {

    /** Number of nodes: degree 7 + 1. */
    static final int NODES = 8;

    private final double[] nodes = new double[NODES];
    /** cos(π k (j + ½) / N), the discrete cosine transform at the Chebyshev nodes. */
    private final double[][] cosines = new double[NODES][NODES];
    private final double[] angleValues = new double[NODES];
    private final double[] velocityValues = new double[NODES];
    private final double[] angleCoefficients = new double[NODES];
    private final double[] velocityCoefficients = new double[NODES];
    private double middle;
    private double halfWidth;

    StepPolynomial() {
        for (int j = 0; j < NODES; j++) {
            nodes[j] = Math.cos(Math.PI * (j + 0.5) / NODES);
            for (int k = 0; k < NODES; k++) {
                cosines[k][j] = Math.cos(Math.PI * k * (j + 0.5) / NODES);
            }
        }
    }

    /** Fits θ and ω over the step [start, end] from eight interpolated states. */
    void fit(ODEStateInterpolator interpolator, double start, double end) {
        middle = 0.5 * (start + end);
        halfWidth = 0.5 * (end - start);
        for (int j = 0; j < NODES; j++) {
            final double[] y = interpolator.getInterpolatedState(middle + halfWidth * nodes[j]).getPrimaryState();
            angleValues[j] = y[0];
            velocityValues[j] = y[1];
        }
        transform(angleValues, angleCoefficients);
        transform(velocityValues, velocityCoefficients);
    }

    double angle(double t) {
        return clenshaw(angleCoefficients, (t - middle) / halfWidth);
    }

    double velocity(double t) {
        return clenshaw(velocityCoefficients, (t - middle) / halfWidth);
    }

    private void transform(double[] values, double[] coefficients) {
        for (int k = 0; k < NODES; k++) {
            double sum = 0;
            for (int j = 0; j < NODES; j++) {
                sum += values[j] * cosines[k][j];
            }
            coefficients[k] = (k == 0 ? 1.0 : 2.0) * sum / NODES;
        }
    }

    private static double clenshaw(double[] c, double x) {
        double b1 = 0;
        double b2 = 0;
        final double twoX = 2 * x;
        for (int k = NODES - 1; k >= 1; k--) {
            final double b0 = c[k] + twoX * b1 - b2;
            b2 = b1;
            b1 = b0;
        }
        return c[0] + x * b1 - b2;
    }
}
