package dev.penduline.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IProjectDescription;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.IWorkspaceRoot;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.ui.IWorkbenchWindow;

import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.ProjectFilesPart;

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

    /**
     * The mechanism file a project opens on: the first {@code .penduline} file at its top level,
     * by name, else the first one in a folder below it.
     *
     * @param project the open project
     * @return the file, or empty when the project holds none
     * @throws CoreException when the project's members cannot be listed
     */
    public static Optional<IFile> firstMechanismFile(IProject project) throws CoreException {
        List<IFile> found = new ArrayList<>();
        project.accept(resource -> {
            if (resource instanceof IFile f && MechanismSelection.isMechanismFile(f)) {
                found.add(f);
            }
            return true;
        });
        return found.stream().min(Comparator.<IFile>comparingInt(f -> f.getProjectRelativePath().segmentCount())
                .thenComparing(f -> f.getProjectRelativePath().toString()));
    }

    /**
     * Shows a resource in the Project Files view of a window and selects it, as if the user had
     * clicked it, so that the views following the selection show it.
     *
     * @param window   the window, may be null (then nothing happens)
     * @param resource the file or folder
     */
    public static void reveal(IWorkbenchWindow window, IResource resource) {
        EPartService parts = window == null ? null : window.getService(EPartService.class);
        if (parts == null) {
            return;
        }
        MPart part = parts.showPart(PendulineViews.PROJECT_FILES, PartState.ACTIVATE);
        if (part != null && part.getObject() instanceof ProjectFilesPart files) {
            files.reveal(resource);
        }
    }

    /**
     * Lands on a project just opened: selects its mechanism file in Project Files (or the project
     * when it has none), so the views show the mechanism rather than "No mechanism selected", and
     * opens it in the mechanism editor.
     *
     * @param window  the window, may be null (then nothing happens)
     * @param project the project
     * @throws CoreException when the project's members cannot be listed
     */
    public static void land(IWorkbenchWindow window, IProject project) throws CoreException {
        Optional<IFile> mechanism = firstMechanismFile(project);
        reveal(window, mechanism.isPresent() ? mechanism.get() : project);
        if (mechanism.isPresent()) {
            ProjectFilesPart.openEditor(mechanism.get());
            // the views keep following the file; Project Files keeps the focus a user expects after opening
            reveal(window, mechanism.get());
        }
    }
}
