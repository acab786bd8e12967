/**
 * The report's plots: inline SVG pictures drawn by JFreeChart on a JFreeSVG canvas, headless,
 * from plain arrays in the units of their axes. Start from
 * {@link dev.penduline.report.plot.Plots}; each method returns a
 * {@link dev.penduline.report.plot.SvgPicture}.
 *
 * <p>Traps: JFreeChart 1.5.6's element hinting marks only the chart, not its series, so the
 * renderers here wrap each series in a {@code <g class='series' data-series='NAME'>} group
 * themselves; JFreeSVG declares the xlink and its own namespace on every {@code <svg>}, which
 * {@code SvgCanvas} takes out (nothing uses them); bars use a flat painter (JFreeChart's default
 * paints gradients).
 */
package dev.penduline.report.plot;
