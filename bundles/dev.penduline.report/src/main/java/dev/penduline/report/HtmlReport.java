package dev.penduline.report;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import java.util.Locale;

import dev.penduline.report.ReportDocument.Block;
import dev.penduline.report.ReportDocument.Caution;
import dev.penduline.report.ReportDocument.Cell;
import dev.penduline.report.ReportDocument.Figure;
import dev.penduline.report.ReportDocument.Heading;
import dev.penduline.report.ReportDocument.Items;
import dev.penduline.report.ReportDocument.Paragraph;
import dev.penduline.report.ReportDocument.Table;

/**
 * Writes a {@link ReportDocument} as one self-contained HTML5 file: the style sheet inline, the
 * plots as inline SVG, no script, no font, no image or link outside the file, so it reads the same
 * from a USB stick, an e-mail or a certification folder, and prints to PDF from any browser (the
 * print style keeps a figure or a table on one page and the caution in a frame).
 */
public final class HtmlReport {

    /** The {@code generator} meta tag's content starts with this: the mark of a file Penduline wrote. */
    public static final String GENERATOR = "Penduline";

    private static final String STYLE = """
            body { font-family: "DejaVu Sans", Arial, Helvetica, sans-serif; color: #111; max-width: 60em;
              margin: 1.5em auto; padding: 0 1em; line-height: 1.4; font-size: 11pt; }
            h1 { font-size: 1.7em; margin-bottom: 0.1em; }
            h2 { font-size: 1.3em; border-bottom: 1px solid #444; margin-top: 1.6em; }
            h3 { font-size: 1.1em; margin-top: 1.2em; }
            p.subtitle { color: #444; margin-top: 0; }
            p.lead { font-weight: bold; font-size: 1.1em; }
            table { border-collapse: collapse; margin: 0.6em 0 1em 0; font-size: 0.95em; }
            p.caption { font-style: italic; margin: 0.8em 0 0.2em 0; }
            div.table table { margin-top: 0; }
            th, td { border: 1px solid #999; padding: 0.15em 0.5em; vertical-align: top; }
            th { background: #eee; text-align: left; }
            td.figure { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
            figure { margin: 0.8em 0 1.2em 0; }
            figure svg { max-width: 100%; height: auto; }
            figcaption { font-size: 0.9em; color: #333; }
            div.caution { border: 3px solid #000; padding: 0.4em 1em; margin: 1em 0; background: #f4f4f4; }
            div.caution h2 { border: none; margin-top: 0.3em; }
            @media print {
              body { max-width: none; margin: 0; font-size: 10pt; }
              figure, div.table, div.caution { page-break-inside: avoid; break-inside: avoid; }
              h2, h3 { page-break-after: avoid; break-after: avoid; }
              div.caution { background: none; }
            }
            """;

    private final String version;

    /**
     * A writer of reports.
     *
     * @param version Penduline's version, written into the file's {@code generator} tag
     */
    public HtmlReport(String version) {
        this.version = version;
    }

    /**
     * Writes the document.
     *
     * @param doc the document
     * @param out where to (UTF-8)
     * @throws IOException when writing fails
     */
    public void write(ReportDocument doc, Writer out) throws IOException {
        out.write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        out.write("<meta name=\"generator\" content=\"" + escape(GENERATOR + " " + version) + "\">\n");
        out.write("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        out.write("<title>" + escape(doc.title()) + "</title>\n<style>\n" + STYLE + "</style>\n</head>\n<body>\n");
        out.write("<header>\n<h1>" + escape(doc.title()) + "</h1>\n<p class=\"subtitle\">" + escape(doc.subtitle())
                + "</p>\n</header>\n");
        boolean open = false;
        for (Block b : doc.blocks()) {
            if (b instanceof Heading h && h.level() == 1) {
                if (open) {
                    out.write("</section>\n");
                }
                out.write("<section id=\"" + escape(h.id()) + "\">\n");
                open = true;
            }
            block(b, out);
        }
        if (open) {
            out.write("</section>\n");
        }
        out.write("</body>\n</html>\n");
    }

    private static void block(Block b, Writer out) throws IOException {
        switch (b) {
            case Heading h -> out.write(String.format(Locale.ROOT, "<h%d id=\"%s-h\">%s</h%d>%n", h.level() + 1,
                    escape(h.id()), escape(h.text()), h.level() + 1));
            case Paragraph p -> out.write((p.strong() ? "<p class=\"lead\">" : "<p>") + escape(p.text()) + "</p>\n");
            case Items i -> {
                out.write("<ul>\n");
                for (String item : i.items()) {
                    out.write("<li>" + escape(item) + "</li>\n");
                }
                out.write("</ul>\n");
            }
            case Caution c -> {
                out.write("<div class=\"caution\" role=\"note\">\n<h2>" + escape(c.title()) + "</h2>\n");
                for (String line : c.lines()) {
                    out.write("<p>" + escape(line) + "</p>\n");
                }
                out.write("</div>\n");
            }
            case Figure f -> out.write("<figure id=\"" + escape(f.picture().id()) + "\">\n" + inline(f.picture().svg())
                    + "\n<figcaption>" + escape(f.caption()) + "</figcaption>\n</figure>\n");
            case Table t -> table(t, out);
        }
    }

    private static void table(Table t, Writer out) throws IOException {
        out.write("<div class=\"table\">\n<p class=\"caption\">" + escape(t.caption()) + "</p>\n<table>\n<thead><tr>");
        for (String h : t.headers()) {
            out.write("<th scope=\"col\">" + escape(h) + "</th>");
        }
        out.write("</tr></thead>\n<tbody>\n");
        for (List<Cell> row : t.rows()) {
            out.write("<tr>");
            for (Cell c : row) {
                if (c.key().isEmpty()) {
                    out.write("<td>" + escape(c.text()) + "</td>");
                } else {
                    out.write("<td class=\"figure\" data-key=\"" + escape(c.key()) + "\" data-format=\""
                            + c.format().name().toLowerCase(Locale.ROOT) + "\"" + (c.sigmaKey().isEmpty() ? ""
                                    : " data-sigma=\"" + escape(c.sigmaKey()) + "\"") + ">" + escape(c.text()) + "</td>");
                }
            }
            out.write("</tr>\n");
        }
        out.write("</tbody>\n</table>\n</div>\n");
    }

    /** The picture's SVG element without an XML declaration, which has no place inside HTML. */
    static String inline(String svg) {
        String s = svg.strip();
        if (s.startsWith("<?xml")) {
            s = s.substring(s.indexOf("?>") + 2).strip();
        }
        return s;
    }

    /**
     * Text for HTML: the five characters with a meaning in markup escaped.
     *
     * @param text the text
     * @return the escaped text
     */
    public static String escape(String text) {
        StringBuilder b = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
