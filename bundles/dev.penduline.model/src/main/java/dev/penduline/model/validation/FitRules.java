package dev.penduline.model.validation;

import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.Set;
import java.util.stream.Collectors;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.Mechanism;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.model.SessionFit;
import dev.penduline.model.TestSession;

/** The rules of a stored fit result. */
final class FitRules {

    /** Rounding allowed on stored correlations and shares. */
    private static final double SLACK = 1e-9;

    private FitRules() {
    }

    static void check(FitResult f, Problems out) {
        final String who = "fit '" + (Problems.blank(f.getName()) ? (Problems.blank(f.getId()) ? "(unnamed)"
                : f.getId()) : f.getName()) + "'";
        if (Problems.blank(f.getId())) {
            out.error(MechanismRule.IDENTIFIER, f, Literals.FIT_RESULT__ID, who + ": has no identifier");
        }
        time(f, who, out);
        numbers(f, who, out);
        if (f.eContainer() instanceof Mechanism m) {
            references(f, m, who, out);
        }
    }

    private static void time(FitResult f, String who, Problems out) {
        if (Problems.blank(f.getComputedAt())) {
            out.error(MechanismRule.FIT_TIME, f, Literals.FIT_RESULT__COMPUTED_AT, who + ": has no computation time");
            return;
        }
        try {
            OffsetDateTime.parse(f.getComputedAt());
        } catch (DateTimeParseException e) {
            out.error(MechanismRule.FIT_TIME, f, Literals.FIT_RESULT__COMPUTED_AT, who + ": computedAt '"
                    + f.getComputedAt() + "' is not an ISO-8601 date and time with offset (e.g. 2026-09-14T10:15:30Z)");
        }
    }

    private static void numbers(FitResult f, String who, Problems out) {
        final int n = f.getCorrelationParameters().size();
        if (f.getCorrelations().size() != n * n) {
            out.error(MechanismRule.FIT_NUMBERS, f, Literals.FIT_RESULT__CORRELATIONS, who + ": the correlation matrix"
                    + " has " + f.getCorrelations().size() + " values, expected " + n + "×" + n + " = " + n * n);
        }
        for (double r : f.getCorrelations()) {
            if (!(Math.abs(r) <= 1 + SLACK)) {
                out.error(MechanismRule.FIT_NUMBERS, f, Literals.FIT_RESULT__CORRELATIONS,
                        who + ": correlation " + r + " lies outside [−1, 1]");
                break;
            }
        }
        for (Estimate e : f.getEstimates()) {
            if (!Double.isFinite(e.getValue())) {
                out.error(MechanismRule.FIT_NUMBERS, e, Literals.ESTIMATE__VALUE,
                        who + ": estimate of '" + e.getParameter() + "' is not a finite number");
            }
            if (e.isSetStandardError() && !(e.getStandardError() >= 0)) {
                out.error(MechanismRule.FIT_NUMBERS, e, Literals.ESTIMATE__STANDARD_ERROR, who + ": standard error of '"
                        + e.getParameter() + "' must be zero or positive (got " + e.getStandardError() + ")");
            }
        }
        double total = 0;
        for (EnergyShare s : f.getEnergyShares()) {
            total += s.getShare();
            if (!(s.getShare() >= -SLACK && s.getShare() <= 1 + SLACK)) {
                out.error(MechanismRule.FIT_NUMBERS, s, Literals.ENERGY_SHARE__SHARE, who + ": energy share of '"
                        + s.getTermId() + "' must lie within 0 … 1 (got " + s.getShare() + ")");
            }
        }
        if (total > 1 + 1e-6) {
            out.error(MechanismRule.FIT_NUMBERS, f, Literals.FIT_RESULT__ENERGY_SHARES,
                    who + ": energy shares add up to " + total + ", more than 1");
        }
        if (f.isSetFittedInertia() && !Problems.positive(f.getFittedInertia())) {
            out.error(MechanismRule.FIT_NUMBERS, f, Literals.FIT_RESULT__FITTED_INERTIA,
                    who + ": fitted inertia must be positive (got " + f.getFittedInertia() + " kg·m²)");
        }
        if (f.isSetCalculatedInertia() && !Problems.positive(f.getCalculatedInertia())) {
            out.error(MechanismRule.FIT_NUMBERS, f, Literals.FIT_RESULT__CALCULATED_INERTIA,
                    who + ": calculated inertia must be positive (got " + f.getCalculatedInertia() + " kg·m²)");
        }
    }

    /** Dangling references are warnings: a fit stays a record of what was done after a session goes. */
    private static void references(FitResult f, Mechanism m, String who, Problems out) {
        final Set<String> sessions = m.getSessions().stream().map(TestSession::getId).collect(Collectors.toSet());
        for (String id : f.getSessionIds()) {
            if (!sessions.contains(id)) {
                out.warning(MechanismRule.FIT_REFERENCE, f, Literals.FIT_RESULT__SESSION_IDS,
                        who + ": session '" + id + "' is no longer in the mechanism");
            }
        }
        for (SessionFit sf : f.getSessionFits()) {
            if (!f.getSessionIds().contains(sf.getSessionId())) {
                out.warning(MechanismRule.FIT_REFERENCE, sf, Literals.SESSION_FIT__SESSION_ID,
                        who + ": nuisance values for session '" + sf.getSessionId() + "', which the fit did not use");
            }
        }
        final FrictionHypothesis hypothesis = m.getFrictionHypotheses().stream()
                .filter(h -> h.getId() != null && h.getId().equals(f.getHypothesisId())).findFirst().orElse(null);
        if (hypothesis == null) {
            if (!Problems.blank(f.getHypothesisId())) {
                out.warning(MechanismRule.FIT_REFERENCE, f, Literals.FIT_RESULT__HYPOTHESIS_ID,
                        who + ": hypothesis '" + f.getHypothesisId() + "' is no longer in the mechanism");
            }
            return;
        }
        final Set<String> terms = hypothesis.getTerms().stream().map(FrictionTerm::getId).collect(Collectors.toSet());
        for (String id : f.getTermIds()) {
            if (!terms.contains(id)) {
                out.warning(MechanismRule.FIT_REFERENCE, f, Literals.FIT_RESULT__TERM_IDS, who + ": term '" + id
                        + "' is not in hypothesis '" + f.getHypothesisId() + "'");
            }
        }
    }
}
