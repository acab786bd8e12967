package dev.penduline.ui.internal.wizard;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.SubMonitor;

import dev.penduline.records.parts.PartsList;
import dev.penduline.services.InputException;
import dev.penduline.services.NewMechanismFile;
import dev.penduline.services.PartsImport;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;

/**
 * Creates a mechanism project in the workspace: reads the parts list first (so a bad list
 * creates nothing), creates and opens the project, writes the mechanism file through the
 * services and refreshes the project. A failure after the project was created removes it again.
 */
public final class MechanismProjectCreation {

    /**
     * What was created.
     *
     * @param mechanismFile the new mechanism file
     * @param warnings      what reading the parts list noted (ignored columns and the like)
     */
    public record Created(IFile mechanismFile, List<String> warnings) {
    }

    private MechanismProjectCreation() {
    }

    /**
     * Creates the project and its mechanism file.
     *
     * @param projectName   the project's name (valid and not yet taken)
     * @param mechanismName the mechanism's name
     * @param partsList     a parts-list CSV to import, or empty
     * @param monitor       progress and cancellation (may be null)
     * @return the mechanism file
     * @throws InputException naming the file, line and field when the parts list is bad
     * @throws CoreException  when the workspace refuses the project
     */
    public static Created create(String projectName, String mechanismName, Optional<Path> partsList,
            IProgressMonitor monitor) throws InputException, CoreException {
        SubMonitor progress = SubMonitor.convert(monitor, "Creating the project " + projectName, 4);
        Optional<PartsList> parts = partsList.isPresent()
                ? Optional.of(PartsImport.readPartsList(partsList.get()))
                : Optional.empty();
        progress.worked(1);
        IProject project = ResourcesPlugin.getWorkspace().getRoot().getProject(projectName);
        project.create(progress.split(1));
        try {
            project.open(progress.split(1));
            IFile file = project.getFile(NewMechanismFile.fileName(mechanismName));
            NewMechanismFile.write(mechanismName, parts, file.getLocation().toFile().toPath(),
                    WorkbenchDefaults.current().gravity());
            project.refreshLocal(IResource.DEPTH_INFINITE, progress.split(1));
            return new Created(file, parts.map(PartsList::warnings).orElse(List.of()));
        } catch (InputException | CoreException | RuntimeException e) {
            project.delete(true, true, null);
            throw e;
        }
    }
}
