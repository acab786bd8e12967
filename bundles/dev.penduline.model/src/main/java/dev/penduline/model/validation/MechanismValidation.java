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
        return messages(validate(mechanism), Diagnostic.WARNING);
    }

    /**
     * The messages of the errors only (what blocks a computation).
     *
     * @param mechanism the mechanism
     * @return one line per error
     */
    public static List<String> errors(Mechanism mechanism) {
        return messages(validate(mechanism), Diagnostic.ERROR);
    }

    /**
     * The messages of a diagnostic tree at or above a severity, in the order of the model: a
     * caller that wants both the errors and the warnings validates once and asks twice.
     *
     * @param diagnostic      what {@link #validate} gave
     * @param minimumSeverity {@link Diagnostic#ERROR} for the errors only, {@link Diagnostic#WARNING}
     *                        for every problem
     * @return one line per problem
     */
    public static List<String> messages(Diagnostic diagnostic, int minimumSeverity) {
        final List<String> out = new ArrayList<>();
        collect(diagnostic, out, minimumSeverity);
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
