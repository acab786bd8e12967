package dev.penduline.model.validation;

import java.util.EnumMap;
import java.util.Map;

import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.model.adapt.FrictionKinds;

/** The rules of friction hypotheses and their terms. */
final class FrictionRules {

    private FrictionRules() {
    }

    static void check(FrictionHypothesis h, Problems out) {
        final String who = "hypothesis '" + label(h) + "'";
        if (Problems.blank(h.getId())) {
            out.error(MechanismRule.IDENTIFIER, h, Literals.FRICTION_HYPOTHESIS__ID, who + ": has no identifier");
        }
        if (Problems.blank(h.getName())) {
            out.warning(MechanismRule.NAME, h, Literals.FRICTION_HYPOTHESIS__NAME, who + ": has no name");
        }
        IdentifierRules.unique(h.getTerms(), FrictionTerm::getId, t -> who + ", term '" + t.getId() + "'",
                Literals.FRICTION_TERM__ID, out);
        final Map<FrictionKind, FrictionTerm> byKind = new EnumMap<>(FrictionKind.class);
        for (FrictionTerm t : h.getTerms()) {
            if (byKind.putIfAbsent(t.getKind(), t) != null) {
                out.error(MechanismRule.FRICTION_SET, t, Literals.FRICTION_TERM__KIND,
                        who + ": has more than one " + t.getKind().getLiteral() + " term");
            }
        }
        stictionAtLeastCoulomb(who, byKind.get(FrictionKind.STICTION), byKind.get(FrictionKind.COULOMB), out);
    }

    static void check(FrictionTerm t, Problems out) {
        final String who = (t.eContainer() instanceof FrictionHypothesis h ? "hypothesis '" + label(h) + "', " : "")
                + "term '" + (Problems.blank(t.getId()) ? t.getKind().getLiteral() : t.getId()) + "'";
        final String unit = unit(t.getKind());
        if (Problems.blank(t.getId())) {
            out.error(MechanismRule.IDENTIFIER, t, Literals.FRICTION_TERM__ID, who + ": has no identifier");
        }
        if (!(t.getLowerBound() >= 0) || Double.isInfinite(t.getLowerBound())) {
            out.error(MechanismRule.FRICTION_BOUNDS, t, Literals.FRICTION_TERM__LOWER_BOUND, who
                    + ": lower bound must be zero or positive, friction only dissipates (got " + t.getLowerBound()
                    + " " + unit + ")");
        }
        if (t.isSetUpperBound() && !(t.getUpperBound() >= t.getLowerBound())) {
            out.error(MechanismRule.FRICTION_BOUNDS, t, Literals.FRICTION_TERM__UPPER_BOUND, who + ": upper bound "
                    + t.getUpperBound() + " " + unit + " is below the lower bound " + t.getLowerBound() + " " + unit);
        }
        if (t.isSetValue()) {
            final double v = t.getValue();
            if (!Double.isFinite(v) || v < t.getLowerBound() || (t.isSetUpperBound() && v > t.getUpperBound())) {
                out.error(MechanismRule.FRICTION_BOUNDS, t, Literals.FRICTION_TERM__VALUE, who + ": value " + v + " "
                        + unit + " lies outside its bounds [" + t.getLowerBound() + ", "
                        + (t.isSetUpperBound() ? t.getUpperBound() : "∞") + "] " + unit);
            }
        } else if (t.isFixed()) {
            out.error(MechanismRule.FRICTION_BOUNDS, t, Literals.FRICTION_TERM__VALUE,
                    who + ": a fixed term needs a value");
        }
    }

    /** Static friction can hold what dynamic friction can: Ts ≥ Tc (docs/physics.md §3 "Friction and drag torques"). */
    private static void stictionAtLeastCoulomb(String who, FrictionTerm stiction, FrictionTerm coulomb, Problems out) {
        if (stiction == null || coulomb == null) {
            return;
        }
        if (stiction.isSetValue() && coulomb.isSetValue() && stiction.getValue() < coulomb.getValue()) {
            out.error(MechanismRule.FRICTION_SET, stiction, Literals.FRICTION_TERM__VALUE, who + ": stiction "
                    + stiction.getValue() + " N·m is below the Coulomb friction " + coulomb.getValue()
                    + " N·m; static friction is at least the sliding one (Ts ≥ Tc)");
        }
        if (stiction.isSetUpperBound() && stiction.getUpperBound() < coulomb.getLowerBound()) {
            out.error(MechanismRule.FRICTION_SET, stiction, Literals.FRICTION_TERM__UPPER_BOUND, who
                    + ": stiction's upper bound " + stiction.getUpperBound() + " N·m is below Coulomb's lower bound "
                    + coulomb.getLowerBound() + " N·m, so Ts ≥ Tc cannot hold");
        }
    }

    static String unit(FrictionKind kind) {
        return FrictionKinds.term(kind).unit();
    }

    private static String label(FrictionHypothesis h) {
        return Problems.blank(h.getName()) ? (Problems.blank(h.getId()) ? "(unnamed)" : h.getId()) : h.getName();
    }
}
