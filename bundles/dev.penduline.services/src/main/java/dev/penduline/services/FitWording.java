package dev.penduline.services;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import dev.penduline.physics.identify.CandidateScore;
import dev.penduline.physics.identify.EnergyShares;
import dev.penduline.physics.identify.FitStatus;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.FrictionVerdict;
import dev.penduline.physics.identify.InertiaCheck;
import dev.penduline.physics.identify.ModelComparison;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.present.Figures;

/**
 * How a fresh friction fit is put into words, the same for {@code penduline fit}'s report and
 * the workbench's Friction Fit wizard: the verdict sentence (dominant, mixed, or withheld for a
 * misfit or a fit that did not converge), the estimates with their ± (through
 * {@link Figures}), and the rows of the term-set comparison.
 */
public final class FitWording {

    /**
     * One estimate as a line of the report: {@code word symbol = text}.
     *
     * @param word   the term's word ("viscous", "coulomb", "stiction", "drag", "inertia")
     * @param symbol its symbol (b, Tc, Ts, c, J0)
     * @param text   the value with its ± and unit, and any remark
     */
    public record EstimateLine(String word, String symbol, String text) {
    }

    /**
     * One candidate term set of the comparison.
     *
     * @param selected  whether the fit kept it
     * @param terms     its terms joined by "+"
     * @param aic       Akaike's criterion, one decimal
     * @param bic       Schwarz's criterion, one decimal
     * @param rms       the residual rms in degrees
     * @param supported whether its terms are supported by the records
     */
    public record CandidateLine(boolean selected, String terms, String aic, String bic, String rms, boolean supported) {
    }

    private FitWording() {
    }

    /**
     * The verdict sentence: one dominant loss, mixed losses in order, or why there is none.
     *
     * @param fit the fit
     * @return the sentence, starting with the kind of verdict ("mixed: ...", "withheld: ...")
     */
    public static String verdict(FrictionFit fit) {
        FrictionVerdict v = fit.verdict();
        EnergyShares e = fit.energy();
        return switch (v.kind()) {
            case DOMINANT -> dominance(lossName(v.dominant()), percent(e.share(v.dominant()), e.sigma(v.dominant())))
                    + String.format(Locale.ROOT, " (a lead of %.0f points over the next loss; %.0f needed)",
                    100 * v.lead(), 100 * v.margin());
            case MIXED -> MIXED_LEAD + String.format(Locale.ROOT, "%.0f", 100 * v.margin())
                    + " percentage points clear of the uncertainty; in order: " + v.leading().stream()
                    .map(t -> lossName(t) + " " + percent(e.share(t), e.sigma(t))).collect(Collectors.joining(", "));
            case WITHHELD -> fit.status() == FitStatus.MISFIT ? "withheld: the model does not describe the records"
                    : "withheld: the fit did not converge";
        };
    }

    /** How a mixed verdict begins, before the margin. */
    static final String MIXED_LEAD = "mixed: no loss leads the next by ";

    /**
     * The words of a dominant loss.
     *
     * @param loss  the loss's name ({@link #lossName})
     * @param share its share of the energy lost, as text with its unit
     * @return "... dominates, dissipating ... of the energy lost over the records"
     */
    static String dominance(String loss, String share) {
        return loss + " dominates, dissipating " + share + " of the energy lost over the records";
    }

    /**
     * The fit against the records' noise floor, in one sentence.
     *
     * @param rms    the residual rms over all records (rad)
     * @param floor  the noise floor over all records (rad)
     * @param ratio  the largest ratio of a record's residual to its floor
     * @param limit  the ratio above which the model is said not to describe a record
     * @param lag1   the residuals' lag-1 autocorrelation, NaN when unknown (then left out)
     * @param passed whether every record is within the limit
     * @return e.g. "Against the noise: residual rms 0.03126° against a noise floor of 0.03721° (...): the model
     *         describes the records"
     */
    public static String againstNoise(double rms, double floor, double ratio, double limit, double lag1, boolean passed) {
        return String.format(Locale.ROOT, "Against the noise: residual rms %s° against a noise floor of %s° (largest ratio of a"
                + " record %.2f, limit %.2g%s): %s", Figures.significant(Unit.DEGREE.fromSi(rms)),
                Figures.significant(Unit.DEGREE.fromSi(floor)), ratio, limit, Double.isNaN(lag1) ? ""
                        : String.format(Locale.ROOT, "; residual lag-1 correlation %.2f", lag1),
                passed ? "the model describes the records" : "the model does NOT describe the records");
    }

