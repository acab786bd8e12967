package dev.penduline.ui.internal.problems;

import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.ui.IStartup;

/**
 * Starts keeping the mechanism files' problem markers current once the workbench is up
 * (extension {@code org.eclipse.ui.startup}; runs outside the UI thread).
 */
public final class ProblemMarkersStartup implements IStartup {

    @Override
    public void earlyStartup() {
        ProblemMarkerUpdater.install(ResourcesPlugin.getWorkspace());
    }
}
