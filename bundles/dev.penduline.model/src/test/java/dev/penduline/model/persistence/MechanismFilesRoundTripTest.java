package dev.penduline.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.InspectionHatch;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;

class MechanismFilesRoundTripTest {

    @TempDir
    Path dir;

    @Test
    void loadSaveLoadGivesAnEqualModelAndIdenticalBytes() throws Exception {
        final Path file = dir.resolve("hatch.penduline");
        final Mechanism original = InspectionHatch.create();
        MechanismFiles.save(original, file);
        final byte[] first = Files.readAllBytes(file);

        final Mechanism loaded = MechanismFiles.load(file);
        assertTrue(EcoreUtil.equals(original, loaded), "the loaded model equals the saved one");

        final Path again = dir.resolve("again.penduline");
        MechanismFiles.save(loaded, again);
        assertArrayEquals(first, Files.readAllBytes(again), "saving an unchanged model gives the same bytes");

        MechanismFiles.save(loaded, file);
        assertArrayEquals(first, Files.readAllBytes(file), "saving over itself changes nothing");
        assertTrue(EcoreUtil.equals(loaded, MechanismFiles.load(again)));
    }

    @Test
    void changingOnePartsMassChangesExactlyOneLine() throws Exception {
        final Path file = dir.resolve("hatch.penduline");
        MechanismFiles.save(InspectionHatch.create(), file);
        final List<String> before = Files.readAllLines(file, StandardCharsets.UTF_8);

        final Mechanism m = MechanismFiles.load(file);
        final Part handle = m.getParts().stream().filter(p -> p.getId().equals("handle")).findFirst().orElseThrow();
        handle.setMass(0.32);
        MechanismFiles.save(m, file);
        final List<String> after = Files.readAllLines(file, StandardCharsets.UTF_8);

        assertEquals(before.size(), after.size(), "no line added or removed");
        final List<Integer> changed = new ArrayList<>();
        for (int i = 0; i < before.size(); i++) {
            if (!before.get(i).equals(after.get(i))) {
                changed.add(i);
            }
        }
        assertEquals(1, changed.size(), "exactly one line differs: " + changed);
        assertEquals("    <mass>0.3</mass>", before.get(changed.get(0)));
        assertEquals("    <mass>0.32</mass>", after.get(changed.get(0)));
    }

    @Test
    void fileIsUtf8WithLfEndsOneValuePerLineAndNoGeneratedIdentifiers() throws Exception {
        final Path file = dir.resolve("hatch.penduline");
        MechanismFiles.save(InspectionHatch.create(), file);
        final byte[] bytes = Files.readAllBytes(file);
        final String text = new String(bytes, StandardCharsets.UTF_8);

        assertFalse(text.contains("\r"), "LF line ends only");
        assertTrue(text.startsWith("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"));
        assertTrue(text.endsWith("</penduline:Mechanism>\n"));
        assertTrue(text.contains("<name>Release at 30°</name>"), "non-ASCII kept as UTF-8");
        assertFalse(text.contains("xmi:id") || text.contains("xmi:uuid"), "no generated identifiers");
        final Pattern twoValues = Pattern.compile("</[^>]+>.*<[^/]");
        for (String line : text.split("\n")) {
            assertFalse(twoValues.matcher(line).find(), "one value per line: " + line);
            assertTrue(line.length() < 200, "no long lines: " + line);
        }
        // The fixture's 2×2 correlation matrix has two equal off-diagonal values: none may be dropped.
        assertEquals(4, text.split("<correlation>", -1).length - 1, "repeated values are all kept");
    }

    @Test
    void resourceSetFromMechanismFilesReadsAndWritesTheSameFormat() throws Exception {
        final Path file = dir.resolve("hatch.penduline");
        MechanismFiles.save(InspectionHatch.create(), file);
        final byte[] saved = Files.readAllBytes(file);

        final ResourceSet set = MechanismFiles.newResourceSet();
        final Resource resource = set.getResource(org.eclipse.emf.common.util.URI.createFileURI(file.toString()), true);
        assertTrue(resource instanceof MechanismResource);
        resource.save(null);
        assertArrayEquals(saved, Files.readAllBytes(file), "the resource's own save uses the same options");
        assertArrayEquals(saved, MechanismFiles.toBytes((Mechanism) resource.getContents().get(0)));
    }
}
