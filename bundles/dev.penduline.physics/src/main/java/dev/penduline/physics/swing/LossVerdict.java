package dev.penduline.physics.swing;

import java.util.List;

/**
 * A first verdict on which loss dominates a free decay, with its evidence. It is a reading of
 * the decrement regression, to guide the choice of terms for the full fit, not a substitute for
 * comparing fitted models.
 *
 * @param kind          the dominant loss, {@link Loss#MIXED} when no term carries the required
 *                      share, {@link Loss#UNDETERMINED} when there are too few half-swings
 * @param leading       the term with the largest share (even when mixed); UNDETERMINED when none
 * @param coulombShare  share of a0 in the mean decrement over the record (0…1), NaN when unknown
 * @param viscousShare  share of a1·Ā (0…1), NaN when unknown
 * @param dragShare     share of a2·Ā² (0…1), NaN when unknown
 * @param bestEnvelope  the envelope shape with the highest r², null with fewer than three turning
 *                      points
 * @param evidence      sentences for the report
 */
public record LossVerdict(Loss kind, Loss leading, double coulombShare, double viscousShare, double dragShare,
        DecayEnvelope.Model bestEnvelope, List<String> evidence) {

    /** The losses of DOMAIN §3 that a free decay can tell apart. */
    public enum Loss {
        /** Dry friction, Tc sgn ω. */
        COULOMB,
        /** Viscous damping, b ω. */
        VISCOUS,
        /** Quadratic drag, c ω|ω|. */
        DRAG,
        /** Two or more terms share the losses. */
        MIXED,
        /** Too little record to tell. */
        UNDETERMINED
    }

    /**
     * Freezes the list.
     */
    public LossVerdict {
        evidence = List.copyOf(evidence);
    }
}
