package dev.penduline.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The layering rule of the architecture (docs/architecture.md §1 "The layers"), enforced: the
 * physics and the model run headless and outside OSGi, so nothing in them may import a user
 * interface, a workbench, OSGi or the workspace; the physics may not import EMF either, and no
 * lower layer imports a higher one. Checked on the import lines of the sources (the bundle
 * manifests state the same rule to OSGi).
 */
class LayeringTest {

    private static final Pattern IMPORT = Pattern.compile("^import (static )?([\\w.]+)", Pattern.MULTILINE);

    private static final Path BUNDLES = Paths.get("..").toAbsolutePath().normalize();

    private static List<String> violations(String bundle, List<String> forbidden) throws IOException {
        Path sources = BUNDLES.resolve(bundle).resolve("src/main/java");
        List<String> found = new ArrayList<>();
        try (Stream<Path> files = Files.walk(sources)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                Matcher m = IMPORT.matcher(Files.readString(f));
                while (m.find()) {
                    String imported = m.group(2);
                    for (String prefix : forbidden) {
                        if (imported.startsWith(prefix)) {
                            found.add(sources.relativize(f) + " imports " + imported);
                        }
                    }
                }
            }
        }
        return found;
    }

    @Test
    void theBundlesAreWhereTheTestExpectsThem() {
        assertTrue(Files.isDirectory(BUNDLES.resolve("dev.penduline.physics/src/main/java")), BUNDLES.toString());
        assertTrue(Files.isDirectory(BUNDLES.resolve("dev.penduline.model/src/main/java")), BUNDLES.toString());
    }

    @Test
    void physicsUsesNothingButJavaAndHipparchus() throws IOException {
        assertEquals(List.of(), violations("dev.penduline.physics", List.of("org.eclipse.", "org.osgi.", "javax.swing",
                "java.awt", "dev.penduline.model", "dev.penduline.records", "dev.penduline.services",
                "dev.penduline.cli", "dev.penduline.ui", "dev.penduline.app")));
    }

    @Test
    void modelStaysHeadlessAndBelowTheRecordsServicesAndUi() throws IOException {
        List<String> forbidden = List.of("org.eclipse.swt", "org.eclipse.jface", "org.eclipse.ui", "org.eclipse.e4",
                "org.eclipse.core.resources", "org.osgi.", "dev.penduline.records", "dev.penduline.services",
                "dev.penduline.cli", "dev.penduline.ui", "dev.penduline.app");
        assertEquals(List.of(), violations("dev.penduline.model", forbidden));
    }

    @Test
    void recordsAndServicesNeverReachForTheUserInterface() throws IOException {
        List<String> forbidden = List.of("org.eclipse.swt", "org.eclipse.jface", "org.eclipse.ui", "org.eclipse.e4",
                "dev.penduline.cli", "dev.penduline.ui", "dev.penduline.app");
        assertEquals(List.of(), violations("dev.penduline.records", forbidden));
        assertEquals(List.of(), violations("dev.penduline.services", forbidden));
    }

    @Test
    void reportsAreMadeHeadlessBelowTheCommandLineAndTheWorkbench() throws IOException {
        // the plots are drawn with JFreeChart on an SVG canvas (java.awt.geom, never a window)
        List<String> forbidden = List.of("org.eclipse.swt", "org.eclipse.jface", "org.eclipse.ui", "org.eclipse.e4",
                "org.eclipse.core.resources", "org.osgi.", "javax.swing", "dev.penduline.cli", "dev.penduline.ui",
                "dev.penduline.app");
        assertEquals(List.of(), violations("dev.penduline.report", forbidden));
    }
}
