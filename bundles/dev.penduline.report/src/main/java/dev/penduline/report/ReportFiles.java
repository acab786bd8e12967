package dev.penduline.report;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import dev.penduline.services.InputException;
import dev.penduline.services.OutputFiles;

/**
 * Where a report goes and how it is written: by default beside the mechanism file, named after
 * it ({@code hatch.penduline} → {@code hatch-report.html}); each file written atomically by the
 * one output writer ({@link OutputFiles}: never over a mechanism file or a record). A report
 * Penduline wrote before is replaced (it says so in its first bytes); any other existing file only
 * when the caller says so.
 */
public final class ReportFiles {

    /** The formats a report is written in. */
    public enum Kind {
        /** One self-contained HTML file. */
        HTML("html"),
        /** Markdown with the plots as SVG files in a folder beside it. */
        MARKDOWN("md");

        private final String extension;

        Kind(String extension) {
            this.extension = extension;
        }

        /**
         * The file extension, without the dot.
         *
         * @return "html" or "md"
         */
        public String extension() {
            return extension;
        }
    }

    private static final int PEEK = 1024;

    private ReportFiles() {
    }

    /**
     * The default report of a mechanism file: beside it, {@code NAME-report.EXT}.
     *
     * @param mechanismFile the mechanism file
     * @param kind          the format
     * @return the report's path
     */
    public static Path defaultTarget(Path mechanismFile, Kind kind) {
        String name = mechanismFile.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String base = dot > 0 ? name.substring(0, dot) : name;
        Path parent = mechanismFile.toAbsolutePath().getParent();
        return parent.resolve(base + "-report." + kind.extension());
    }

    /**
     * Checks that a report may be written to a path, before any work is done for it.
     *
     * @param target    the report file
     * @param overwrite whether any existing plain file may be replaced
     * @throws InputException naming the file and why it is not written
     */
    public static void check(Path target, boolean overwrite) throws InputException {
        OutputFiles.check(target, overwrite || isOwnReport(target));
    }

    /**
     * Writes a report.
     *
     * @param doc       the document
     * @param target    the report file (its extension need not match the format)
     * @param kind      the format
     * @param version   Penduline's version, for the file's mark
     * @param overwrite whether any existing plain file may be replaced (an earlier report always may)
     * @return notes for the user, possibly empty
     * @throws InputException naming the file when it may not or cannot be written; an old file is kept
     */
    public static List<String> write(ReportDocument doc, Path target, Kind kind, String version, boolean overwrite)
            throws InputException {
        List<String> notes = new ArrayList<>();
        if (kind == Kind.HTML) {
            notes.addAll(OutputFiles.write(target, overwrite || isOwnReport(target),
                    out -> new HtmlReport(version).write(doc, out)));
            return notes;
        }
        Path folder = target.toAbsolutePath().getParent();
        Map<String, String> files = new MarkdownReport(version).files(doc, target.getFileName().toString());
        // the pictures first, the text last: a reader of the text never finds a picture missing
        List<Map.Entry<String, String>> order = new ArrayList<>(files.entrySet());
        order.add(order.remove(0));
        for (Map.Entry<String, String> f : order) {
            Path p = folder.resolve(f.getKey());
            boolean ours = overwrite || isOwnReport(p) || p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".svg")
                    && p.getParent().getFileName().toString().endsWith("-figures");
            notes.addAll(OutputFiles.write(p, ours, out -> out.write(f.getValue())));
        }
        return notes;
    }

    /** Whether a file is a report Penduline wrote (its first bytes carry the mark). */
    static boolean isOwnReport(Path file) {
        if (!Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS)) {
            return false;
        }
        try (InputStream in = Files.newInputStream(file)) {
            String head = new String(in.readNBytes(PEEK), StandardCharsets.UTF_8);
            return head.contains("<meta name=\"generator\" content=\"" + HtmlReport.GENERATOR + " ")
                    || head.startsWith(MarkdownReport.MARK);
        } catch (IOException e) {
            return false;
        }
    }
}
