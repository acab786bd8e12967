package dev.penduline.app.internal;

import java.nio.file.Path;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.jface.action.Action;
import org.eclipse.jface.dialogs.ErrorDialog;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.ui.IWorkbenchWindow;

import dev.penduline.ui.ProjectFolders;

/** File › Open Mechanism Folder…: a folder kept next to the CAD becomes a workspace project in place. */
final class OpenFolderAction extends Action {

    private final IWorkbenchWindow window;

    OpenFolderAction(IWorkbenchWindow window) {
        super("&Open Mechanism Folder...");
        this.window = window;
        setToolTipText("Open a folder with a mechanism file and its records as a project, where it is");
    }

    @Override
    public void run() {
        DirectoryDialog dialog = new DirectoryDialog(window.getShell());
        dialog.setText("Open Mechanism Folder");
        dialog.setMessage("Choose the folder that holds the mechanism file (.penduline) and its records.");
        String chosen = dialog.open();
        if (chosen == null) {
            return;
        }
        try {
            ProjectFolders.land(window, ProjectFolders.open(Path.of(chosen), new NullProgressMonitor()));
        } catch (CoreException e) {
            ErrorDialog.openError(window.getShell(), "Open Mechanism Folder", "The folder could not be opened.",
                    e.getStatus());
        }
    }
}
