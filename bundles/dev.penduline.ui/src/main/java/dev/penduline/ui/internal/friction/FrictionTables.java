package dev.penduline.ui.internal.friction;

import java.util.List;
import java.util.function.Function;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;

import dev.penduline.services.StoredFitText;
import dev.penduline.services.StoredFitText.ComparisonRow;
import dev.penduline.services.StoredFitText.EstimateRow;
import dev.penduline.services.StoredFitText.SessionRow;

/**
 * The tables of one stored fit, in two rows: the estimates with the comparison of term sets
 * beside them, then the sessions. Each table is as tall as its rows (the view
 * scrolls as a whole), so no row hides behind a table's own scroll bar.
 */
final class FrictionTables {

    private final Composite area;
    private final TableViewer estimates;
    private final TableViewer sessions;
    private final TableViewer comparisons;

    FrictionTables(Composite parent) {
        area = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().spacing(0, 8).applyTo(area);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(area);
        // Each row is laid out on its own so that a wide table in one row does not push the
        // other row's right-hand table out of sight.
        Composite first = row(area);
        caption(first, "Estimates (± σ: the Jacobian's, or the bootstrap's when clearly larger)");
        caption(first, "Term sets compared (⇒ kept: lowest BIC, all terms clear of 0)");
        estimates = table(first);
        column(estimates, "quantity", SWT.LEFT, EstimateRow.class,
                e -> e.symbol().isEmpty() ? e.quantity() : e.quantity() + "  " + e.symbol());
        column(estimates, "value", SWT.RIGHT, EstimateRow.class, EstimateRow::value);
        column(estimates, "± σ", SWT.RIGHT, EstimateRow.class, EstimateRow::sigma);
        column(estimates, "σ Jacobian", SWT.RIGHT, EstimateRow.class, EstimateRow::sigmaJacobian);
        column(estimates, "σ bootstrap", SWT.RIGHT, EstimateRow.class, EstimateRow::sigmaResampling);
        column(estimates, "unit", SWT.LEFT, EstimateRow.class, EstimateRow::unit);
        comparisons = table(first);
        column(comparisons, "terms", SWT.LEFT, ComparisonRow.class,
                c -> (c.selected() ? "⇒ " : "     ") + c.terms());
        column(comparisons, "AIC", SWT.RIGHT, ComparisonRow.class, ComparisonRow::aic);
        column(comparisons, "BIC", SWT.RIGHT, ComparisonRow.class, ComparisonRow::bic);
        column(comparisons, "rms (°)", SWT.RIGHT, ComparisonRow.class, ComparisonRow::rms);
        Composite second = row(area);
        caption(second, "Test sessions (fitted release and residual)");
        caption(second, "");
        sessions = table(second);
        column(sessions, "session", SWT.LEFT, SessionRow.class, SessionRow::session);
        column(sessions, "release (°)", SWT.RIGHT, SessionRow.class, SessionRow::releaseAngle);
        column(sessions, "at (s)", SWT.RIGHT, SessionRow.class, SessionRow::releaseTime);
        column(sessions, "offset (°)", SWT.RIGHT, SessionRow.class, SessionRow::offset);
        column(sessions, "rms (°)", SWT.RIGHT, SessionRow.class, SessionRow::rms);
        show(null);
    }

    private static Composite row(Composite parent) {
        Composite row = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(16, 2).applyTo(row);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(row);
        return row;
    }

    /**
     * Shows a stored fit, or hides the tables.
     *
     * @param fit the fit, or null for none
     */
    void show(StoredFitText fit) {
        boolean none = fit == null;
        area.setVisible(!none);
        ((GridData) area.getLayoutData()).exclude = none;
        if (none) {
            return;
        }
        fill(estimates, fit.estimates());
        fill(sessions, fit.sessions());
        fill(comparisons, fit.comparisons().isEmpty() ? List.of(new ComparisonRow(true, "(terms given, not "
                + "compared)", "", "", "")) : fit.comparisons());
    }

    /**
     * The estimates table, for tests: what the user reads.
     *
     * @return the table
     */
    Table estimates() {
        return estimates.getTable();
    }

    /**
     * The comparison table, for tests.
     *
     * @return the table
     */
    Table comparisons() {
        return comparisons.getTable();
    }

    /**
     * The sessions table, for tests.
     *
     * @return the table
     */
    Table sessions() {
        return sessions.getTable();
    }

    private static void caption(Composite parent, String text) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(text);
        GridDataFactory.fillDefaults().align(SWT.BEGINNING, SWT.END).applyTo(l);
    }

    private static TableViewer table(Composite parent) {
        // No scroll bars of its own: the table is as tall and as wide as its content.
        TableViewer v = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.NO_SCROLL);
        v.setContentProvider(ArrayContentProvider.getInstance());
        v.getTable().setHeaderVisible(true);
        v.getTable().setLinesVisible(true);
        GridDataFactory.fillDefaults().align(SWT.BEGINNING, SWT.BEGINNING).applyTo(v.getTable());
        return v;
    }

    private static void fill(TableViewer viewer, List<?> rows) {
        viewer.setInput(rows);
        Table table = viewer.getTable();
        int width = 0;
        for (TableColumn c : table.getColumns()) {
            c.pack();
            width += c.getWidth();
        }
        GridData data = (GridData) table.getLayoutData();
        data.widthHint = width + 2 * table.getBorderWidth();
        data.heightHint = table.getHeaderHeight() + Math.max(1, rows.size()) * table.getItemHeight()
                + 2 * table.getBorderWidth() + 2;
    }

    private static <T> void column(TableViewer viewer, String header, int align, Class<T> type,
            Function<T, String> text) {
        TableViewerColumn c = new TableViewerColumn(viewer, align);
        c.getColumn().setText(header);
        c.getColumn().setWidth(60);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return type.isInstance(element) ? text.apply(type.cast(element)) : "";
            }
        });
    }

    /**
     * The whole area, for layout.
     *
     * @return the composite holding the tables
     */
    Control control() {
        return area;
    }
}
