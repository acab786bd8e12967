package dev.penduline.cli.commands;

/** The usual caution printed under every human-readable report. */
final class Caution {

    /** Printed last in readable reports. */
    static final String TEXT = "Caution: these results are estimates to be confirmed by test. For doors, hatches, "
            + "gates and lifting gear, follow local codes and licensed engineering practice.";

    private Caution() {
    }
}
