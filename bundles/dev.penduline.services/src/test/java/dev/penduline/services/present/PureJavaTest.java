package dev.penduline.services.present;

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

/** The figures are plain Java: no EMF, no OSGi, no user interface, nothing else of Penduline. */
class PureJavaTest {

    private static final Pattern IMPORT = Pattern.compile("^import (static )?([\\w.]+)", Pattern.MULTILINE);

    @Test
    void thePackageImportsOnlyTheJavaPlatform() throws IOException {
        Path sources = Paths.get("src/main/java/dev/penduline/services/present");
        assertTrue(Files.isDirectory(sources), sources.toAbsolutePath().toString());
        List<String> found = new ArrayList<>();
        try (Stream<Path> files = Files.list(sources)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                Matcher m = IMPORT.matcher(Files.readString(f));
                while (m.find()) {
                    if (!m.group(2).startsWith("java.")) {
                        found.add(f.getFileName() + " imports " + m.group(2));
                    }
                }
            }
        }
        assertEquals(List.of(), found);
    }
}
