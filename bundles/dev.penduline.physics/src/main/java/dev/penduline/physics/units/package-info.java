/**
 * Units of measurement: the one place where values change units. Inside Penduline everything
 * is SI (m, kg, kg·m², rad, s, rad/s, N·m, kg/m³); conversion happens only at the edges, when a
 * file is read or a value is shown.
 *
 * <p><b>Where to start.</b> {@link dev.penduline.physics.units.Unit} holds the catalogue of
 * units with their exact factors; {@link dev.penduline.physics.units.SuffixedName} reads the
 * unit from a column name such as {@code "mass_g"}, {@code "ixx_g_mm2"} or {@code "time_ms"}.
 *
 * <p><b>Traps.</b>
 * <ul>
 * <li>Encoder counts are an angle unit only once the counts per revolution are known
 * ({@link dev.penduline.physics.units.Unit#encoderCounts}); after quadrature decoding that is
 * four times the line count.</li>
 * <li>"lb" is the pound <em>mass</em>; a pound-force is a different quantity.</li>
 * <li>Inertia in g·mm² is 1e-9 kg·m²: a CAD value of 1.2e6 g·mm² is only 1.2e-3 kg·m².</li>
 * </ul>
 */
package dev.penduline.physics.units;
