package dev.penduline.report;

import java.nio.file.Path;
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

    /**
     * The predictions of a mechanism file, its lines naming the file by its name only, so the report
     * reads the same wherever it was made from.
     *
     * @param options       the predict options, as given
     * @param lines         the readable forecast ({@code ForecastText.lines})
     * @param outcome       the forecast
     * @param mechanismFile the mechanism file, as the lines name it
     * @return the predictions
     */
    public static ReportPredictions of(String options, List<String> lines, MechanismForecast.Outcome outcome,
            Path mechanismFile) {
        String given = mechanismFile.toString();
        String name = mechanismFile.getFileName().toString();
        return new ReportPredictions(options, lines.stream().map(l -> l.replace(given, name)).toList(), outcome);
    }
}
