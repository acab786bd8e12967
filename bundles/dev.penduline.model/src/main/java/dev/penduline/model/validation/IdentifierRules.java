package dev.penduline.model.validation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;

/** Identifiers are unique among siblings. */
final class IdentifierRules {

    private IdentifierRules() {
    }

    static <T extends EObject> void unique(List<T> siblings, Function<T, String> id, Function<T, String> who,
            EAttribute feature, Problems out) {
        final Map<String, T> seen = new HashMap<>();
        for (T element : siblings) {
            final String value = id.apply(element);
            if (Problems.blank(value)) {
                continue;
            }
            final T first = seen.putIfAbsent(value, element);
            if (first != null) {
                out.error(MechanismRule.IDENTIFIER, element, feature, who.apply(element) + ": identifier '" + value
                        + "' is already used by " + who.apply(first) + "; identifiers must be unique");
            }
        }
    }
}
