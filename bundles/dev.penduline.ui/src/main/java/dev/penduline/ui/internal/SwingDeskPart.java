package dev.penduline.ui.internal;

import jakarta.annotation.PostConstruct;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/**
 * The start page of the workbench: what Penduline does and the usual caution. Later issues turn
 * it into the desk where a mechanism's inertia, swing records and fits are shown.
 */
public final class SwingDeskPart {

    /**
     * Builds the page.
     *
     * @param parent the part's composite
     */
    @PostConstruct
    public void create(Composite parent) {
        GridLayoutFactory.swtDefaults().margins(16, 16).applyTo(parent);
        Label title = new Label(parent, SWT.NONE);
        title.setText("Penduline - pivoted mechanisms");
        title.setFont(org.eclipse.jface.resource.JFaceResources.getHeaderFont());
        Label body = new Label(parent, SWT.WRAP);
        body.setText("Compute the pivot inertia and centroid of hatches, swing arms, gates and flaps from a parts list, "
                + "import free-release swing records, and find which friction losses dominate.\n\n"
                + "Caution: results are estimates to be confirmed by test. For doors, hatches, gates and lifting gear, "
                + "follow local codes and licensed engineering practice.");
        GridDataFactory.fillDefaults().grab(true, false).hint(480, SWT.DEFAULT).applyTo(body);
    }
}
