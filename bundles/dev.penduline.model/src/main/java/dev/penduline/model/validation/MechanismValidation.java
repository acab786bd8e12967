package dev.penduline.model.validation;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.EValidator;
import org.eclipse.emf.ecore.impl.EValidatorRegistryImpl;
import org.eclipse.emf.ecore.util.Diagnostician;

import dev.penduline.model.Mechanism;

/**
 * Validates a mechanism with the core EMF {@link Diagnostician} and Penduline's rules, without
 * touching EMF's global validator registry: the place to start.
 */
public final class MechanismValidation {

    private MechanismValidation() {
    }

    /**
     * Validates the whole mechanism: every problem at once.
     *
     * @param mechanism the mechanism
     * @return the diagnostic tree; {@code OK} when there is nothing to report
     */
    public static Diagnostic validate(Mechanism mechanism) {
        final EValidator.Registry registry = new MechanismValidator().registerIn(new EValidatorRegistryImpl());
        return new Diagnostician(registry).validate(mechanism);
    }

    /**
     * The messages of all errors and warnings, in the order of the model.
     *
     * @param mechanism the mechanism
     * @return one line per problem, each naming its element; empty when the mechanism is valid
     */
    public static List<String> problems(Mechanism mechanism) {
        final List<String> out = new ArrayList<>();
        collect(validate(mechanism), out, Diagnostic.WARNING);
        return out;
    }

    /**
     * The messages of the errors only (what blocks a computation).
     *
     * @param mechanism the mechanism
     * @return one line per error
     */
    public static List<String> errors(Mechanism mechanism) {
        final List<String> out = new ArrayList<>();
        collect(validate(mechanism), out, Diagnostic.ERROR);
        return out;
    }

    private static void collect(Diagnostic d, List<String> out, int minimumSeverity) {
        if (d.getChildren().isEmpty()) {
            if (d.getSeverity() >= minimumSeverity) {
                out.add(d.getMessage());
            }
            return;
        }
        for (Diagnostic child : d.getChildren()) {
            collect(child, out, minimumSeverity);
        }
    }
}
