package dev.penduline.physics.inertia;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

class ToleranceSpreadTest {

    private static final double M = 2.0;
    private static final double L = 0.8;
    private static final double D = 0.5;
    private static final double MASS_TOL = 0.05;
    private static final double DIM_TOL = 0.002;

    /** A slender rod along x, its centroid D below the pivot axis (the z axis through the origin). */
    private static List<Part> rod() {
        return List.of(Part.of("arm", new SlenderRod(L, Axis.X), M, new Vector3D(0, -D, 0))
                .withTolerance(new PartTolerance(MASS_TOL, DIM_TOL)));
    }

    @Test
    void theSpreadOfASingleRodMatchesTheHandDifferentiatedParallelAxisFormula() {
        // J0 = m (L²/12 + x² + y²) (slender rod about a perpendicular axis through its centre,
        // Gere & Timoshenko table; parallel-axis theorem). Differentiated by hand at x = 0, y = −D:
        // ∂J0/∂m = L²/12 + D², ∂J0/∂L = m L / 6, ∂J0/∂y = 2 m y, ∂J0/∂x = ∂J0/∂z = 0; each ± tolerance
        // a uniform distribution with u = tol/√3 (GUM 4.3.7), combined in quadrature (GUM 5.1.2).
        final double um = MASS_TOL / Math.sqrt(3);
        final double ud = DIM_TOL / Math.sqrt(3);
        final double sigmaJ = Math.sqrt(Math.pow((L * L / 12 + D * D) * um, 2) + Math.pow(M * L / 6 * ud, 2)
                + Math.pow(2 * M * D * ud, 2));
        final ToleranceSpread.Result r = ToleranceSpread.of(PivotInertia.DEFAULT, rod(), 20000, 3);
        assertEquals(M * (L * L / 12 + D * D), r.pivotInertia().nominal(), 1e-15);
        assertEquals(sigmaJ, r.pivotInertia().linearSigma(), 1e-6 * sigmaJ);
        // the Monte Carlo standard deviation from 20 000 draws: standard error about σ/√(2N) = 0.5 %
        assertEquals(sigmaJ, r.pivotInertia().sigma(), 0.03 * sigmaJ);
        // m alone carries the mass tolerance; Lc = sqrt(x² + y²) moves one for one with y
        assertEquals(um, r.mass().linearSigma(), 1e-9 * um);
        assertEquals(um, r.mass().sigma(), 0.03 * um);
        assertEquals(ud, r.centroidDistance().linearSigma(), 1e-6 * ud);
        assertEquals(ud, r.centroidDistance().sigma(), 0.03 * ud);
        // a uniform variable's 5th and 95th percentiles are at ∓0.9 of its half-width
        assertEquals(M - 0.9 * MASS_TOL, r.mass().p5(), 0.02 * MASS_TOL);
        assertEquals(M + 0.9 * MASS_TOL, r.mass().p95(), 0.02 * MASS_TOL);
        assertEquals(0, r.failed());
        assertEquals(20000, r.draws().size());
        // T0 = 2π sqrt(J0 / (m g Lc)): its linear spread from the three (GUM 5.1.2, by hand)
        final double g = PivotInertia.DEFAULT.gravity();
        final double t0 = 2 * Math.PI * Math.sqrt(M * (L * L / 12 + D * D) / (M * g * D));
        assertEquals(t0, r.period().nominal(), 1e-12);
        // T0 = 2π sqrt((L²/12 + D²)/(g D)) does not depend on m; ∂T0/∂L and ∂T0/∂D by hand
        final double k = (L * L / 12 + D * D);
        final double dTdL = t0 / 2 * (L / 6) / k;
        final double dTdD = t0 / 2 * (2 * D / k - 1 / D);
        final double sigmaT = Math.sqrt(Math.pow(dTdL * ud, 2) + Math.pow(dTdD * ud, 2));
        assertEquals(sigmaT, r.period().linearSigma(), 1e-5 * sigmaT);
    }

    @Test
    void withoutTolerancesThereIsNothingToSpreadAndASeedRepeats() {
        assertFalse(ToleranceSpread.applies(List.of(Part.of("arm", new SlenderRod(L, Axis.X), M, new Vector3D(0, -D, 0)))));
        assertTrue(ToleranceSpread.applies(rod()));
        final ToleranceSpread.Result a = ToleranceSpread.of(PivotInertia.DEFAULT, rod(), 50, 9);
        final ToleranceSpread.Result b = ToleranceSpread.of(PivotInertia.DEFAULT, rod(), 50, 9);
        assertEquals(a.pivotInertia(), b.pivotInertia());
    }

    @Test
    void drawsThatCannotBeComputedAreCountedNotFatal() {
        // a rod 1 mm long with a 2 mm dimension tolerance goes below zero length in about a quarter of the draws
        final List<Part> shortRod = List.of(Part.of("pin", new SlenderRod(0.001, Axis.X), 0.1, new Vector3D(0, -0.3, 0))
                .withTolerance(new PartTolerance(0, 0.002)));
        final ToleranceSpread.Result r = ToleranceSpread.of(PivotInertia.DEFAULT, shortRod, 2000, 1);
        assertTrue(r.failed() > 300 && r.failed() < 700, "failed " + r.failed());
        assertEquals(2000 - r.failed(), r.draws().size());
    }
}
