package dev.penduline.physics.motion;

import java.util.List;

/**
 * The outcome of one simulated swing: the sampled trajectory, its turning points, whether and
 * where the body came to rest, and the energy account.
 *
 * <p>Angles are in the sensor's frame (the frame of the {@code θ0} given to the simulator);
 * gravity acts on {@code θ − θeq}. Array accessors return copies.
 */
public final class SwingRun {

    private final double[] times;
    private final double[] angles;
    private final double[] velocities;
    private final List<TurningPoint> turningPoints;
    private final boolean stopped;
    private final double stopTime;
    private final double restAngle;
    private final SwingEnergy energy;
    private final boolean smoothed;

    SwingRun(double[] times, double[] angles, double[] velocities, List<TurningPoint> turningPoints,
            boolean stopped, double stopTime, double restAngle, SwingEnergy energy, boolean smoothed) {
        this.times = times;
        this.angles = angles;
        this.velocities = velocities;
        this.turningPoints = List.copyOf(turningPoints);
        this.stopped = stopped;
        this.stopTime = stopTime;
        this.restAngle = restAngle;
        this.energy = energy;
        this.smoothed = smoothed;
    }

    /**
     * The sample times asked for.
     *
     * @return times since release (s)
     */
    public double[] times() {
        return times.clone();
    }

    /**
     * The angle at each sample time.
     *
     * @return θ in the sensor's frame (rad)
     */
    public double[] angles() {
        return angles.clone();
    }

    /**
     * The angular velocity at each sample time.
     *
     * @return ω (rad/s)
     */
    public double[] velocities() {
        return velocities.clone();
    }

    /**
     * Number of samples.
     *
     * @return the length of {@link #times()}
     */
    public int size() {
        return times.length;
    }

    /**
     * Every instant of zero velocity, in time order: the release when it is from rest, each
     * reversal, and the final stop.
     *
     * @return the turning points (unmodifiable)
     */
    public List<TurningPoint> turningPoints() {
        return turningPoints;
    }

    /**
     * Durations between consecutive turning points.
     *
     * @return half-swing durations (s); empty with fewer than two turning points
     */
    public double[] halfSwingDurations() {
        final int n = Math.max(0, turningPoints.size() - 1);
        final double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = turningPoints.get(i + 1).time() - turningPoints.get(i).time();
        }
        return d;
    }

    /**
     * Full-cycle periods, from each turning point to the next-but-one.
     *
     * @return periods (s); empty with fewer than three turning points
     */
    public double[] periods() {
        final int n = Math.max(0, turningPoints.size() - 2);
        final double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            p[i] = turningPoints.get(i + 2).time() - turningPoints.get(i).time();
        }
        return p;
    }

    /**
     * Whether the body is held at rest by stiction at the end of the run.
     *
     * @return true when at rest at the end
     */
    public boolean stopped() {
        return stopped;
    }

    /**
     * When the body last came to rest.
     *
     * @return time since release (s), or NaN when it is moving at the end
     */
    public double stopTime() {
        return stopTime;
    }

    /**
     * Where the body rests.
     *
     * @return θ in the sensor's frame (rad), or NaN when it is moving at the end
     */
    public double restAngle() {
        return restAngle;
    }

    /**
     * The energy account of the run.
     *
     * @return initial, remaining, dissipated and applied energy (J)
     */
    public SwingEnergy energy() {
        return energy;
    }

    /**
     * Whether the sign of the velocity was smoothed with {@code tanh}: then stiction was not
     * modelled and the body never stops exactly.
     *
     * @return true for a smoothed run
     */
    public boolean smoothed() {
        return smoothed;
    }
}
