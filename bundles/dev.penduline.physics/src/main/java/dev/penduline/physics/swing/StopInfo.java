package dev.penduline.physics.swing;

/**
 * Whether and where the body came to rest, and the band of static friction that the stop allows.
 *
 * <p>A body at rest at {@code x = θrest − θeq} is held against the gravity torque {@code K sin x},
 * K = m g Lc cos α, so the static friction torque Ts is at least {@code K |sin x|}; at the
 * reversal before, {@code x_prev} from the equilibrium, the body did not stick but moved on, so
 * Ts is below {@code K |sin x_prev|}. Both follow from the equation of motion at ω = 0 (the body
 * stays put while the net torque is within the static friction). The lower end is given only
 * when the rest offset exceeds twice its uncertainty: a viscous decay settles at the equilibrium
 * itself, and a rest within the uncertainty shows no stiction that the uncertainty would not
 * also allow.
 *
 * @param stopped               true when the record ends at rest
 * @param time                  the stop: the last reversal, after which the body does not move
 *                              again, in the record's time base (s); NaN when not stopped
 * @param timeUncertainty       standard uncertainty of {@code time} (s); NaN when not judged
 * @param restAngle             the rest reading, sensor frame (rad); NaN when not stopped
 * @param restOffset            rest angle minus the equilibrium, x (rad); NaN when not stopped
 * @param restOffsetUncertainty standard uncertainty of x: the equilibrium's and the rest level's
 *                              (rad); NaN when the equilibrium's is unknown
 * @param previousOffset        the reversal before the stop, from the equilibrium, x_prev (rad);
 *                              NaN when not stopped
 * @param stictionLowerBound    {@code K |sin x|} (N·m); NaN when x is within twice its uncertainty,
 *                              when not stopped or when the mechanism is unknown
 * @param stictionUpperBound    {@code K |sin x_prev|} (N·m); NaN when not stopped or when the
 *                              mechanism is unknown
 * @param stictionResolution    {@code K |sin 2σ|}, σ the rest offset's uncertainty: the least
 *                              static torque a rest could show against that uncertainty (N·m);
 *                              NaN when not stopped, the mechanism or σ unknown
 * @param note                  a sentence for the report
 */
public record StopInfo(boolean stopped, double time, double timeUncertainty, double restAngle, double restOffset,
        double restOffsetUncertainty, double previousOffset, double stictionLowerBound, double stictionUpperBound,
        double stictionResolution, String note) {

    /**
     * A record that ends still moving.
     *
     * @return the stop info with every number NaN
     */
    static StopInfo moving() {
        final double nan = Double.NaN;
        return new StopInfo(false, nan, nan, nan, nan, nan, nan, nan, nan, nan,
                "the body is still moving at the end of the record, or still for less than a period");
    }
}
