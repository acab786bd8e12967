/**
 * Reading the files engineers bring to Penduline: parts lists and swing-test records.
 *
 * <p><b>Where to start.</b> {@link dev.penduline.records.parts.PartsListReader} for parts lists,
 * {@link dev.penduline.records.swing.SwingRecordReader} for angle records. Both report a bad file
 * with a {@link dev.penduline.records.RecordFormatException} naming the file, the 1-based line
 * and the column, and both split lines with {@link dev.penduline.records.DelimitedLine}.
 *
 * <p><b>Units.</b> Values are converted to SI on import, through
 * {@link dev.penduline.physics.units.Unit}, and nowhere else.
 *
 * <p><b>Traps.</b> A reader never writes to the file it reads. Decimal commas need a delimiter
 * other than the comma (semicolon or tab).
 */
package dev.penduline.records;
