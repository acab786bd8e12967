package dev.penduline.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.forms.widgets.FormToolkit;

import dev.penduline.model.FitResult;
import dev.penduline.model.TestSession;
import dev.penduline.services.PartsImport;
import dev.penduline.services.StoredFitText;
import dev.penduline.services.present.Figures;

/**
 * The fits stored in the mechanism, read-only: when each was made, of which sessions, with which
 * terms, its verdict, and whether it is stale (the parts or the pivot changed after it). A fit
 * can be deleted, as one undoable command; making one is the fit wizard's job.
 */
final class FitsPage extends EditorPage {

    /** The page's id. */
    static final String ID = "fits";

    private EditableTable<FitResult> table;

    FitsPage(MechanismEditor editor) {
        super(editor, ID, "Stored Fits");
    }

    @Override
    String introduction() {
        return "Fits are results: they are shown as they were stored and can only be deleted. A fit is stale when the parts,"
                + " the pivot or gravity changed after it was made; fit again to bring it up to date.";
    }

    @Override
    void fill(Composite body, FormToolkit tk) {
        table = newTable(body, 110);
        table.column("computed at", 150, f -> String.valueOf(f.getComputedAt()).replace('T', ' ').replace("Z", " UTC"));
        table.column("terms", 150, f -> String.join(" + ", f.getTermIds()));
        table.column("sessions", 150, this::sessionsOf);
        table.column("J0 at the fit (kg·m²)", 140, f -> f.isSetCalculatedInertia() ? number(f.getCalculatedInertia()) : "");
        table.column("J0 fitted (kg·m²)", 120, f -> f.isSetFittedInertia() ? number(f.getFittedInertia()) : "held");
        table.column("verdict", 260, f -> StoredFitText.of(f, mechanism().getSessions()).verdict().replaceFirst("^Verdict: ", ""));
        table.column("state", 320, f -> PartsImport.staleReason(f).map(r -> "stale: " + r).orElse("current"));
        Composite row = buttonRow(body, tk);
        button(row, tk, "Delete Fit", this::delete);
    }

    private static String number(double v) {
        return Figures.significant(v);
    }

    private String sessionsOf(FitResult f) {
        List<String> names = new ArrayList<>();
        for (String id : f.getSessionIds()) {
            names.add(mechanism().getSessions().stream().filter(s -> id.equals(s.getId())).map(TestSession::getName)
                    .findFirst().orElse(id + " (removed)"));
        }
        return String.join(", ", names);
    }

    private void delete() {
        removeSelected(table, FitResult.class, "fit", "Delete", FitResult::getName, mechanism().getFitResults(), false);
    }

    @Override
    void show() {
        table.show(new ArrayList<>(mechanism().getFitResults()));
    }

    @Override
    boolean reveal(String elementId) {
        return select(table, mechanism().getFitResults(), FitResult::getId, elementId);
    }

}
