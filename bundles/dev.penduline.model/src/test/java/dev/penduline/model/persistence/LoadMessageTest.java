package dev.penduline.model.persistence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.Mechanism;
import dev.penduline.model.validation.MechanismValidation;

/**
 * What the fuzzer of the mechanism-file reader found (releng/fuzz; the inputs are also in the
 * hostile corpus, hostile/files/fuzz/): messages that named the XML parser's exception classes, and
 * control characters from the file echoed raw into a load or a validation message.
 */
class LoadMessageTest {

    private static final String HEAD = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n";
    private static final String ROOT = "<penduline:Mechanism xmi:version=\"2.0\" xmlns:xmi=\"http://www.omg.org/XMI\""
            + " xmlns:penduline=\"urn:dev.penduline:mechanism:1\">\n";
    /** A Java class name such as com.sun.org.apache.xerces.internal.impl.io.MalformedByteSequenceException. */
    private static final Pattern CLASS_NAME = Pattern.compile("\\b[a-z]+(\\.[a-z]+)+\\.[A-Z]\\w*");

    @TempDir
    Path dir;

    private MechanismFileException refused(String name, byte[] content) throws Exception {
        final Path file = Files.write(dir.resolve(name), content);
        final MechanismFileException e = assertThrows(MechanismFileException.class, () -> MechanismFiles.load(file));
        assertTrue(e.getMessage().startsWith(file + ":"), e.getMessage());
        assertFalse(CLASS_NAME.matcher(e.getMessage()).find(), "no Java class name: " + e.getMessage());
        assertFalse(e.getMessage().contains("Exception"), e.getMessage());
        for (char c : e.getMessage().toCharArray()) {
            assertFalse(Character.isISOControl(c), "no raw control character: " + e.getMessage());
        }
        return e;
    }

    private static byte[] bytes(Object... pieces) {
        final ByteArrayOutputStream b = new ByteArrayOutputStream();
        for (Object p : pieces) {
            b.writeBytes(p instanceof byte[] raw ? raw : p.toString().getBytes(StandardCharsets.UTF_8));
        }
        return b.toByteArray();
    }

    @Test
    void aFileThatIsNotUtf8SaysSoInsteadOfNamingTheDecoder() throws Exception {
        // 0xE9 is "é" in ISO-8859-1 and never a whole character in UTF-8 (RFC 3629, §3: E0-EF open a three-byte sequence)
        final MechanismFileException e = refused("latin1.penduline", bytes(HEAD, ROOT, "  <name>Trappe d", new byte[] {
            (byte) 0xE9}, "gag\u00e9e</name>\n</penduline:Mechanism>\n"));
        assertTrue(e.problem().startsWith("not UTF-8 text"), e.getMessage());
        final MechanismFileException binary = refused("binary.penduline", new byte[] {(byte) 0xFF, 0, 1, 2, (byte) 0x80});
        assertTrue(binary.problem().startsWith("not UTF-8 text") || binary.problem().startsWith("not a well-formed"),
                binary.getMessage());
    }

    @Test
    void parserMessagesKeepTheirWordsButLoseTheClassNames() throws Exception {
        final MechanismFileException e = refused("prolog.penduline", bytes("junk before the prolog"));
        assertEquals(1, e.line(), e.getMessage());
        assertTrue(e.problem().startsWith("not a well-formed mechanism file: "), e.getMessage());
        assertTrue(e.problem().length() > "not a well-formed mechanism file: ".length() + 10, e.getMessage());
    }

    @Test
    void controlCharactersEchoedFromTheFileAreEscaped() throws Exception {
        // a line feed and a C1 control (U+009B, the 8-bit "control sequence introducer") inside a bad number:
        // XML 1.0 allows both as characters of element content (XML 1.0, §2.2)
        final MechanismFileException e = refused("value.penduline", bytes(HEAD, ROOT, "  <part>\n    <id>lid</id>\n",
                "    <mass>heavy\n\u009b31m</mass>\n  </part>\n</penduline:Mechanism>\n"));
        assertTrue(e.problem().contains("heavy\\u000a\\u009b31m"), e.getMessage());
    }

    @Test
    void validationMessagesEscapeTheControlCharactersOfANameFromTheFile() throws Exception {
        final Path file = Files.write(dir.resolve("names.penduline"), bytes(HEAD, ROOT, "  <name>lid</name>\n  <part>\n",
                "    <id>plate</id>\n    <name>pl\tate\u009b2J</name>\n    <shape>box</shape>\n    <length>0.006</length>\n",
                "    <width>0.5</width>\n    <height>0.6</height>\n    <mass>-4.86</mass>\n  </part>\n",
                "</penduline:Mechanism>\n"));
        final Mechanism m = MechanismFiles.load(file);
        assertEquals("pl\tate\u009b2J", m.getParts().get(0).getName(), "the name itself is kept as written");
        final String mass = MechanismValidation.problems(m).stream().filter(p -> p.contains("mass")).findFirst()
                .orElseThrow();
        assertTrue(mass.startsWith("part 'pl\\u0009ate\\u009b2J': mass must be positive"), mass);
    }
}
