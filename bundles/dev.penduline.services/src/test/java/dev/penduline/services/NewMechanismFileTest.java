package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.Mechanism;

class NewMechanismFileTest {

    @TempDir
    Path dir;

    @Test
    void fileNameIsTheSlugOfTheMechanismName() {
        assertEquals("inspection-hatch-ih-60.penduline", NewMechanismFile.fileName("Inspection hatch IH-60"));
        assertEquals("mechanism.penduline", NewMechanismFile.fileName("  -- "));
    }

    @Test
    void withoutPartsListTheFileHoldsANamedMechanismWithoutParts() throws Exception {
        Path target = dir.resolve("gate.penduline");
        NewMechanismFile.write("Yard gate", Optional.empty(), target);
        Mechanism m = MechanismLoader.readMechanism(target);
        assertEquals("Yard gate", m.getName());
        assertTrue(m.getParts().isEmpty());
        InputException again = assertThrows(InputException.class,
                () -> NewMechanismFile.write("Yard gate", Optional.empty(), target));
        assertTrue(again.getMessage().contains("already exists"), again.getMessage());
    }

    @Test
    void withPartsListTheFileGivesTheSameInertiaAsTheList() throws Exception {
        // A slender rod pivoted at its end: J0 = m L²/3 (Meriam & Kraige, Dynamics, Table D/4),
        // 1.5 · 0.6² / 3 = 0.18 kg·m².
        Path csv = Files.writeString(dir.resolve("arm.csv"), """
                name,shape,mass_kg,x_m,y_m,z_m,length_m,axis
                arm,rod,1.5,0,-0.3,0,0.6,y
                """);
        Path target = dir.resolve(NewMechanismFile.fileName("Swing arm"));
        NewMechanismFile.write("Swing arm", Optional.of(PartsImport.readPartsList(csv)), target);
        assertEquals(0.18, new MechanismLoader().load(target).properties().pivotInertia(), 1e-12);
    }

    @Test
    void aBadPartsListNamesTheFileAndLine() throws Exception {
        Path csv = Files.writeString(dir.resolve("bad.csv"), """
                name,shape,mass_kg,x_m,y_m,z_m
                arm,point,heavy,0,-0.3,0
                """);
        InputException e = assertThrows(InputException.class, () -> PartsImport.readPartsList(csv));
        // file and line (the bad value is on line 2, under the header), then the column and the value
        assertTrue(e.getMessage().contains("bad.csv:2:"), e.getMessage());
        assertTrue(e.getMessage().contains("mass_kg"), e.getMessage());
        assertTrue(e.getMessage().contains("'heavy'"), e.getMessage());
    }
}
