package dev.penduline.ui.internal.editor;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import dev.penduline.physics.units.Quantity;
import dev.penduline.physics.units.Unit;

/**
 * Values typed in the editor's fields: a number with an optional unit of the field's quantity
 * ({@code 12 mm}, {@code 0.5 lb}, {@code 3 deg}), converted to SI; a plain number is SI already.
 * The units are those of the parts list ({@link Unit#all()}), by suffix or symbol.
 */
final class UnitText {

    private static final Pattern VALUE = Pattern.compile(
            "\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(\\S*)\\s*");

    private UnitText() {
    }

    /**
     * Reads a typed value.
     *
     * @param text     what the user typed
     * @param quantity the field's quantity, or null for a plain number (no unit allowed)
     * @return the value in SI
     * @throws IllegalArgumentException with a message for the user when the text is not a number
     *                                  with a unit of that quantity
     */
    static double parse(String text, Quantity quantity) {
        Matcher m = VALUE.matcher(text == null ? "" : text);
        if (!m.matches()) {
            throw new IllegalArgumentException("'" + text + "' is not a number" + (quantity == null ? ""
                    : " with an optional unit (" + units(quantity) + ")"));
        }
        double value = Double.parseDouble(m.group(1));
        String suffix = m.group(2);
        if (suffix.isEmpty()) {
            return value;
        }
        Optional<Unit> unit = quantity == null ? Optional.empty() : unitOf(suffix, quantity);
        if (unit.isEmpty()) {
            throw new IllegalArgumentException("'" + suffix + "' is not a unit of "
                    + (quantity == null ? "this field (a plain number)" : quantity.readableName()
                            + " (" + units(quantity) + ")"));
        }
        return unit.get().toSi(value);
    }

    /**
     * Shows a stored SI value for editing: the number as stored (no rounding a retype would
     * lose), with the SI unit's symbol.
     *
     * @param si       the value in SI
     * @param quantity its quantity, or null for a plain number
     * @return the text
     */
    static String format(double si, Quantity quantity) {
        String number = Double.isFinite(si) ? new BigDecimal(Double.toString(si)).stripTrailingZeros().toPlainString()
                : Double.toString(si);
        if (number.length() > 14) {
            number = Double.toString(si);
        }
        return quantity == null ? number : number + " " + quantity.siSymbol();
    }

    private static Optional<Unit> unitOf(String text, Quantity quantity) {
        String lower = text.toLowerCase(Locale.ROOT);
        for (Unit u : Unit.all()) {
            if (u.quantity() == quantity && Double.isFinite(u.siPerUnit()) && (u.suffix().equals(lower) || u.symbol().equals(text))) {
                return Optional.of(u);
            }
        }
        return Optional.empty();
    }

    private static String units(Quantity quantity) {
        StringBuilder b = new StringBuilder();
        for (Unit u : Unit.all()) {
            if (u.quantity() == quantity && Double.isFinite(u.siPerUnit())) {
                b.append(b.isEmpty() ? "" : ", ").append(u.suffix());
            }
        }
        return b.toString();
    }
}
