package dev.penduline.ui.internal;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

import dev.penduline.ui.PendulineViews;

/** Project files on the left, the desk in the middle, properties and problems below. */
public final class PendulinePerspective implements IPerspectiveFactory {

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editors = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        layout.addView(PendulineViews.PROJECT_FILES, IPageLayout.LEFT, 0.25f, editors);
        layout.addStandaloneView(PendulineViews.SWING_DESK, false, IPageLayout.TOP, 0.7f, editors);
        IFolderLayout bottom = layout.createFolder("dev.penduline.ui.bottom", IPageLayout.BOTTOM, 0.7f, editors);
        bottom.addView(PendulineViews.PROPERTIES);
        bottom.addView(PendulineViews.PROBLEMS);
        bottom.addPlaceholder(PendulineViews.PROGRESS);
        layout.addShowViewShortcut(PendulineViews.PROJECT_FILES);
        layout.addShowViewShortcut(PendulineViews.SWING_DESK);
        layout.addShowViewShortcut(PendulineViews.PROPERTIES);
        layout.addShowViewShortcut(PendulineViews.PROBLEMS);
        layout.addShowViewShortcut(PendulineViews.PROGRESS);
    }
}
