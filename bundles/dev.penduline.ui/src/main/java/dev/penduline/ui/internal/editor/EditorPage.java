package dev.penduline.ui.internal.editor;

import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;
import java.util.function.Function;

import org.eclipse.jface.dialogs.IMessageProvider;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.forms.IManagedForm;
import org.eclipse.ui.forms.editor.FormPage;
import org.eclipse.ui.forms.widgets.FormToolkit;
import org.eclipse.ui.forms.widgets.ScrolledForm;

import dev.penduline.model.Mechanism;
import dev.penduline.ui.internal.document.MechanismDocument;

/**
 * A page of the mechanism editor: a form whose widgets show the live model and turn the user's
 * edits into commands of the editor's document. The editor calls {@link #refresh()} after every
 * change (an edit, undo, redo, revert) and {@link #reveal(String)} to go to an element.
 */
abstract class EditorPage extends FormPage {

    private Label problem;

    /**
     * A page.
     *
     * @param editor the editor
     * @param id     the page's id
     * @param title  its tab's title
     */
    EditorPage(MechanismEditor editor, String id, String title) {
        super(editor, id, title);
    }

    /** @return the editor's document (it changes on Save As) */
    final MechanismDocument document() {
        return ((MechanismEditor) getEditor()).document();
    }

    /** @return the live model */
    final Mechanism mechanism() {
        return document().mechanism();
    }

    @Override
    protected final void createFormContent(IManagedForm managedForm) {
        ScrolledForm form = managedForm.getForm();
        FormToolkit tk = managedForm.getToolkit();
        form.setText(getTitle());
        tk.decorateFormHeading(form.getForm());
        Composite body = form.getBody();
        GridLayoutFactory.swtDefaults().numColumns(1).applyTo(body);
        Label intro = tk.createLabel(body, introduction(), SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(400, SWT.DEFAULT).applyTo(intro);
        fill(body, tk);
        problem = tk.createLabel(body, "", SWT.WRAP);
        problem.setForeground(body.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridDataFactory.fillDefaults().grab(true, false).hint(400, SWT.DEFAULT).applyTo(problem);
        refresh();
    }

    /** @return one or two sentences above the page's widgets */
    abstract String introduction();

    /**
     * Builds the page's widgets.
     *
     * @param body the form's body (one-column grid)
     * @param tk   the toolkit
     */
    abstract void fill(Composite body, FormToolkit tk);

    /** Shows the live model again; does nothing before the page's widgets exist. */
    final void refresh() {
        if (getManagedForm() != null && !getManagedForm().getForm().isDisposed() && problem != null) {
            show();
            getManagedForm().getForm().reflow(true);
        }
    }

    /** Shows the live model in the widgets (they exist). */
    abstract void show();

    /**
     * Selects an element of the page.
     *
     * @param elementId the element's stable id
     * @return true when the page holds it
     */
    abstract boolean reveal(String elementId);

    /**
     * Shows (or, with null, clears) a refused edit's message in the page's header and below it.
     *
     * @param field   what was edited
     * @param message why it was refused, or null
     */
    final void refused(String field, String message) {
        if (problem == null || problem.isDisposed()) {
            return;
        }
        String text = message == null ? "" : field + ": " + message + " (nothing changed)";
        problem.setText(text);
        getManagedForm().getForm().setMessage(message == null ? null : text,
                message == null ? IMessageProvider.NONE : IMessageProvider.ERROR);
        problem.getParent().layout(true, true);
    }

    /** @return the sink for refused edits of tables on this page */
    final BiConsumer<String, String> errors() {
        return this::refused;
    }


    /**
     * A table filling the page's width, its errors shown on this page.
     *
     * @param <T>    the row type
     * @param body   the form's body
     * @param height the table's height hint in pixels (it grows with the page)
     * @return the table, without columns yet
     */
    final <T> EditableTable<T> newTable(Composite body, int height) {
        EditableTable<T> t = new EditableTable<>(body, errors());
        GridDataFactory.fillDefaults().grab(true, true).hint(500, height).applyTo(t.control());
        return t;
    }

    /**
     * Selects the row of an element by its stable id.
     *
     * @param <T>       the row type
     * @param table     the table
     * @param rows      the rows it shows
     * @param id        a row's stable id
     * @param elementId the id wanted
     * @return true when a row has it
     */
    static <T> boolean select(EditableTable<T> table, List<? extends T> rows, Function<T, String> id, String elementId) {
        for (T row : rows) {
            if (id.apply(row).equals(elementId)) {
                table.viewer().setSelection(new StructuredSelection(row), true);
                return true;
            }
        }
        return false;
    }

    /**
     * Removes the selected rows from their list as one command.
     *
     * @param <T>   the row type
     * @param table the table
     * @param type  the row type
     * @param what  what a row is ("fit", "session"), for the labels
     * @param verb  the action's name ("Delete", "Remove")
     * @param name  a row's name
     * @param from  the model list the rows are in
     * @param parts whether the rows are parts (their removal may leave stored fits stale)
     */
    final <T> void removeSelected(EditableTable<T> table, Class<T> type, String what, String verb, Function<T, String> name,
            List<T> from, boolean parts) {
        List<T> chosen = table.selected(type);
        if (chosen.isEmpty()) {
            refused(verb, "select the " + what + "s to " + verb.toLowerCase(Locale.ROOT) + " first");
            return;
        }
        String label = chosen.size() == 1 ? verb + " " + what + " " + name.apply(chosen.get(0))
                : verb + " " + chosen.size() + " " + what + "s";
        if (parts) {
            MechanismEdits.runOnParts(document(), label, () -> from.removeAll(chosen));
        } else {
            MechanismEdits.run(document(), label, () -> from.removeAll(chosen));
        }
    }

    /**
     * A row of push buttons.
     *
     * @param parent the parent
     * @param tk     the toolkit
     * @return the row, for {@link #button}
     */
    static Composite buttonRow(Composite parent, FormToolkit tk) {
        Composite row = tk.createComposite(parent);
        GridLayoutFactory.fillDefaults().numColumns(0).equalWidth(false).applyTo(row);
        return row;
    }

    /**
     * A push button in a row.
     *
     * @param row    the row
     * @param tk     the toolkit
     * @param text   its text
     * @param action what it does
     * @return the button
     */
    static Button button(Composite row, FormToolkit tk, String text, Runnable action) {
        ((GridLayout) row.getLayout()).numColumns++;
        Button b = tk.createButton(row, text, SWT.PUSH);
        b.addListener(SWT.Selection, e -> action.run());
        return b;
    }
}
