package dev.penduline.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import dev.penduline.report.ReportDocument.Block;
import dev.penduline.report.ReportDocument.Caution;
import dev.penduline.report.ReportDocument.Cell;
import dev.penduline.report.ReportDocument.Figure;
import dev.penduline.report.ReportDocument.Heading;
import dev.penduline.report.ReportDocument.Items;
import dev.penduline.report.ReportDocument.Paragraph;
import dev.penduline.report.ReportDocument.Table;

/**
 * Writes a {@link ReportDocument} as Markdown (the GitHub dialect's pipe tables) with each plot as
 * an SVG file in a folder beside it, for engineers who keep reports in git next to the mechanism
 * file: the text diffs line by line, and the pictures show in any Markdown viewer.
 */
public final class MarkdownReport {

    /** The first line of a Markdown report: the mark of a file Penduline wrote. */
    public static final String MARK = "<!-- written by Penduline";

    private final String version;

    /**
     * A writer of Markdown reports.
     *
     * @param version Penduline's version, written into the first line
     */
    public MarkdownReport(String version) {
        this.version = version;
    }

    /**
     * The folder of a Markdown report's pictures, named after the report.
     *
     * @param reportFileName the report's file name, e.g. {@code hatch-report.md}
     * @return e.g. {@code hatch-report-figures}
     */
    public static String figuresFolder(String reportFileName) {
        String base = reportFileName.endsWith(".md") ? reportFileName.substring(0, reportFileName.length() - 3)
                : reportFileName;
        return base + "-figures";
    }

    /**
     * The report's files: the Markdown text first, under the report's own name, then each picture
     * under {@code FOLDER/ID.svg}.
     *
     * @param doc            the document
     * @param reportFileName the report's file name (the pictures' folder is named after it)
     * @return file paths relative to the report's folder, with their content, in writing order
     */
    public Map<String, String> files(ReportDocument doc, String reportFileName) {
        String folder = figuresFolder(reportFileName);
        Map<String, String> files = new LinkedHashMap<>();
        StringBuilder md = new StringBuilder();
        md.append(MARK).append(' ').append(version).append(" -->\n\n");
        md.append("# ").append(line(doc.title())).append("\n\n").append(line(doc.subtitle())).append("\n\n");
        for (Block b : doc.blocks()) {
            switch (b) {
                case Heading h -> md.append("#".repeat(h.level() + 1)).append(' ').append(line(h.text())).append("\n\n");
                case Paragraph p -> md.append(p.strong() ? "**" + line(p.text()) + "**" : line(p.text())).append("\n\n");
                case Items i -> {
                    i.items().forEach(item -> md.append("- ").append(line(item)).append('\n'));
                    md.append('\n');
                }
                case Caution c -> {
                    md.append("> **").append(line(c.title())).append("**\n>\n");
                    for (String l : c.lines()) {
                        md.append("> ").append(line(l)).append("\n>\n");
                    }
                    md.setLength(md.length() - 2);
                    md.append('\n');
                }
                case Figure f -> {
                    String file = folder + "/" + f.picture().id() + ".svg";
                    files.put(file, HtmlReport.inline(f.picture().svg()) + "\n");
                    md.append("![").append(line(f.picture().title())).append("](").append(file).append(")\n\n*")
                            .append(line(f.caption())).append("*\n\n");
                }
                case Table t -> table(t, md);
            }
        }
        Map<String, String> ordered = new LinkedHashMap<>();
        ordered.put(reportFileName, md.toString());
        ordered.putAll(files);
        return ordered;
    }

    private static void table(Table t, StringBuilder md) {
        md.append('*').append(line(t.caption())).append("*\n\n|");
        t.headers().forEach(h -> md.append(' ').append(cell(h)).append(" |"));
        md.append("\n|");
        for (int c = 0; c < t.headers().size(); c++) {
            // a column of figures is set flush right, as in the HTML
            final int col = c;
            boolean figures = !t.rows().isEmpty() && t.rows().stream().allMatch(r -> col < r.size() && !r.get(col).key()
                    .isEmpty());
            md.append(figures ? " ---: |" : " --- |");
        }
        md.append('\n');
        for (List<Cell> row : t.rows()) {
            md.append('|');
            row.forEach(c -> md.append(' ').append(cell(c.text())).append(" |"));
            md.append('\n');
        }
        md.append('\n');
    }

    /** Text on one line, with the characters that would start Markdown markup in running text escaped. */
    private static String line(String text) {
        return text.replace("\r", " ").replace("\n", " ").replace("\\", "\\\\").replace("*", "\\*").replace("_", "\\_")
                .replace("<", "&lt;").replace("[", "\\[").replace("]", "\\]");
    }

    private static String cell(String text) {
        return line(text).replace("|", "\\|");
    }
}
