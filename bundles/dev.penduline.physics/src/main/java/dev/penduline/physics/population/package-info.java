/**
 * Statistics of a population of fitted mechanisms of one design (the survey of many records):
 * where the values lie (median, median absolute deviation, 5th and 95th percentiles), which units
 * stand out (the modified z-score), and the limits of an individuals control chart.
 *
 * <h2>Where to start</h2>
 * {@link dev.penduline.physics.population.PopulationStatistics#of(double[])} gives a
 * {@link dev.penduline.physics.population.PopulationStatistics} of values in the units' order.
 *
 * <h2>Traps</h2>
 * <ul>
 * <li>Control limits are statistical: they say where the process has been, not whether a unit
 * is acceptable; they are no acceptance criteria.</li>
 * <li>The individuals chart's limits need the units in production (or test) order: the moving
 * range is taken between neighbours in the order given.</li>
 * </ul>
 */
package dev.penduline.physics.population;
