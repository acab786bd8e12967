package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import dev.penduline.physics.identify.CandidateScore;
import dev.penduline.physics.identify.EnergyShares;
import dev.penduline.physics.identify.FitStatus;
import dev.penduline.physics.identify.FitWarning;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.InertiaCheck;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.identify.SessionEstimate;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.present.Figures;

/** The readable report of {@code penduline fit}: verdict, estimates, evidence, warnings, caution. */
final class FitReportText {

    private final Outcome outcome;
    private final String stored;
    private final String file;

    FitReportText(Outcome outcome, String stored, String file) {
        this.outcome = outcome;
        this.stored = stored;
        this.file = file;
    }

    void print(PrintWriter out) {
        FrictionFit fit = outcome.fit();
        EnergyShares e = fit.energy();
        out.println("Friction of " + outcome.mechanism().label() + ", from " + outcome.sessions().size()
                + " release record(s)");
        out.println();
        if (fit.status() != FitStatus.CONVERGED) {
            out.println("THE FIT DID NOT CONVERGE (" + fit.status().name().toLowerCase(Locale.ROOT).replace('_', ' ')
                    + "): " + fit.message());
            out.println("The values below are the best point reached and must not be used.");
            out.println();
        }
        out.printf(Locale.ROOT, "Verdict: %s dominates, dissipating %.0f %% of the energy lost over the records%n",
                lossName(e.dominant()), 100 * share(e, e.dominant()));
        out.printf(Locale.ROOT, "  (viscous %.0f %%, Coulomb %.0f %%, drag %.0f %% of %s J)%n", 100 * e.viscous(),
                100 * e.coulomb(), 100 * e.drag(), Figures.significant(e.dissipated()));
        out.println("  model: " + termList(fit.terms()) + (outcome.automatic() ? " (chosen by BIC among the candidates)"
                : " (as asked)"));
        out.println();
        out.println("Estimates (± one standard error: the larger of the Jacobian and the bootstrap estimate):");
        for (FrictionTerm t : fit.terms()) {
            if (t == FrictionTerm.STICTION && fit.stiction() != null) {
                out.printf(Locale.ROOT, "  %-9s Ts = between %s and %s %s%n", "stiction",
                        Figures.significant(fit.stiction().lower()), Figures.significant(fit.stiction().upper()),
                        t.unit());
                continue;
            }
            Optional<ParameterEstimate> p = fit.parameter(t.symbol());
            p.ifPresent(v -> out.printf(Locale.ROOT, "  %-9s %-2s = %s %s%s%n", FitJson.word(t), t.symbol(),
                    Figures.measured(v.value(), v.sigma()), t.unit(),
                    v.onBound() ? "  (on its bound)" : ""));
        }
        InertiaCheck i = fit.inertia();
        if (i.free()) {
            out.printf(Locale.ROOT, "  inertia   J0 = %s kg·m² (calculated from the parts: %s kg·m², %+.2f %%)%n",
                    Figures.measured(i.fitted(), i.sigma()), Figures.significant(i.calculated()),
                    i.differencePercent());
        } else {
            out.printf(Locale.ROOT, "  inertia   J0 = %s kg·m² (held at the calculated value)%n",
                    Figures.significant(i.calculated()));
        }
        out.println();
        printSessions(out, fit);
        outcome.comparison().ifPresent(c -> {
            out.println();
            out.printf(Locale.ROOT, "Term sets compared (effective samples %s of %d, residual lag-1 correlation %.2f):%n",
                    Figures.fixed(c.effectiveSamples(), 0), c.samples(), c.lag1());
            out.println("      terms                              AIC           BIC    rms (°)  supported");
            for (int k = 0; k < c.candidates().size(); k++) {
                CandidateScore s = c.candidates().get(k);
                out.printf(Locale.ROOT, "  %s  %-30s %12s  %12s  %9s  %s%n", k == c.selected() ? "=>" : "  ",
                        termList(s.terms()), Figures.fixed(s.aic(), 1), Figures.fixed(s.bic(), 1),
                        Figures.significant(Unit.DEGREE.fromSi(s.rms())), s.supported() ? "yes" : "no");
            }
        });
        List<FitWarning> warnings = fit.warnings();
        if (!warnings.isEmpty() || !outcome.warnings().isEmpty()) {
            out.println();
            out.println("Warnings:");
            warnings.forEach(w -> out.println("  - " + w.message()));
            outcome.warnings().forEach(w -> out.println("  - " + w));
        }
        out.println();
        out.printf(Locale.ROOT, "Residual rms %s° over %d samples; %d iterations, %d evaluations, %d bootstrap refits.%n",
                Figures.significant(Unit.DEGREE.fromSi(fit.rms())), fit.samples(), fit.iterations(), fit.evaluations(),
                fit.resamplesUsed());
        if (stored != null) {
            out.println("Stored in " + file + " as fit '" + stored + "'.");
        }
        out.println(Caution.TEXT);
    }

    private void printSessions(PrintWriter out, FrictionFit fit) {
        out.println("Records:");
        for (SessionEstimate s : fit.sessions()) {
            out.printf(Locale.ROOT, "  %-22s released %s° at %s s, offset %s°, residual rms %s°%n", s.name(),
                    Figures.significant(Unit.DEGREE.fromSi(s.releaseAngle().value())),
                    Figures.significant(s.releaseTime().value()),
                    Figures.significant(Unit.DEGREE.fromSi(s.offset().value())),
                    Figures.significant(Unit.DEGREE.fromSi(s.rms())));
        }
    }

    private static double share(EnergyShares e, FrictionTerm t) {
        return switch (t) {
            case VISCOUS -> e.viscous();
            case COULOMB, STICTION -> e.coulomb();
            case DRAG -> e.drag();
        };
    }

    private static String lossName(FrictionTerm t) {
        return switch (t) {
            case VISCOUS -> "viscous damping";
            case COULOMB, STICTION -> "dry (Coulomb) friction";
            case DRAG -> "air drag";
        };
    }

    private static String termList(List<FrictionTerm> terms) {
        return terms.stream().map(FitJson::word).collect(Collectors.joining("+"));
    }
}
