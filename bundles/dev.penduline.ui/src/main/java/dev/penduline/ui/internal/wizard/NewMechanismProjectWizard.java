package dev.penduline.ui.internal.wizard;

import java.lang.reflect.InvocationTargetException;
import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.ui.INewWizard;
import org.eclipse.ui.IWorkbench;

import dev.penduline.services.InputException;
import dev.penduline.ui.ProjectFolders;

/**
 * File › New › Mechanism Project: creates a workspace project with its mechanism file, empty or
 * from a parts list, then selects the file in Project Files so the Mechanism view shows it.
 */
public final class NewMechanismProjectWizard extends Wizard implements INewWizard {

    private IWorkbench workbench;
    private NewMechanismProjectPage page;
    private IFile created;

    /** Created by the workbench's new-wizard registry. */
    public NewMechanismProjectWizard() {
        setWindowTitle("New Mechanism Project");
        setNeedsProgressMonitor(true);
    }

    @Override
    public void init(IWorkbench bench, IStructuredSelection selection) {
        this.workbench = bench;
    }

    @Override
    public void addPages() {
        page = new NewMechanismProjectPage();
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        String projectName = page.projectName();
        String mechanismName = page.mechanismName();
        Optional<Path> csv = page.partsListPath();
        MechanismProjectCreation.Created[] done = new MechanismProjectCreation.Created[1];
        try {
            getContainer().run(true, false, monitor -> {
                try {
                    done[0] = MechanismProjectCreation.create(projectName, mechanismName, csv, monitor);
                } catch (InputException | CoreException e) {
                    throw new InvocationTargetException(e);
                }
            });
        } catch (InvocationTargetException e) {
            Throwable cause = e.getCause();
            if (!(cause instanceof InputException)) {
                ILog.of(getClass()).error("creating the project " + projectName + " failed", cause);
            }
            page.setErrorMessage(cause instanceof InputException ? cause.getMessage()
                    : "The project could not be created: " + cause.getMessage());
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
        created = done[0].mechanismFile();
        if (!done[0].warnings().isEmpty()) {
            MessageDialog.openInformation(getShell(), "Parts list imported with remarks",
                    String.join("\n", done[0].warnings()));
        }
        reveal(created);
        return true;
    }

    private void reveal(IFile file) {
        ProjectFolders.reveal(workbench == null ? null : workbench.getActiveWorkbenchWindow(), file);
    }

    /**
     * Fills the page as a user would (for tests); call after the dialog has created the page.
     *
     * @param projectName   the project's name
     * @param mechanismName the mechanism's name
     * @param partsList     the parts list, or null
     */
    public void fill(String projectName, String mechanismName, Path partsList) {
        page.fill(projectName, mechanismName, partsList);
    }

    /**
     * The mechanism file the wizard created.
     *
     * @return the file, null before a successful finish
     */
    public IFile created() {
        return created;
    }
}
