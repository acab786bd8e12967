package dev.penduline.report.plot;

/**
 * A bar's category: its place and its text, so two parts of the same name stay two bars (a
 * category dataset merges equal keys); the axis shows the text.
 *
 * @param index the place, from 0
 * @param text  the text shown
 */
record CategoryLabel(int index, String text) implements Comparable<CategoryLabel> {

    @Override
    public int compareTo(CategoryLabel other) {
        return Integer.compare(index, other.index);
    }

    @Override
    public String toString() {
        return text;
    }
}
