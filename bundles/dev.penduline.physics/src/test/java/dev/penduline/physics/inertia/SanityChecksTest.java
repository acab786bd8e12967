package dev.penduline.physics.inertia;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Inconsistent inputs are refused with a message naming what to look at. */
class SanityChecksTest {

    @Test
    void zeroAxisIsRefused() {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new PivotAxis(Vector3.ZERO, Vector3.ZERO));
        assertTrue(e.getMessage().contains("direction"), e.getMessage());
    }

    @Test
    void emptyPartsListIsRefused() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> PivotInertia.DEFAULT.compute(List.of()))
                .getMessage().contains("empty"));
    }

    @Test
    void cutOutHeavierThanTheSolidIsNamed() {
        final Part plate = Part.of("plate", new Box(0.2, 0.2, 0.01), 1.0, new Vector3(0, -0.1, 0));
        final Part hole = Part.of("big hole", Cylinder.solid(0.1, 0.01, Axis.Z), 1.5, new Vector3(0, -0.1, 0))
                .withCutout(true);
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PivotInertia.DEFAULT.compute(List.of(plate, hole)));
        assertTrue(e.getMessage().contains("total mass") && e.getMessage().contains("'big hole'"), e.getMessage());
        assertEquals(1, PivotInertia.DEFAULT.problems(List.of(plate, hole)).size());
    }

    @Test
    void inertiaBelowThePointMassBoundNamesTheCutOut() {
        // 2 kg at 1 m less a 1 kg ring of radius 1 m centred there: M = 1 kg, Lc = 1 m, but
        // J0 = 2 − (1 + 1) = 0 < M Lc² = 1 kg·m² — impossible for a real body (parallel-axis
        // theorem: J0 = Jcg + m Lc² with Jcg ≥ 0, so J0 ≥ m Lc²).
        final Part solid = Part.of("weight", new PointMass(), 2, new Vector3(0, -1, 0));
        final Part ring = Part.of("groove", new ThinRing(1, Axis.Z), 1, new Vector3(0, -1, 0)).withCutout(true);
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PivotInertia.DEFAULT.compute(List.of(solid, ring)));
        assertTrue(e.getMessage().contains("M·Lc²") && e.getMessage().contains("'groove'"), e.getMessage());
    }

    @Test
    void oneAssessmentGivesTheProblemsAndTheSummaryOfTheTwoCalls() {
        // the groove case above: fatal, so no summary, and the problems as problems() lists them
        final Part solid = Part.of("weight", new PointMass(), 2, new Vector3(0, -1, 0));
        final Part ring = Part.of("groove", new ThinRing(1, Axis.Z), 1, new Vector3(0, -1, 0)).withCutout(true);
        final PivotInertia.Assessment bad = PivotInertia.DEFAULT.assess(List.of(solid, ring));
        assertEquals(PivotInertia.DEFAULT.problems(List.of(solid, ring)), bad.problems());
        assertEquals(List.of(bad.fatal().orElseThrow()), bad.problems());
        assertEquals(assertThrows(IllegalArgumentException.class, () -> PivotInertia.DEFAULT.compute(List.of(solid, ring)))
                .getMessage(), bad.fatal().get());
        assertTrue(bad.summary().isEmpty());
        // a point mass m at distance L: J0 = m·L² (classic result), 2 kg at 1 m gives 2 kg·m²
        final PivotInertia.Assessment good = PivotInertia.DEFAULT.assess(List.of(solid));
        assertEquals(List.of(), good.problems());
        assertTrue(good.fatal().isEmpty());
        assertEquals(2.0, good.summary().orElseThrow().pivotInertia(), 1e-12);
        assertEquals(PivotInertia.DEFAULT.compute(List.of(solid)), good.summary().get());
    }

    @Test
    void problemsListNamesAnInadmissibleTensor() {
        final Part bad = Part.ofTensor("bracket", 1, new Vector3(0, -0.2, 0), InertiaTensor.diagonal(0.001, 0.001, 0.003));
        final List<String> problems = PivotInertia.DEFAULT.problems(List.of(bad));
        assertTrue(problems.stream().anyMatch(p -> p.startsWith("part 'bracket'") && p.contains("triangle")),
                problems.toString());
    }

    @Test
    void badPartsAreRefusedByName() {
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> Part.of("shim", new PointMass(), -0.1, Vector3.ZERO)).getMessage().contains("'shim'"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> Part.of("shim", new PointMass(), 0.1, Vector3.ZERO).withQuantity(0)).getMessage().contains("quantity"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> Orientation.ofMatrix(new double[][] {{-1, 0, 0}, {0, 1, 0}, {0, 0, 1}})).getMessage().contains("reflection"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> PivotInertia.DEFAULT.withGravity(0)).getMessage().contains("gravity"));
    }

    @Test
    void tolerancesAreCarried() {
        final Part p = Part.of("cast", new Sphere(0.05), 4, Vector3.ZERO).withTolerance(new PartTolerance(0.1, 0.001));
        assertEquals(0.1, p.tolerance().mass(), 0);
        assertEquals(0.001, p.tolerance().dimension(), 0);
        assertThrows(IllegalArgumentException.class, () -> new PartTolerance(-1, 0));
    }
}
