package dev.penduline.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SafeLoadTest {

    private static final String HEAD = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n";
    private static final String ROOT = "<penduline:Mechanism xmi:version=\"2.0\" xmlns:xmi=\"http://www.omg.org/XMI\""
            + " xmlns:penduline=\"urn:dev.penduline:mechanism:1\">\n";

    @TempDir
    Path dir;

    private Path write(String name, String content) throws Exception {
        final Path file = dir.resolve(name);
        Files.writeString(file, content, StandardCharsets.UTF_8);
        return file;
    }

    private MechanismFileException refused(Path file) throws Exception {
        final byte[] before = Files.readAllBytes(file);
        final MechanismFileException e = assertThrows(MechanismFileException.class, () -> MechanismFiles.load(file));
        assertArrayEquals(before, Files.readAllBytes(file), "a failed load leaves the file byte-identical");
        assertEquals(file, e.file());
        assertTrue(e.getMessage().startsWith(file.toString() + ":"), e.getMessage());
        return e;
    }

    @Test
    void malformedFileIsRefusedWithLineAndColumn() throws Exception {
        final Path file = write("broken.penduline", HEAD + ROOT + "  <name>Hatch</name>\n  <part>\n    <name>Lid</nam>\n");
        final MechanismFileException e = refused(file);
        assertEquals(5, e.line(), e.getMessage());
        assertTrue(e.column() > 0, e.getMessage());
        assertTrue(e.getMessage().startsWith(file + ":5:" + e.column() + ": "), e.getMessage());
        assertTrue(e.problem().contains("not a well-formed mechanism file"), e.getMessage());
    }

    @Test
    void externalEntityReadingALocalFileIsRefused() throws Exception {
        final Path secret = write("secret.txt", "TOP-SECRET-CONTENT");
        final Path file = write("xxe.penduline", HEAD
                + "<!DOCTYPE penduline:Mechanism [<!ENTITY leak SYSTEM \"" + secret.toUri() + "\">]>\n"
                + ROOT + "  <name>&leak;</name>\n</penduline:Mechanism>\n");
        final MechanismFileException e = refused(file);
        assertEquals(2, e.line(), e.getMessage());
        assertTrue(e.column() > 0, e.getMessage());
        assertTrue(e.problem().contains("DOCTYPE"), e.getMessage());
        assertFalse(e.getMessage().contains("TOP-SECRET"), "the entity was never expanded");
    }

    @Test
    void billionLaughsIsRefusedBeforeAnyExpansion() throws Exception {
        final StringBuilder dtd = new StringBuilder("<!DOCTYPE lolz [\n<!ENTITY lol \"lol\">\n");
        for (int i = 1; i <= 9; i++) {
            dtd.append("<!ENTITY lol").append(i).append(" \"");
            for (int k = 0; k < 10; k++) {
                dtd.append("&lol").append(i == 1 ? "" : String.valueOf(i - 1)).append(';');
            }
            dtd.append("\">\n");
        }
        dtd.append("]>\n");
        final Path file = write("laughs.penduline", HEAD + dtd + ROOT + "  <name>&lol9;</name>\n</penduline:Mechanism>\n");
        final MechanismFileException e = refused(file);
        assertEquals(2, e.line(), e.getMessage());
        assertTrue(e.problem().contains("DOCTYPE"), e.getMessage());
    }

    @Test
    void unknownElementIsRefusedWithItsLine() throws Exception {
        final Path file = write("unknown.penduline", HEAD + ROOT + "  <name>Hatch</name>\n  <colour>red</colour>\n"
                + "</penduline:Mechanism>\n");
        final MechanismFileException e = refused(file);
        assertEquals(4, e.line(), e.getMessage());
        assertTrue(e.problem().contains("colour"), e.getMessage());
    }

    @Test
    void badNumberIsRefusedWithItsLine() throws Exception {
        final Path file = write("value.penduline", HEAD + ROOT + "  <part>\n    <id>lid</id>\n    <mass>heavy</mass>\n"
                + "  </part>\n</penduline:Mechanism>\n");
        final MechanismFileException e = refused(file);
        assertEquals(5, e.line(), e.getMessage());
        assertTrue(e.problem().contains("heavy"), e.getMessage());
    }

    @Test
    void truncatedFileReportsItsFirstProblem() throws Exception {
        final Path file = write("cut.penduline", HEAD + ROOT + "  <part>\n    <mass>heavy</mass>\n");
        final MechanismFileException e = refused(file);
        assertEquals(4, e.line(), e.getMessage());
        assertTrue(e.problem().startsWith("bad value"), e.getMessage());
    }

    @Test
    void otherXmlIsNotAMechanismFile() throws Exception {
        final Path file = write("other.penduline", HEAD + "<notes>nothing here</notes>\n");
        final MechanismFileException e = refused(file);
        assertEquals(2, e.line(), e.getMessage());
        assertTrue(e.problem().startsWith("not a mechanism file"), e.getMessage());
    }

    @Test
    void missingFileIsNamed() {
        final Path file = dir.resolve("nowhere.penduline");
        final MechanismFileException e = assertThrows(MechanismFileException.class, () -> MechanismFiles.load(file));
        assertTrue(e.getMessage().startsWith(file + ": no such file"), e.getMessage());
        assertFalse(Files.exists(file), "loading never creates the file");
    }
}
