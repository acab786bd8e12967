package dev.penduline.cli.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;

class InertiaCommandTest {

    @TempDir
    Path dir;

    private final CommandHarness cli = new CommandHarness();

    private ExitCode run(String... args) {
        return cli.run(args);
    }

    @Test
    void slenderRodHungFromItsEndGivesTheHandbookInertia() throws IOException {
        // Slender rod about its end: J0 = m L²/3 (Meriam & Kraige, Dynamics, Table D/4);
        // m = 3 kg, L = 1.2 m: J0 = 1.44 kg·m², Lc = 0.6 m, Leq = 2L/3 = 0.8 m.
        Path csv = Files.writeString(dir.resolve("arm.csv"),
                "name,shape,mass_kg,x_m,y_m,z_m,length_m,axis\narm,rod,3,0,-0.6,0,1.2,y\n");
        assertEquals(ExitCode.OK, run("inertia", csv.toString(), "--json"), cli.err());
        String json = cli.out();
        assertEquals(3.0, JsonTree.requiredNumber(json, "mass_kg"), 1e-12);
        assertEquals(1.44, JsonTree.requiredNumber(json, "pivot_inertia_kg_m2"), 1e-12);
        assertEquals(0.6, JsonTree.requiredNumber(json, "centroid_distance_m"), 1e-12);
        assertEquals(0.8, JsonTree.requiredNumber(json, "equivalent_length_m"), 1e-12);
        assertEquals(1.0, JsonTree.requiredNumber(json, "parts", 0, "share"), 1e-12);
    }

    @Test
    void toleranceColumnsGiveTheSpreadOfAPointMass() throws IOException {
        // point mass m ± a at r ± b below the axis: J0 = m r², so by the law of propagation (GUM 5.1.2)
        // with uniform tolerances u = tol/√3 (GUM 4.3.7): u(m) = a/√3, u(Lc) = b/√3 and
        // u(J0) = sqrt((r² u(m))² + (2 m r u(r))²)
        Path csv = Files.writeString(dir.resolve("bob.csv"),
                "name,shape,mass_kg,x_m,y_m,z_m,mass_tol_kg,dim_tol_mm\nbob,point,2,0,-1,0,0.1,5\n");
        assertEquals(ExitCode.OK, run("inertia", csv.toString(), "--draws", "10000", "--json"), cli.err());
        String json = cli.out();
        double um = 0.1 / Math.sqrt(3);
        double ur = 0.005 / Math.sqrt(3);
        double uj = Math.sqrt(Math.pow(1 * um, 2) + Math.pow(2 * 2 * 1 * ur, 2));
        // Monte Carlo standard deviations of 10 000 draws: within 3 % (standard error ≈ 0.7 %)
        assertEquals(um, JsonTree.requiredNumber(json, "mass_kg_sigma"), 0.03 * um);
        assertEquals(ur, JsonTree.requiredNumber(json, "centroid_distance_m_sigma"), 0.03 * ur);
        assertEquals(uj, JsonTree.requiredNumber(json, "pivot_inertia_kg_m2_sigma"), 0.03 * uj);
        assertTrue(JsonTree.at(JsonTree.parse(json), "tolerance_spread") instanceof Map, json);
        cli.clearOut();
        assertEquals(ExitCode.OK, run("inertia", csv.toString()), cli.err());
        assertTrue(cli.out().contains("within the parts' tolerances (2000 Monte Carlo draws"), cli.out());
    }

    @Test
    void readableReportEndsWithTheCaution() throws IOException {
        Path csv = Files.writeString(dir.resolve("bob.csv"), "name,shape,mass_kg,x_m,y_m,z_m\nbob,point,2,0,-1,0\n");
        assertEquals(ExitCode.OK, run("inertia", csv.toString()));
        // a point mass m = 2 kg at r = 1 m: J0 = m r² = 2 kg·m², printed to four significant digits
        assertTrue(cli.out().contains("inertia about the pivot J0      2.000 kg·m²"), cli.out());
        // the simple pendulum of length 1 m: T0 = 2π √(L/g) = 2.006 s (g = 9.80665 m/s², the classic result)
        assertTrue(cli.out().contains("small-angle period T0           2.006 s"), cli.out());
        assertTrue(cli.out().contains("100.0 %"), "the bob's share " + cli.out());
        assertTrue(cli.out().contains("Caution"), cli.out());
    }

    @Test
    void aBadCellIsAnInputErrorNamingFileLineAndColumn() throws IOException {
        Path csv = Files.writeString(dir.resolve("bad.csv"), "name,shape,mass_kg,x_m,y_m,z_m\nbob,point,abc,0,-1,0\n");
        assertEquals(ExitCode.USAGE_OR_INPUT, run("inertia", csv.toString()));
        assertTrue(cli.err().contains("bad.csv:2") && cli.err().contains("mass_kg"), cli.err());
    }

    @Test
    void aMissingFileAndAMissingArgumentAreUsageErrors() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("inertia", dir.resolve("none.csv").toString()));
        assertTrue(cli.err().contains("no such file"), cli.err());
        assertEquals(ExitCode.USAGE_OR_INPUT, run("inertia"));
        assertEquals(ExitCode.USAGE_OR_INPUT, run("inertia", "x.csv", "--frobnicate"));
        assertTrue(cli.err().contains("unknown option --frobnicate"), cli.err());
    }
}
