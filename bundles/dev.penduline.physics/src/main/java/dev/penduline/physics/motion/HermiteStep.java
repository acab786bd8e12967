package dev.penduline.physics.motion;

/**
 * Cheap dense output of several state components over one integration step.
 *
 * <p>Within a step, the continuous extension of Dormand–Prince 8(5,3) is a polynomial of
 * degree 7 in time (Hairer, Nørsett &amp; Wanner, Solving Ordinary Differential Equations I,
 * 2nd ed., §II.6, dense output of DOP853), and the integrator's interpolator gives its exact
 * derivative with each value. Values and derivatives at four nodes — the step's two ends, which
 * the integrator hands over anyway, and two inside — fix a polynomial of degree 7, so Hermite
 * interpolation on them reproduces the continuous extension up to rounding (Burden &amp; Faires,
 * Numerical Analysis, §3.4, divided differences with repeated nodes). The interpolator, which
 * interpolates and copies the whole augmented state at each call, is asked twice per step; each
 * sample then costs one nested multiplication per component. One instance per
 * {@link SwingSampler}; buffers are reused.
 */
final class HermiteStep {

    /** Number of nodes, each with a value and a derivative: 2 × 4 conditions for degree 7. */
    static final int NODES = 4;
    /** The nodes on the step, as fractions of it: both ends and two inside (Chebyshev–Lobatto). */
    private static final double[] FRACTIONS = {0, 0.25, 0.75, 1};
    private static final int DEGREE = 2 * NODES - 1;
    /** The doubled nodes z_0 = z_1 = x_0, z_2 = z_3 = x_1, ... */
    private static final double[] Z = new double[2 * NODES];
    /** 1 / (z_i − z_{i−j}) for the divided differences of order j ≥ 1 (unused where z repeats). */
    private static final double[][] INVERSE = new double[2 * NODES][2 * NODES];

    static {
        for (int i = 0; i < 2 * NODES; i++) {
            Z[i] = FRACTIONS[i / 2];
        }
        for (int j = 1; j < 2 * NODES; j++) {
            for (int i = j; i < 2 * NODES; i++) {
                final double d = Z[i] - Z[i - j];
                INVERSE[j][i] = d == 0 ? 0 : 1 / d;
            }
        }
    }

    /** values[c][2j]: component c at node j; values[c][2j + 1]: its derivative (per unit fraction). */
    private final double[][] data;
    /** coefficients[c][k]: Newton coefficient k of component c on the doubled nodes. */
    private final double[][] coefficients;
    private final double[] work = new double[2 * NODES];
    private double start;
    private double width;

    /**
     * Creates the buffers.
     *
     * @param components how many state components are sampled
     */
    HermiteStep(int components) {
        this.data = new double[components][2 * NODES];
        this.coefficients = new double[components][2 * NODES];
    }

    /**
     * Starts a new step.
     *
     * @param from the step's first time (s)
     * @param to   its last time (s), after from
     */
    void begin(double from, double to) {
        start = from;
        width = to - from;
    }

    /**
     * The time of a node on the current step; call {@link #begin} first.
     *
     * @param j the node, 0 to {@link #NODES} − 1 (0 and NODES − 1 are the step's ends)
     * @return its time (s)
     */
    double nodeTime(int j) {
        return j == NODES - 1 ? start + width : start + width * FRACTIONS[j];
    }

    /**
     * Stores a component's value and time derivative at a node.
     *
     * @param c          the component
     * @param j          the node
     * @param value      the value there (unit of the component)
     * @param derivative its rate of change there (unit per second)
     */
    void set(int c, int j, double value, double derivative) {
        data[c][2 * j] = value;
        data[c][2 * j + 1] = derivative * width;
    }

    /** Turns the node data into Newton coefficients, for every component. */
    void transform() {
        final double[] q = work;
        for (int c = 0; c < data.length; c++) {
            final double[] d = data[c];
            final double[] a = coefficients[c];
            for (int i = 0; i < 2 * NODES; i++) {
                q[i] = d[2 * (i / 2)];
            }
            a[0] = q[0];
            // order 1: the derivative where a node repeats, a difference quotient between nodes
            for (int i = 2 * NODES - 1; i >= 1; i--) {
                q[i] = (i % 2 == 1) ? d[i] : (q[i] - q[i - 1]) * INVERSE[1][i];
            }
            a[1] = q[1];
            for (int j = 2; j < 2 * NODES; j++) {
                for (int i = 2 * NODES - 1; i >= j; i--) {
                    q[i] = (q[i] - q[i - 1]) * INVERSE[j][i];
                }
                a[j] = q[j];
            }
        }
    }

    /**
     * A component inside the step, by nested multiplication of the Newton form.
     *
     * @param c the component
     * @param t the time, within the step (s)
     * @return the component's value there
     */
    double value(int c, double t) {
        final double[] a = coefficients[c];
        final double x = (t - start) / width;
        double p = a[DEGREE];
        for (int k = DEGREE - 1; k >= 0; k--) {
            p = p * (x - Z[k]) + a[k];
        }
        return p;
    }
}
