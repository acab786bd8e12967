package dev.penduline.ui.internal.editor;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.forms.widgets.FormToolkit;

import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.ShapeAxis;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.model.naming.StableIds;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.services.InputException;
import dev.penduline.services.PartsImport;
import dev.penduline.services.present.Figures;

/**
 * The parts of the mechanism as a table edited in place: a value may be typed in any unit of
 * its quantity ({@code 12 mm}, {@code 0.5 lb}) and is stored in SI; the columns and shapes are
 * the parts list's. Parts are added, duplicated, deleted, moved, or imported from a parts list
 * (replacing the parts or merging by name), each as one undoable command. Below the table the
 * totals the parts give now.
 */
final class PartsPage extends EditorPage {

    /** The page's id. */
    static final String ID = "parts";

    private EditableTable<Part> table;
    private Label totals;

    PartsPage(MechanismEditor editor) {
        super(editor, ID, "Parts");
    }

    @Override
    String introduction() {
        return "Each row is one part about the pivot axis. Type values with a unit (12 mm, 0.5 lb, 3 in); they are stored in"
                + " SI. A blank cell is not used by the part's shape. Every change can be undone (Edit > Undo).";
    }

    @Override
    void fill(Composite body, FormToolkit tk) {
        table = newTable(body, 110);
        table.textColumn("name", 140, Part::getName, (p, s) -> edit("Rename part " + p.getName(), () -> {
            if (s.isBlank()) {
                throw new IllegalArgumentException("a part needs a name");
            }
            p.setName(s);
        }));
        table.choiceColumn("shape", 130, p -> p.getShape().getLiteral(),
                Arrays.stream(ShapeKind.values()).map(ShapeKind::getLiteral).toList(),
                (p, s) -> edit("Set shape of " + p.getName(), () -> p.setShape(ShapeKind.get(s))));
        table.choiceColumn("axis", 60, p -> p.getShapeAxis().getLiteral(),
                ShapeAxis.VALUES.stream().map(ShapeAxis::getLiteral).toList(),
                (p, s) -> edit("Set axis of " + p.getName(), () -> p.setShapeAxis(ShapeAxis.get(s))));
        table.textColumn("count", 55, p -> Integer.toString(p.getQuantity()), (p, s) -> {
            int n = count(s);
            edit("Set count of " + p.getName(), () -> p.setQuantity(n));
        });
        for (PartField f : PartField.values()) {
            table.textColumn(f.header(), 95, f::text, (p, s) -> setField(p, f, s));
        }
        table.choiceColumn("cutout", 60, p -> p.isCutout() ? "yes" : "no", List.of("no", "yes"),
                (p, s) -> edit("Set cutout of " + p.getName(), () -> p.setCutout("yes".equals(s))));
        Composite row = buttonRow(body, tk);
        button(row, tk, "Add", this::add);
        button(row, tk, "Duplicate", this::duplicate);
        button(row, tk, "Delete", this::delete);
        button(row, tk, "Move Up", () -> move(-1));
        button(row, tk, "Move Down", () -> move(1));
        button(row, tk, "Import Parts List...", this::importParts);
        totals = tk.createLabel(body, "", SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(400, SWT.DEFAULT).applyTo(totals);
    }

    @Override
    void show() {
        table.show(new ArrayList<>(mechanism().getParts()));
        totals.setText(totalsOf(mechanism()));
    }

    @Override
    boolean reveal(String elementId) {
        return select(table, mechanism().getParts(), Part::getId, elementId);
    }



    static String totalsOf(Mechanism m) {
        try {
            MechanismProperties p = MechanismAdapter.properties(m);
            return "From these parts: J0 = " + Figures.significant(p.pivotInertia()) + " kg·m² about the pivot, mass "
                    + Figures.significant(p.mass()) + " kg, centroid " + Figures.significant(p.centroidDistance())
                    + " m from the axis.";
        } catch (IllegalArgumentException e) {
            return "The parts cannot be computed yet: " + e.getMessage();
        }
    }

    private void edit(String label, Runnable change) {
        MechanismEdits.runOnParts(document(), label, change);
    }

    private static int count(String s) {
        try {
            int n = Integer.parseInt(s.trim());
            if (n < 1) {
                throw new IllegalArgumentException("the count is a whole number of at least 1, not " + s);
            }
            return n;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("the count is a whole number of at least 1, not '" + s + "'", e);
        }
    }

    private void setField(Part p, PartField f, String text) {
        if (!f.appliesTo(p)) {
            throw new IllegalArgumentException("a part of shape " + p.getShape().getLiteral() + " has no " + f.title());
        }
        if (text.isBlank()) {
            if (!f.attribute().isUnsettable()) {
                throw new IllegalArgumentException(f.title() + " needs a value");
            }
            edit("Clear " + f.title() + " of " + p.getName(), () -> p.eUnset(f.attribute()));
            return;
        }
        double v = UnitText.parse(text, f.quantity());
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(f.title() + " must be a finite number, not '" + text + "'");
        }
        edit("Set " + f.title() + " of " + p.getName(), () -> p.eSet(f.attribute(), v));
    }

