package dev.penduline.services.survey;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.records.DelimitedLine;
import dev.penduline.records.RecordFormatException;
import dev.penduline.services.InputException;

/**
 * Which records a survey fits and how they make units: every record ({@code *.csv}) directly in
 * the folders given (or the files given), one unit a record; or grouped by a pattern on the file
 * name; or as a manifest lists them. Units come in key order, a unit's records in name order.
 */
public final class SurveyGrouping {

    /** The manifest's column that names the records, relative to the manifest's folder. */
    public static final String FILE_COLUMN = "file";

    /**
     * The units, and the records that belong to none.
     *
     * @param units      the units, in key order
     * @param unassigned records left out, each with why (its name does not match the pattern, a manifest line is wrong)
     */
    public record Grouping(List<SurveyUnit> units, List<SurveyFailure> unassigned) {

        /** Copies the lists. */
        public Grouping {
            units = List.copyOf(units);
            unassigned = List.copyOf(unassigned);
        }
    }

    private static final Comparator<Path> BY_NAME = Comparator.comparing((Path p) -> p.getFileName().toString())
            .thenComparing(Path::toString);

    private SurveyGrouping() {
    }

    /**
     * The records of folders and files: a folder's regular files ending in {@code .csv} (not its
     * subfolders'), a file as it is.
     *
     * @param inputs folders and files
     * @return the records, without repeats, in name order
     * @throws InputException naming an input that does not exist or is neither a folder nor a file
     */
    public static List<Path> records(List<Path> inputs) throws InputException {
        Set<Path> found = new LinkedHashSet<>();
        for (Path in : inputs) {
            if (Files.isDirectory(in)) {
                try (DirectoryStream<Path> s = Files.newDirectoryStream(in)) {
                    for (Path p : s) {
                        if (Files.isRegularFile(p) && p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")) {
                            found.add(p.normalize());
                        }
                    }
                } catch (IOException e) {
                    throw new InputException(in + ": cannot list the folder (" + AtomicFileWrite.reason(e) + ")", e);
                }
            } else if (Files.isRegularFile(in)) {
                found.add(in.normalize());
            } else if (Files.exists(in)) {
                throw new InputException(in + ": is neither a folder nor a regular file");
            } else {
                throw new InputException(in + ": no such folder or file");
            }
        }
        List<Path> sorted = new ArrayList<>(found);
        sorted.sort(BY_NAME);
        return sorted;
    }

    /**
     * One unit a record, keyed by the file name without its extension (the path without it where
     * two folders hold records of the same name).
     *
     * @param records the records
     * @return the grouping
     */
    public static Grouping perRecord(List<Path> records) {
        Map<String, Integer> names = new HashMap<>();
        records.forEach(p -> names.merge(stem(p.getFileName().toString()), 1, Integer::sum));
        Map<String, List<Path>> units = new TreeMap<>();
        for (Path p : records) {
            String name = stem(p.getFileName().toString());
            String key = names.get(name) > 1 ? stem(p.toString()) : name;
            units.computeIfAbsent(key, k -> new ArrayList<>()).add(p);
        }
        return grouping(units, List.of());
    }

    /**
     * Units by a pattern on the file name: the first capture group of its first match (or the
     * whole match when the pattern has no group) is the unit's key; a record whose name does not
     * match belongs to no unit.
     *
     * @param records the records
     * @param pattern the pattern (Java regular expression), searched in the file name
     * @return the grouping
     */
    public static Grouping byPattern(List<Path> records, Pattern pattern) {
        Map<String, List<Path>> units = new TreeMap<>();
        List<SurveyFailure> unassigned = new ArrayList<>();
        for (Path p : records) {
            Matcher m = pattern.matcher(p.getFileName().toString());
            String key = null;
            if (m.find()) {
                key = m.groupCount() >= 1 && m.group(1) != null ? m.group(1) : m.group();
            }
            if (key == null || key.isEmpty()) {
                unassigned.add(new SurveyFailure("", p.toString(), p + ": its name " + (key == null ? "does not match"
                        : "matches with an empty key") + " the grouping pattern '" + pattern.pattern() + "'; not fitted"));
            } else {
                units.computeIfAbsent(key, k -> new ArrayList<>()).add(p);
            }
        }
        return grouping(units, unassigned);
    }

