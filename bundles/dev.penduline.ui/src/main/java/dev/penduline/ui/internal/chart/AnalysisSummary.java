package dev.penduline.ui.internal.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import dev.penduline.physics.swing.FrictionEstimates;
import dev.penduline.physics.swing.LossVerdict;
import dev.penduline.physics.swing.PeriodCheck;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.AnalysisWording;
import dev.penduline.services.present.Figures;

/**
 * The few lines under the Swing Chart: the first look from the decay (not a verdict: the fit in
 * the Friction view decides), then the release, the sensor's offset and the first estimates — the
 * head of {@code penduline analyze}'s report, worded for a view.
 */
final class AnalysisSummary {

    private AnalysisSummary() {
    }

    static List<String> lines(SwingAnalysis a, boolean withMechanism) {
        List<String> out = new ArrayList<>();
        LossVerdict v = a.verdict();
        out.add(AnalysisWording.firstLook(v));
        out.add("Release at " + Figures.measured(a.release().time(), a.release().uncertainty()) + " s, "
                + deg(a.initialAngle())
                + "° from the hanging equilibrium; " + a.cycles().size() + " cycle(s), "
                + a.turningPoints().size() + " turning point(s)");
        out.add("Offset: the sensor reads "
                + Figures.measured(Unit.DEGREE.fromSi(a.offset().value()), Unit.DEGREE.fromSi(a.offset().uncertainty()))
                + "° at the hanging equilibrium ("
                + a.offset().method().name().toLowerCase(Locale.ROOT).replace('_', ' ') + ")");
        PeriodCheck p = a.periodCheck();
        if (withMechanism && p != null && Double.isFinite(p.predictedSmallAnglePeriod())) {
            out.add(String.format(Locale.ROOT, "Period: small-angle %s s measured, %s s predicted (%+.2f %%)",
                    Figures.significant(p.measuredSmallAnglePeriod()), Figures.significant(p.predictedSmallAnglePeriod()),
                    100 * p.medianRelativeDifference()));
        }
        if (a.estimates().isPresent()) {
            FrictionEstimates e = a.estimates().get();
            out.add("First estimates: viscous b = " + Figures.significant(e.viscous()) + " N·m·s/rad, Coulomb Tc = "
                    + Figures.significant(e.coulomb()) + " N·m, drag c = " + Figures.significant(e.drag())
                    + " N·m·s²/rad² (starting values for a fit, not its result)");
        } else {
            out.add("First friction estimates need the mechanism's inertia: add parts to the mechanism file.");
        }
        return out;
    }

    private static String deg(double rad) {
        return Figures.significant(Unit.DEGREE.fromSi(rad));
    }
}
