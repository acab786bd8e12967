package dev.penduline.ui.internal.document;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStack;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;

import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.SaveLock;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismStore;
import dev.penduline.services.SessionRecords;
import dev.penduline.ui.internal.MechanismSelection;

/**
 * One mechanism file open in the workbench: its live model, the editing domain whose command
 * stack holds every change as one undoable command, the dirty state, save and revert.
 *
 * <p>Listeners hear about every executed, undone or redone command and about a revert, on the
 * thread that made the change (the UI thread in the workbench). A save validates first and
 * writes nothing when the model has errors; it takes the file's save lock and refuses to
 * replace a file that changed on disk since it was read (another writer, the command line),
 * unless asked to.
 */
public final class MechanismDocument {

    private final IFile file;
    private final BasicCommandStack stack = new BasicCommandStack();
    private final AdapterFactoryEditingDomain domain;
    private final List<Runnable> listeners = new CopyOnWriteArrayList<>();
    private Mechanism mechanism;
    private String readHash;

    private MechanismDocument(IFile file) {
        this.file = file;
        this.domain = new AdapterFactoryEditingDomain(new ReflectiveItemProviderAdapterFactory(), stack);
        stack.addCommandStackListener(e -> fire());
    }

    /**
     * Reads a mechanism file into a new document (not registered; see {@link MechanismDocuments}).
     *
     * @param file the workspace file
     * @return the document
     * @throws InputException naming the file, line and field when it cannot be read
     */
    public static MechanismDocument read(IFile file) throws InputException {
        MechanismDocument d = new MechanismDocument(file);
        d.reload();
        return d;
    }

    /** @return the workspace file */
    public IFile file() {
        return file;
    }

    /** @return the file's location in the file system */
    public Path path() {
        return MechanismSelection.pathOf(file);
    }

    /** @return the live model; changes go through {@link #execute(Command)} */
    public Mechanism mechanism() {
        return mechanism;
    }

    /** @return the editing domain, for building EMF commands (SetCommand.create(domain(), ...)) */
    public EditingDomain domain() {
        return domain;
    }

    /** @return the command stack (undo, redo, dirty state) */
    public CommandStack commandStack() {
        return stack;
    }

    /**
     * Runs a change as one undoable command.
     *
     * @param command the command
     * @return false when the command could not be executed (nothing changed)
     */
    public boolean execute(Command command) {
        if (command == null || !command.canExecute()) {
            return false;
        }
        stack.execute(command);
        return true;
    }

    /** @return true when the model holds changes not yet saved */
    public boolean isDirty() {
        return stack.isSaveNeeded();
    }

    /**
     * Whether the file on disk differs from what this document read or last saved.
     *
     * @return true when another writer changed (or removed) the file
     */
    public boolean changedOnDisk() {
        try {
            return !hashOf(path()).equals(readHash);
        } catch (IOException e) {
            return true;
        }
    }

    /**
     * Validates and saves the model to its file, under the file's save lock.
     *
     * @param overwriteChanges save even when the file changed on disk since it was read
     * @param notes            receives notes of the save (e.g. a stale temporary file removed)
     * @throws InputException listing the model's errors, saying that the file changed on disk,
     *                        or naming the file when writing fails; then nothing was written
     */
    public void save(boolean overwriteChanges, Consumer<String> notes) throws InputException {
        Path p = path();
        MechanismStore.check(mechanism, p);
        try (SaveLock lock = MechanismStore.lock(p)) {
            if (!overwriteChanges && Files.exists(p) && changedOnDisk()) {
                throw new InputException(p + ": changed on disk since it was opened (another program or the command line "
                        + "wrote it); not saved. Revert to read the new content, or save again to replace it.");
            }
            MechanismStore.save(mechanism, p).forEach(notes);
            readHash = hashOf(p);
        } catch (IOException e) {
            throw new InputException(p + ": saved, but could not be read back: " + e.getMessage(), e);
        }
        stack.saveIsDone();
        refreshWorkspace();
        fire();
    }

    /**
     * Saves the model under another file; this document stays on its own file.
     *
     * @param target the new file (replaced atomically when it exists)
     * @param notes  receives notes of the save
     * @throws InputException listing the model's errors or naming the file when writing fails
     */
    public void saveCopy(Path target, Consumer<String> notes) throws InputException {
        MechanismStore.check(mechanism, target);
        try (SaveLock lock = MechanismStore.lock(target)) {
            MechanismStore.save(mechanism, target).forEach(notes);
        }
    }

    /**
     * Reads the file again, dropping unsaved changes and the undo history.
     *
     * @throws InputException naming the file, line and field when it cannot be read; then the
     *                        document keeps its model
     */
    public void reload() throws InputException {
        Path p = path();
        Mechanism m = MechanismLoader.readMechanism(p);
        String hash;
        try {
            hash = hashOf(p);
        } catch (IOException e) {
            throw new InputException(p + ": " + e.getMessage(), e);
        }
        domain.getResourceSet().getResources().clear();
        if (m.eResource() != null) {
            domain.getResourceSet().getResources().add(m.eResource());
        }
        mechanism = m;
        readHash = hash;
        stack.flush();
        fire();
    }

    /**
     * Listens to every change of the model (command executed, undone, redone; revert; save).
     *
     * @param listener runs on the thread that made the change
     */
    public void addListener(Runnable listener) {
        listeners.add(listener);
    }

    /**
     * Stops listening.
     *
     * @param listener a listener added before
     */
    public void removeListener(Runnable listener) {
        listeners.remove(listener);
    }

    private void fire() {
        for (Runnable r : new ArrayList<>(listeners)) {
            r.run();
        }
    }

    private void refreshWorkspace() {
        try {
            file.refreshLocal(IResource.DEPTH_ZERO, null);
        } catch (CoreException e) {
            // The file is saved; the workspace notices it on its next refresh.
        }
    }

    private static String hashOf(Path p) throws IOException {
        return SessionRecords.sha256(p);
    }
}
