package dev.penduline.physics.swing;

import java.util.List;
import java.util.Locale;

/**
 * A first look at which loss dominates a free decay, with its evidence. It is a reading of the
 * decrement regression and the decay envelopes, to guide the choice of terms for the full fit,
 * not a substitute for comparing fitted models: the fit decides. Wherever it is shown it goes
 * under {@link #HEADING}, never under the word "Verdict", which belongs to the fit.
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

    /**
     * The heading of this reading wherever it is shown (the command line's report, the workbench):
     * one wording, kept here.
     */
    public static final String HEADING = "First look from the decay (the fit decides)";

    /** The losses that a free decay can tell apart by the shape of its envelope. */
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

    /**
     * The reading in a few words, for a line that starts with {@link #HEADING}.
     *
     * @return e.g. "dry (Coulomb) friction dominates"
     */
    public String reading() {
        return switch (kind) {
            case COULOMB -> "dry (Coulomb) friction dominates";
            case VISCOUS -> "viscous damping dominates";
            case DRAG -> "air drag dominates";
            case MIXED -> "mixed losses, led by " + leading.name().toLowerCase(Locale.ROOT);
            case UNDETERMINED -> "undetermined (too few swings to tell)";
        };
    }
}
