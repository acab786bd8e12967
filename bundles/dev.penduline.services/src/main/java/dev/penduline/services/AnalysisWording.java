package dev.penduline.services;

import dev.penduline.physics.swing.LossVerdict;
import dev.penduline.services.present.Figures;

/**
 * How a swing record's decay analysis is put into words, the same for {@code penduline analyze}'s
 * report and the workbench's Swing Chart: the first look from the decay, under
 * {@link LossVerdict#HEADING}, with the decrement's shares as whole percentages (the envelopes
 * resolve no finer).
 */
public final class AnalysisWording {

    private AnalysisWording() {
    }

    /**
     * The first look, one line.
     *
     * @param v the decay's reading
     * @return e.g. {@code First look from the decay (the fit decides): ... (Coulomb 31 %, viscous 52 %, drag 17 % of
     *         the mean decrement)}
     */
    public static String firstLook(LossVerdict v) {
        return LossVerdict.HEADING + ": " + v.reading() + " (Coulomb " + Figures.percent(v.coulombShare(), 0)
                + ", viscous " + Figures.percent(v.viscousShare(), 0) + ", drag " + Figures.percent(v.dragShare(), 0)
                + " of the mean decrement)";
    }
}
