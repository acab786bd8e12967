package dev.penduline.physics.swing;

import java.util.List;

/**
 * A record trimmed at the release, with its equilibrium, turning points and a smoothed velocity:
 * what the decay analysis and the later fit start from. Arrays are copied in and out.
 */
public final class PreparedSwing {

    private final double[] times;
    private final double[] angles;
    private final double[] velocities;
    private final Release release;
    private final ZeroOffset offset;
    private final List<MeasuredTurningPoint> turningPoints;
    private final SavitzkyGolay filter;
    private final double periodEstimate;
    private final StopFinder.Stop stop;
    private final double noiseBand;

    PreparedSwing(double[] times, double[] angles, double[] velocities, Release release, ZeroOffset offset,
            List<MeasuredTurningPoint> turningPoints, SavitzkyGolay filter, SwingOutline outline) {
        this.times = times;
        this.angles = angles;
        this.velocities = velocities;
        this.release = release;
        this.offset = offset;
        this.turningPoints = List.copyOf(turningPoints);
        this.filter = filter;
        this.periodEstimate = outline.period();
        this.stop = outline.stop();
        this.noiseBand = outline.noiseBand();
    }

    /**
     * Sample times from the release on, in the record's time base.
     *
     * @return times (s)
     */
    public double[] times() {
        return times.clone();
    }

    /**
     * Angles from the release on, in the sensor's frame.
     *
     * @return angles (rad)
     */
    public double[] angles() {
        return angles.clone();
    }

    /**
     * Angles from the equilibrium: the sensor's angle less the estimated offset.
     *
     * @return θ − θeq (rad)
     */
    public double[] anglesFromEquilibrium() {
        final double[] a = new double[angles.length];
        for (int i = 0; i < a.length; i++) {
            a[i] = angles[i] - offset.value();
        }
        return a;
    }

    /**
     * Angular velocity by the Savitzky–Golay differentiator {@link #filter()}.
     *
     * @return ω (rad/s)
     */
    public double[] velocities() {
        return velocities.clone();
    }

    /**
     * The release found.
     *
     * @return the release
     */
    public Release release() {
        return release;
    }

    /**
     * The equilibrium reading (zero offset) found.
     *
     * @return the offset
     */
    public ZeroOffset offset() {
        return offset;
    }

    /**
     * Turning points with their amplitudes from the equilibrium, release first.
     *
     * @return the turning points (unmodifiable)
     */
    public List<MeasuredTurningPoint> turningPoints() {
        return turningPoints;
    }

    /**
     * The differentiator used for the velocity.
     *
     * @return the filter
     */
    public SavitzkyGolay filter() {
        return filter;
    }

    /**
     * The period from the spacing of the centre crossings, a rough value for windows.
     *
     * @return period (s), NaN with fewer than two crossings
     */
    public double periodEstimate() {
        return periodEstimate;
    }

    /**
     * Index (into {@link #times()}) of the first sample at or after the stop: the last reversal,
     * after which the body does not move again.
     *
     * @return the index, −1 when the record does not settle
     */
    public int settledFrom() {
        return stop == null ? -1 : stop.index();
    }

    /**
     * The rest reading after the stop: the mean of the readings over two periods from it.
     *
     * @return angle in the sensor's frame (rad), NaN when not settled
     */
    public double settledLevel() {
        return stop == null ? Double.NaN : stop.level();
    }

    /** The stop as found, null when the body is still moving at the end of the record. */
    StopFinder.Stop stop() {
        return stop;
    }

    /**
     * Half-width of the band within which the angle counts as still: 4σ + 2q.
     *
     * @return the band (rad)
     */
    public double noiseBand() {
        return noiseBand;
    }
}
