package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;

import dev.penduline.physics.identify.EnergyShares;
import dev.penduline.physics.identify.FitStatus;
import dev.penduline.physics.identify.FitWarning;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.Goodness;
import dev.penduline.physics.identify.SessionEstimate;
import dev.penduline.physics.identify.StictionBand;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.Cautions;
import dev.penduline.services.FitWording;
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
        outcome.thinned().forEach(d -> out.println("  note: " + d.note()));
        out.println();
        if (fit.status() == FitStatus.MISFIT) {
            out.println("THE MODEL DOES NOT DESCRIBE THE RECORDS: the residuals are clearly above the noise floor.");
            fit.goodness().evidence().forEach(line -> out.println("  " + line));
            out.println("  Likely causes: a loss law not in the model, a wrong inertia or centroid, a sensor fault, or a");
            out.println("  record that is not a free swing. No verdict is drawn, nothing is stored, and the values below");
            out.println("  describe the best fit of a model that does not hold: do not use them.");
            out.println();
        } else if (fit.status() != FitStatus.CONVERGED) {
            out.println("THE FIT DID NOT CONVERGE (" + fit.status().name().toLowerCase(Locale.ROOT).replace('_', ' ')
                    + "): " + fit.message());
            out.println("The values below are the best point reached and must not be used.");
            out.println();
        }
        out.println("Verdict: " + FitWording.verdict(fit));
        out.printf(Locale.ROOT, "  (energy lost over the records: viscous %s, Coulomb %s, drag %s of %s J)%n",
                FitWording.percent(e.viscous(), e.viscousSigma()), FitWording.percent(e.coulomb(), e.coulombSigma()),
                FitWording.percent(e.drag(), e.dragSigma()), Figures.significant(e.dissipated()));
        out.println("  model: " + FitWording.termList(fit.terms())
                + (outcome.automatic() ? " (chosen by BIC among the candidates)" : " (as asked)"));
        out.println();
        out.println("Estimates (± one standard error: the Jacobian's, or the bootstrap's when clearly larger):");
        for (FitWording.EstimateLine line : FitWording.estimates(fit)) {
            out.printf(Locale.ROOT, "  %-9s %-2s = %s%n", line.word(), line.symbol(), line.text());
        }
        out.println();
        printSessions(out, fit);
        printGoodness(out, fit);
        printStopBand(out, fit);
        outcome.comparison().ifPresent(c -> {
            out.println();
            out.printf(Locale.ROOT, "Term sets compared (effective samples %s of %d, residual lag-1 correlation %.2f):%n",
                    Figures.fixed(c.effectiveSamples(), 0), c.samples(), c.lag1());
            out.println("      terms                              AIC           BIC    rms (°)  supported");
            for (FitWording.CandidateLine s : FitWording.candidates(c)) {
                out.printf(Locale.ROOT, "  %s  %-30s %12s  %12s  %9s  %s%n", s.selected() ? "=>" : "  ", s.terms(), s.aic(),
                        s.bic(), s.rms(), s.supported() ? "yes" : "no");
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
        out.println(Cautions.TEXT);
    }

    private static void printGoodness(PrintWriter out, FrictionFit fit) {
        Goodness g = fit.goodness();
        if (g != null) {
            out.println(FitWording.againstNoise(g.rms(), g.floor(), g.ratio(), g.limit(), g.lag1(), g.passed()));
        }
    }

    private static void printStopBand(PrintWriter out, FrictionFit fit) {
        if (fit.stopNote() != null) {
            StictionBand b = fit.stopBand();
            out.println(b == null ? FitWording.stopBand(Double.NaN, Double.NaN, fit.stopNote())
                    : FitWording.stopBand(b.lower(), b.upper(), fit.stopNote()));
        }
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
}
