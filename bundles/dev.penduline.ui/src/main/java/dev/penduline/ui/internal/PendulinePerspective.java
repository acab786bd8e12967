package dev.penduline.ui.internal;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

import dev.penduline.ui.PendulineViews;

/**
 * Project files on the left with Properties, Problems and Progress in a folder below them; the
 * Mechanism view, the Friction view and the Swing Desk at the top of the centre, the Swing Chart
 * below them. The
 * centre keeps the full height because the totals, the parts and the chart need it more than
 * the platform views do.
 */
public final class PendulinePerspective implements IPerspectiveFactory {

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editors = layout.getEditorArea();
        // The editor area holds the mechanism editor at the top; the views that follow its live
        // model sit below it, so an edit and its effect on the inertia are in sight together.
        layout.setEditorAreaVisible(true);
        layout.addView(PendulineViews.PROJECT_FILES, IPageLayout.LEFT, 0.2f, editors);
        IFolderLayout bottom = layout.createFolder("dev.penduline.ui.bottom", IPageLayout.BOTTOM, 0.6f,
                PendulineViews.PROJECT_FILES);
        bottom.addView(PendulineViews.PROPERTIES);
        bottom.addView(PendulineViews.PROBLEMS);
        bottom.addPlaceholder(PendulineViews.PROGRESS);
        IFolderLayout centre = layout.createFolder("dev.penduline.ui.centre", IPageLayout.BOTTOM, 0.45f, editors);
        centre.addView(PendulineViews.MECHANISM);
        // Beside the Mechanism view rather than the chart: a stored fit is read next to the record
        // it came from, and the chart beside it stays in sight.
        centre.addView(PendulineViews.FRICTION);
        centre.addView(PendulineViews.SWING_DESK);
        centre.addView(PendulineViews.WHAT_IF);
        IFolderLayout charts = layout.createFolder("dev.penduline.ui.charts", IPageLayout.RIGHT, 0.6f,
                "dev.penduline.ui.centre");
        charts.addView(PendulineViews.SWING_CHART);
        for (String view : new String[] {PendulineViews.PROJECT_FILES, PendulineViews.MECHANISM,
                PendulineViews.SWING_CHART, PendulineViews.FRICTION, PendulineViews.SWING_DESK, PendulineViews.PROPERTIES,
                PendulineViews.PROBLEMS, PendulineViews.PROGRESS}) {
            layout.addShowViewShortcut(view);
        }
        layout.addShowViewShortcut(PendulineViews.WHAT_IF);
        layout.addNewWizardShortcut(PendulineViews.NEW_MECHANISM_PROJECT);
    }
}
