/**
 * Figures for people: how the command line's readable reports and the workbench's views write a
 * number, a value with its standard uncertainty (JCGM 100:2008 §7.2.6: the uncertainty to two
 * significant digits, the value to the same decimal place) and a percentage. Start from
 * {@link dev.penduline.services.present.Figures}; its class comment states the notation rule.
 * {@link dev.penduline.services.present.PlotThinning} thins long records for drawing (the
 * workbench's charts and the report's plots), keeping every peak.
 *
 * <p>Plain Java only (no EMF, no OSGi, no user interface), independent of the default locale.
 * Machine output (JSON, CSV) never goes through here: it keeps a {@code double}'s full precision.
 */
package dev.penduline.services.present;
