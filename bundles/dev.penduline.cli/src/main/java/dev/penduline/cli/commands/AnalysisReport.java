package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.physics.swing.DecayEnvelope;
import dev.penduline.physics.swing.FrictionEstimates;
import dev.penduline.physics.swing.LossVerdict;
import dev.penduline.physics.swing.PeriodCheck;
import dev.penduline.physics.swing.StopInfo;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.swing.SwingCycle;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.services.AnalysisWording;
import dev.penduline.services.Cautions;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.present.Figures;

/** The readable report of {@code penduline analyze}: the first look from the decay, then the evidence. */
final class AnalysisReport {

    private final SwingRecord record;
    private final SwingAnalysis s;
    private final Optional<MechanismSource> mechanism;

    AnalysisReport(SwingRecord record, SwingAnalysis analysis, Optional<MechanismSource> mechanism) {
        this.record = record;
        this.s = analysis;
        this.mechanism = mechanism;
    }

    void print(PrintWriter out) {
        LossVerdict v = s.verdict();
        out.println("Swing record " + record.source());
        out.printf(Locale.ROOT, "  %d samples at %s Hz; SHA-256 %s%n", record.size(),
                Figures.significant(AnalyzeCommand.sampleRate(record.times())), record.sha256().substring(0, 16) + "…");
        out.println();
        out.println(AnalysisWording.firstLook(v));
        for (String e : v.evidence()) {
            out.println("  - " + e);
        }
        out.println();
        out.printf(Locale.ROOT, "Release   at %s s, from %s° off the hanging equilibrium%n",
                Figures.measured(s.release().time(), s.release().uncertainty()), deg(s.initialAngle()));
        out.printf(Locale.ROOT, "Offset    the sensor reads %s° at the hanging equilibrium (%s)%n",
                Figures.measured(Unit.DEGREE.fromSi(s.offset().value()), Unit.DEGREE.fromSi(s.offset().uncertainty())),
                s.offset().method().name().toLowerCase(Locale.ROOT).replace('_', ' '));
        printStop(out);
        out.println();
        printCycles(out);
        out.println();
        out.println("Decay envelopes (amplitude against cycles):");
        for (DecayEnvelope e : s.envelopes()) {
            out.printf(Locale.ROOT, "  %-10s r² = %.5f   %s%n", e.model().name().toLowerCase(Locale.ROOT), e.rSquared(),
                    switch (e.model()) {
                        case LINEAR -> "loses " + deg(e.ratePerCycle()) + "° per cycle (dry-friction signature)";
                        case GEOMETRIC -> "log decrement " + Figures.significant(e.ratePerCycle()) + ", damping ratio "
                                + Figures.significant(e.dampingRatio()) + " (viscous signature)";
                        case RECIPROCAL -> "1/A grows " + Figures.significant(e.ratePerCycle())
                                + " /rad per cycle (drag signature)";
                    });
        }
        s.regression().ifPresent(r -> out.printf(Locale.ROOT,
                "Decrement per half-swing ΔA = a0 + a1·A + a2·A²: a0 = %s rad, a1 = %s, a2 = %s /rad (r² = %.4f, %d half-swings)%n",
                Figures.significant(r.a0()), Figures.significant(r.a1()), Figures.significant(r.a2()), r.rSquared(),
                r.count()));
        PeriodCheck p = s.periodCheck();
        if (mechanism.isPresent() && p != null && Double.isFinite(p.predictedSmallAnglePeriod())) {
            out.printf(Locale.ROOT, "Period    small-angle %s s measured, %s s predicted from the mechanism (%+.2f %%); "
                    + "the record implies J0 ≈ %s kg·m²%n", Figures.significant(p.measuredSmallAnglePeriod()),
                    Figures.significant(p.predictedSmallAnglePeriod()), 100 * p.medianRelativeDifference(),
                    Figures.significant(p.impliedPivotInertia()));
        }
        s.estimates().ifPresent(e -> printEstimates(e, out));
        out.println();
        out.println("These are first estimates from the decay envelope; 'penduline fit' identifies the terms from the "
                + "whole trajectory.");
        out.println(Cautions.TEXT);
    }

    private void printStop(PrintWriter out) {
        StopInfo stop = s.stop();
        if (!stop.stopped()) {
            out.println("Stop      still swinging at the end of the record (or still for less than a period)");
            return;
        }
        out.printf(Locale.ROOT, "Stop      at rest from the last reversal at %s s (± %s s), %s° (± %s°) from the equilibrium%n",
                Figures.significant(stop.time()), Figures.significant(stop.timeUncertainty()), deg(stop.restOffset()),
                deg(stop.restOffsetUncertainty()));
        boolean lower = Double.isFinite(stop.stictionLowerBound());
        boolean upper = Double.isFinite(stop.stictionUpperBound());
        if (lower && upper) {
            out.printf(Locale.ROOT, "          stiction between %s N·m (held at rest) and %s N·m (moved on from the"
                    + " reversal before, %s° out)%n", Figures.significant(stop.stictionLowerBound()),
                    Figures.significant(stop.stictionUpperBound()), deg(stop.previousOffset()));
        } else if (upper && Double.isFinite(stop.stictionResolution())) {
            out.printf(Locale.ROOT, "          within twice its uncertainty of the equilibrium: the stop shows no evidence of"
                    + " stiction above what that allows (< K|sin 2σ| = %s N·m); below %s N·m (moved on from the"
                    + " reversal before, %s° out)%n", Figures.significant(stop.stictionResolution()),
                    Figures.significant(stop.stictionUpperBound()), deg(stop.previousOffset()));
        } else {
            out.println("          " + stop.note());
        }
    }

    private void printCycles(PrintWriter out) {
        List<SwingCycle> cycles = s.cycles();
        out.printf("Cycles (%d):%n", cycles.size());
        out.println("     #   start (s)   amplitude (°)   period (s)");
        int n = cycles.size();
        for (int i = 0; i < n; i++) {
            if (n > 12 && i == 6) {
                out.printf("   ... %d more ...%n", n - 10);
                i = n - 4;
            }
            SwingCycle c = cycles.get(i);
            out.printf(Locale.ROOT, "  %4d  %10s  %14s  %11s%n", c.index() + 1, Figures.significant(c.startTime()),
                    deg(c.amplitude()), Figures.significant(c.period()));
        }
    }

    private static void printEstimates(FrictionEstimates e, PrintWriter out) {
        out.println("First estimates (energy balance per half-swing):");
        out.printf(Locale.ROOT, "  viscous   b  = %s N·m·s/rad%n", Figures.measured(e.viscous(), e.viscousError()));
        out.printf(Locale.ROOT, "  Coulomb   Tc = %s N·m%n", Figures.measured(e.coulomb(), e.coulombError()));
        out.printf(Locale.ROOT, "  drag      c  = %s N·m·s²/rad²%n", Figures.measured(e.drag(), e.dragError()));
    }

    private static String deg(double rad) {
        return Figures.significant(Unit.DEGREE.fromSi(rad));
    }
}
