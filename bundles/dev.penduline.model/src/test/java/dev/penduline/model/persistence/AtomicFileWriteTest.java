package dev.penduline.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.InspectionHatch;

/**
 * The one writer's promises: links written through, non-regular targets refused, every write
 * error reported with the old file kept, leftovers of interrupted saves removed with a note.
 * Full disks and read-only folders are simulated through the writer's {@link AtomicFileWrite.Disk}
 * seam, since a test machine (often running as root, which ignores permissions) cannot offer them.
 */
class AtomicFileWriteTest {

    @TempDir
    Path dir;

    private List<String> names() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static AtomicFileWrite.Content text(String s) {
        return out -> out.write(s.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void aSymbolicLinkIsWrittenThroughAndStaysALink() throws Exception {
        Path real = Files.createDirectories(dir.resolve("elsewhere")).resolve("hatch.penduline");
        Files.writeString(real, "old\n");
        Path link = Files.createSymbolicLink(dir.resolve("link.penduline"), real);
        AtomicFileWrite.write(link, text("new\n"));
        assertTrue(Files.isSymbolicLink(link));
        assertEquals(real, Files.readSymbolicLink(link));
        assertEquals("new\n", Files.readString(real));

        Path dangling = Files.createSymbolicLink(dir.resolve("dangling.csv"), Path.of("elsewhere", "new.csv"));
        AtomicFileWrite.write(dangling, text("created\n"));
        assertTrue(Files.isSymbolicLink(dangling));
        assertEquals("created\n", Files.readString(dir.resolve("elsewhere").resolve("new.csv")));
    }

    @Test
    void aMechanismFileThatIsALinkIsSavedIntoItsTarget() throws Exception {
        Path real = dir.resolve("real.penduline");
        MechanismFiles.save(InspectionHatch.create(), real);
        Path link = Files.createSymbolicLink(dir.resolve("hatch.penduline"), real);
        var m = MechanismFiles.load(link);
        m.setName("Renamed through the link");
        MechanismFiles.save(m, link);
        assertTrue(Files.isSymbolicLink(link));
        assertEquals("Renamed through the link", MechanismFiles.load(real).getName());
    }

    @Test
    void aFolderANamedPipeAndADeviceAreRefusedUntouched() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("out.csv"));
        IOException e = assertThrows(IOException.class, () -> AtomicFileWrite.write(folder, text("x")));
        assertTrue(e.getMessage().contains("a folder, not a regular file"), e.getMessage());
        assertTrue(Files.isDirectory(folder));

        Path fifo = dir.resolve("pipe.csv");
        Process p = new ProcessBuilder("mkfifo", fifo.toString()).start();
        assumeTrue(p.waitFor(20, TimeUnit.SECONDS) && p.exitValue() == 0, "mkfifo is available");
        e = assertThrows(IOException.class, () -> AtomicFileWrite.write(fifo, text("x")));
        assertTrue(e.getMessage().contains("a named pipe (FIFO), not a regular file"), e.getMessage());
        assertTrue(AtomicFileWrite.notRegular(fifo).isPresent(), "still a pipe");

        Path full = Path.of("/dev/full");
        assumeTrue(Files.exists(full), "/dev/full exists on this system");
        e = assertThrows(IOException.class, () -> AtomicFileWrite.write(full, text("x")));
        assertTrue(e.getMessage().contains("a character device, not a regular file"), e.getMessage());
        assertEquals("a character device", AtomicFileWrite.notRegular(full).orElseThrow());
        assertEquals(List.of("out.csv", "pipe.csv"), names(), "no temporary file anywhere");
    }

    /** Saves through a failing disk and checks the answer names the reason and the old file stays alone. */
    private void assertFailsKeepingTheOldFile(AtomicFileWrite.Disk disk, String... reasons) throws IOException {
        Path file = dir.resolve("hatch.penduline");
        Files.writeString(file, "the old content\n");
        byte[] big = new byte[200_000];
        IOException e = assertThrows(IOException.class, () -> AtomicFileWrite.write(file, out -> out.write(big), disk));
        for (String r : reasons) {
            assertTrue(e.getMessage().contains(r), e.getMessage());
        }
        assertTrue(e.getMessage().contains("previous file, if any, is unchanged"), e.getMessage());
        assertEquals("the old content\n", Files.readString(file));
        assertEquals(List.of("hatch.penduline"), names(), "no temporary file is left");
    }

    @Test
    void aFullDiskMidWriteIsReportedAndTheOldFileKept() throws Exception {
        assertFailsKeepingTheOldFile(new AtomicFileWrite.Disk() {
            private long written;

            @Override
            public void write(FileChannel channel, ByteBuffer bytes) throws IOException {
                if (written + bytes.remaining() > 1000) {
                    throw new FileSystemException(null, null, "No space left on device");
                }
                written += bytes.remaining();
                AtomicFileWrite.REAL.write(channel, bytes);
            }
        }, "No space left on device");
    }

    @Test
    void aDiskErrorWhenForcingIsReportedAndTheOldFileKept() throws Exception {
        assertFailsKeepingTheOldFile(new AtomicFileWrite.Disk() {
            @Override
            public void force(FileChannel channel) throws IOException {
                throw new IOException("Input/output error");
            }
        }, "Input/output error");
    }

