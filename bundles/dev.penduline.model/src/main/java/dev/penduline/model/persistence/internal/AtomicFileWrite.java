package dev.penduline.model.persistence.internal;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/**
 * Replaces a file so that a reader (or a crash) sees either the old content or the new, never a
 * mix: the content goes to a temporary file beside the target, is forced to the disk, and the
 * temporary file is then renamed over the target in one step. On any failure the temporary file
 * is removed and the target is left as it was, byte for byte.
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

    private static final Set<PosixFilePermission> NEW_FILE_PERMISSIONS = PosixFilePermissions.fromString("rw-r--r--");

    private AtomicFileWrite() {
    }

    /**
     * Replaces (or creates) the target with the given content.
     *
     * @param target  the file to write
     * @param content writes the content
     * @throws IOException when the content cannot be written or the rename fails; the target is
     *                     then unchanged
     */
    public static void write(Path target, Content content) throws IOException {
        final Path absolute = target.toAbsolutePath();
        final Path directory = absolute.getParent();
        final Path temporary = Files.createTempFile(directory, "." + absolute.getFileName() + ".", ".saving");
        boolean moved = false;
        try {
            keepPermissions(absolute, temporary);
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                final OutputStream out = Channels.newOutputStream(channel);
                content.writeTo(out);
                out.flush();
                channel.force(true);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                // Same directory, so this only happens on unusual file systems; still a rename.
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
            forceDirectory(directory);
        } finally {
            if (!moved) {
                Files.deleteIfExists(temporary);
            }
        }
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

    /** Makes the rename itself durable; not every platform can open a directory, so best effort. */
    private static void forceDirectory(Path directory) {
        try (FileChannel channel = FileChannel.open(directory, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // The file content is already on disk; only the directory entry may lag.
        }
    }
}
