package dev.penduline.services;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Objects;

import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.AtomicFileWrite;

/**
 * A mechanism file read once: the mechanism, and the fingerprint (size and SHA-256) of the
 * content it was read from. A command that computes from the file and then stores into it (a
 * fit) reads it once through this, and stores through
 * {@link MechanismStore#update(MechanismSnapshot, MechanismStore.Change, java.util.function.Consumer)},
 * which refuses when the file no longer has that content: a change another writer made
 * meanwhile is never lost under a result computed from the older content.
 */
public final class MechanismSnapshot {

    private final Path file;
    private final Mechanism mechanism;
    private Fingerprint read;

    /** What identifies a content: its size and hash. */
    private record Fingerprint(long size, String sha256) {
    }

    /** What changes when a file is written: its size, time of change and (on Unix) its inode. */
    private record Stat(long size, Object modified, Object key) {
    }

    private MechanismSnapshot(Path file, Mechanism mechanism, Fingerprint read) {
        this.file = file;
        this.mechanism = mechanism;
        this.read = read;
    }

    /**
     * Reads a mechanism file once, with the fingerprint of the content read.
     *
     * @param file the mechanism file
     * @return the snapshot
     * @throws InputException with file, line and column when it cannot be read, or naming the file
     *                        when it changed while it was being read
     */
    public static MechanismSnapshot read(Path file) throws InputException {
        Stat before = stat(file);
        Mechanism m = MechanismLoader.readMechanism(file);
        try {
            Fingerprint f = fingerprint(file);
            if (before == null || !before.equals(stat(file))) {
                throw new InputException(file + ": changed while it was being read (another program or command was"
                        + " writing it); nothing was computed or written: run the command again");
            }
            return new MechanismSnapshot(file, m, f);
        } catch (IOException e) {
            throw new InputException(file + ": cannot be read (" + AtomicFileWrite.reason(e) + ")", e);
        }
    }

    /** @return the file, as it was given */
    public Path file() {
        return file;
    }

    /**
     * The mechanism as read; a change stored through {@link MechanismStore#update(MechanismSnapshot,
     * MechanismStore.Change, java.util.function.Consumer)} is made on it.
     *
     * @return the mechanism
     */
    public Mechanism mechanism() {
        return mechanism;
    }

    /**
     * Refuses when the file no longer holds the content read (call it under the file's lock, just
     * before replacing it).
     *
     * @param advice what the user can do, e.g. "fit again to store a fit of the new content"
     * @throws InputException naming the file, saying that it changed since it was read and that
     *                        nothing was written
     */
    void requireUnchanged(String advice) throws InputException {
        Fingerprint now;
        try {
            now = fingerprint(file);
        } catch (IOException e) {
            throw new InputException(file + ": can no longer be read (" + AtomicFileWrite.reason(e) + "); nothing was"
                    + " written", e);
        }
        if (!now.equals(read)) {
            throw new InputException(file + ": changed since it was read (another program or command wrote it"
                    + " meanwhile); nothing was written, so that change is kept: " + advice);
        }
    }

    /** After a save under the lock: the file now holds the saved content, which is what this holds. */
    void saved() throws InputException {
        try {
            read = fingerprint(file);
        } catch (IOException e) {
            throw new InputException(file + ": saved, but could not be read back (" + AtomicFileWrite.reason(e) + ")", e);
        }
    }

    private static Fingerprint fingerprint(Path file) throws IOException {
        return new Fingerprint(Files.size(file), SessionRecords.sha256(file));
    }

    private static Stat stat(Path file) {
        try {
            BasicFileAttributes a = Files.readAttributes(file, BasicFileAttributes.class);
            return new Stat(a.size(), a.lastModifiedTime(), Objects.requireNonNullElse(a.fileKey(), ""));
        } catch (IOException e) {
            return null; // reading the file says what is wrong with it
        }
    }
}
