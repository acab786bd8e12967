package dev.penduline.ui.internal.mechanism;

/**
 * One line of the Mechanism view's totals.
 *
 * @param total    which total, null for a line without its own key (the centroid)
 * @param quantity what the line is called
 * @param value    the value as shown
 * @param unit     the unit's symbol
 */
public record TotalRow(InertiaTotal total, String quantity, String value, String unit) {
}
