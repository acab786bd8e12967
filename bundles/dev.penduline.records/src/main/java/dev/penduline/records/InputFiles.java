package dev.penduline.records;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;

import dev.penduline.physics.InputMessage;

/**
 * The check every file Penduline reads passes before it is opened: it must be a regular file.
 * A named pipe would block the reader until something writes to it (forever, as a rule), a device
 * such as {@code /dev/zero} never ends, a folder or a socket cannot be read as text at all. So
 * these are refused from their file attributes alone, without opening them, with the kind of file
 * named. A symbolic link is followed: what counts is the file it leads to.
 *
 * <p>Used by the parts-list and swing-record readers and, through the services, for mechanism
 * files, so the check lives in one place.
 */
public final class InputFiles {

    /** The file-type bits of a Unix mode, and the types Penduline names. */
    private static final int TYPE_MASK = 0170000;
    private static final int FIFO = 0010000;
    private static final int CHARACTER_DEVICE = 0020000;
    private static final int BLOCK_DEVICE = 0060000;
    private static final int SOCKET = 0140000;

    private InputFiles() {
    }

    /**
     * Refuses anything but a regular file, without opening it.
     *
     * @param file what the user named
     * @param what what the file should be, for the advice, e.g. {@code "a swing record (.csv)"}
     * @throws java.nio.file.NoSuchFileException when there is no such file (the caller says so in its words)
     * @throws IOException           when its attributes cannot be read
     * @throws RecordFormatException naming the file, the kind of file it is and what to give instead
     */
    public static void requireRegularFile(Path file, String what) throws IOException, RecordFormatException {
        final String kind = notRegular(file);
        if (kind != null) {
            throw new RecordFormatException(file.toString(), 0, null, InputMessage.NOT_A_REGULAR_FILE.format(kind, what));
        }
    }

    /**
     * What a file is when it is not a regular file, from its attributes alone (it is never opened).
     *
     * @param file the file; a symbolic link is followed
     * @return null for a regular file, otherwise the kind in words, e.g. {@code "a named pipe (FIFO)"}
     * @throws java.nio.file.NoSuchFileException when there is no such file
     * @throws IOException when its attributes cannot be read
     */
    public static String notRegular(Path file) throws IOException {
        final BasicFileAttributes a = Files.readAttributes(file, BasicFileAttributes.class);
        if (a.isRegularFile()) {
            return null;
        }
        if (a.isDirectory()) {
            return "a folder";
        }
        return switch (unixType(file)) {
            case FIFO -> "a named pipe (FIFO), which could keep the reader waiting forever";
            case CHARACTER_DEVICE -> "a device (a character device, such as /dev/zero or a terminal)";
            case BLOCK_DEVICE -> "a device (a block device)";
            case SOCKET -> "a socket";
            default -> "a special file";
        };
    }

    /** The file-type bits of the Unix mode, or -1 where the platform does not show them. */
    private static int unixType(Path file) {
        try {
            return ((Integer) Files.getAttribute(file, "unix:mode")) & TYPE_MASK;
        } catch (IOException | UnsupportedOperationException | IllegalArgumentException | ClassCastException e) {
            return -1;
        }
    }
}
