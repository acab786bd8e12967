package dev.penduline.physics.swing;

import java.util.List;
import java.util.Optional;

/**
 * Everything the decay analysis of one free-release record found, as plain values ready to be
 * written out. Times are in the record's time base (s), angles in rad.
 *
 * @param release       where the record leaves the still segment
 * @param offset        the equilibrium reading and how it was obtained
 * @param initialAngle  θ0 from the equilibrium, the still level less the offset (rad, signed)
 * @param turningPoints turning points with amplitudes, release first
 * @param halfSwings    per half-swing: time, amplitudes, decrement
 * @param cycles        per full cycle: period, amplitude and, when the mechanism is known, the
 *                      predicted large-amplitude period beside it
 * @param periodCheck   measured against predicted small-angle period
 * @param envelopes     linear, geometric and reciprocal envelopes (empty with fewer than three
 *                      turning points)
 * @param regression    the decrement regression ΔA = a0 + a1 Ā + a2 Ā², empty with fewer than two
 *                      half-swings
 * @param verdict       the dominant loss and its evidence
 * @param estimates     b, Tc and c in SI when the mechanism is known
 * @param stop          whether and where the body came to rest
 * @param warnings      things the user should know, in plain sentences
 */
public record SwingAnalysis(Release release, ZeroOffset offset, double initialAngle,
        List<MeasuredTurningPoint> turningPoints, List<HalfSwing> halfSwings, List<SwingCycle> cycles,
        PeriodCheck periodCheck, List<DecayEnvelope> envelopes, Optional<DecrementRegression> regression,
        LossVerdict verdict, Optional<FrictionEstimates> estimates, StopInfo stop, List<String> warnings) {

    /**
     * Freezes the lists.
     */
    public SwingAnalysis {
        turningPoints = List.copyOf(turningPoints);
        halfSwings = List.copyOf(halfSwings);
        cycles = List.copyOf(cycles);
        envelopes = List.copyOf(envelopes);
        warnings = List.copyOf(warnings);
    }

    /**
     * The envelope of a given shape.
     *
     * @param model the shape
     * @return the fitted envelope, empty when none was fitted
     */
    public Optional<DecayEnvelope> envelope(DecayEnvelope.Model model) {
        return envelopes.stream().filter(e -> e.model() == model).findFirst();
    }
}
