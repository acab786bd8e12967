package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.penduline.physics.inertia.Axis;
import dev.penduline.physics.inertia.Box;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PivotInertia;
import dev.penduline.physics.inertia.PointMass;
import dev.penduline.physics.inertia.SlenderRod;

class PartChangesTest {

    private static final List<Part> PARTS = List.of(
            Part.of("arm", new SlenderRod(0.8, Axis.Y), 1.5, new Vector3D(0, -0.4, 0)),
            Part.of("bob", new PointMass(), 2.0, new Vector3D(0, -0.8, 0)),
            Part.of("tag", new Box(0.02, 0.03, 0.004), 0.01, new Vector3D(0, -0.1, 0)));

    private static double j0(List<Part> parts) {
        return PivotInertia.DEFAULT.compute(parts).pivotInertia();
    }

    @Test
    void settingsInUserUnitsChangeTheInertiaAsTheParallelAxisTheoremSays() throws Exception {
        // moving a point mass m from r1 to r2 changes J0 by m (r2² − r1²); adding Δm at r adds Δm r²
        // (parallel-axis theorem, Meriam & Kraige, Dynamics, Appendix B)
        double before = j0(PARTS);
        List<Part> moved = PartChanges.apply(PARTS, List.of(PartChanges.parse("bob.y=-900mm")), List.of(), List.of());
        assertEquals(2.0 * (0.81 - 0.64), j0(moved) - before, 1e-12);
        List<Part> heavier = PartChanges.apply(PARTS, List.of(PartChanges.parse("bob.mass=2000g"),
                PartChanges.parse("bob.mass=2.5kg")), List.of(), List.of());
        assertEquals(0.5 * 0.64, j0(heavier) - before, 1e-12, "the last setting of a field wins");
        List<Part> pounds = PartChanges.apply(PARTS, List.of(PartChanges.parse("bob.mass=1lb")), List.of(), List.of());
        assertEquals(0.45359237, pounds.get(1).mass(), 1e-12, "1 lb = 0.45359237 kg exactly (international pound)");
        // a slender rod about its end: J = m L²/3 (Meriam & Kraige, Table D/4); lengthening it from its
        // centre keeps the centroid, so J0 changes by m (L2² − L1²)/12
        List<Part> longer = PartChanges.apply(PARTS, List.of(PartChanges.parse("arm.length=1m")), List.of(), List.of());
        assertEquals(1.5 * (1.0 - 0.64) / 12, j0(longer) - before, 1e-12);
        List<Part> without = PartChanges.apply(PARTS, List.of(), List.of("tag"), List.of());
        assertEquals(2, without.size());
    }

    @Test
    void badSettingsNameWhatIsWrong() throws Exception {
        assertThrows(InputException.class, () -> PartChanges.parse("bob.mass"));
        InputException unit = assertThrows(InputException.class, () -> PartChanges.parse("bob.mass=2mm"));
        assertTrue(unit.getMessage().contains("not a unit of mass"), unit.getMessage());
        InputException field = assertThrows(InputException.class, () -> PartChanges.parse("bob.colour=2"));
        assertTrue(field.getMessage().contains("no field 'colour'"), field.getMessage());
        InputException part = assertThrows(InputException.class,
                () -> PartChanges.apply(PARTS, List.of(PartChanges.parse("lid.mass=1")), List.of(), List.of()));
        assertTrue(part.getMessage().contains("no part 'lid'") && part.getMessage().contains("arm, bob, tag"), part.getMessage());
        InputException shape = assertThrows(InputException.class,
                () -> PartChanges.apply(PARTS, List.of(PartChanges.parse("bob.radius=1mm")), List.of(), List.of()));
        assertTrue(shape.getMessage().contains("a point has no radius"), shape.getMessage());
        assertThrows(InputException.class, () -> PartChanges.parse("bob.quantity=1.5"));
    }
}
