package dev.penduline.services;

/**
 * The safety caution Penduline shows with its results, in one place for the command line, the
 * workbench and the reports: the figures are estimates, and the hazards of doors, hatches, gates
 * and lifting gear are judged by local codes and licensed engineering practice, not by a program.
 */
public final class Cautions {

    /** Shown with every readable result. */
    public static final String TEXT = "Caution: these results are estimates to be confirmed by test. For doors, hatches, "
            + "gates and lifting gear, follow local codes and licensed engineering practice.";

    /** Shown with figures that feed hazard judgements (closing speeds, energies). */
    public static final String HAZARD = "Closing speeds and energies feed hazard judgements (slam, pinch, impact): a "
            + "prediction never shows that a mechanism is safe. Judge the hazard by the applicable local codes and "
            + "standards, with licensed engineering practice, and confirm it on the real mechanism.";

    private Cautions() {
    }
}
