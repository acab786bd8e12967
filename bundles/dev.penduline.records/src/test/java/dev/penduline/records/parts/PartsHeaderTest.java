package dev.penduline.records.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The edit distance behind the typo check. */
class PartsHeaderTest {

    @Test
    void editDistanceOfClassicPairs() {
        // Levenshtein's classic example: kitten → sitting needs 3 edits (Levenshtein 1966;
        // Wagner & Fischer 1974); an adjacent swap counts 1 in the optimal-string-alignment variant.
        assertEquals(3, PartsHeader.editDistance("kitten", "sitting"));
        assertEquals(1, PartsHeader.editDistance("lenght_m", "length_m"));
        assertEquals(0, PartsHeader.editDistance("x_m", "x_m"));
        assertEquals(3, PartsHeader.editDistance("", "abc"));
    }

    @Test
    void shortNamesNeedACloserMatch() {
        assertTrue(PartsHeader.isNearMiss("nmae", "name"));
        assertFalse(PartsHeader.isNearMiss("note", "name"));
        assertTrue(PartsHeader.isNearMiss("radus_m", "radius_m"));
        assertFalse(PartsHeader.isNearMiss("radius_m", "radius_m"));
    }
}
