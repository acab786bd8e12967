package dev.penduline.services;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.model.persistence.MechanismFileException;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.model.persistence.SaveLock;
import dev.penduline.model.validation.MechanismValidation;

/**
 * Saves a changed mechanism: validated first, then written atomically. A change to a mechanism
 * file that exists is made by {@link #update}: under the file's {@link SaveLock}, on the content
 * the file has at that moment, so that two writers at once (two commands, a command and the
 * workbench) both keep their change.
 */
public final class MechanismStore {

    /** A change to a mechanism file's current content. */
    @FunctionalInterface
    public interface Change<T> {
        /**
         * Makes the change.
         *
         * @param current the mechanism as the file holds it now (under the lock)
         * @return what the caller wants back (e.g. the new element's id)
         * @throws InputException when the change cannot be made; nothing is saved
         */
        T apply(Mechanism current) throws InputException;
    }

    private MechanismStore() {
    }

    /**
     * Validates a mechanism before it is saved.
     *
     * @param mechanism the mechanism
     * @param file      where it would be saved (for the message)
     * @throws InputException listing every error
     */
    public static void check(Mechanism mechanism, Path file) throws InputException {
        List<String> errors = MechanismValidation.errors(mechanism);
        if (!errors.isEmpty()) {
            throw new InputException(file + ": not saved, " + errors.size() + " problem(s):\n  "
                    + String.join("\n  ", errors));
        }
    }

    /**
     * Validates and saves a mechanism; nothing is written when it has errors.
     *
     * @param mechanism the mechanism
     * @param file      where to save it
     * @return notes for the user (a temporary file of an interrupted save removed), possibly empty
     * @throws InputException listing every error, or naming the file when writing fails
     */
    public static List<String> save(Mechanism mechanism, Path file) throws InputException {
        check(mechanism, file);
        try {
            return MechanismFiles.save(mechanism, file);
        } catch (MechanismFileException e) {
            throw new InputException(e.getMessage(), e);
        }
    }

    /**
     * Takes the save lock of a mechanism file (waiting at most {@link SaveLock#DEFAULT_WAIT}).
     *
     * @param file the mechanism file
     * @return the lock; close it in the same thread
     * @throws InputException naming the file when another writer holds it too long or the lock
     *                        file cannot be created; nothing was written
     */
    public static SaveLock lock(Path file) throws InputException {
        try {
            return SaveLock.acquire(file);
        } catch (IOException e) {
            throw new InputException(file + ": " + AtomicFileWrite.reason(e), e);
        }
    }

    /**
     * Validates and saves a new mechanism file under its lock; an existing file (or anything else
     * at that path, a link included) is never replaced.
     *
     * @param mechanism the new mechanism
     * @param file      the file to create
     * @param notes     receives notes for the user
     * @throws InputException when the file exists, or it cannot be validated, locked or written
     */
    public static void createNew(Mechanism mechanism, Path file, Consumer<String> notes) throws InputException {
        try (SaveLock lock = lock(file)) {
            if (Files.isSymbolicLink(file)) {
                throw new InputException(file + ": is a symbolic link; a new mechanism file is only created where"
                        + " nothing is yet: choose another name or remove the link first");
            }
            if (Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
                throw new InputException(file + ": already exists; choose another name or remove it first");
            }
            save(mechanism, file).forEach(notes);
        }
    }

    /**
     * Changes a mechanism file: takes its lock, reads its current content, applies the change,
     * validates and saves — so a change made meanwhile by another writer is kept.
     *
     * @param file   the mechanism file
     * @param change the change
     * @param notes  receives notes for the user
     * @param <T>    what the change gives back
     * @return what the change gave back
     * @throws InputException when the file cannot be read, locked, changed or saved; then nothing
     *                        was written
     */
    public static <T> T update(Path file, Change<T> change, Consumer<String> notes) throws InputException {
        try (SaveLock lock = lock(file)) {
            Mechanism current = MechanismLoader.readMechanism(file);
            T result = change.apply(current);
            save(current, file).forEach(notes);
            return result;
        }
    }

    /**
     * Changes a mechanism file read once before ({@link MechanismSnapshot#read}), on the mechanism
     * read: under the file's lock, just before replacing it, the file's content is compared with
     * the content read, and the change is refused when another writer changed the file
     * meanwhile, so that writer's change is never lost under one made on the older content.
     *
     * @param read   the file as read
     * @param change the change, made on {@link MechanismSnapshot#mechanism()}
     * @param notes  receives notes for the user
     * @param advice what the user can do when the file changed (ends the refusal's message)
     * @param <T>    what the change gives back
     * @return what the change gave back
     * @throws InputException naming the file when it changed since it was read, or cannot be
     *                        locked, changed or saved; then nothing was written
     */
    public static <T> T update(MechanismSnapshot read, Change<T> change, Consumer<String> notes, String advice)
            throws InputException {
        try (SaveLock lock = lock(read.file())) {
            read.requireUnchanged(advice);
            T result = change.apply(read.mechanism());
            save(read.mechanism(), read.file()).forEach(notes);
            read.saved();
            return result;
        }
    }
}
