package dev.penduline.model.validation;

import java.util.List;

import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.model.TestSession;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.inertia.PivotInertia;

/** The rules of the mechanism as a whole: gravity, axis, identifiers, and the inertia engine's checks. */
final class MechanismRules {

    private MechanismRules() {
    }

    static void check(Mechanism m, Problems out) {
        final String who = "mechanism '" + (Problems.blank(m.getName()) ? "(unnamed)" : m.getName()) + "'";
        if (Problems.blank(m.getName())) {
            out.warning(MechanismRule.NAME, m, Literals.MECHANISM__NAME, who + ": has no name");
        }
        if (!Problems.positive(m.getGravity())) {
            out.error(MechanismRule.GRAVITY, m, Literals.MECHANISM__GRAVITY,
                    who + ": gravity must be positive (got " + m.getGravity() + " m/s²)");
        }
        boolean axisUsable = true;
        try {
            MechanismAdapter.gravityDirection(m);
        } catch (InvalidValueException e) {
            axisUsable = false;
            out.error(MechanismRule.AXIS, m, Literals.MECHANISM__AXIS_DIRECTION_X, who + ": " + e.getMessage());
        }
        IdentifierRules.unique(m.getParts(), Part::getId, p -> "part '" + MechanismAdapter.label(p) + "'",
                Literals.PART__ID, out);
        IdentifierRules.unique(m.getFrictionHypotheses(), FrictionHypothesis::getId,
                h -> "hypothesis '" + h.getName() + "'", Literals.FRICTION_HYPOTHESIS__ID, out);
        IdentifierRules.unique(m.getSessions(), TestSession::getId, SessionRules::label,
                Literals.TEST_SESSION__ID, out);
        SessionRules.duplicates(m.getSessions(), out);
        IdentifierRules.unique(m.getFitResults(), FitResult::getId, f -> "fit '" + f.getName() + "'",
                Literals.FIT_RESULT__ID, out);
        if (axisUsable && Problems.positive(m.getGravity())) {
            inertia(m, who, out);
        }
    }

    /**
     * The inertia engine's checks of the whole parts list (positive total mass, J0 ≥ m·Lc²).
     * Only possible when every part converts; otherwise the parts' own rules have reported why.
     * Tensor problems are reported per part already and are skipped here.
     */
    private static void inertia(Mechanism m, String who, Problems out) {
        final List<dev.penduline.physics.inertia.Part> parts;
        final PivotInertia engine;
        try {
            parts = MechanismAdapter.parts(m);
            engine = MechanismAdapter.pivotInertia(m);
        } catch (InvalidValueException e) {
            return;
        }
        if (parts.isEmpty()) {
            out.warning(MechanismRule.INERTIA, m, Literals.MECHANISM__PARTS,
                    who + ": has no parts yet, so its inertia cannot be computed");
            return;
        }
        for (String problem : engine.problems(parts)) {
            if (problem.startsWith("part '") && problem.contains("inertia tensor")) {
                continue;
            }
            out.error(MechanismRule.INERTIA, m, Literals.MECHANISM__PARTS,
                    problem.startsWith("part '") ? problem : who + ": " + problem);
        }
    }
}
