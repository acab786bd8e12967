package dev.penduline.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.InspectionHatch;
import dev.penduline.model.Mechanism;
import dev.penduline.model.impl.PartImpl;

class AtomicSaveTest {

    @TempDir
    Path dir;

    /** A part whose name cannot be read: serialisation fails half way through the file. */
    private static final class UnreadablePart extends PartImpl {
        @Override
        public String getName() {
            throw new IllegalStateException("simulated failure while serialising");
        }
    }

    private List<Path> listing() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }

    @Test
    void failedSerialisationKeepsThePreviousFileByteIdentical() throws Exception {
        final Path file = dir.resolve("hatch.penduline");
        MechanismFiles.save(InspectionHatch.create(), file);
        final byte[] before = Files.readAllBytes(file);
        final List<Path> filesBefore = listing();

        final Mechanism m = MechanismFiles.load(file);
        final UnreadablePart unreadable = new UnreadablePart();
        unreadable.setName("set, so that saving reads it");
        m.getParts().add(unreadable);
        final MechanismFileException e = assertThrows(MechanismFileException.class, () -> MechanismFiles.save(m, file));

        assertTrue(e.getMessage().contains("previous file, if any, is unchanged"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(filesBefore, listing(), "no temporary file is left behind");
    }

    @Test
    void failedWriteKeepsThePreviousFileAndLeavesNoTemporary() throws Exception {
        final Path file = dir.resolve("plain.penduline");
        Files.writeString(file, "old content\n", StandardCharsets.UTF_8);
        assertThrows(IOException.class, () -> AtomicFileWrite.write(file, out -> {
            out.write("half of the new con".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full (simulated)");
        }));
        assertEquals("old content\n", Files.readString(file));
        assertEquals(List.of(file), listing());
    }

    @Test
    void successfulWriteReplacesContentAndKeepsPermissions() throws Exception {
        final Path file = dir.resolve("perm.penduline");
        Files.writeString(file, "old\n");
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-rw----"));
        AtomicFileWrite.write(file, out -> out.write("new\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals("new\n", Files.readString(file));
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));

        final Path fresh = dir.resolve("fresh.penduline");
        AtomicFileWrite.write(fresh, out -> out.write(1));
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(fresh)));
        assertEquals(List.of(fresh, file), listing());
    }
}
