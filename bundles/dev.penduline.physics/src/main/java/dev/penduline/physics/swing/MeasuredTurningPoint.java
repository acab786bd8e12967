package dev.penduline.physics.swing;

/**
 * A turning point read from a record: an instant of zero angular velocity, located between the
 * samples by a local quadratic fit.
 *
 * @param time      instant in the record's time base (s)
 * @param angle     angle in the sensor's frame (rad)
 * @param amplitude distance from the equilibrium, {@code |angle − θeq|} (rad); NaN until the
 *                  equilibrium is known
 * @param kind      release, reversal or stop
 */
public record MeasuredTurningPoint(double time, double angle, double amplitude, Kind kind) {

    /** What happened at the turning point. */
    public enum Kind {
        /** The body was let go from rest here. */
        RELEASE,
        /** The body reversed at the end of a half-swing. */
        REVERSAL,
        /** The body came to rest here; its time is only as good as the settling is sharp. */
        STOP
    }

    /**
     * Returns a copy with the amplitude measured from an equilibrium.
     *
     * @param equilibrium the sensor's reading at the hanging equilibrium (rad)
     * @return the copy
     */
    public MeasuredTurningPoint withAmplitudeFrom(double equilibrium) {
        return new MeasuredTurningPoint(time, angle, Math.abs(angle - equilibrium), kind);
    }
}