    @Test
    void aRefusedRenameIsReportedAndTheOldFileKept() throws Exception {
        assertFailsKeepingTheOldFile(new AtomicFileWrite.Disk() {
            @Override
            public void rename(Path temporary, Path target) throws IOException {
                throw new AccessDeniedException(target.toString());
            }
        }, "permission denied");
    }

    @Test
    void aContentThatFailsHalfWayLeavesTheOldFileAndNoTemporaryFile() throws Exception {
        Path file = dir.resolve("hatch.penduline");
        Files.writeString(file, "the old content\n");
        byte[] half = new byte[150_000]; // more than the writer's buffer, so part of it reached the temporary file
        IOException e = assertThrows(IOException.class, () -> AtomicFileWrite.write(file, out -> {
            out.write(half);
            throw new IOException("the model could not be written");
        }));
        assertTrue(e.getMessage().contains("the model could not be written"), e.getMessage());
        assertTrue(e.getMessage().contains("previous file, if any, is unchanged"), e.getMessage());
        assertEquals("the old content\n", Files.readString(file));
        assertEquals(List.of("hatch.penduline"), names(), "no temporary file is left");

        // a bug in the writer of the content: it leaves as itself, the old file and the folder as they were
        IllegalStateException bug = assertThrows(IllegalStateException.class, () -> AtomicFileWrite.write(file, out -> {
            out.write(half);
            throw new IllegalStateException("a bug");
        }));
        assertEquals("a bug", bug.getMessage());
        assertEquals("the old content\n", Files.readString(file));
        assertEquals(List.of("hatch.penduline"), names(), "no temporary file is left");
    }

    @Test
    void aReadOnlyFolderIsReportedAndTheOldFileKept() throws Exception {
        // What a read-only folder answers; simulated, since root may write into any folder.
        assertFailsKeepingTheOldFile(new AtomicFileWrite.Disk() {
            @Override
            public Path createTemporary(Path directory, String prefix, String suffix) throws IOException {
                throw new AccessDeniedException(directory.resolve(prefix + "1" + suffix).toString());
            }
        }, "cannot create a file in the folder " + dir.toRealPath(), "permission denied");
    }

    @Test
    void aReallyReadOnlyFolderIsReportedAndTheOldFileKeptWhereTheSystemEnforcesIt() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("locked"));
        Path file = Files.writeString(folder.resolve("hatch.penduline"), "old\n");
        Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            assumeTrue(!Files.isWritable(folder), "the system enforces folder permissions (not so for root)");
            IOException e = assertThrows(IOException.class, () -> AtomicFileWrite.write(file, text("new\n")));
            assertTrue(e.getMessage().contains("permission denied"), e.getMessage());
            assertEquals("old\n", Files.readString(file));
        } finally {
            Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @Test
    void staleTemporaryFilesOfThisTargetAreRemovedWithANoteAndNothingElse() throws Exception {
        Path file = dir.resolve("hatch.penduline");
        Files.writeString(file, "old\n");
        FileTime longAgo = FileTime.from(Instant.now().minus(AtomicFileWrite.STALE_AFTER).minusSeconds(60));
        Path stale = Files.writeString(dir.resolve(".hatch.penduline.8812345.saving"), "half");
        Path legacy = Files.writeString(dir.resolve(".hatch.penduline445566.tmp"), "half");
        Path fresh = Files.writeString(dir.resolve(".hatch.penduline.99.saving"), "a save running now");
        Path otherTarget = Files.writeString(dir.resolve(".other.penduline.77.saving"), "not ours to judge");
        Path notOurs = Files.writeString(dir.resolve(".hatch.penduline.x1.saving"), "another program's name");
        for (Path p : List.of(stale, legacy, otherTarget, notOurs)) {
            Files.setLastModifiedTime(p, longAgo);
        }
        List<String> notes = AtomicFileWrite.write(file, text("new\n"));
        Path real = dir.toRealPath();
        assertEquals(Set.of("removed a temporary file left by an interrupted save: " + real.resolve(stale.getFileName()),
                "removed a temporary file left by an interrupted save: " + real.resolve(legacy.getFileName())),
                Set.copyOf(notes));
        assertEquals(2, notes.size());
        assertFalse(Files.exists(stale));
        assertFalse(Files.exists(legacy));
        assertTrue(Files.exists(fresh) && Files.exists(otherTarget) && Files.exists(notOurs));
        assertEquals("new\n", Files.readString(file));
        assertTrue(AtomicFileWrite.write(file, text("again\n")).isEmpty(), "nothing left to remove");
    }

    @Test
    void temporaryFilesAreNeverNamedLikeAMechanismFile() throws Exception {
        Path file = dir.resolve("hatch.penduline");
        Path[] seen = new Path[1];
        AtomicFileWrite.Disk watch = new AtomicFileWrite.Disk() {
            @Override
            public void rename(Path temporary, Path target) throws IOException {
                seen[0] = temporary;
                AtomicFileWrite.REAL.rename(temporary, target);
            }
        };
        AtomicFileWrite.write(file, text("x"), watch);
        String name = seen[0].getFileName().toString();
        assertTrue(name.startsWith(".hatch.penduline.") && name.endsWith(AtomicFileWrite.TEMPORARY_SUFFIX), name);
        assertFalse(name.endsWith("." + MechanismFormat.FILE_EXTENSION), name);
        assertArrayEquals("x".getBytes(StandardCharsets.UTF_8), Files.readAllBytes(file));
    }
}
