/**
 * The Swing Chart view: a test session's record, angle (°) against time (s), with the turning
 * points and release the analysis found, and the first look from the decay, offset and first
 * estimates below.
 * Start from {@link dev.penduline.ui.internal.chart.SwingChartPart}; the data comes from
 * {@link dev.penduline.ui.internal.chart.ChartSubject}, which calls {@code SessionRecords},
 * {@code SwingSessionAnalysis} and, for a mechanism without sessions, {@code SwingPrediction}.
 *
 * <p>Traps: records may hold hundreds of thousands of samples; they are thinned for drawing
 * only ({@link dev.penduline.services.present.PlotThinning}, keeping each run's extremes so
 * that peaks survive), never for the analysis. Record angles are in the sensor's frame (the
 * offset is not removed); a prediction is measured from the hanging equilibrium.
 *
 * <p>{@link dev.penduline.ui.internal.chart.ChartTools#install} gives any SWTChart chart its zoom,
 * pan, hover readout and PNG/SVG export ({@link dev.penduline.ui.internal.chart.ChartSvg} draws the
 * SVG from the series); axis titles must read "quantity (unit)" for the readout to name units.
 */
package dev.penduline.ui.internal.chart;
