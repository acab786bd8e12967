package dev.penduline.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.net.StandardProtocolFamily;
import java.net.UnixDomainSocketAddress;
import java.nio.channels.ServerSocketChannel;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Duration;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.records.parts.PartsListReader;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecordReader;

/**
 * Files that are not regular files are refused from their attributes, never opened. The readers'
 * calls are guarded by a time limit only so that a regression (opening the pipe, which blocks
 * until a writer comes) fails instead of hanging the build; the limit is no speed target.
 */
class InputFilesTest {

    private static final Duration HANG_GUARD = Duration.ofSeconds(30);

    @TempDir
    Path dir;

    private Path fifo() throws IOException, InterruptedException {
        final Path pipe = dir.resolve("pipe.csv");
        Process p;
        try {
            p = new ProcessBuilder("mkfifo", pipe.toString()).inheritIO().start();
        } catch (IOException e) {
            assumeTrue(false, "mkfifo is not available here");
            return null;
        }
        assumeTrue(p.waitFor() == 0 && Files.exists(pipe), "mkfifo made no named pipe");
        return pipe;
    }

    @Test
    void aNamedPipeIsRefusedByBothReadersWithoutBeingOpened() throws Exception {
        final Path pipe = fifo();
        final RecordFormatException swing = assertTimeoutPreemptively(HANG_GUARD, () -> assertThrows(
                RecordFormatException.class, () -> new SwingRecordReader().read(pipe, SwingImportOptions.defaults())));
        assertEquals(pipe + ": not a regular file: a named pipe (FIFO), which could keep the reader waiting forever; give the"
                + " path of a swing record (a .csv file)", swing.getMessage());
        final RecordFormatException parts = assertTimeoutPreemptively(HANG_GUARD, () -> assertThrows(
                RecordFormatException.class, () -> new PartsListReader().read(pipe)));
        assertTrue(parts.getMessage().contains("not a regular file: a named pipe"), parts.getMessage());
        assertTrue(parts.getMessage().endsWith("give the path of a parts list (a .csv file)"), parts.getMessage());
    }

    @Test
    void aDeviceIsRefusedSoDevZeroIsNeverRead() throws Exception {
        final Path zero = Path.of("/dev/zero");
        assumeTrue(Files.exists(zero), "no /dev/zero on this machine");
        final RecordFormatException e = assertTimeoutPreemptively(HANG_GUARD, () -> assertThrows(
                RecordFormatException.class, () -> new SwingRecordReader().read(zero, SwingImportOptions.defaults())));
        assertTrue(e.getMessage().startsWith("/dev/zero: not a regular file: a device (a character device"), e.getMessage());
    }

    @Test
    void aFolderIsRefused() throws Exception {
        final Path folder = Files.createDirectories(dir.resolve("records.csv"));
        assertEquals("a folder", InputFiles.notRegular(folder));
        final RecordFormatException e = assertThrows(RecordFormatException.class, () -> new PartsListReader().read(folder));
        assertTrue(e.getMessage().startsWith(folder + ": not a regular file: a folder;"), e.getMessage());
    }

    @Test
    void aSocketIsRefused() throws Exception {
        final Path socket = dir.resolve("rig.sock");
        try (ServerSocketChannel server = ServerSocketChannel.open(StandardProtocolFamily.UNIX)) {
            server.bind(UnixDomainSocketAddress.of(socket));
            assertEquals("a socket", InputFiles.notRegular(socket));
        }
    }

    @Test
    void aRegularFileAndALinkToOnePassAMissingFileIsTheCallersToName() throws Exception {
        final Path file = Files.writeString(dir.resolve("a.csv"), "time_s,angle_deg\n");
        assertNull(InputFiles.notRegular(file));
        final Path link = Files.createSymbolicLink(dir.resolve("link.csv"), file);
        assertNull(InputFiles.notRegular(link));
        InputFiles.requireRegularFile(link, "a record");
        assertThrows(NoSuchFileException.class, () -> InputFiles.requireRegularFile(dir.resolve("none.csv"), "a record"));
        final Path linkToPipe = Files.createSymbolicLink(dir.resolve("to-pipe.csv"), fifo());
        assertTrue(InputFiles.notRegular(linkToPipe).startsWith("a named pipe"), "a link is judged by where it leads");
    }
}
