package dev.penduline.records.parts;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.inertia.Part;
import dev.penduline.records.BoundedLines;
import dev.penduline.records.DelimitedLine;
import dev.penduline.records.InputFiles;
import dev.penduline.records.InputLimits;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.Utf8Text;

/**
 * Reads a parts list from a comma-separated file into {@link Part}s for the inertia engine.
 *
 * <p><b>Layout.</b> One header row, then one part per line; blank lines and lines starting with
 * {@code #} are skipped; fields may be double-quoted (and then hold commas). Columns may come in
 * any order:
 * <ul>
 * <li>{@code name}, {@code shape} — required text. Shapes: {@code point}; {@code rod} (slender,
 * {@code length} along {@code axis}); {@code box} ({@code length} along x, {@code width} along y,
 * {@code height} along z of the mechanism frame); {@code cylinder} ({@code radius},
 * {@code inner_radius} (0 or blank for solid), {@code length} along {@code axis});
 * {@code sphere} ({@code radius}); {@code ring} (thin, {@code radius}, {@code axis} normal to its
 * plane); {@code tensor} (the six components below).</li>
 * <li>{@code mass_kg} — or {@code density_kg_m3}, the mass then being density × volume for the
 * shapes that have a volume (box, cylinder, sphere); give one of the two per line.</li>
 * <li>{@code x_m}, {@code y_m}, {@code z_m} — required: the part's centroid.</li>
 * <li>{@code length_m, width_m, height_m, radius_m, inner_radius_m} and {@code axis}
 * ({@code x|y|z}) as the shape needs.</li>
 * <li>{@code cutout} ({@code true|false}, blank = false): material removed, counted with
 * negative mass; {@code quantity} (positive integer, blank = 1): identical copies at the same
 * place.</li>
 * <li>{@code ixx_kg_m2, iyy_kg_m2, izz_kg_m2, ixy_kg_m2, ixz_kg_m2, iyz_kg_m2} for
 * {@code shape=tensor}: the inertia tensor about the part's centroid in the mechanism frame.
 * <b>Sign convention:</b> the products are the tensor's off-diagonal elements,
 * {@code ixy = −∫ x y dm} (and likewise {@code ixz}, {@code iyz}); a CAD report that prints the
 * positive integrals {@code +∫ x y dm} must have them negated.</li>
 * <li>{@code mass_tol_kg} (or {@code mass_tolerance_kg}) and {@code dim_tol_m} (or
 * {@code dimension_tolerance_m}): optional ± tolerances, carried as data.</li>
 * </ul>
 * A number column's unit suffix may be any unit of its quantity known to
 * {@link dev.penduline.physics.units.Unit}: {@code x_mm}, {@code mass_g}, {@code mass_lb},
 * {@code radius_in}, {@code ixx_g_mm2}, {@code density_g_cm3} ...; values are converted to SI on
 * import.
 *
 * <p><b>Frame.</b> The pivot axis is z through the origin and gravity points along −y, so a part
 * hanging below the pivot has a negative y.
 *
 * <p><b>Errors.</b> Unknown columns are ignored with a warning; a column name within a small edit
 * distance of a known one is refused as a likely typo, naming the intended column. Missing
 * required columns and bad cells raise a {@link RecordFormatException} naming the file, the
 * 1-based line and the column's header. The input file is only ever read.
 */
public final class PartsListReader {

    /**
     * Creates a reader.
     */
    public PartsListReader() {
        // no settings yet; an instance leaves room for them without changing callers
    }

    /**
     * Reads a parts list file (UTF-8; a line in another encoding is refused with its number,
     * see {@link Utf8Text}).
     *
     * @param file the file; it is opened for reading only, and only when it is a regular file (a named
     *             pipe, a device or a folder is refused unopened, see {@link InputFiles})
     * @return the parts and warnings
     * @throws IOException            when the file cannot be read
     * @throws RecordFormatException  naming file, line and column of the first problem
     */
    public PartsList read(Path file) throws IOException, RecordFormatException {
        InputFiles.requireRegularFile(file, "a parts list (a .csv file)");
        InputLimits.requireSize(file, InputLimits.MAX_PARTS_LIST_BYTES, "parts list");
        try (Reader in = Utf8Text.reader(Files.newInputStream(file))) {
            return read(in, file.toString());
        }
    }

    /**
     * Reads a parts list from a character stream.
     *
     * @param in       the text; not closed by this method
     * @param fileName the name to use in messages
     * @return the parts and warnings
     * @throws IOException           when the stream fails
     * @throws RecordFormatException naming file, line and column of the first problem
     */
    public PartsList read(Reader in, String fileName) throws IOException, RecordFormatException {
        final BufferedReader lines = in instanceof BufferedReader b ? b : new BufferedReader(in);
        final List<Part> parts = new ArrayList<>();
        final List<String> warnings = new ArrayList<>();
        PartsHeader header = null;
        int lineNumber = 0;
        final BoundedLines bounded = new BoundedLines(lines, fileName, InputLimits.MAX_LINE_CHARS);
        for (String line = bounded.next(); line != null; line = bounded.next()) {
            lineNumber++;
            if (lineNumber == 1 && line.startsWith("\uFEFF")) {
                line = line.substring(1);
            }
            final boolean skipped = line.isBlank() || line.stripLeading().startsWith("#");
            Utf8Text.check(line, lineNumber, !skipped, fileName);
            if (skipped) {
                continue;
            }
            final List<String> cells = DelimitedLine.split(line, ',', fileName, lineNumber);
            if (header == null) {
                header = PartsHeader.parse(cells, fileName, lineNumber);
                warnings.addAll(header.warnings());
                continue;
            }
            if (cells.stream().allMatch(String::isBlank)) {
                continue;
            }
            if (parts.size() >= InputLimits.MAX_PARTS) {
                throw new RecordFormatException(fileName, lineNumber, null, InputMessage.TOO_MANY_PARTS.format(
                        InputLimits.MAX_PARTS));
            }
            final PartsRow row = new PartsRow(header, cells, fileName, lineNumber);
            parts.add(PartLine.toPart(row, warnings));
        }
        if (header == null) {
            throw new RecordFormatException(fileName, 0, null, InputMessage.NO_HEADER_ROW.format());
        }
        return new PartsList(fileName, parts, warnings);
    }
}
