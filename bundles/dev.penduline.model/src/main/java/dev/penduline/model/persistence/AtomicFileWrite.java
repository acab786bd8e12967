package dev.penduline.model.persistence;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * The one writer of every file Penduline writes (mechanism files, records copied into a project,
 * the CSV outputs): a reader, or a crash at any moment, sees either the old content or the new,
 * never a mix.
 *
 * <p>How: the target's symbolic links are followed to the file they name (the link stays a
 * link; the file it points to is replaced); a target that exists and is not a regular file (a
 * folder, a named pipe, a device such as {@code /dev/full}) or is read-only is refused before
 * anything is written. The content goes to a temporary file {@code .NAME.DIGITS.saving} beside
 * the target (its name never ends in {@code .penduline}, so it is never taken for a mechanism
 * file), is forced to the disk, gets the old file's permissions, and is renamed over the target
 * in one step; the folder is then forced too. Every failure is reported and leaves the target
 * byte for byte as it was, with no temporary file. A temporary file that a killed save left
 * behind (one of ours by its name, for this target, untouched for {@link #STALE_AFTER}) is
 * removed by the next save of the target, which says so in a note.
 *
 * <p>Writers of a mechanism file also hold its {@link SaveLock}; this class does not lock.
 */
public final class AtomicFileWrite {

    /** Writes the new content of a file. */
    @FunctionalInterface
    public interface Content {
        /**
         * Writes the whole content.
         *
         * @param out the stream to write to; do not close it
         * @throws IOException when writing fails; the target then stays untouched
         */
        void writeTo(OutputStream out) throws IOException;
    }

    /**
     * The file-system steps of a save, so that a test can make one of them fail the way a full
     * disk or a read-only folder does. {@link #REAL} does them.
     */
    public interface Disk {
        /**
         * Creates the temporary file.
         *
         * @param directory the target's folder
         * @param prefix    the temporary file's name starts with this
         * @param suffix    and ends with this
         * @return the new, empty file
         * @throws IOException when the folder cannot be written
         */
        default Path createTemporary(Path directory, String prefix, String suffix) throws IOException {
            return Files.createTempFile(directory, prefix, suffix);
        }

        /**
         * Writes bytes to the temporary file.
         *
         * @param channel the temporary file
         * @param bytes   what to write; all of it
         * @throws IOException when the bytes cannot be written (no space left, an I/O error)
         */
        default void write(FileChannel channel, ByteBuffer bytes) throws IOException {
            while (bytes.hasRemaining()) {
                channel.write(bytes);
            }
        }

        /**
         * Forces the temporary file's content to the disk.
         *
         * @param channel the temporary file
         * @throws IOException when the disk reports an error
         */
        default void force(FileChannel channel) throws IOException {
            channel.force(true);
        }

        /**
         * Renames the temporary file over the target in one step.
         *
         * @param temporary the temporary file
         * @param target    the target
         * @throws IOException when the rename fails
         */
        default void rename(Path temporary, Path target) throws IOException {
            try {
                Files.move(temporary, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                // Same folder, so this only happens on unusual file systems; still a rename.
                Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING);
            }
        }
    }

    /** The real file system. */
    public static final Disk REAL = new Disk() {
    };

    /**
     * How long a temporary file of ours must have been left untouched before a later save takes
     * it for the leftover of an interrupted save and removes it. A running save writes its
     * temporary file within well under a second of creating it and renames it at once.
     */
    public static final Duration STALE_AFTER = Duration.ofSeconds(30);

    /** The suffix of the temporary files. */
    public static final String TEMPORARY_SUFFIX = ".saving";

    private static final Set<PosixFilePermission> NEW_FILE_PERMISSIONS = PosixFilePermissions.fromString("rw-r--r--");
    private static final int MAX_LINKS = 40;
    private static final int BUFFER = 1 << 16;

    private AtomicFileWrite() {
    }

    /**
     * Replaces (or creates) the target with the given content.
     *
     * @param target  the file to write; a symbolic link is written through to the file it names
     * @param content writes the content
     * @return notes for the user (a temporary file of an interrupted save removed), possibly empty
     * @throws IOException with a message giving the reason (not the target's name: the caller
     *                     puts it first) when the target is not a regular file, is read-only, or
     *                     the content cannot be written; the target is then unchanged
     */
    public static List<String> write(Path target, Content content) throws IOException {
        return write(target, content, REAL);
    }

    /**
     * Replaces (or creates) the target with the given content, through the given file system.
     *
     * @param target  the file to write
     * @param content writes the content
     * @param disk    the file-system steps ({@link #REAL}, or a test's)
     * @return notes for the user, possibly empty
     * @throws IOException as for {@link #write(Path, Content)}
     */
    public static List<String> write(Path target, Content content, Disk disk) throws IOException {
        final Path file = resolve(target);
        refuseUnwritable(file, Files.isSymbolicLink(target));
        final Path directory = file.getParent();
        final List<String> notes = removeStale(directory, file.getFileName().toString(), Instant.now());
        final Path temporary;
        try {
            temporary = disk.createTemporary(directory, "." + file.getFileName() + ".", TEMPORARY_SUFFIX);
        } catch (IOException e) {
            throw new IOException("not saved: cannot create a file in the folder " + directory + " (" + reason(e)
                    + "); the previous file, if any, is unchanged", e);
        }
        boolean moved = false;
        try {
            keepPermissions(file, temporary);
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                final OutputStream out = new BufferedOutputStream(new ChannelStream(channel, disk), BUFFER);
                content.writeTo(out);
                out.flush();
                disk.force(channel);
            }
            disk.rename(temporary, file);
            moved = true;
        } catch (IOException e) {
            throw new IOException("not saved (" + reason(e) + "); the previous file, if any, is unchanged", e);
        } finally {
            if (!moved) {
                Files.deleteIfExists(temporary);
            }
        }
        forceDirectory(directory).ifPresent(notes::add);
        return notes;
    }

    /**
     * The file a path names: its symbolic links followed (also a link to a file that does not
     * exist yet), in the real form of its folder.
     *
     * @param target a path
     * @return the absolute path of the file itself, never a link
     * @throws IOException when the folder does not exist or the links loop (the message gives the
     *                     reason, not the path)
     */
    public static Path resolve(Path target) throws IOException {
        Path p = target.toAbsolutePath();
        for (int i = 0; Files.isSymbolicLink(p); i++) {
            if (i == MAX_LINKS) {
                throw new IOException("too many levels of symbolic links");
            }
            p = p.resolveSibling(Files.readSymbolicLink(p));
        }
        final Path parent = p.getParent();
        if (parent == null || p.getFileName() == null) {
            throw new IOException("not a file name");
        }
        try {
            return parent.toRealPath().resolve(p.getFileName().toString());
        } catch (NoSuchFileException e) {
            throw new IOException("the folder " + parent + " does not exist", e);
        }
    }

    /**
     * What a path is when it is not a regular file, in words ("a named pipe (FIFO)", "a character
     * device", "a folder"), or empty when it is a regular file or does not exist.
     *
     * @param file a path (links are not followed)
     * @return the description, or empty
     */
    public static Optional<String> notRegular(Path file) {
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS) || Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS)) {
            return Optional.empty();
        }
        if (Files.isDirectory(file, LinkOption.NOFOLLOW_LINKS)) {
            return Optional.of("a folder");
        }
        if (Files.isSymbolicLink(file)) {
            return Optional.of("a symbolic link");
        }
        try {
            final int mode = (Integer) Files.getAttribute(file, "unix:mode", LinkOption.NOFOLLOW_LINKS);
            switch (mode & 0170000) {
                case 0010000:
                    return Optional.of("a named pipe (FIFO)");
                case 0020000:
                    return Optional.of("a character device");
                case 0060000:
                    return Optional.of("a block device");
                case 0140000:
                    return Optional.of("a socket");
                default:
                    break;
            }
        } catch (IOException | UnsupportedOperationException | IllegalArgumentException | ClassCastException e) {
            // not a Unix file system: the general words below
        }
        return Optional.of("not a regular file");
    }

    private static void refuseUnwritable(Path file, boolean linked) throws IOException {
        final String what = linked ? "the file it links to, " + file + ", is " : "is ";
        final Optional<String> kind = notRegular(file);
        if (kind.isPresent()) {
            throw new IOException(what + kind.get() + ", not a regular file; nothing was written (give the path of a"
                    + " regular file)");
        }
        if (Files.exists(file) && !Files.isWritable(file)) {
            throw new IOException(what + "read-only; nothing was written (make it writable first if it should be"
                    + " replaced)");
        }
    }

    /**
     * Removes the temporary files of earlier saves of this target that were interrupted: only
     * names this class (or the services' writer before it) gives, only regular files, only when
     * untouched for {@link #STALE_AFTER}.
     */
    private static List<String> removeStale(Path directory, String name, Instant now) {
        final Pattern ours = Pattern.compile("\\." + Pattern.quote(name) + "\\.[0-9]+" + Pattern.quote(TEMPORARY_SUFFIX)
                + "|\\." + Pattern.quote(name) + "[0-9]+\\.tmp");
        final List<String> notes = new ArrayList<>();
        final List<Path> stale = new ArrayList<>();
        try (DirectoryStream<Path> s = Files.newDirectoryStream(directory,
                p -> ours.matcher(p.getFileName().toString()).matches())) {
            for (Path p : s) {
                final BasicFileAttributes a = Files.readAttributes(p, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
                if (a.isRegularFile() && a.lastModifiedTime().toInstant().isBefore(now.minus(STALE_AFTER))) {
                    stale.add(p);
                }
            }
        } catch (IOException e) {
            return notes;
        }
        for (Path p : stale) {
            try {
                Files.deleteIfExists(p);
                notes.add("removed a temporary file left by an interrupted save: " + p);
            } catch (IOException e) {
                notes.add("could not remove a temporary file left by an interrupted save: " + p + " (" + reason(e) + ")");
            }
        }
        return notes;
    }

    /** The temporary file is created private (rw-------); give the result the old file's mode. */
    private static void keepPermissions(Path target, Path temporary) throws IOException {
        final PosixFileAttributeView view = Files.getFileAttributeView(temporary, PosixFileAttributeView.class);
        if (view == null) {
            return;
        }
        if (Files.exists(target)) {
            view.setPermissions(Files.getPosixFilePermissions(target));
        } else {
            view.setPermissions(NEW_FILE_PERMISSIONS);
        }
    }

    /**
     * Makes the rename itself durable. Not every platform can open a folder (then there is
     * nothing to do); a folder that cannot be forced is said in a note, since the file is saved.
     */
    private static Optional<String> forceDirectory(Path directory) {
        final FileChannel channel;
        try {
            channel = FileChannel.open(directory, StandardOpenOption.READ);
        } catch (IOException | UnsupportedOperationException e) {
            return Optional.empty();
        }
        try (channel) {
            channel.force(true);
            return Optional.empty();
        } catch (IOException e) {
            return Optional.of(directory + ": the file is saved, but the folder could not be forced to the"
                    + " disk (" + reason(e) + "); a power cut now could still lose the change");
        }
    }

    /**
     * The reason of a failed file operation in plain words (never an exception's class name).
     *
     * @param e the failure
     * @return the reason
     */
    public static String reason(IOException e) {
        if (e instanceof AccessDeniedException a) {
            return "permission denied" + (a.getFile() == null ? "" : ": " + a.getFile());
        }
        if (e instanceof NoSuchFileException n) {
            return "no such file or folder" + (n.getFile() == null ? "" : ": " + n.getFile());
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason() + (f.getFile() == null ? "" : ": " + f.getFile());
        }
        return e.getMessage() == null ? "an input/output error" : e.getMessage();
    }

    /** Writes through the disk's {@code write}, so that a test's disk sees every byte. */
    private static final class ChannelStream extends OutputStream {
        private final FileChannel channel;
        private final Disk disk;

        ChannelStream(FileChannel channel, Disk disk) {
            this.channel = channel;
            this.disk = disk;
        }

        @Override
        public void write(int b) throws IOException {
            disk.write(channel, ByteBuffer.wrap(new byte[] {(byte) b}));
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            disk.write(channel, ByteBuffer.wrap(b, off, len));
        }
    }
}
