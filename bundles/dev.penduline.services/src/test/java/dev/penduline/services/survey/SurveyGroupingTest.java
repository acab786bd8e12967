package dev.penduline.services.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.services.InputException;

/** A manifest that is not UTF-8 is refused as such, by its file (a Java decoding failure is an IOException). */
class SurveyGroupingTest {

    @TempDir
    Path dir;

    @Test
    void aLatin1ManifestIsNotUtf8Text() throws Exception {
        Path manifest = dir.resolve("units.csv");
        // "file,unit" then a Latin-1 "é" (0xE9), which is no UTF-8 sequence on its own
        Files.write(manifest, new byte[] {'f', 'i', 'l', 'e', ',', 'u', 'n', 'i', 't', '\n', 'a', (byte) 0xE9, ',', '1', '\n'});
        InputException e = assertThrows(InputException.class, () -> SurveyGrouping.byManifest(manifest, "unit"));
        assertEquals(manifest + ": is not UTF-8 text", e.getMessage());
    }
}
