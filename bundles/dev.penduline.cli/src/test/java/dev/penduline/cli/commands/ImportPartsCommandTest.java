package dev.penduline.cli.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.cli.ExitCode;
import dev.penduline.cli.JsonTree;

class ImportPartsCommandTest {

    private static final Path HATCH = Path.of("..", "..", "samples", "inspection-hatch", "hatch.penduline");

    @TempDir
    Path dir;

    private final CommandHarness cli = new CommandHarness();

    private ExitCode run(String... args) {
        return cli.run(args);
    }

    private static int count(String text, String tag) {
        Matcher m = Pattern.compile("<" + tag + ">").matcher(text);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @Test
    void intoReplacesThePartsKeepsSessionsAndFitsAndMarksTheFitsStale() throws Exception {
        Path file = Files.copy(HATCH, dir.resolve("hatch.penduline"));
        String before = Files.readString(file);
        // a point mass m = 2 kg at r = 1 m: J0 = m r² = 2 kg·m² (parallel-axis theorem)
        Path parts = Files.writeString(dir.resolve("new.csv"), "name,shape,mass_kg,x_m,y_m,z_m\nbob,point,2,0,-1,0\n");
        assertEquals(ExitCode.OK, run("import-parts", parts.toString(), "--into", file.toString()), cli.err());
        String after = Files.readString(file);
        assertEquals(1, count(after, "part"));
        assertEquals(count(before, "session"), count(after, "session"));
        assertEquals(count(before, "fitResult"), count(after, "fitResult"));
        assertTrue(after.contains("<key>stale</key>"), after);
        assertTrue(cli.out().contains("marked the"), cli.out());
        cli.clear();
        assertEquals(ExitCode.OK, run("inertia", file.toString(), "--json"), cli.err());
        assertEquals(2, JsonTree.number(JsonTree.parse(cli.out()), "pivot_inertia_kg_m2"), 1e-12, cli.out());
        cli.clear();
        assertEquals(ExitCode.OK, run("predict", file.toString(), "--theta0-deg", "10", "--draws", "0", "--json"),
                cli.err());
        assertTrue(cli.err().contains("is stale: parts replaced from new.csv"), cli.err());
        assertTrue(cli.out().contains("\"fit_stale\""), cli.out());
    }

    @Test
    void toAndIntoTogetherAreRefused() {
        assertEquals(ExitCode.USAGE_OR_INPUT, run("import-parts", "a.csv", "--to", "x.penduline", "--into", "y.penduline"));
        assertTrue(cli.err().contains("either --to"), cli.err());
    }
}
