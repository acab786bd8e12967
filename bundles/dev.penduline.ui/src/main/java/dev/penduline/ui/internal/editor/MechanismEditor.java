package dev.penduline.ui.internal.editor;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResourceChangeEvent;
import org.eclipse.core.resources.IResourceChangeListener;
import org.eclipse.core.resources.IResourceDelta;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.ISelectionChangedListener;
import org.eclipse.jface.viewers.ISelectionProvider;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorSite;
import org.eclipse.ui.IFileEditorInput;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.dialogs.SaveAsDialog;
import org.eclipse.ui.forms.editor.FormEditor;
import org.eclipse.ui.ide.IGotoMarker;
import org.eclipse.ui.part.FileEditorInput;

import dev.penduline.services.InputException;
import dev.penduline.ui.internal.document.MechanismDocument;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.problems.ProblemMarkers;

/**
 * The editor of a mechanism file ({@code .penduline}): pages for the parts, the pivot and
 * gravity, the friction hypotheses, the test sessions and the stored fits, all on the file's one
 * shared {@link MechanismDocument}. Every change is one command on the document's stack (Edit ›
 * Undo/Redo); the editor is dirty while the stack holds unsaved changes; Save validates and
 * writes atomically under the file's lock, refusing (unless confirmed) to replace a file another
 * program changed; Save As writes a copy and goes on editing it; Revert reads the file again.
 * While it is open, the views follow its live model.
 */
public final class MechanismEditor extends FormEditor implements IGotoMarker {

    /** The editor's id. */
    public static final String ID = "dev.penduline.ui.mechanismEditor";

    private final Runnable changed = this::changed;
    private final IResourceChangeListener disk = this::diskChanged;
    private final List<EditorPage> pages = new ArrayList<>();
    private MechanismDocument document;
    private boolean ownsRegistration;

    @Override
    public void init(IEditorSite site, IEditorInput input) throws PartInitException {
        if (!(input instanceof IFileEditorInput in)) {
            throw new PartInitException("A mechanism editor opens a mechanism file of the workspace, not " + input.getName());
        }
        super.init(site, input);
        attach(in.getFile());
        // the views follow the file of the active editor, as they follow a file chosen in Project Files
        site.setSelectionProvider(new FileSelection());
        ResourcesPlugin.getWorkspace().addResourceChangeListener(disk, IResourceChangeEvent.POST_CHANGE);
    }

    private void attach(IFile file) throws PartInitException {
        MechanismDocument d = MechanismDocuments.of(file).orElse(null);
        ownsRegistration = d == null;
        if (d == null) {
            try {
                d = MechanismDocument.read(file);
            } catch (InputException e) {
                throw new PartInitException(e.getMessage(), e);
            }
            MechanismDocuments.register(d);
        }
        document = d;
        document.addListener(changed);
        setPartName(file.getName());
        setTitleToolTip(file.getFullPath().toString());
    }

    private void detach() {
        if (document != null) {
            document.removeListener(changed);
            if (ownsRegistration) {
                MechanismDocuments.unregister(document);
            }
        }
    }

    /** @return the document this editor edits */
    public MechanismDocument document() {
        return document;
    }

    @Override
    protected void addPages() {
        add(new PartsPage(this));
        add(new PivotPage(this));
        add(new HypothesesPage(this));
        add(new SessionsPage(this));
        add(new FitsPage(this));
    }

    private void add(EditorPage page) {
        try {
            addPage(page);
            pages.add(page);
        } catch (PartInitException e) {
            throw new IllegalStateException("editor page " + page.getId() + " could not be added", e);
        }
    }

    /**
     * A page of this editor.
     *
     * @param id the page's id ({@code parts}, {@code pivot}, {@code hypotheses}, {@code sessions}, {@code fits})
     * @return the page, null when there is none of that id
     */
    public EditorPage page(String id) {
        return pages.stream().filter(p -> p.getId().equals(id)).findFirst().orElse(null);
    }

    private void changed() {
        Display display = getSite().getShell().getDisplay();
        if (Display.getCurrent() != display) {
            display.asyncExec(this::changed);
            return;
        }
        firePropertyChange(PROP_DIRTY);
        pages.forEach(EditorPage::refresh);
    }

    @Override
    public boolean isDirty() {
        return document != null && document.isDirty();
    }

