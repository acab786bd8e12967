package dev.penduline.model.validation;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

import dev.penduline.model.persistence.internal.LoadProblem;

/**
 * Collects the diagnostics of one element's rules; works with or without a chain. Names and
 * values from the file are echoed with their control characters escaped (a mechanism file may
 * hold tabs, line feeds and C1 controls in a name), so each message is one printable line.
 */
final class Problems {

    private final DiagnosticChain chain;
    private boolean clean = true;

    Problems(DiagnosticChain chain) {
        this.chain = chain;
    }

    void error(MechanismRule rule, EObject object, EStructuralFeature feature, String message) {
        add(Diagnostic.ERROR, rule, object, feature, message);
    }

    void warning(MechanismRule rule, EObject object, EStructuralFeature feature, String message) {
        add(Diagnostic.WARNING, rule, object, feature, message);
    }

    /** True while no error or warning was added. */
    boolean clean() {
        return clean;
    }

    private void add(int severity, MechanismRule rule, EObject object, EStructuralFeature feature, String message) {
        clean = false;
        if (chain != null) {
            final Object[] data = feature == null ? new Object[] {object} : new Object[] {object, feature};
            chain.add(new BasicDiagnostic(severity, MechanismRule.SOURCE, rule.code(), LoadProblem.printable(message), data));
        }
    }

    static boolean positive(double v) {
        return v > 0 && Double.isFinite(v);
    }

    static boolean blank(String s) {
        return s == null || s.isBlank();
    }
}
