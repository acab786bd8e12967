package dev.penduline.ui.internal.document;

import java.util.Optional;
import java.util.function.Consumer;

import org.eclipse.core.resources.IFile;

/**
 * What a view needs to follow the live model of the file it shows: the open document of that
 * file, if an editor has it, and a call back on every change of it (an edit, undo, redo, revert,
 * save) and when a document of the file is opened or closed. The call back runs on the thread that
 * made the change (the UI thread in the workbench) through the given executor.
 */
public final class LiveModel {

    private final Consumer<Runnable> onUiThread;
    private final Runnable changed;
    private final Runnable listener;
    private final Runnable registry;
    private IFile file;
    private MechanismDocument document;

    /**
     * A follower, not yet following a file.
     *
     * @param onUiThread runs a task on the UI thread (e.g. {@code UISynchronize::asyncExec})
     * @param changed    what the view does when the model it shows changed
     */
    public LiveModel(Consumer<Runnable> onUiThread, Runnable changed) {
        this.onUiThread = onUiThread;
        this.changed = changed;
        this.listener = () -> onUiThread.accept(changed);
        this.registry = this::registryChanged;
        MechanismDocuments.addListener(registry);
    }

    /**
     * Follows a file: from now on the call back hears of its open document's changes.
     *
     * @param next the file the view shows now
     * @return its open document, empty when no editor has it (the view reads the file)
     */
    public Optional<MechanismDocument> follow(IFile next) {
        file = next;
        MechanismDocument d = MechanismDocuments.of(next).orElse(null);
        if (d != document) {
            if (document != null) {
                document.removeListener(listener);
            }
            document = d;
            if (d != null) {
                d.addListener(listener);
            }
        }
        return Optional.ofNullable(d);
    }

    /** @return the document followed now, empty when the view shows the file on disk */
    public Optional<MechanismDocument> document() {
        return Optional.ofNullable(document);
    }

    private void registryChanged() {
        IFile f = file;
        if (f != null && MechanismDocuments.of(f).orElse(null) != document) {
            onUiThread.accept(changed);
        }
    }

    /** Stops following. */
    public void dispose() {
        MechanismDocuments.removeListener(registry);
        if (document != null) {
            document.removeListener(listener);
            document = null;
        }
        file = null;
    }
}
