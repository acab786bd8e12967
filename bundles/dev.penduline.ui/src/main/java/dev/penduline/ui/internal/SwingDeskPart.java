package dev.penduline.ui.internal;

import jakarta.annotation.PostConstruct;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/**
 * The start page of the workbench: what Penduline does, where to begin, and the usual caution.
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
                + "To begin: File › Open Mechanism Folder… opens a folder that holds a mechanism file (.penduline) "
                + "and its records where it is, next to the CAD; File › New › Mechanism Project starts a new one "
                + "from a parts list. Select the mechanism file in Project Files: the Mechanism view shows its "
                + "inertia part by part, the Swing Chart its test sessions, the Friction view the fits stored in it; "
                + "its Fit friction button (or ./penduline fit FILE) identifies the friction and stores the result "
                + "in the file.\n\n"
                + "Caution: results are estimates to be confirmed by test. For doors, hatches, gates and lifting gear, "
                + "follow local codes and licensed engineering practice.");
        GridDataFactory.fillDefaults().grab(true, false).hint(480, SWT.DEFAULT).applyTo(body);
    }
}
