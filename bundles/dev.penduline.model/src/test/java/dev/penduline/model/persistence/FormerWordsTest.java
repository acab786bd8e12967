package dev.penduline.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.AngleUnit;
import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.ShapeKind;

/** A mechanism file in the words of an older Penduline loads, and saves in today's words. */
class FormerWordsTest {

    private static final Path OLD = Path.of("src/test/resources/former-words/swing-arm-before-one-word.penduline");

    @TempDir
    Path dir;

    private Path copy() throws Exception {
        final Path file = dir.resolve("arm.penduline");
        Files.copy(OLD, file);
        return file;
    }

    @Test
    void oldWordsReadAsTheCurrentOnes() throws Exception {
        final Path file = copy();
        final byte[] before = Files.readAllBytes(file);
        final Mechanism m = MechanismFiles.load(file);
        assertEquals(List.of(ShapeKind.POINT_MASS, ShapeKind.SLENDER_ROD, ShapeKind.THIN_RING, ShapeKind.MASS_PROPERTIES),
                m.getParts().stream().map(Part::getShape).toList());
        final List<FrictionTerm> terms = m.getFrictionHypotheses().get(0).getTerms();
        assertEquals(FrictionKind.DRAG, terms.get(1).getKind());
        assertEquals("drag", terms.get(1).getId(), "the drag term's former default id is renamed");
        assertEquals(AngleUnit.COUNT, m.getSessions().get(0).getAngleUnit());
        final FitResult fit = m.getFitResults().get(0);
        assertEquals(List.of("viscous", "drag"), fit.getTermIds());
        assertEquals(List.of("viscous", "drag"), fit.getComparisons().get(0).getTermIds());
        assertEquals("drag", fit.getEnergyShares().get(0).getTermId());
        assertArrayEquals(before, Files.readAllBytes(file), "loading never writes");
    }

    @Test
    void theNextSaveWritesTheCurrentWordsAndReadsBackTheSame() throws Exception {
        final Path file = copy();
        final Mechanism m = MechanismFiles.load(file);
        MechanismFiles.save(m, file);
        final String text = Files.readString(file, StandardCharsets.UTF_8);
        for (String now : List.of("<shape>point</shape>", "<shape>rod</shape>", "<shape>ring</shape>",
                "<shape>tensor</shape>", "<kind>drag</kind>", "<id>drag</id>", "<termId>drag</termId>",
                "<angleUnit>counts</angleUnit>")) {
            assertTrue(text.contains(now), now + " in\n" + text);
        }
        for (String former : List.of("point-mass", "slender-rod", "thin-ring", "mass-properties", "quadratic-drag",
                "<angleUnit>count<")) {
            assertFalse(text.contains(former), former + " in\n" + text);
        }
        assertTrue(EcoreUtil.equals(m, MechanismFiles.load(file)), "the saved file reads as the migrated model");
    }

    @Test
    void aWordThatWasNeverAShapeIsStillRefusedWithItsLine() throws Exception {
        final Path file = dir.resolve("bad.penduline");
        Files.writeString(file, Files.readString(OLD, StandardCharsets.UTF_8).replace("<shape>thin-ring</shape>",
                "<shape>hoop</shape>"), StandardCharsets.UTF_8);
        final MechanismFileException e = assertThrows(MechanismFileException.class, () -> MechanismFiles.load(file));
        assertEquals(23, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("hoop"), e.getMessage());
    }
}
