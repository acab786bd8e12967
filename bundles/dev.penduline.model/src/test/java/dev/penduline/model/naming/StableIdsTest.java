package dev.penduline.model.naming;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;

class StableIdsTest {

    @Test
    void slugIsLowerCaseWordsJoinedByHyphens() {
        assertEquals("lid-plate", StableIds.slug("Lid plate", "part"));
        assertEquals("release-at-30", StableIds.slug("Release at 30°", "session"));
        assertEquals("rib-left-2", StableIds.slug("  Rib (left) ×2 ", "part"));
        assertEquals("daempfer-eco", StableIds.slug("Daempfer Éco", "part"));
        assertEquals("part", StableIds.slug(" ### ", "part"));
        assertEquals("part", StableIds.slug(null, "part"));
    }

    @Test
    void uniqueAppendsTheFirstFreeNumber() {
        assertEquals("rib", StableIds.unique("rib", List.of("lid")));
        assertEquals("rib-3", StableIds.unique("rib", List.of("rib", "rib-2")));
    }

    @Test
    void namedElementsGetStableIdsThatSurviveRenaming() {
        final Mechanism m = NamedElements.mechanism("Hatch");
        final Part first = NamedElements.addPart(m, "Rib");
        final Part second = NamedElements.addPart(m, "rib");
        assertEquals("rib", first.getId());
        assertEquals("rib-2", second.getId());
        first.setName("Left rib");
        assertEquals("rib", first.getId());
        final FrictionHypothesis h = NamedElements.addHypothesis(m, "Coulomb only");
        assertEquals("coulomb", NamedElements.addTerm(h, FrictionKind.COULOMB).getId());
        assertEquals("drag", NamedElements.addTerm(h, FrictionKind.DRAG).getId());
        assertEquals("coulomb-only", h.getId());
    }
}