    /**
     * Units as a manifest lists them: a CSV file (comma-separated, a header line first, lines
     * starting with {@code #} and blank lines skipped) with a column {@value #FILE_COLUMN} naming
     * each record relative to the manifest's folder and a column whose value is the record's unit.
     * A line whose record is missing or whose unit is blank belongs to no unit, named by its line.
     *
     * @param manifest   the manifest
     * @param unitColumn the column of the unit's key
     * @return the grouping
     * @throws InputException naming the manifest (and its line) when it cannot be read, has no
     *                        header with both columns, or a line has too few fields
     */
    public static Grouping byManifest(Path manifest, String unitColumn) throws InputException {
        List<String> lines;
        try {
            lines = Files.readAllLines(manifest, StandardCharsets.UTF_8);
        } catch (CharacterCodingException e) {
            throw new InputException(manifest + ": is not UTF-8 text", e);
        } catch (IOException e) {
            throw new InputException(manifest + ": cannot be read (" + AtomicFileWrite.reason(e) + ")", e);
        }
        Path folder = manifest.toAbsolutePath().getParent();
        int fileAt = -1;
        int unitAt = -1;
        Map<String, List<Path>> units = new TreeMap<>();
        List<SurveyFailure> unassigned = new ArrayList<>();
        Set<Path> seen = new LinkedHashSet<>();
        for (int n = 0; n < lines.size(); n++) {
            String line = lines.get(n).replace("\uFEFF", "");
            if (line.isBlank() || line.stripLeading().startsWith("#")) {
                continue;
            }
            List<String> fields;
            try {
                fields = DelimitedLine.split(line, ',', manifest.toString(), n + 1);
            } catch (RecordFormatException e) {
                throw new InputException(e.getMessage(), e);
            }
            String where = manifest + ": line " + (n + 1);
            if (fileAt < 0) {
                fileAt = fields.indexOf(FILE_COLUMN);
                unitAt = fields.indexOf(unitColumn);
                if (fileAt < 0 || unitAt < 0) {
                    throw new InputException(where + ": the header " + fields + " needs a column '" + FILE_COLUMN
                            + "' (the records) and a column '" + unitColumn + "' (their units)");
                }
                continue;
            }
            if (fields.size() <= Math.max(fileAt, unitAt)) {
                throw new InputException(where + ": has " + fields.size() + " fields; the columns '" + FILE_COLUMN + "' and '"
                        + unitColumn + "' need " + (Math.max(fileAt, unitAt) + 1));
            }
            String name = fields.get(fileAt).strip();
            String key = fields.get(unitAt).strip();
            Path record = name.isEmpty() ? null : folder.resolve(name).normalize();
            if (record == null) {
                unassigned.add(new SurveyFailure(key, manifest.toString(), where + ", field '" + FILE_COLUMN
                        + "': empty; not fitted"));
            } else if (key.isEmpty()) {
                unassigned.add(new SurveyFailure("", record.toString(), where + ", field '" + unitColumn + "': empty for "
                        + name + "; not fitted"));
            } else if (!Files.isRegularFile(record)) {
                unassigned.add(new SurveyFailure(key, record.toString(), where + ", field '" + FILE_COLUMN + "': " + record
                        + " is no such file; not fitted"));
            } else if (!seen.add(record)) {
                unassigned.add(new SurveyFailure(key, record.toString(), where + ", field '" + FILE_COLUMN + "': " + name
                        + " is listed a second time; fitted once, with its first line's unit"));
            } else {
                units.computeIfAbsent(key, k -> new ArrayList<>()).add(record);
            }
        }
        if (fileAt < 0) {
            throw new InputException(manifest + ": is empty; it needs a header with the columns '" + FILE_COLUMN + "' and '"
                    + unitColumn + "'");
        }
        return grouping(units, unassigned);
    }

    private static Grouping grouping(Map<String, List<Path>> units, List<SurveyFailure> unassigned) {
        List<SurveyUnit> list = new ArrayList<>();
        units.forEach((k, files) -> {
            files.sort(BY_NAME);
            list.add(new SurveyUnit(k, files));
        });
        return new Grouping(list, unassigned);
    }

    private static String stem(String name) {
        return name.replaceFirst("\\.[^./\\\\]*$", "");
    }
}
