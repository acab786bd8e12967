package dev.penduline.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.forms.widgets.FormToolkit;

import dev.penduline.model.Mechanism;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.physics.units.Quantity;

/**
 * The mechanism's own settings as a two-column table: its name and description, local gravity,
 * and where the pivot axis is and how it lies (a point on it, its direction, the downward
 * direction when level, the tilt of the axis from level). Values are typed with a unit where they
 * have one; the direction components are plain numbers (only their direction counts).
 */
final class PivotPage extends EditorPage {

    /** The page's id. */
    static final String ID = "pivot";

    /** One setting: its label, its attribute of the mechanism, and its quantity (null: plain number or text). */
    record Row(String label, EAttribute attribute, Quantity quantity, String unit) {
        String text(Mechanism m) {
            Object v = m.eGet(attribute);
            if (v instanceof Double d) {
                return unit != null ? UnitText.format(d, null) + " " + unit : UnitText.format(d, quantity);
            }
            return v == null ? "" : v.toString();
        }
    }

    private static final List<Row> ROWS = List.of(
            new Row("name", Literals.MECHANISM__NAME, null, null),
            new Row("description", Literals.MECHANISM__DESCRIPTION, null, null),
            new Row("local gravity g", Literals.MECHANISM__GRAVITY, null, "m/s²"),
            new Row("axis point x", Literals.MECHANISM__AXIS_POINT_X, Quantity.LENGTH, null),
            new Row("axis point y", Literals.MECHANISM__AXIS_POINT_Y, Quantity.LENGTH, null),
            new Row("axis point z", Literals.MECHANISM__AXIS_POINT_Z, Quantity.LENGTH, null),
            new Row("axis direction x", Literals.MECHANISM__AXIS_DIRECTION_X, null, null),
            new Row("axis direction y", Literals.MECHANISM__AXIS_DIRECTION_Y, null, null),
            new Row("axis direction z", Literals.MECHANISM__AXIS_DIRECTION_Z, null, null),
            new Row("downward direction x", Literals.MECHANISM__GRAVITY_DIRECTION_X, null, null),
            new Row("downward direction y", Literals.MECHANISM__GRAVITY_DIRECTION_Y, null, null),
            new Row("downward direction z", Literals.MECHANISM__GRAVITY_DIRECTION_Z, null, null),
            new Row("axis tilt from level", Literals.MECHANISM__AXIS_TILT, Quantity.ANGLE, null));

    private EditableTable<Row> table;

    PivotPage(MechanismEditor editor) {
        super(editor, ID, "Pivot and Gravity");
    }

    @Override
    String introduction() {
        return "Where the pivot axis is and how gravity acts on the mechanism. Coordinates are those of the parts;"
                + " gravity is the local value (standard gravity is 9.80665 m/s²). Changing these changes the inertia"
                + " and the gravity moment, so stored fits are marked stale.";
    }

    @Override
    void fill(Composite body, FormToolkit tk) {
        table = newTable(body, 150);
        table.column("setting", 200, Row::label);
        table.textColumn("value", 300, r -> r.text(mechanism()), this::set);
    }

    private void set(Row r, String text) {
        Object value;
        if (r.attribute().getEAttributeType().getInstanceClass() == String.class) {
            if (r.attribute() == Literals.MECHANISM__NAME && text.isBlank()) {
                throw new IllegalArgumentException("a mechanism needs a name");
            }
            value = text;
        } else {
            String number = r.unit() != null ? stripUnit(text, r.unit()) : text;
            double v = UnitText.parse(number, r.quantity());
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(r.label() + " must be a finite number");
            }
            if (r.attribute() == Literals.MECHANISM__GRAVITY && !(v > 0)) {
                throw new IllegalArgumentException("local gravity must be positive (standard gravity is 9.80665 m/s²)");
            }
            value = v;
        }
        if (value.equals(mechanism().eGet(r.attribute()))) {
            return;
        }
        MechanismEdits.runOnParts(document(), "Set " + r.label(), () -> mechanism().eSet(r.attribute(), value));
    }

    private static String stripUnit(String text, String unit) {
        String t = text.trim();
        return t.endsWith(unit) ? t.substring(0, t.length() - unit.length()) : t;
    }

    @Override
    void show() {
        table.show(new ArrayList<>(ROWS));
    }

    @Override
    boolean reveal(String elementId) {
        return false;
    }

}
