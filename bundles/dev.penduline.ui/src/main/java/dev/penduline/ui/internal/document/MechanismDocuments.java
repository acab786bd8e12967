package dev.penduline.ui.internal.document;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;

import org.eclipse.core.resources.IFile;

/**
 * The mechanism documents open in this workbench, one per file: the mechanism editor registers
 * its document while it is open; views and wizards find it here, so they show and change the
 * same live model (and its command stack) the editor has.
 */
public final class MechanismDocuments {

    private static final Map<IFile, MechanismDocument> OPEN = new ConcurrentHashMap<>();
    private static final List<Runnable> LISTENERS = new CopyOnWriteArrayList<>();

    private MechanismDocuments() {
    }

    /**
     * The open document of a file.
     *
     * @param file the mechanism file
     * @return its document, empty when no editor has it open
     */
    public static Optional<MechanismDocument> of(IFile file) {
        return file == null ? Optional.empty() : Optional.ofNullable(OPEN.get(file));
    }

    /**
     * Registers a document (by its editor, when it opens).
     *
     * @param document the document
     */
    public static void register(MechanismDocument document) {
        OPEN.put(document.file(), document);
        LISTENERS.forEach(Runnable::run);
    }

    /**
     * Unregisters a document (by its editor, when it closes).
     *
     * @param document the document
     */
    public static void unregister(MechanismDocument document) {
        OPEN.remove(document.file(), document);
        LISTENERS.forEach(Runnable::run);
    }

    /**
     * Listens to documents being opened and closed (views switch between the file on disk and
     * the live model).
     *
     * @param listener runs on the thread that opened or closed the document
     */
    public static void addListener(Runnable listener) {
        LISTENERS.add(listener);
    }

    /**
     * Stops listening.
     *
     * @param listener a listener added before
     */
    public static void removeListener(Runnable listener) {
        LISTENERS.remove(listener);
    }
}
