package dev.penduline.ui.internal.chart;

import java.util.List;
import java.util.Optional;

import dev.penduline.services.present.PlotThinning;

/**
 * What the Swing Chart draws: the angle against time (thinned for drawing), the turning points,
 * the release, and the lines of the summary below the chart. Built off the UI thread from the
 * services' results; angles in degrees, times in seconds, as plotted.
 *
 * @param title         the chart's title (says when the curve is a prediction)
 * @param curve         the angle (°) against time (s), at most {@link #DRAWN_POINTS} points
 * @param curvePoints   how many samples the record or prediction really has
 * @param turningPoints the turning points found by the analysis (or the simulator), time (s)
 *                      and angle (°)
 * @param releaseTime   the release instant (s), NaN when unknown
 * @param stopTime      when the body came to rest (s), NaN when it did not or it is unknown
 * @param predicted     true when the curve is a prediction, not a record
 * @param summary       the short summary under the chart (first look from the decay, release, offset, estimates)
 * @param warnings      what the user should know about the record or the analysis
 * @param error         what went wrong, when nothing could be drawn
 */
public record SwingChartContent(String title, PlotThinning.Points curve, int curvePoints,
        PlotThinning.Points turningPoints, double releaseTime, double stopTime, boolean predicted, List<String> summary,
        List<String> warnings, Optional<String> error) {

    /** The most points drawn of one curve; longer records are thinned keeping their extremes. */
    public static final int DRAWN_POINTS = 20_000;

    private static final PlotThinning.Points NONE = new PlotThinning.Points(new double[0], new double[0]);

    /** Freezes the lists. */
    public SwingChartContent {
        summary = List.copyOf(summary);
        warnings = List.copyOf(warnings);
    }

    /**
     * A chart that only says what went wrong.
     *
     * @param title   the title
     * @param message the services' message (file, line, field)
     * @return the content
     */
    public static SwingChartContent failed(String title, String message) {
        return new SwingChartContent(title, NONE, 0, NONE, Double.NaN, Double.NaN, false, List.of(), List.of(),
                Optional.of(message));
    }
}
