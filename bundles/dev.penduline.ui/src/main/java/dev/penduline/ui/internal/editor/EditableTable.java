package dev.penduline.ui.internal.editor;

import java.util.List;
import java.util.function.BiConsumer;
import java.util.function.Function;

import org.eclipse.jface.layout.TableColumnLayout;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.ColumnPixelData;
import org.eclipse.jface.viewers.ColumnViewerEditor;
import org.eclipse.jface.viewers.ColumnViewerEditorActivationStrategy;
import org.eclipse.jface.viewers.ComboBoxCellEditor;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.TableViewerEditor;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;

/**
 * A table of model objects whose cells are edited in place: each column shows a text and, when
 * editable, takes a typed text (or a choice from a list) that its edit turns into one command. A
 * typed value the column refuses ({@link IllegalArgumentException}) goes to the error sink with
 * the column's name, and nothing changes.
 *
 * @param <T> the row type
 */
final class EditableTable<T> {

    private final TableViewer viewer;
    private final TableColumnLayout layout = new TableColumnLayout();
    private final BiConsumer<String, String> errors;

    /**
     * A table in its own composite (the composite is what to lay out).
     *
     * @param parent the parent
     * @param errors receives (column, message) when a typed value is refused
     */
    EditableTable(Composite parent, BiConsumer<String, String> errors) {
        Composite holder = new Composite(parent, SWT.NONE);
        holder.setLayout(layout);
        this.errors = errors;
        viewer = new TableViewer(holder, SWT.MULTI | SWT.FULL_SELECTION | SWT.BORDER | SWT.H_SCROLL | SWT.V_SCROLL);
        viewer.setContentProvider(ArrayContentProvider.getInstance());
        viewer.getTable().setHeaderVisible(true);
        viewer.getTable().setLinesVisible(true);
        TableViewerEditor.create(viewer, new ColumnViewerEditorActivationStrategy(viewer),
                ColumnViewerEditor.TABBING_HORIZONTAL | ColumnViewerEditor.TABBING_MOVE_TO_ROW_NEIGHBOR
                        | ColumnViewerEditor.KEYBOARD_ACTIVATION);
    }

    /** @return the viewer */
    TableViewer viewer() {
        return viewer;
    }


    /** @return the composite holding the table */
    Composite control() {
        return viewer.getTable().getParent();
    }

    /**
     * A read-only column.
     *
     * @param title the header
     * @param width its width in pixels
     * @param text  the cell's text
     * @return the column
     */
    TableViewerColumn column(String title, int width, Function<T, String> text) {
        TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
        c.getColumn().setText(title);
        c.getColumn().setMoveable(false);
        layout.setColumnData(c.getColumn(), new ColumnPixelData(width, true));
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            @SuppressWarnings("unchecked")
            public String getText(Object element) {
                String s = text.apply((T) element);
                return s == null ? "" : s;
            }
        });
        return c;
    }

    /**
     * A column edited as text.
     *
     * @param title the header
     * @param width its width
     * @param text  the cell's text, also the text offered for editing
     * @param edit  applies a typed text (throws {@link IllegalArgumentException} to refuse it)
     * @return the column
     */
    TableViewerColumn textColumn(String title, int width, Function<T, String> text, BiConsumer<T, String> edit) {
        TableViewerColumn c = column(title, width, text);
        TextCellEditor editor = new TextCellEditor(viewer.getTable());
        c.setEditingSupport(new Support(title, editor, text, edit, null));
        return c;
    }

    /**
     * A column edited by choosing from a list.
     *
     * @param title   the header
     * @param width   its width
     * @param text    the cell's text (one of the choices)
     * @param choices the choices
     * @param edit    applies a chosen text
     * @return the column
     */
    TableViewerColumn choiceColumn(String title, int width, Function<T, String> text, List<String> choices,
            BiConsumer<T, String> edit) {
        TableViewerColumn c = column(title, width, text);
        ComboBoxCellEditor editor = new ComboBoxCellEditor(viewer.getTable(), choices.toArray(String[]::new), SWT.READ_ONLY);
        c.setEditingSupport(new Support(title, editor, text, edit, choices));
        return c;
    }

    /**
     * The selected rows.
     *
     * @param type the row type
     * @return the rows, in the table's order of selection
     */
    List<T> selected(Class<T> type) {
        IStructuredSelection s = viewer.getStructuredSelection();
        return s.toList().stream().filter(type::isInstance).map(type::cast).toList();
    }

    /**
     * Shows rows, keeping the selection where the rows are still there.
     *
     * @param rows the rows
     */
    void show(List<T> rows) {
        if (viewer.getTable().isDisposed()) {
            return;
        }
        if (viewer.isCellEditorActive()) {
            viewer.cancelEditing();
        }
        viewer.setInput(rows);
        viewer.refresh();
    }

    private final class Support extends EditingSupport {
        private final String title;
        private final CellEditor editor;
        private final Function<T, String> text;
        private final BiConsumer<T, String> edit;
        private final List<String> choices;

        Support(String title, CellEditor editor, Function<T, String> text, BiConsumer<T, String> edit, List<String> choices) {
            super(viewer);
            this.title = title;
            this.editor = editor;
            this.text = text;
            this.edit = edit;
            this.choices = choices;
        }

        @Override
        protected CellEditor getCellEditor(Object element) {
            return editor;
        }

        @Override
        protected boolean canEdit(Object element) {
            return true;
        }

        @Override
        @SuppressWarnings("unchecked")
        protected Object getValue(Object element) {
            String s = text.apply((T) element);
            if (choices != null) {
                return Math.max(0, choices.indexOf(s));
            }
            return s == null ? "" : s;
        }

        @Override
        @SuppressWarnings("unchecked")
        protected void setValue(Object element, Object value) {
            String typed = choices != null ? (value instanceof Integer i && i >= 0 && i < choices.size() ? choices.get(i) : null)
                    : String.valueOf(value);
            if (typed == null || typed.equals(text.apply((T) element))) {
                return;
            }
            try {
                edit.accept((T) element, typed.trim());
                errors.accept(title, null);
            } catch (IllegalArgumentException e) {
                errors.accept(title, e.getMessage());
            }
        }
    }
}
