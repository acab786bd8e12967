package dev.penduline.physics.identify;

/**
 * The range of static torque consistent with where the recorded swings stopped. Stiction
 * only decides whether the body sticks at a reversal, so every Ts in the band gives the same
 * trajectory: the data bound it, they do not pin it.
 *
 * @param lower    smallest consistent Ts, the gravity torque at the final rest K |sin(θ_rest − eq)| or Tc (N·m)
 * @param upper    largest consistent Ts, the gravity torque at the last reversal before the stop (N·m)
 * @param resolved false when the sessions disagree (the band of one session misses another's)
 */
public record StictionBand(double lower, double upper, boolean resolved) {

    /**
     * The middle of the band, used as the point estimate.
     *
     * @return (lower + upper) / 2 (N·m)
     */
    public double middle() {
        return 0.5 * (lower + upper);
    }

    /**
     * The standard uncertainty of the middle: every Ts in the band fits alike, so it is taken
     * as uniformly distributed over the band, σ = width/√12 (JCGM 100:2008, §4.3.7, the
     * rectangular distribution).
     *
     * @return (upper − lower)/√12 (N·m)
     */
    public double sigma() {
        return (upper - lower) / Math.sqrt(12);
    }
}
