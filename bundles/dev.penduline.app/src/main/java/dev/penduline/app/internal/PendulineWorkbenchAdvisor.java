package dev.penduline.app.internal;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.core.runtime.Platform;
import org.eclipse.jface.resource.ResourceLocator;
import org.eclipse.ui.application.IWorkbenchConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;
import org.eclipse.ui.ide.IDE;

import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.ProjectFolders;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;

/**
 * Opens the Penduline perspective and keeps the workspace saved. Public (to the test bundle
 * only) so that the workbench smoke test can run the real workbench with it.
 */
public class PendulineWorkbenchAdvisor extends WorkbenchAdvisor {

    /** The window title of the main window. */
    public static final String WINDOW_TITLE = PendulineWindowAdvisor.TITLE;

    @Override
    public void initialize(IWorkbenchConfigurer configurer) {
        super.initialize(configurer);
        configurer.setSaveAndRestore(true);
        // Adapters that let the platform's views show workspace resources (labels, properties).
        IDE.registerAdapters();
        // The user's defaults (display precision, fit resamples, gravity of new mechanisms) before any view draws.
        WorkbenchDefaults.reload();
        declareProblemImages(configurer);
    }

    /**
     * The severity icons of the Problems view. The IDE's own advisor declares them; without them
     * every marker shows the red square of a missing image, a warning as much as an error.
     */
    private static void declareProblemImages(IWorkbenchConfigurer configurer) {
        String[][] images = {{"IMG_OBJS_ERROR_PATH", "error_tsk.png"}, {"IMG_OBJS_WARNING_PATH", "warn_tsk.png"},
            {"IMG_OBJS_INFO_PATH", "info_tsk.png"}};
        for (String[] image : images) {
            ResourceLocator.imageDescriptorFromBundle("org.eclipse.ui.ide", "icons/full/obj16/" + image[1])
                    .ifPresent(d -> configurer.declareImage(image[0], d, true));
        }
    }

    @Override
    public String getInitialWindowPerspectiveId() {
        return PendulineViews.PERSPECTIVE;
    }

    @Override
    public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        return new PendulineWindowAdvisor(configurer);
    }

    /**
     * Opens the folders named on the command line ({@code ./penduline gui FOLDER ...}) as
     * projects, in place.
     */
    @Override
    public void postStartup() {
        super.postStartup();
        IProject first = null;
        for (String arg : Platform.getApplicationArgs()) {
            if (arg.startsWith("-")) {
                continue;
            }
            Path folder = Path.of(arg);
            if (Files.isDirectory(folder)) {
                try {
                    IProject project = ProjectFolders.open(folder, new NullProgressMonitor());
                    first = first == null ? project : first;
                } catch (CoreException e) {
                    ILog.of(getClass()).log(e.getStatus());
                }
            } else {
                ILog.of(getClass()).warn("not a folder, not opened: " + folder.toAbsolutePath());
            }
        }
        if (first != null) {
            // land on the folder's mechanism, not on "No mechanism selected"
            try {
                ProjectFolders.land(getWorkbenchConfigurer().getWorkbench().getActiveWorkbenchWindow(), first);
            } catch (CoreException e) {
                ILog.of(getClass()).log(e.getStatus());
            }
        }
    }

    @Override
    public void postShutdown() {
        try {
            ResourcesPlugin.getWorkspace().save(true, new NullProgressMonitor());
        } catch (CoreException e) {
            ILog.of(getClass()).log(e.getStatus());
        }
    }
}
