package dev.penduline.cli.commands;

import dev.penduline.services.Cautions;

/** The caution of the readable reports: the words are {@link Cautions}', shared with the workbench and the reports. */
final class Caution {

    /** Printed last in readable reports. */
    static final String TEXT = Cautions.TEXT;

    /** Printed with figures that feed hazard judgements (closing speeds, energies). */
    static final String HAZARD = Cautions.HAZARD;

    private Caution() {
    }
}
