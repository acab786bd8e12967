package dev.penduline.services;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Writes text files the safe way: into a temporary file beside the target, flushed to disk,
 * then renamed over the target. A failure at any point leaves the previous file as it was.
 */
public final class AtomicFiles {

    /** Writes the content of a file. */
    @FunctionalInterface
    public interface Content {
        /**
         * Writes the content.
         *
         * @param out the writer (UTF-8, buffered)
         * @throws IOException when writing fails
         */
        void writeTo(Writer out) throws IOException;
    }

    private AtomicFiles() {
    }

    /**
     * Gives a new file the usual rw-r--r-- permissions (temporary files start private).
     *
     * @param file the file
     * @throws IOException when the permissions cannot be set
     */
    static void makeReadable(Path file) throws IOException {
        try {
            Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r--r--"));
        } catch (UnsupportedOperationException e) {
            // not a POSIX file system: the platform's defaults apply
        }
    }

    /**
     * Writes a UTF-8 text file atomically.
     *
     * @param target  the file to create or replace
     * @param content what to write
     * @throws InputException naming the file when it cannot be written; the old file is kept
     */
    public static void write(Path target, Content content) throws InputException {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        Path temp = null;
        try {
            Files.createDirectories(dir);
            temp = Files.createTempFile(dir, "." + absolute.getFileName(), ".tmp");
            try (BufferedWriter out = Files.newBufferedWriter(temp, StandardCharsets.UTF_8)) {
                content.writeTo(out);
            }
            if (Files.exists(absolute)) {
                Files.setPosixFilePermissions(temp, Files.getPosixFilePermissions(absolute));
            } else {
                makeReadable(temp);
            }
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                channel.force(true);
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            temp = null;
        } catch (IOException e) {
            throw new InputException(target + ": cannot be written (" + e.getMessage() + ")", e);
        } finally {
            if (temp != null) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // the temporary file is hidden and harmless; the target is untouched
                }
            }
        }
    }
}
