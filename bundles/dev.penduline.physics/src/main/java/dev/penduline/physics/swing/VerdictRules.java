package dev.penduline.physics.swing;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import dev.penduline.physics.swing.LossVerdict.Loss;

/** Reads the regression shares and the envelope scores into a verdict with sentences. */
final class VerdictRules {

    private VerdictRules() {
    }

    static LossVerdict judge(DecrementRegression regression, double[] meanAmplitudes, List<DecayEnvelope> envelopes,
            double dominance) {
        final List<String> evidence = new ArrayList<>();
        DecayEnvelope best = null;
        for (DecayEnvelope e : envelopes) {
            if (best == null || e.rSquared() > best.rSquared()) {
                best = e;
            }
        }
        if (!envelopes.isEmpty()) {
            final StringBuilder b = new StringBuilder("envelope r² (amplitude space):");
            for (DecayEnvelope e : envelopes) {
                b.append(' ').append(e.model().name().toLowerCase(Locale.ROOT)).append(' ')
                        .append(format(e.rSquared(), 4));
            }
            evidence.add(b.append("; best ").append(best.model().name().toLowerCase(Locale.ROOT)).toString());
        }
        if (regression == null) {
            evidence.add("fewer than two half-swings: no decrement regression");
            return new LossVerdict(Loss.UNDETERMINED, Loss.UNDETERMINED, Double.NaN, Double.NaN, Double.NaN,
                    best == null ? null : best.model(), evidence);
        }
        final double[] s = regression.shares(meanAmplitudes);
        evidence.add("decrement regression over " + regression.count() + " half-swings: a0 = "
                + format(regression.a0(), 5) + " rad, a1 = " + format(regression.a1(), 5) + ", a2 = "
                + format(regression.a2(), 5) + " /rad, r² = " + format(regression.rSquared(), 4)
                + (regression.dropped().isEmpty() ? "" : "; held at zero to stay non-negative: "
                        + String.join(", ", regression.dropped())));
        if (Double.isNaN(s[0])) {
            evidence.add("the fitted decrement is zero: no measurable loss");
            return new LossVerdict(Loss.UNDETERMINED, Loss.UNDETERMINED, s[0], s[1], s[2],
                    best == null ? null : best.model(), evidence);
        }
        evidence.add("shares of the mean decrement: Coulomb (a0) " + percent(s[0]) + ", viscous (a1·Ā) "
                + percent(s[1]) + ", drag (a2·Ā²) " + percent(s[2]));
        final Loss[] order = {Loss.COULOMB, Loss.VISCOUS, Loss.DRAG};
        int lead = 0;
        for (int k = 1; k < 3; k++) {
            if (s[k] > s[lead]) {
                lead = k;
            }
        }
        final Loss kind = s[lead] >= dominance ? order[lead] : Loss.MIXED;
        if (best != null && expected(best.model()) != order[lead]) {
            evidence.add("the best envelope points to " + expected(best.model()).name().toLowerCase(Locale.ROOT)
                    + " while the regression leads with " + order[lead].name().toLowerCase(Locale.ROOT)
                    + ": compare both terms in the full fit");
        }
        return new LossVerdict(kind, order[lead], s[0], s[1], s[2], best == null ? null : best.model(), evidence);
    }

    private static Loss expected(DecayEnvelope.Model model) {
        return switch (model) {
            case LINEAR -> Loss.COULOMB;
            case GEOMETRIC -> Loss.VISCOUS;
            case RECIPROCAL -> Loss.DRAG;
        };
    }

    private static String percent(double share) {
        return String.format(Locale.ROOT, "%.0f %%", 100 * share);
    }

    private static String format(double v, int digits) {
        return String.format(Locale.ROOT, "%." + digits + "g", v);
    }
}
