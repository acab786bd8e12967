package dev.penduline.physics.motion;

/**
 * Cheap dense output of several state components over one integration step.
 *
 * <p>Within a step, the continuous extension of Dormand–Prince 8(5,3) is a polynomial of
 * degree 7 in time (Hairer, Nørsett &amp; Wanner, Solving Ordinary Differential Equations I,
 * dense output of DOP853), so eight Chebyshev nodes reproduce it up to rounding. The
 * integrator's interpolator is asked eight times per step; each sample then costs one
 * Clenshaw recurrence per component instead of an interpolation of the whole augmented state
 * (which allocates). One instance per {@link SwingSampler}; buffers are reused. The sampler
 * serves both the simulator (angle and velocity) and the identification's sensitivity
 * integration (the state and its sensitivities).
 */
final class ChebyshevStep {

    /** Number of nodes: degree 7 + 1. */
    public static final int NODES = 8;

    private final double[] nodes = new double[NODES];
    /** cos(π k (j + ½) / N): the discrete cosine transform at the Chebyshev nodes. */
    private final double[][] cosines = new double[NODES][NODES];
    /** values[c][j]: component c at node j. */
    private final double[][] values;
    /** coefficients[c][k]: Chebyshev coefficient k of component c. */
    private final double[][] coefficients;
    private double middle;
    private double halfWidth;

    /**
     * Creates the buffers.
     *
     * @param components how many state components are sampled
     */
    public ChebyshevStep(int components) {
        this.values = new double[components][NODES];
        this.coefficients = new double[components][NODES];
        for (int j = 0; j < NODES; j++) {
            nodes[j] = Math.cos(Math.PI * (j + 0.5) / NODES);
            for (int k = 0; k < NODES; k++) {
                cosines[k][j] = Math.cos(Math.PI * k * (j + 0.5) / NODES);
            }
        }
    }

    /**
     * The time of a node on the current step; call {@link #begin} first.
     *
     * @param j the node, 0 to {@link #NODES} − 1
     * @return its time (s)
     */
    public double nodeTime(int j) {
        return middle + halfWidth * nodes[j];
    }

    /**
     * Starts a new step.
     *
     * @param start the step's first time (s)
     * @param end   its last time (s)
     */
    public void begin(double start, double end) {
        middle = 0.5 * (start + end);
        halfWidth = 0.5 * (end - start);
    }

    /**
     * Stores a component's value at a node.
     *
     * @param c     the component
     * @param j     the node
     * @param value the value there (unit of the component)
     */
    public void set(int c, int j, double value) {
        values[c][j] = value;
    }

    /** Turns the node values into Chebyshev coefficients, for every component. */
    public void transform() {
        for (int c = 0; c < values.length; c++) {
            final double[] v = values[c];
            final double[] a = coefficients[c];
            for (int k = 0; k < NODES; k++) {
                final double[] cos = cosines[k];
                double sum = 0;
                for (int j = 0; j < NODES; j++) {
                    sum += v[j] * cos[j];
                }
                a[k] = (k == 0 ? 1.0 : 2.0) * sum / NODES;
            }
        }
    }

    /**
     * A component inside the step, by Clenshaw's recurrence.
     *
     * @param c the component
     * @param t the time, within the step (s)
     * @return the component's value there
     */
    public double value(int c, double t) {
        final double[] a = coefficients[c];
        final double x = (t - middle) / halfWidth;
        double b1 = 0;
        double b2 = 0;
        final double twoX = 2 * x;
        for (int k = NODES - 1; k >= 1; k--) {
            final double b0 = a[k] + twoX * b1 - b2;
            b2 = b1;
            b1 = b0;
        }
        return a[0] + x * b1 - b2;
    }
}
