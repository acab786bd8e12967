package dev.penduline.physics.swing;

/**
 * The sensor's reading at the hanging equilibrium, θeq, and how it was obtained.
 *
 * @param value       θeq in the sensor's frame (rad)
 * @param uncertainty one-standard-deviation uncertainty (rad); NaN when it cannot be judged
 * @param method      the source of the estimate
 * @param note        a sentence for the report: what was used and what to beware of
 */
public record ZeroOffset(double value, double uncertainty, Method method, String note) {

    /** Where an offset estimate comes from, best first. */
    public enum Method {
        /**
         * The symmetry of the swings: each run of three turning points p0, p1, p2 gives
         * {@code (p0 + 2 p1 + p2)/4}, in which the alternating centre shift of dry friction and
         * the decrement cancel (exact for a constant decrement per half-swing).
         */
        SWING_SYMMETRY,
        /** The midpoint of the only full half-swing: biased by half its decrement. */
        SINGLE_HALF_SWING,
        /**
         * The angle of a settled tail: the equilibrium only when there is no dry friction or
         * stiction; otherwise anywhere within the dead band ±Ts/K.
         */
        SETTLED_TAIL
    }
}
