package dev.penduline.model.persistence.internal;

import java.util.Map;

import org.eclipse.emf.common.util.EList;
import org.eclipse.emf.common.util.TreeIterator;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.TermSetScore;

/**
 * The words mechanism files used before each concept got one word everywhere (the parts list's
 * shape words, the command line's term and unit words), and their migration on load: an old file
 * reads as if written in the new words, and the next save writes the new words.
 *
 * <p>Old enumeration literals: shapes {@code point-mass}, {@code slender-rod}, {@code thin-ring}
 * and {@code mass-properties} (now {@code point}, {@code rod}, {@code ring}, {@code tensor}), the
 * friction kind {@code quadratic-drag} (now {@code drag}) and the angle unit {@code count} (now
 * {@code counts}). Old identifiers: a drag term's default id {@code quadratic-drag} becomes
 * {@code drag} (when no other term of its hypothesis has that id), and so does every reference to
 * it from a fit result.
 */
public final class FormerWords {

    /** The id and kind literal drag terms had before; the new one is {@link FrictionKind#DRAG}'s literal. */
    static final String FORMER_DRAG = "quadratic-drag";

    private static final Map<EDataType, Map<String, String>> LITERALS = Map.of(
            PendulinePackage.Literals.SHAPE_KIND, Map.of("point-mass", "point", "slender-rod", "rod",
                    "thin-ring", "ring", "mass-properties", "tensor"),
            PendulinePackage.Literals.FRICTION_KIND, Map.of(FORMER_DRAG, FrictionKind.DRAG.getLiteral()),
            PendulinePackage.Literals.ANGLE_UNIT, Map.of("count", "counts"));

    private FormerWords() {
    }

    /**
     * The current literal for a value read from a file.
     *
     * @param type  the value's data type
     * @param value the text in the file
     * @return the current literal when {@code value} is a former one of an enumeration, else {@code value}
     */
    public static String literal(EDataType type, String value) {
        final Map<String, String> former = LITERALS.get(type);
        return former == null || value == null ? value : former.getOrDefault(value.strip(), value);
    }

    /**
     * Renames the former drag identifier in a loaded resource.
     *
     * @param resource the loaded resource
     */
    public static void migrate(Resource resource) {
        final String drag = FrictionKind.DRAG.getLiteral();
        for (TreeIterator<EObject> all = resource.getAllContents(); all.hasNext();) {
            switch (all.next()) {
                case FrictionTerm t when FORMER_DRAG.equals(t.getId()) && t.getKind() == FrictionKind.DRAG
                        && t.eContainer() instanceof FrictionHypothesis h
                        && h.getTerms().stream().noneMatch(o -> drag.equals(o.getId())) -> t.setId(drag);
                case FitResult f -> rename(f.getTermIds(), drag);
                case TermSetScore s -> rename(s.getTermIds(), drag);
                case EnergyShare e when FORMER_DRAG.equals(e.getTermId()) -> e.setTermId(drag);
                default -> {
                }
            }
        }
    }

    private static void rename(EList<String> ids, String drag) {
        final int i = ids.indexOf(FORMER_DRAG);
        if (i >= 0 && !ids.contains(drag)) {
            ids.set(i, drag);
        }
    }
}
