package dev.penduline.report.plot;

import java.util.List;
import java.util.Objects;

/**
 * One inline vector picture: a standalone {@code <svg>} element with its width, height and
 * viewBox, every id in it prefixed with {@link #id()} so several pictures can sit in one HTML
 * page, no reference to anything outside it.
 *
 * @param id          the picture's id: the {@code <svg>} element's id and the prefix of every
 *                    id inside it
 * @param title       the picture's title (also its SVG {@code <title>})
 * @param svg         the {@code <svg>} element, UTF-8 text without an XML declaration
 * @param seriesCount how many data series the picture draws; each is a
 *                    {@code <g class="series" data-series="NAME">} group in {@link #svg()}
 * @param axisLabels  the axis labels drawn, each with its unit, e.g. {@code "time (s)"}
 * @param width       the width in pixels
 * @param height      the height in pixels
 */
public record SvgPicture(String id, String title, String svg, int seriesCount, List<String> axisLabels, int width,
        int height) {

    /**
     * Checks and copies the parts.
     *
     * @throws NullPointerException when a part is null
     */
    public SvgPicture {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(svg, "svg");
        axisLabels = List.copyOf(axisLabels);
    }
}
