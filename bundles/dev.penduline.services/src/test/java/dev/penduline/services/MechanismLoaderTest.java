package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.Mechanism;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.physics.inertia.InertiaSummary;

class MechanismLoaderTest {

    /** A slender rod pivoted at its end plus a disc at its tip, in millimetres (invented test data). */
    private static final String ROD_AND_DISC = """
            name,shape,mass_kg,x_mm,y_mm,z_mm,length_mm,radius_mm,inner_radius_mm,axis
            arm,rod,2,0,-400,0,800,,,y
            bob,cylinder,3,0,-900,0,20,100,0,z
            """;

    @TempDir
    Path dir;

    private Path csv(String text) throws IOException {
        return Files.writeString(dir.resolve("parts.csv"), text);
    }

    @Test
    void partsListAndItsImportedMechanismFileGiveTheSameInertia() throws Exception {
        // A slender rod pivoted at its end plus a disc at its tip, in millimetres.
        // Hand check (Meriam & Kraige, Dynamics, Table D/4 and the parallel-axis theorem):
        // rod m L²/3 = 2·0.8²/3 = 0.426667; disc about its axis m r²/2 + m d² = 3·0.1²/2 + 3·0.9² = 2.445;
        // J0 = 2.871667 kg·m².
        Path parts = csv(ROD_AND_DISC);
        MechanismSource fromCsv = new MechanismLoader().load(parts);
        assertEquals(2.871666666667, fromCsv.properties().pivotInertia(), 1e-9);

        Path file = dir.resolve("arm.penduline");
        PartsImport.importFile(parts, file, "Test arm");
        MechanismSource fromFile = new MechanismLoader().load(file);
        InertiaSummary a = fromCsv.inertia().orElseThrow();
        InertiaSummary b = fromFile.inertia().orElseThrow();
        assertEquals(a.pivotInertia(), b.pivotInertia(), 1e-12);
        assertEquals(a.totalMass(), b.totalMass(), 1e-12);
        assertEquals(a.centroidDistance(), b.centroidDistance(), 1e-12);
        assertTrue(Files.readString(file).contains("<length>0.8</length>"), "no unit-conversion leftovers");

        byte[] before = Files.readAllBytes(file);
        InputException again = assertThrows(InputException.class, () -> PartsImport.importFile(parts, file, "x"));
        assertTrue(again.getMessage().contains("already exists"), again.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void aLiveModelIsValidatedAndComputedAsItsFileIs() throws Exception {
        Path parts = csv(ROD_AND_DISC);
        Mechanism m = PartsImport.toMechanism("Test arm", PartsImport.readPartsList(parts));
        // the same hand check as above (Meriam & Kraige, Table D/4 and the parallel-axis theorem)
        assertEquals(2.871666666667, new MechanismLoader().loadMechanism(m, "live").properties().pivotInertia(), 1e-9);
        // lengthen the rod from its centre: J0 grows by m (L2² − L1²)/12 = 2·(1.44 − 0.64)/12
        m.getParts().get(0).setLength(1.2);
        assertEquals(2.871666666667 + 2 * 0.8 / 12, new MechanismLoader().loadMechanism(m, "live").properties().pivotInertia(),
                1e-9);
        m.getParts().get(1).setMass(-3);
        InputException bad = assertThrows(InputException.class, () -> new MechanismLoader().loadMechanism(m, "arm.penduline"));
        assertTrue(bad.getMessage().startsWith("arm.penduline: 1 problem(s)") && bad.getMessage().contains("bob"),
                bad.getMessage());
    }

    @Test
    void staleMarksKeepTheFirstReasonWhenAsked() {
        Mechanism m = NamedElements.mechanism("Test arm");
        NamedElements.addFitResult(m, "first", "2026-11-30T09:00:00Z");
        assertEquals(Optional.empty(), PartsImport.staleReason(m.getFitResults().get(0)), "a new fit is current");
        assertEquals(1, PartsImport.markFitsStale(m, "arm lengthened", true));
        NamedElements.addFitResult(m, "second", "2026-11-30T10:00:00Z");
        assertEquals(1, PartsImport.markFitsStale(m, "bob heavier", true), "only the fit not yet stale is marked");
        assertEquals("arm lengthened", PartsImport.staleReason(m.getFitResults().get(0)).orElseThrow(), "first reason kept");
        assertEquals("bob heavier", PartsImport.staleReason(m.getFitResults().get(1)).orElseThrow());
        assertEquals(2, PartsImport.markFitsStale(m, "parts replaced"), "without keeping, every fit gets the new reason");
        assertEquals("parts replaced", PartsImport.staleReason(m.getFitResults().get(0)).orElseThrow());
        assertEquals(1, m.getFitResults().get(0).getSettings().size(), "one stale setting, replaced, never repeated");
    }

    @Test
    void anInvalidMechanismFileListsEveryProblem() throws Exception {
        Path file = dir.resolve("bad.penduline");
        Files.writeString(file, """
                <?xml version="1.0" encoding="UTF-8"?>
                <penduline:Mechanism xmi:version="2.0" xmlns:xmi="http://www.omg.org/XMI" xmlns:penduline="urn:dev.penduline:mechanism:1">
                  <name>bad</name>
                  <part>
                    <id>a</id>
                    <name>a</name>
                    <shape>sphere</shape>
                    <radius>-0.1</radius>
                    <mass>-1</mass>
                    <centroidY>-0.5</centroidY>
                  </part>
                </penduline:Mechanism>
                """);
        InputException e = assertThrows(InputException.class, () -> new MechanismLoader().load(file));
        assertTrue(e.getMessage().contains("problem(s) to fix"), e.getMessage());
        assertTrue(e.getMessage().contains("mass") && e.getMessage().contains("radius"), e.getMessage());
    }

    @Test
    void aMalformedMechanismFileNamesItsLine() throws Exception {
        Path file = dir.resolve("broken.penduline");
        Files.writeString(file, "<?xml version=\"1.0\"?>\n<penduline:Mechanism>\n  <name>x</nam>\n");
        InputException e = assertThrows(InputException.class, () -> new MechanismLoader().load(file));
        assertTrue(e.getMessage().contains("broken.penduline:"), e.getMessage());
    }

    @Test
    void lumpedPropertiesBelowThePointMassBoundAreRefused() {
        InputException e = assertThrows(InputException.class, () -> MechanismLoader.lumped(2, 0.5, 0.1, 9.81));
        assertTrue(e.getMessage().contains("pivotInertia"), e.getMessage());
    }
}
