package dev.penduline.report;

import java.util.ArrayList;
import java.util.List;

import dev.penduline.report.plot.SvgPicture;

/**
 * A report as a sequence of plain blocks, independent of how it is written: {@link HtmlReport}
 * and {@link MarkdownReport} render the same document, so the HTML and the Markdown say the same
 * thing in the same words and figures.
 *
 * <p>Figures in tables carry the key of the value they show in the command line's JSON
 * ({@code fit.terms.viscous}, {@code inertia.pivot_inertia_kg_m2}) and how it was rounded, so a
 * test (and a reader of the HTML source) can trace every number to the output of
 * {@code penduline inertia}, {@code fit} or {@code predict}.
 *
 * @param title    the title (the mechanism's name)
 * @param subtitle one line under the title (the file and the time of the report)
 * @param blocks   the content, in reading order
 */
public record ReportDocument(String title, String subtitle, List<Block> blocks) {

    /** Freezes the list. */
    public ReportDocument {
        blocks = List.copyOf(blocks);
    }

    /** One block of the document. */
    public sealed interface Block permits Heading, Paragraph, Table, Figure, Caution, Items {
    }

    /**
     * A section heading.
     *
     * @param level 1 for a section, 2 for a subsection
     * @param id    the anchor (letters, digits and hyphens)
     * @param text  the heading
     */
    public record Heading(int level, String id, String text) implements Block {
    }

    /**
     * A paragraph.
     *
     * @param text   the text
     * @param strong whether it is the lead statement of its section (the verdict, say)
     */
    public record Paragraph(String text, boolean strong) implements Block {
    }

    /**
     * A table.
     *
     * @param caption what it shows
     * @param headers the column headings, with units
     * @param rows    the rows, each as many cells as headings
     */
    public record Table(String caption, List<String> headers, List<List<Cell>> rows) implements Block {

        /** Freezes the lists. */
        public Table {
            headers = List.copyOf(headers);
            rows = rows.stream().map(List::copyOf).toList();
        }
    }

    /**
     * One table cell.
     *
     * @param text   what it shows
     * @param key    the JSON key of the value it shows (empty when it is not a figure of the JSON)
     * @param format   how the value was written ({@link Format}), null when {@code key} is empty
     * @param sigmaKey the JSON key of the value's standard uncertainty, for {@link Format#MEASURED} and
     *                 {@link Format#SHARE}; empty otherwise
     */
    public record Cell(String text, String key, Format format, String sigmaKey) {

        /**
         * A cell of words.
         *
         * @param text the words
         * @return the cell
         */
        public static Cell of(String text) {
            return new Cell(text, "", null, "");
        }

        /**
         * A figure of the JSON.
         *
         * @param text   the figure as written
         * @param key    its JSON key
         * @param format how it was written
         * @return the cell
         */
        public static Cell figure(String text, String key, Format format) {
            return new Cell(text, key, format, "");
        }

        /**
         * A figure of the JSON with its standard uncertainty.
         *
         * @param text     the figure as written
         * @param key      its JSON key
         * @param format   {@link Format#MEASURED} or {@link Format#SHARE}
         * @param sigmaKey the JSON key of its standard uncertainty
         * @return the cell
         */
        public static Cell measured(String text, String key, Format format, String sigmaKey) {
            return new Cell(text, key, format, sigmaKey);
        }
    }

    /** How a figure of the JSON was rounded for the report (the rules of {@code Figures}). */
    public enum Format {
        /** {@code Figures.significant(v)}. */
        SIGNIFICANT,
        /** {@code Figures.significant(v, 2)}: a spread. */
        SIGNIFICANT2,
        /** {@code Figures.measured(value, sigma)}: the value at the key, the σ at the sigma key. */
        MEASURED,
        /** {@code Figures.percent(v)} of a ratio. */
        PERCENT,
        /** {@code Figures.percent(v, 2)} of a ratio. */
        PERCENT2,
        /** {@code FitWording.percent(share, sigma)}: the share at the key, its σ at the sigma key. */
        SHARE,
        /** {@code Math.round(v)}: a count. */
        WHOLE,
        /** {@code Figures.fixed(v, 1)}. */
        FIXED1,
        /** {@code Figures.fixed(v, 2)}. */
        FIXED2,
        /** The sign, then {@code Figures.fixed(v, 2)}: a difference in percent. */
        SIGNED_FIXED2,
        /** Written as it is (a whole number, a word). */
        VERBATIM
    }

    /**
     * A picture with its caption.
     *
     * @param picture the vector picture
     * @param caption what it shows and how to read it
     */
    public record Figure(SvgPicture picture, String caption) implements Block {
    }

    /**
     * The caution: a framed statement a reader cannot miss.
     *
     * @param title the heading of the box
     * @param lines its sentences
     */
    public record Caution(String title, List<String> lines) implements Block {

        /** Freezes the list. */
        public Caution {
            lines = List.copyOf(lines);
        }
    }

    /**
     * A list of items.
     *
     * @param items the items
     */
    public record Items(List<String> items) implements Block {

        /** Freezes the list. */
        public Items {
            items = List.copyOf(items);
        }
    }

    /** Collects the blocks of a document in reading order. */
    public static final class Builder {

        private final List<Block> blocks = new ArrayList<>();

        /**
         * Adds a block.
         *
         * @param block the block
         * @return this builder
         */
        public Builder add(Block block) {
            blocks.add(block);
            return this;
        }

        /**
         * The document.
         *
         * @param title    its title
         * @param subtitle the line under it
         * @return the document
         */
        public ReportDocument build(String title, String subtitle) {
            return new ReportDocument(title, subtitle, blocks);
        }
    }

    /**
     * The pictures of the document, in order.
     *
     * @return the pictures
     */
    public List<SvgPicture> pictures() {
        return blocks.stream().filter(Figure.class::isInstance).map(b -> ((Figure) b).picture()).toList();
    }
}
