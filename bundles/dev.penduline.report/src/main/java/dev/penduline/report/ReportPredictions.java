package dev.penduline.report;

import java.util.List;

import dev.penduline.services.MechanismForecast;

/**
 * The predictions a report includes: what {@code penduline predict} computed for the options
 * given, and its readable lines, so the report says what the command says.
 *
 * @param options the predict options, as given
 * @param lines   the readable report of {@code penduline predict}, line by line (its caution left out:
 *                the report has its own)
 * @param outcome the forecast
 */
public record ReportPredictions(String options, List<String> lines, MechanismForecast.Outcome outcome) {

    /** Freezes the list. */
    public ReportPredictions {
        lines = List.copyOf(lines);
    }
}
