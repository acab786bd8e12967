package dev.penduline.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.forms.widgets.FormToolkit;

import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.Mechanism;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.model.adapt.FrictionKinds;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.model.naming.StableIds;

/**
 * The friction hypotheses: one row per term of each hypothesis, with its starting (or fixed)
 * value and the bounds a fit keeps it within, in the SI unit of its kind.
 */
final class HypothesesPage extends EditorPage {

    /** The page's id. */
    static final String ID = "hypotheses";

    private EditableTable<FrictionTerm> table;

    HypothesesPage(MechanismEditor editor) {
        super(editor, ID, "Friction Hypotheses");
    }

    /**
     * The SI unit of a friction term's coefficient.
     *
     * @param kind the kind
     * @return its unit
     */
    static String unitOf(FrictionKind kind) {
        return FrictionKinds.term(kind).unit();
    }

    @Override
    String introduction() {
        return "A hypothesis is a set of friction terms a fit may use. A value is where the fit starts (or, when fixed,"
                + " the value it keeps); blank lets the fit choose its start. Bounds keep a term within a range; blank upper"
                + " bound means none. Values are in the SI unit shown beside the kind.";
    }

    @Override
    void fill(Composite body, FormToolkit tk) {
        table = newTable(body, 110);
        table.column("hypothesis", 170, t -> hypothesisOf(t).getName());
        table.column("term", 110, FrictionTerm::getId);
        table.column("unit", 110, t -> unitOf(t.getKind()));
        table.textColumn("value", 110, t -> t.isSetValue() ? UnitText.format(t.getValue(), null) : "",
                (t, s) -> setNumber(t, s, "value"));
        table.textColumn("lower bound", 110, t -> UnitText.format(t.getLowerBound(), null), (t, s) -> setNumber(t, s, "lower"));
        table.textColumn("upper bound", 110, t -> t.isSetUpperBound() ? UnitText.format(t.getUpperBound(), null) : "",
                (t, s) -> setNumber(t, s, "upper"));
        table.choiceColumn("fixed", 60, t -> t.isFixed() ? "yes" : "no", List.of("no", "yes"),
                (t, s) -> MechanismEdits.run(document(), "Set " + t.getId() + " fixed", () -> t.setFixed("yes".equals(s))));
        Composite row = buttonRow(body, tk);
        button(row, tk, "Add Hypothesis", this::addHypothesis);
        button(row, tk, "Delete Term", this::deleteTerms);
    }

    private static FrictionHypothesis hypothesisOf(FrictionTerm t) {
        return (FrictionHypothesis) t.eContainer();
    }

    private void setNumber(FrictionTerm t, String text, String which) {
        String where = t.getId() + " of " + hypothesisOf(t).getName();
        if (text.isBlank()) {
            switch (which) {
                case "value" -> MechanismEdits.run(document(), "Clear value of " + where, t::unsetValue);
                case "upper" -> MechanismEdits.run(document(), "Clear upper bound of " + where, t::unsetUpperBound);
                default -> throw new IllegalArgumentException("the lower bound needs a value (0 for none)");
            }
            return;
        }
        double v = UnitText.parse(stripUnit(text, unitOf(t.getKind())), null);
        if (!Double.isFinite(v) || v < 0) {
            throw new IllegalArgumentException("a friction coefficient is a finite number of at least 0, not '" + text + "'");
        }
        switch (which) {
            case "value" -> MechanismEdits.run(document(), "Set value of " + where, () -> t.setValue(v));
            case "lower" -> {
                if (t.isSetUpperBound() && v > t.getUpperBound()) {
                    throw new IllegalArgumentException("the lower bound is above the upper bound " + t.getUpperBound());
                }
                MechanismEdits.run(document(), "Set lower bound of " + where, () -> t.eSet(Literals.FRICTION_TERM__LOWER_BOUND, v));
            }
            default -> {
                if (v < t.getLowerBound()) {
                    throw new IllegalArgumentException("the upper bound is below the lower bound " + t.getLowerBound());
                }
                MechanismEdits.run(document(), "Set upper bound of " + where, () -> t.setUpperBound(v));
            }
        }
    }

    private static String stripUnit(String text, String unit) {
        String t = text.trim();
        return t.endsWith(unit) ? t.substring(0, t.length() - unit.length()) : t;
    }

    private void addHypothesis() {
        Mechanism m = mechanism();
        String name = StableIds.unique("viscous and Coulomb",
                m.getFrictionHypotheses().stream().map(FrictionHypothesis::getName).collect(Collectors.toSet()));
        FrictionHypothesis[] added = new FrictionHypothesis[1];
        MechanismEdits.run(document(), "Add hypothesis " + name, () -> {
            added[0] = NamedElements.addHypothesis(m, name);
            NamedElements.addTerm(added[0], FrictionKind.VISCOUS);
            NamedElements.addTerm(added[0], FrictionKind.COULOMB);
        });
        table.viewer().setSelection(new StructuredSelection(added[0].getTerms()), true);
    }

    private void deleteTerms() {
        List<FrictionTerm> chosen = table.selected(FrictionTerm.class);
        if (chosen.isEmpty()) {
            refused("Delete Term", "select the terms to delete first");
            return;
        }
        MechanismEdits.run(document(), chosen.size() == 1 ? "Delete term " + chosen.get(0).getId() : "Delete " + chosen.size()
                + " terms", () -> {
                    for (FrictionTerm t : chosen) {
                        FrictionHypothesis h = hypothesisOf(t);
                        h.getTerms().remove(t);
                        if (h.getTerms().isEmpty()) {
                            mechanism().getFrictionHypotheses().remove(h);
                        }
                    }
                });
    }

    @Override
    void show() {
        List<FrictionTerm> rows = new ArrayList<>();
        mechanism().getFrictionHypotheses().forEach(h -> rows.addAll(h.getTerms()));
        table.show(rows);
    }

    @Override
    boolean reveal(String elementId) {
        for (FrictionHypothesis h : mechanism().getFrictionHypotheses()) {
            if (h.getId().equals(elementId) && !h.getTerms().isEmpty()) {
                table.viewer().setSelection(new StructuredSelection(h.getTerms()), true);
                return true;
            }
        }
        return false;
    }
}
