package dev.penduline.physics.motion;

import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * The state of a {@link SwingIntegration} at the caller's sample times: θ, ω and chosen
 * components of the companion's state, written into buffers that are reused from run to run.
 *
 * <p>In each accepted step the samples that fall in it are interpolated directly when they are
 * few, and through the step's polynomial ({@link HermiteStep}, two interpolations a step) when
 * there are more. Samples at or before the release get the state at release; samples after the body has
 * come to rest for good get the resting state. One instance per thread.
 */
public final class SwingSampler implements ODEStepHandler {

    /** Up to this many samples in a step are interpolated one by one (the polynomial costs two). */
    private static final int DIRECT_SAMPLES = 2;

    private final int[] recorded;
    /** values[0]: θ (rad), values[1]: ω (rad/s), values[2 + k]: companion component recorded[k]. */
    private final double[][] values;
    private final HermiteStep polynomial;
    private double[] times;
    private int next;
    private int end;
    private double lastTime;

    /**
     * Creates the buffers.
     *
     * @param capacity  the largest number of samples of a run
     * @param companion the companion components to record besides θ and ω, in column order
     */
    public SwingSampler(int capacity, int... companion) {
        this.recorded = companion.clone();
        this.values = new double[2 + recorded.length][capacity];
        this.polynomial = new HermiteStep(2 + recorded.length);
    }

    /**
     * Sets the sample times of the next run: samples {@code from} to {@code to − 1} of
     * {@code sampleTimes}, in s since release, non-decreasing; the array is read, not copied.
     *
     * @param sampleTimes times since release (s)
     * @param from        first sample
     * @param to          one past the last sample; the run ends at the last sample's time
     */
    public void start(double[] sampleTimes, int from, int to) {
        this.times = sampleTimes;
        this.next = from;
        this.end = to;
        this.lastTime = to > from ? sampleTimes[to - 1] : 0;
    }

    /**
     * The angle at each sample, filled up to the last run's samples; the buffer itself.
     *
     * @return θ in the model's frame (rad)
     */
    public double[] angles() {
        return values[0];
    }

    /**
     * The angular velocity at each sample; the buffer itself.
     *
     * @return ω (rad/s)
     */
    public double[] velocities() {
        return values[1];
    }

    /**
     * A recorded companion component at each sample; the buffer itself.
     *
     * @param k the column, in the order given to the constructor
     * @return its values (units of the companion)
     */
    public double[] companion(int k) {
        return values[2 + k];
    }

    /** Time of the last sample of the run (s). */
    double lastTime() {
        return lastTime;
    }

    /** Records the samples at or before t with the given state. */
    void holdUntil(double t, double[] primary, double[] secondary) {
        while (next < end && times[next] <= t) {
            record(next++, primary, secondary);
        }
    }

    /** Records every remaining sample with the given state. */
    void holdRest(double[] primary, double[] secondary) {
        while (next < end) {
            record(next++, primary, secondary);
        }
    }

    private void record(int i, double[] primary, double[] secondary) {
        values[0][i] = primary[0];
        values[1][i] = primary[1];
        for (int k = 0; k < recorded.length; k++) {
            values[2 + k][i] = secondary[recorded[k]];
        }
    }

    @Override
    public void handleStep(ODEStateInterpolator interpolator) {
        final double tCurrent = interpolator.getCurrentState().getTime();
        int last = next;
        while (last < end && times[last] <= tCurrent) {
            last++;
        }
        final double tPrevious = interpolator.getPreviousState().getTime();
        final int components = values.length;
        if (last - next > DIRECT_SAMPLES && tCurrent > tPrevious) {
            final HermiteStep poly = polynomial;
            poly.begin(tPrevious, tCurrent);
            for (int j = 0; j < HermiteStep.NODES; j++) {
                final ODEStateAndDerivative s = j == 0 ? interpolator.getPreviousState()
                        : j == HermiteStep.NODES - 1 ? interpolator.getCurrentState()
                        : interpolator.getInterpolatedState(poly.nodeTime(j));
                final double[] y = s.getPrimaryState();
                final double[] dy = s.getPrimaryDerivative();
                poly.set(0, j, y[0], dy[0]);
                poly.set(1, j, y[1], dy[1]);
                if (components > 2) {
                    final double[] z = s.getSecondaryState(1);
                    final double[] dz = s.getSecondaryDerivative(1);
                    for (int k = 0; k < recorded.length; k++) {
                        poly.set(2 + k, j, z[recorded[k]], dz[recorded[k]]);
                    }
                }
            }
            poly.transform();
            for (; next < last; next++) {
                final double t = times[next];
                for (int c = 0; c < components; c++) {
                    values[c][next] = poly.value(c, t);
                }
            }
        } else {
            for (; next < last; next++) {
                final ODEStateAndDerivative s = interpolator.getInterpolatedState(times[next]);
                record(next, s.getPrimaryState(), components > 2 ? s.getSecondaryState(1) : null);
            }
        }
    }
}
