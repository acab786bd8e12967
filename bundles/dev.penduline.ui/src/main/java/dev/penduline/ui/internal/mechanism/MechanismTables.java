package dev.penduline.ui.internal.mechanism;

import java.util.function.Function;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.TableColumn;

import dev.penduline.physics.inertia.PartContribution;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.present.Figures;

/**
 * The two tables of the Mechanism view, side by side: the totals (quantity, value, unit) and the
 * parts with their contributions, in the order of the file (a cut-out shows with negative mass
 * and share). Hidden when there is nothing to show.
 */
final class MechanismTables {

    private final TableViewer totals;
    private final TableViewer parts;
    private final SashForm sash;

    MechanismTables(Composite parent) {
        sash = new SashForm(parent, SWT.HORIZONTAL);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(sash);
        totals = new TableViewer(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        totals.setContentProvider(ArrayContentProvider.getInstance());
        column(totals, "total", SWT.LEFT, 150, TotalRow.class, TotalRow::quantity);
        column(totals, "value", SWT.RIGHT, 70, TotalRow.class, TotalRow::value);
        column(totals, "unit", SWT.LEFT, 60, TotalRow.class, TotalRow::unit);
        totals.getTable().setHeaderVisible(true);
        totals.getTable().setLinesVisible(true);

        parts = new TableViewer(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        parts.setContentProvider(ArrayContentProvider.getInstance());
        column(parts, "part (file order)", SWT.LEFT, 110, PartContribution.class, PartContribution::name);
        column(parts, "mass (" + Unit.KILOGRAM.symbol() + ")", SWT.RIGHT, 60, PartContribution.class,
                p -> Figures.significant(p.mass()));
        column(parts, "distance (" + Unit.METRE.symbol() + ")", SWT.RIGHT, 70, PartContribution.class,
                p -> Figures.significant(p.axisDistance()));
        column(parts, "J pivot (" + Unit.KG_M2.symbol() + ")", SWT.RIGHT, 80, PartContribution.class,
                p -> Figures.significant(p.pivotInertia()));
        column(parts, "share", SWT.RIGHT, 68, PartContribution.class, p -> Figures.percent(p.share()));
        parts.getTable().setHeaderVisible(true);
        parts.getTable().setLinesVisible(true);
        // the totals need their values in sight; the parts table scrolls sideways
        sash.setWeights(58, 42);
        // nothing to show until a mechanism is loaded
        sash.setVisible(false);
        ((GridData) sash.getLayoutData()).exclude = true;
    }

    void show(MechanismSheet sheet) {
        totals.setInput(sheet.totals());
        parts.setInput(sheet.parts());
        fit(totals, 165, 125);
        fit(parts, 200);
        boolean empty = sheet.totals().isEmpty();
        sash.setVisible(!empty);
        ((GridData) sash.getLayoutData()).exclude = empty;
    }

    /**
     * Sizes the columns to their content, each at most its cap, so that a long value cannot
     * push the next columns out of sight.
     */
    private static void fit(TableViewer viewer, int... caps) {
        TableColumn[] columns = viewer.getTable().getColumns();
        // GTK packs the last column to the table's remaining width, pushing right-aligned text
        // out of sight; the last column keeps its fixed width.
        for (int i = 0; i < columns.length - 1; i++) {
            TableColumn c = columns[i];
            int wanted = c.getWidth();
            c.pack();
            int cap = i < caps.length ? caps[i] : Integer.MAX_VALUE;
            c.setWidth(Math.min(cap, Math.max(wanted, c.getWidth() + 4)));
        }
    }

    private static <T> void column(TableViewer viewer, String header, int align, int width, Class<T> type,
            Function<T, String> text) {
        TableViewerColumn c = new TableViewerColumn(viewer, align);
        c.getColumn().setText(header);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return type.isInstance(element) ? text.apply(type.cast(element)) : "";
            }
        });
    }
}