    @Override
    public void doSave(IProgressMonitor monitor) {
        try {
            document.save(false, note -> { });
        } catch (InputException e) {
            if (document.changedOnDisk() && EditorDialogs.replaceChangedFile.apply(getSite().getShell(), document.path().toString())) {
                try {
                    document.save(true, note -> { });
                    return;
                } catch (InputException again) {
                    e = again;
                }
            }
            MessageDialog.openError(getSite().getShell(), "Not Saved", e.getMessage());
            if (monitor != null) {
                monitor.setCanceled(true);
            }
        }
    }

    @Override
    public boolean isSaveAsAllowed() {
        return true;
    }

    @Override
    public void doSaveAs() {
        SaveAsDialog d = new SaveAsDialog(getSite().getShell());
        d.setOriginalFile(document.file());
        if (d.open() != SaveAsDialog.OK || d.getResult() == null) {
            return;
        }
        IPath target = d.getResult();
        if (target.getFileExtension() == null) {
            target = target.addFileExtension("penduline");
        }
        saveAs(ResourcesPlugin.getWorkspace().getRoot().getFile(target));
    }

    /**
     * Writes the model to another file and goes on editing that file; the old file keeps what it
     * held (its unsaved changes are dropped from it).
     *
     * @param target the new file
     * @return true when it was written
     */
    public boolean saveAs(IFile target) {
        try {
            Path location = target.getLocation().toPath();
            document.saveCopy(location, note -> { });
            target.refreshLocal(0, null);
            detach();
            attach(target);
            setInputWithNotify(new FileEditorInput(target));
            firePropertyChange(PROP_TITLE);
            getEditorSite().getActionBarContributor().setActiveEditor(this);
            changed();
            return true;
        } catch (InputException | CoreException e) {
            MessageDialog.openError(getSite().getShell(), "Not Saved", e.getMessage());
            return false;
        }
    }

    /** Reads the file again, dropping the unsaved changes and the undo history. */
    public void revert() {
        try {
            document.reload();
        } catch (InputException e) {
            MessageDialog.openError(getSite().getShell(), "Not Reverted", e.getMessage()
                    + "\n\nThe editor keeps its content; the file on disk is unchanged.");
        }
    }

    private void diskChanged(IResourceChangeEvent event) {
        MechanismDocument d = document;
        if (d == null || event.getDelta() == null) {
            return;
        }
        IResourceDelta delta = event.getDelta().findMember(d.file().getFullPath());
        // only a new content: marker changes (the Problems updater's) must not hash the file again
        if (delta == null || (delta.getFlags() & (IResourceDelta.CONTENT | IResourceDelta.REPLACED)) == 0) {
            return;
        }
        Display display = getSite().getShell().getDisplay();
        display.asyncExec(() -> {
            if (d == document && !d.isDirty() && d.file().exists() && d.changedOnDisk()) {
                revert();
            }
        });
    }

    /** The editor's selection, as the views see it: its file. */
    private final class FileSelection implements ISelectionProvider {
        @Override
        public ISelection getSelection() {
            return document == null ? StructuredSelection.EMPTY : new StructuredSelection(document.file());
        }

        @Override
        public void setSelection(ISelection selection) {
            // the file is the editor's input; it is not chosen through the selection
        }

        @Override
        public void addSelectionChangedListener(ISelectionChangedListener listener) {
            // the selection changes only with Save As, which re-opens the views' file anyway
        }

        @Override
        public void removeSelectionChangedListener(ISelectionChangedListener listener) {
            // see addSelectionChangedListener
        }
    }

    @Override
    public void gotoMarker(IMarker marker) {
        String id = marker.getAttribute(ProblemMarkers.ELEMENT_ID, "");
        String kind = marker.getAttribute(ProblemMarkers.ELEMENT_KIND, "");
        String pageId = switch (kind) {
            case "session" -> SessionsPage.ID;
            case "fit" -> FitsPage.ID;
            case "hypothesis", "term" -> HypothesesPage.ID;
            case "mechanism" -> PivotPage.ID;
            default -> PartsPage.ID;
        };
        EditorPage page = page(pageId);
        if (page != null) {
            setActivePage(pageId);
            page.refresh();
            page.reveal(id);
        }
    }

    @Override
    public void dispose() {
        ResourcesPlugin.getWorkspace().removeResourceChangeListener(disk);
        // Closing without saving drops the document: the views go back to the file on disk.
        detach();
        document = null;
        super.dispose();
    }
}