    private void add() {
        Mechanism m = mechanism();
        String name = StableIds.unique("part " + (m.getParts().size() + 1),
                m.getParts().stream().map(Part::getName).collect(Collectors.toSet()));
        Part[] added = new Part[1];
        edit("Add part " + name, () -> {
            added[0] = NamedElements.addPart(m, name);
            added[0].setMass(0.1);
        });
        reveal(added[0].getId());
    }

    private void duplicate() {
        List<Part> chosen = table.selected(Part.class);
        if (chosen.isEmpty()) {
            refused("Duplicate", "select the parts to duplicate first");
            return;
        }
        Mechanism m = mechanism();
        List<Part> copies = new ArrayList<>();
        edit(chosen.size() == 1 ? "Duplicate part " + chosen.get(0).getName() : "Duplicate " + chosen.size() + " parts", () -> {
            Set<String> ids = m.getParts().stream().map(Part::getId).collect(Collectors.toCollection(HashSet::new));
            Set<String> names = m.getParts().stream().map(Part::getName).collect(Collectors.toCollection(HashSet::new));
            for (Part p : chosen) {
                Part c = EcoreUtil.copy(p);
                c.setName(StableIds.unique(p.getName() + " copy", names));
                c.setId(StableIds.unique(StableIds.slug(c.getName(), "part"), ids));
                names.add(c.getName());
                ids.add(c.getId());
                m.getParts().add(m.getParts().indexOf(p) + 1, c);
                copies.add(c);
            }
        });
        table.viewer().setSelection(new StructuredSelection(copies), true);
    }

    private void delete() {
        removeSelected(table, Part.class, "part", "Delete", Part::getName, mechanism().getParts(), true);
    }

    private void move(int by) {
        List<Part> chosen = table.selected(Part.class);
        if (chosen.size() != 1) {
            refused("Move", "select one part to move");
            return;
        }
        Part p = chosen.get(0);
        int from = mechanism().getParts().indexOf(p);
        int to = from + by;
        if (to < 0 || to >= mechanism().getParts().size()) {
            return;
        }
        MechanismEdits.run(document(), "Move part " + p.getName(), () -> mechanism().getParts().move(to, from));
        table.viewer().setSelection(new StructuredSelection(p), true);
    }

    private void importParts() {
        String chosen = EditorDialogs.partsListChooser.apply(getSite().getShell());
        if (chosen == null) {
            return;
        }
        int mode = EditorDialogs.importModeChooser.apply(getSite().getShell(), chosen);
        if (mode != EditorDialogs.REPLACE && mode != EditorDialogs.MERGE) {
            return;
        }
        Path file = Path.of(chosen);
        List<Part> incoming;
        List<String> notes;
        try {
            var list = PartsImport.readPartsList(file);
            incoming = PartsImport.toMechanism(mechanism().getName(), list).getParts();
            notes = list.warnings();
        } catch (InputException e) {
            refused("Import Parts List", e.getMessage());
            return;
        }
        List<Part> parts = new ArrayList<>(incoming);
        String label = (mode == EditorDialogs.REPLACE ? "Replace parts from " : "Merge parts from ") + file.getFileName();
        edit(label, () -> merge(mechanism(), parts, mode == EditorDialogs.REPLACE));
        refused("Import Parts List", notes.isEmpty() ? null : String.join("; ", notes));
    }

    /**
     * Brings parts into a mechanism.
     *
     * @param m       the mechanism
     * @param parts   the parts read from a list (not contained anywhere else afterwards)
     * @param replace true: the parts become exactly these; false: a part with the same name is
     *                replaced in place (keeping its id), the others are added at the end
     */
    static void merge(Mechanism m, List<Part> parts, boolean replace) {
        if (replace) {
            m.getParts().clear();
            m.getParts().addAll(parts);
            return;
        }
        Set<String> ids = m.getParts().stream().map(Part::getId).collect(Collectors.toCollection(HashSet::new));
        for (Part p : parts) {
            Part same = m.getParts().stream().filter(x -> x.getName().equals(p.getName())).findFirst().orElse(null);
            if (same != null) {
                p.setId(same.getId());
                m.getParts().set(m.getParts().indexOf(same), p);
            } else {
                p.setId(StableIds.unique(p.getId(), ids));
                ids.add(p.getId());
                m.getParts().add(p);
            }
        }
    }
}