    /**
     * The static friction the stops allow, in one sentence.
     *
     * @param lower the band's lower end (N·m), NaN when there is no band
     * @param upper its upper end (N·m)
     * @param note  how it was found, or why there is none; may be null beside a band
     * @return the sentence
     */
    public static String stopBand(double lower, double upper, String note) {
        if (Double.isNaN(lower)) {
            return "Static friction from the stops: none can be given: " + note;
        }
        return "Static friction from the stops: Ts between " + Figures.significant(lower) + " and "
                + Figures.significant(upper) + " N·m" + (note == null ? "" : " (" + note + ")");
    }

    /**
     * A share of the dissipated energy as a percentage, with its ± when known.
     *
     * @param share the share (fraction)
     * @param sigma its standard deviation (fraction), NaN or 0 when unknown
     * @return e.g. "62 ± 4 %" or "62 %"
     */
    public static String percent(double share, double sigma) {
        if (Double.isFinite(sigma) && sigma > 0) {
            return Figures.measured(100 * share, 100 * sigma) + " %";
        }
        return Figures.percent(share);
    }

    /**
     * The loss a term stands for, in the trade's words.
     *
     * @param t the term
     * @return "viscous damping", "dry (Coulomb) friction" or "air drag"
     */
    public static String lossName(FrictionTerm t) {
        return switch (t) {
            case VISCOUS -> "viscous damping";
            case COULOMB, STICTION -> "dry (Coulomb) friction";
            case DRAG -> "air drag";
        };
    }

    /**
     * The word for a term, as the command line's {@code --terms} and JSON spell it.
     *
     * @param t the term
     * @return "viscous", "coulomb", "stiction" or "drag"
     */
    public static String word(FrictionTerm t) {
        return t.word();
    }

    /**
     * Terms joined by "+".
     *
     * @param terms the terms
     * @return e.g. "viscous+coulomb"
     */
    public static String termList(List<FrictionTerm> terms) {
        return terms.stream().map(FitWording::word).collect(Collectors.joining("+"));
    }

    /**
     * The estimates of a fit: each fitted term (stiction as its band), then the inertia, fitted
     * against calculated or held at the calculated value.
     *
     * @param fit the fit
     * @return the lines, in the report's order
     */
    public static List<EstimateLine> estimates(FrictionFit fit) {
        List<EstimateLine> lines = new ArrayList<>();
        for (FrictionTerm t : fit.terms()) {
            if (t == FrictionTerm.STICTION && fit.stiction() != null) {
                lines.add(new EstimateLine("stiction", t.symbol(), "between " + Figures.significant(fit.stiction().lower())
                        + " and " + Figures.significant(fit.stiction().upper()) + " " + t.unit()));
                continue;
            }
            Optional<ParameterEstimate> p = fit.parameter(t.symbol());
            p.ifPresent(v -> lines.add(new EstimateLine(word(t), t.symbol(), Figures.measured(v.value(), v.sigma()) + " "
                    + t.unit() + (v.onBound() ? "  (on its bound)" : ""))));
        }
        InertiaCheck i = fit.inertia();
        if (i.free()) {
            lines.add(new EstimateLine("inertia", "J0", String.format(Locale.ROOT,
                    "%s kg·m² (calculated from the parts: %s kg·m², %+.2f %%)", Figures.measured(i.fitted(), i.sigma()),
                    Figures.significant(i.calculated()), i.differencePercent())));
        } else {
            lines.add(new EstimateLine("inertia", "J0", Figures.significant(i.calculated())
                    + " kg·m² (held at the calculated value)"));
        }
        return lines;
    }

    /**
     * The rows of a comparison of term sets, in the order compared.
     *
     * @param comparison the comparison
     * @return one row per candidate
     */
    public static List<CandidateLine> candidates(ModelComparison comparison) {
        List<CandidateLine> rows = new ArrayList<>();
        for (int k = 0; k < comparison.candidates().size(); k++) {
            CandidateScore s = comparison.candidates().get(k);
            rows.add(new CandidateLine(k == comparison.selected(), termList(s.terms()), Figures.fixed(s.aic(), 1),
                    Figures.fixed(s.bic(), 1), Figures.significant(Unit.DEGREE.fromSi(s.rms())), s.supported()));
        }
        return rows;
    }
}
