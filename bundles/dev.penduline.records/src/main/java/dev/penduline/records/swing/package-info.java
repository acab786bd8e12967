/**
 * Importing free-release swing records: the angle of a body let go from rest, as an encoder, an
 * IMU or a video tracker wrote it.
 *
 * <p><b>Where to start.</b> {@link dev.penduline.records.swing.SwingRecordReader#read} with
 * {@link dev.penduline.records.swing.SwingImportOptions#defaults()} (or the user's choices)
 * returns a {@link dev.penduline.records.swing.SwingRecord}: times and angles in SI, the file's
 * path and SHA-256, the {@link dev.penduline.records.swing.SwingRecordMapping} that read it (store
 * it in the project to read the file the same way again), the assumptions made and the
 * warnings. The analysis itself lives in {@code dev.penduline.physics.swing}.
 *
 * <p><b>Units.</b> s, ms, µs (suffix {@code us}); rad, deg, encoder counts. Conversion to SI
 * happens here, through {@link dev.penduline.physics.units.Unit}, and nowhere else.
 *
 * <p><b>Traps.</b>
 * <ul>
 * <li>Encoder counts need the counts per revolution after quadrature decoding (four times the
 * line count of a quadrature encoder).</li>
 * <li>A decimal comma cannot share the line with a comma delimiter: such files use semicolons or
 * tabs, and the reader detects them.</li>
 * <li>A header without units makes the reader assume seconds and degrees, and say so; check the
 * assumptions.</li>
 * <li>The raw file is only read; the hash lets a project notice if it was edited later.</li>
 * </ul>
 */
package dev.penduline.records.swing;
