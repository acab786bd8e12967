package dev.penduline.cli.commands;

/** The usual caution printed under every human-readable report. */
final class Caution {

    /** Printed last in readable reports. */
    static final String TEXT = "Caution: these results are estimates to be confirmed by test. For doors, hatches, "
            + "gates and lifting gear, follow local codes and licensed engineering practice.";

    /** Printed with figures that feed hazard judgements (closing speeds, energies). */
    static final String HAZARD = "Closing speeds and energies feed hazard judgements (slam, pinch, impact): a prediction "
            + "never shows that a mechanism is safe. Judge the hazard by the applicable local codes and standards, with "
            + "licensed engineering practice, and confirm it on the real mechanism.";

    private Caution() {
    }
}
