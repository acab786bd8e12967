package dev.penduline.model.validation;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EValidator;
import org.eclipse.emf.ecore.util.EObjectValidator;

import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.TestSession;

/**
 * The domain rules of a mechanism file as an EMF {@link EValidator}: EMF's own structural checks
 * first, then the {@link MechanismRule}s of each element. Never stops at the first problem; each
 * diagnostic names its element ("part 'rib': mass must be positive (got -0.2 kg)") and carries
 * the element and feature as data. Stateless.
 */
public final class MechanismValidator implements EValidator {

    /** Creates the validator. */
    public MechanismValidator() {
        super();
    }

    /**
     * Registers this validator for the mechanism package in a registry (e.g. a Diagnostician's
     * own, or {@code EValidator.Registry.INSTANCE} where an application wants it global).
     *
     * @param registry the registry to add to
     * @return the registry
     */
    public EValidator.Registry registerIn(EValidator.Registry registry) {
        registry.put(PendulinePackage.eINSTANCE, this);
        return registry;
    }

    @Override
    public boolean validate(EObject eObject, DiagnosticChain diagnostics, Map<Object, Object> context) {
        return validate(eObject.eClass(), eObject, diagnostics, context);
    }

    @Override
    public boolean validate(EClass eClass, EObject eObject, DiagnosticChain diagnostics, Map<Object, Object> context) {
        final boolean structural = EObjectValidator.INSTANCE.validate(eClass, eObject, diagnostics, context);
        if (!structural && diagnostics == null) {
            return false;
        }
        final Problems out = new Problems(diagnostics);
        switch (eObject) {
            case Mechanism m -> MechanismRules.check(m, out);
            case Part p -> PartRules.check(p, out);
            case FrictionHypothesis h -> FrictionRules.check(h, out);
            case FrictionTerm t -> FrictionRules.check(t, out);
            case TestSession s -> SessionRules.check(s, out);
            case FitResult f -> FitRules.check(f, out);
            default -> {
                // Estimates, settings and the like have no rules of their own; FitRules checks them.
            }
        }
        return structural && out.clean();
    }

    @Override
    public boolean validate(EDataType eDataType, Object value, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        return EObjectValidator.INSTANCE.validate(eDataType, value, diagnostics, context);
    }
}
