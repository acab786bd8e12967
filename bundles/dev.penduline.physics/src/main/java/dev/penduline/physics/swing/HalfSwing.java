package dev.penduline.physics.swing;

/**
 * One half-swing, from a turning point to the next.
 *
 * @param index               0 for the half-swing that starts at the release
 * @param startTime           start, in the record's time base (s)
 * @param duration            time to the next turning point (s)
 * @param startAmplitude      amplitude at the start, from the equilibrium (rad)
 * @param endAmplitude        amplitude at the end (rad)
 * @param meanAmplitude       Ā, the mean of the two (rad)
 * @param decrement           ΔA = start − end (rad)
 * @param equivalentDecrement the decrement that the same energy loss makes at small angles,
 *                            {@code 2 sin Ā sin(ΔA/2) / Ā} (rad): gravity's potential is
 *                            {@code K(1 − cos A)}, and {@code cos A₂ − cos A₁ = 2 sin Ā sin(ΔA/2)}
 *                            exactly, so this equals {@code ΔE/(K Ā)} at any amplitude
 */
public record HalfSwing(int index, double startTime, double duration, double startAmplitude, double endAmplitude,
        double meanAmplitude, double decrement, double equivalentDecrement) {

    static HalfSwing between(int index, MeasuredTurningPoint a, MeasuredTurningPoint b) {
        final double mean = 0.5 * (a.amplitude() + b.amplitude());
        final double d = a.amplitude() - b.amplitude();
        final double equivalent = mean > 0 ? 2 * Math.sin(mean) * Math.sin(0.5 * d) / mean : d;
        return new HalfSwing(index, a.time(), b.time() - a.time(), a.amplitude(), b.amplitude(), mean, d, equivalent);
    }
}
