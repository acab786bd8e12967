package dev.penduline.ui.internal.friction;

import java.util.List;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;

import dev.penduline.services.StoredFitText;

/**
 * The scrolled body of the Friction view: the verdict first, the energy shares and the model,
 * the warnings, then the tables of one stored fit — or what to do when the file holds none.
 */
final class StoredFitPanel {

    private final ScrolledComposite scroller;
    private final Composite content;
    private final Label verdict;
    private final Label details;
    private final Label warnings;
    private final FrictionTables tables;

    StoredFitPanel(Composite parent) {
        scroller = new ScrolledComposite(parent, SWT.V_SCROLL | SWT.H_SCROLL);
        scroller.setExpandHorizontal(true);
        scroller.setExpandVertical(true);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(scroller);
        content = new Composite(scroller, SWT.NONE);
        GridLayoutFactory.fillDefaults().spacing(6, 6).applyTo(content);
        verdict = new Label(content, SWT.WRAP);
        verdict.setFont(JFaceResources.getBannerFont());
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(verdict);
        details = new Label(content, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(details);
        warnings = new Label(content, SWT.WRAP);
        warnings.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(warnings);
        tables = new FrictionTables(content);
        scroller.setContent(content);
        scroller.addListener(SWT.Resize, e -> resize());
    }

    /**
     * Shows a stored fit of a file, or what to do when there is none.
     *
     * @param sheet the file's sheet (null before a file is read)
     * @param fit   the fit to show, or null
     */
    void show(FrictionSheet sheet, StoredFitText fit) {
        if (fit == null) {
            boolean broken = sheet == null || sheet.error().isPresent();
            verdict.setText(broken ? "" : "No fit stored yet.");
            details.setText(broken ? "" : sheet.sessions() == 0
                    ? "This mechanism has no test sessions yet: add swing records with 'penduline add-session', "
                            + "then press Fit Friction\u2026."
                    : "Press Fit Friction\u2026 to set up a fit of the friction from its " + sheet.sessions()
                            + " test session(s) and store the result in the file.");
        } else {
            verdict.setText(fit.verdict());
            String status = "converged".equals(fit.status()) ? "" : "; status " + fit.status();
            details.setText(fit.shares() + "  ·  " + fit.model() + status);
        }
        List<String> w = fit == null ? List.of() : fit.warnings();
        // Warnings come right under the verdict, where they cannot be scrolled out of sight.
        warnings.setText(w.isEmpty() ? "" : "Warnings:\n- " + String.join("\n- ", w));
        warnings.setVisible(!w.isEmpty());
        ((GridData) warnings.getLayoutData()).exclude = w.isEmpty();
        tables.show(fit);
        content.layout(true, true);
        resize();
    }

    /** The scrolled area's minimum size follows the content at the current width (labels wrap). */
    private void resize() {
        int width = Math.max(scroller.getClientArea().width,
                tables.control().isVisible() ? tables.control().computeSize(SWT.DEFAULT, SWT.DEFAULT).x : 0);
        scroller.setMinSize(content.computeSize(width, SWT.DEFAULT));
    }

    /**
     * The estimates table as the user sees it.
     *
     * @return the table
     */
    Table estimates() {
        return tables.estimates();
    }
}
