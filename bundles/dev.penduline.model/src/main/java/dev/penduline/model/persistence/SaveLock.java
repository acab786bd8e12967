package dev.penduline.model.persistence;

import java.io.IOException;
import java.io.InterruptedIOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.locks.ReentrantLock;

/**
 * The lock every writer of a mechanism file holds while it reads the file, changes it and saves
 * it, so that two writers (two commands, or the workbench and a command) never lose each
 * other's change: the second waits, then reads the file the first saved.
 *
 * <p>The lock is an operating-system lock ({@link FileChannel#lock}) on a sibling file
 * {@code .NAME.lock} beside the file the path names (links followed), so it holds across
 * processes; inside one program a {@link ReentrantLock} per file comes first (the operating
 * system's lock belongs to the whole process), and a thread that already holds the lock may take
 * it again. The lock file is left in place (removing it would race with the next writer); it is
 * empty and may be deleted whenever no save runs. A writer that cannot get the lock within
 * {@link #DEFAULT_WAIT} gives up with a {@link SaveLockException} and writes nothing.
 */
public final class SaveLock implements AutoCloseable {

    /** How long a writer waits for another writer of the same file: 30 s. */
    public static final Duration DEFAULT_WAIT = Duration.ofSeconds(30);

    /** The suffix of the lock files. */
    public static final String LOCK_SUFFIX = ".lock";

    private static final long POLL_MILLIS = 20;
    private static final Map<Path, Holder> HOLDERS = new ConcurrentHashMap<>();

    /** Another writer kept the lock longer than the writer would wait. */
    public static final class SaveLockException extends IOException {
        private static final long serialVersionUID = 1L;

        SaveLockException(String message) {
            super(message);
        }
    }

    /** The in-process side of one lock file. */
    private static final class Holder {
        private final ReentrantLock inProcess = new ReentrantLock(true);
        private FileChannel channel;
        private FileLock lock;
    }

    private final Holder holder;
    private final Path file;
    private boolean closed;

    private SaveLock(Holder holder, Path file) {
        this.holder = holder;
        this.file = file;
    }

    /**
     * Takes the save lock of a file, waiting at most {@link #DEFAULT_WAIT}.
     *
     * @param file the file to be written (it need not exist yet; its folder must)
     * @return the lock; close it when the save is done
     * @throws IOException a {@link SaveLockException} when another writer held it too long, or
     *                     when the lock file cannot be created (the message gives the reason)
     */
    public static SaveLock acquire(Path file) throws IOException {
        return acquire(file, DEFAULT_WAIT);
    }

    /**
     * Takes the save lock of a file, waiting at most the given time.
     *
     * @param file the file to be written
     * @param wait how long to wait for another writer
     * @return the lock; close it when the save is done
     * @throws IOException as for {@link #acquire(Path)}
     */
    public static SaveLock acquire(Path file, Duration wait) throws IOException {
        final Path target = AtomicFileWrite.resolve(file);
        final Path lockFile = lockFileOf(target);
        final Holder h = HOLDERS.computeIfAbsent(lockFile, k -> new Holder());
        final long deadline = System.nanoTime() + wait.toNanos();
        try {
            if (!h.inProcess.tryLock(wait.toNanos(), TimeUnit.NANOSECONDS)) {
                throw busy(target, lockFile, wait);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InterruptedIOException("interrupted while waiting for the lock " + lockFile);
        }
        if (h.inProcess.getHoldCount() > 1) {
            return new SaveLock(h, target);
        }
        try {
            final FileChannel channel;
            try {
                channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
            } catch (IOException e) {
                throw new IOException("cannot create the lock file " + lockFile + " (" + AtomicFileWrite.reason(e)
                        + "); nothing was written", e);
            }
            FileLock lock = null;
            try {
                while ((lock = tryLock(channel)) == null) {
                    if (System.nanoTime() - deadline >= 0) {
                        throw busy(target, lockFile, wait);
                    }
                    Thread.sleep(POLL_MILLIS);
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new InterruptedIOException("interrupted while waiting for the lock " + lockFile);
            } finally {
                if (lock == null) {
                    channel.close();
                }
            }
            h.channel = channel;
            h.lock = lock;
            return new SaveLock(h, target);
        } catch (IOException | RuntimeException e) {
            h.inProcess.unlock();
            throw e;
        }
    }

    /**
     * The lock file of a file: {@code .NAME.lock} beside it.
     *
     * @param target the file (links already followed)
     * @return the lock file's path
     */
    public static Path lockFileOf(Path target) {
        return target.resolveSibling("." + target.getFileName() + LOCK_SUFFIX);
    }

    private static FileLock tryLock(FileChannel channel) throws IOException {
        try {
            return channel.tryLock();
        } catch (OverlappingFileLockException e) {
            // the same file reached by another path (a hard link) in this process: still busy
            return null;
        }
    }

    private static SaveLockException busy(Path target, Path lockFile, Duration wait) {
        return new SaveLockException("another writer (a command or the workbench) is saving " + target
                + " (it has held the lock " + lockFile + " for more than " + wait.toSeconds() + " s);"
                + " nothing was written. Try again once it has finished");
    }

    /**
     * The file this lock is for.
     *
     * @return the file, links followed
     */
    public Path file() {
        return file;
    }

    /** Releases the lock (once; further calls do nothing); call it from the thread that took it. */
    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        if (holder.inProcess.getHoldCount() == 1) {
            try {
                holder.lock.release();
            } catch (IOException e) {
                // closing the channel below releases it as well
            }
            try {
                holder.channel.close();
            } catch (IOException e) {
                // nothing left to release
            }
            holder.lock = null;
            holder.channel = null;
        }
        holder.inProcess.unlock();
    }
}
