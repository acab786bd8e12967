package dev.penduline.ui;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IProjectDescription;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.IWorkspaceRoot;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.IProgressMonitor;

/**
 * Opens a folder of the file system — a mechanism project kept next to the CAD in version
 * control — as a workspace project in place: the files stay where they are, the workspace only
 * refers to them.
 */
public final class ProjectFolders {

    private ProjectFolders() {
    }

    /**
     * Opens a folder as a project, reusing the project that already points at it.
     *
     * @param folder  the folder
     * @param monitor progress, may be null
     * @return the open project
     * @throws CoreException when the project cannot be created or opened (the message says why)
     */
    public static IProject open(Path folder, IProgressMonitor monitor) throws CoreException {
        Path dir = folder.toAbsolutePath().normalize();
        if (!Files.isDirectory(dir)) {
            throw new CoreException(org.eclipse.core.runtime.Status.error(dir + " is not a folder"));
        }
        IWorkspace workspace = ResourcesPlugin.getWorkspace();
        IWorkspaceRoot root = workspace.getRoot();
        IPath location = IPath.fromOSString(dir.toString());
        for (IProject p : root.getProjects()) {
            if (location.equals(p.getLocation())) {
                if (!p.isOpen()) {
                    p.open(monitor);
                }
                return p;
            }
        }
        String base = dir.getFileName() == null ? "mechanism" : dir.getFileName().toString();
        String name = base;
        for (int i = 2; root.getProject(name).exists(); i++) {
            name = base + "-" + i;
        }
        IProject project = root.getProject(name);
        IProjectDescription description = workspace.newProjectDescription(name);
        if (!location.equals(root.getLocation().append(name))) {
            description.setLocation(location);
        }
        project.create(description, monitor);
        project.open(monitor);
        return project;
    }
}
