package dev.penduline.ui.internal;

import java.nio.file.Path;
import java.util.Arrays;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IResourceChangeEvent;
import org.eclipse.core.resources.IResourceChangeListener;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.e4.ui.workbench.modeling.ESelectionService;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerDropAdapter;
import org.eclipse.jface.viewers.ViewerFilter;
import org.eclipse.swt.SWT;
import org.eclipse.swt.dnd.DND;
import org.eclipse.swt.dnd.FileTransfer;
import org.eclipse.swt.dnd.Transfer;
import org.eclipse.swt.dnd.TransferData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.model.WorkbenchContentProvider;
import org.eclipse.ui.model.WorkbenchLabelProvider;

import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.model.persistence.SaveLock;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.wizard.RecordImportWizard;

/**
 * The workspace as a tree: one project per mechanism, with its mechanism file, parts lists and
 * swing records. Content and labels come from the platform's workbench adapters; the selection
 * feeds the Properties view.
 */
public final class ProjectFilesPart {

    private final ESelectionService selection;
    private TreeViewer viewer;
    private IResourceChangeListener refresher;

    /**
     * Created by the workbench.
     *
     * @param selection the part's selection service
     */
    @Inject
    public ProjectFilesPart(ESelectionService selection) {
        this.selection = selection;
    }

    /**
     * Builds the tree.
     *
     * @param parent the part's composite
     */
    @PostConstruct
    public void create(Composite parent) {
        viewer = new TreeViewer(parent, SWT.MULTI | SWT.H_SCROLL | SWT.V_SCROLL);
        viewer.setContentProvider(new WorkbenchContentProvider());
        viewer.setLabelProvider(WorkbenchLabelProvider.getDecoratingWorkbenchLabelProvider());
        viewer.addFilter(new ViewerFilter() {
            @Override
            public boolean select(Viewer v, Object parentElement, Object element) {
                return !(element instanceof IResource r && isSaveHousekeeping(r.getName()));
            }
        });
        IWorkspace workspace = ResourcesPlugin.getWorkspace();
        viewer.setInput(workspace.getRoot());
        viewer.addSelectionChangedListener(e -> selection.setSelection(
                e.getSelection() instanceof IStructuredSelection s && s.size() == 1 ? s.getFirstElement() : e.getSelection()));
        // swing records dropped on a mechanism file open the record import on it
        viewer.addDropSupport(DND.DROP_COPY | DND.DROP_DEFAULT, new Transfer[] {FileTransfer.getInstance()},
                new ViewerDropAdapter(viewer) {
                    @Override
                    public boolean validateDrop(Object target, int operation, TransferData type) {
                        return target instanceof IFile f && MechanismSelection.isMechanismFile(f)
                                && FileTransfer.getInstance().isSupportedType(type);
                    }

                    @Override
                    public boolean performDrop(Object data) {
                        if (!(getCurrentTarget() instanceof IFile f) || !(data instanceof String[] paths)) {
                            return false;
                        }
                        RecordImportWizard.open(viewer.getControl().getShell(), f,
                                Arrays.stream(paths).map(Path::of).toList());
                        return true;
                    }
                });
        viewer.addDoubleClickListener(e -> {
            Object first = e.getSelection() instanceof IStructuredSelection s ? s.getFirstElement() : null;
            if (first instanceof IFile f && MechanismSelection.isMechanismFile(f)) {
                openEditor(f);
            } else if (first != null) {
                viewer.setExpandedState(first, !viewer.getExpandedState(first));
            }
        });
        refresher = event -> {
            if (event.getType() == IResourceChangeEvent.POST_CHANGE && !viewer.getControl().isDisposed()) {
                viewer.getControl().getDisplay().asyncExec(() -> {
                    if (!viewer.getControl().isDisposed()) {
                        viewer.refresh();
                    }
                });
            }
        };
        workspace.addResourceChangeListener(refresher, IResourceChangeEvent.POST_CHANGE);
    }

    /**
     * Opens a mechanism file in the mechanism editor of the active workbench page.
     *
     * @param file the mechanism file
     */
    public static void openEditor(IFile file) {
        IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
        if (window == null || window.getActivePage() == null) {
            return;
        }
        try {
            IDE.openEditor(window.getActivePage(), file, PendulineViews.MECHANISM_EDITOR);
        } catch (PartInitException e) {
            MessageDialog.openError(window.getShell(), "Cannot Open " + file.getName(), e.getMessage());
        }
    }

    /**
     * Whether a file is one of the saving's own: a mechanism file's lock ({@code .NAME.lock}) or
     * the temporary file of a save ({@code .NAME.DIGITS.saving}); the tree does not show them.
     *
     * @param name the file's name
     * @return true for the lock and temporary files
     */
    public static boolean isSaveHousekeeping(String name) {
        return name.startsWith(".") && (name.endsWith(SaveLock.LOCK_SUFFIX) || name.endsWith(AtomicFileWrite.TEMPORARY_SUFFIX));
    }

    /**
     * Selects a resource in the tree and shows it, as if the user had clicked it; the
     * selection then reaches the views that follow it.
     *
     * @param resource the file or folder
     */
    public void reveal(IResource resource) {
        if (viewer == null || viewer.getControl().isDisposed()) {
            return;
        }
        viewer.refresh();
        viewer.setSelection(new StructuredSelection(resource), true);
    }

    /** Stops listening to the workspace. */
    @PreDestroy
    public void dispose() {
        if (refresher != null) {
            ResourcesPlugin.getWorkspace().removeResourceChangeListener(refresher);
        }
    }
}
