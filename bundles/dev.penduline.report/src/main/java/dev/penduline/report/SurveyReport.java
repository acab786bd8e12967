package dev.penduline.report;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.population.PopulationStatistics;
import dev.penduline.report.ReportDocument.Caution;
import dev.penduline.report.ReportDocument.Cell;
import dev.penduline.report.ReportDocument.Figure;
import dev.penduline.report.ReportDocument.Format;
import dev.penduline.report.ReportDocument.Heading;
import dev.penduline.report.ReportDocument.Items;
import dev.penduline.report.ReportDocument.Paragraph;
import dev.penduline.report.ReportDocument.Table;
import dev.penduline.report.plot.Plots;
import dev.penduline.services.Cautions;
import dev.penduline.services.present.Figures;
import dev.penduline.services.survey.SurveyFailure;
import dev.penduline.services.survey.SurveyRow;
import dev.penduline.services.survey.SurveySummary;

/**
 * The page of a survey ({@code survey.html}): the population's statistics per term, an
 * individuals control chart and a histogram per term, the units that stand out, the failed
 * records, one line a unit, and the caution; written by {@link HtmlReport}, so it is as
 * self-contained as a report. Every figure of the statistics table carries its key in
 * {@code summary.json} ({@code terms.viscous.median}, ...).
 */
public final class SurveyReport {

    /** What the caution adds for a survey: the limits describe the population, they judge no unit. */
    public static final String LIMITS_CAUTION = "The control limits and outlier scores are statistical: they say where "
            + "this population of units lies and which units stand apart from it, not whether a unit is acceptable. "
            + "They are no acceptance criteria; those come from the product's specification and the applicable local "
            + "codes.";

    private SurveyReport() {
    }

    /**
     * The survey's document.
     *
     * @param mechanism the mechanism file's name (the design)
     * @param rows      the units' rows, in unit order
     * @param failed    the records not fitted, with why
     * @param skipped   how many rows were reused from an earlier run
     * @param summary   the statistics
     * @return the document
     */
    public static ReportDocument document(String mechanism, List<SurveyRow> rows, List<SurveyFailure> failed, int skipped,
            SurveySummary summary) {
        long fitted = rows.stream().filter(SurveyRow::fitted).count();
        ReportDocument.Builder doc = new ReportDocument.Builder();
        doc.add(new Heading(1, "population", "The population"));
        doc.add(new Paragraph(String.format(Locale.ROOT, "%d units fitted against the design %s (%d of them reused from an"
                + " earlier run), %d records not fitted. Values in SI units; statistics over the fitted units in key order.",
                fitted, mechanism, skipped, failed.size()), true));
        List<List<Cell>> table = new ArrayList<>();
        for (Map.Entry<String, PopulationStatistics> e : summary.terms().entrySet()) {
            PopulationStatistics s = e.getValue();
            String k = "terms." + e.getKey() + ".";
            table.add(List.of(Cell.of(label(e.getKey())), Cell.of(Long.toString(s.count())),
                    figure(s.median(), k + "median"), figure(s.mad(), k + "mad"), figure(s.p05(), k + "p05"),
                    figure(s.p95(), k + "p95"), figure(s.center(), k + "center"), figure(s.lcl(), k + "lcl"),
                    figure(s.ucl(), k + "ucl")));
        }
        doc.add(new Table("Each quantity over the units: median, raw median absolute deviation (MAD), 5th and 95th"
                + " percentiles (R-7), and the individuals chart's center (mean) and control limits (center ± 3·MR̄/1.128)",
                List.of("quantity (unit)", "units", "median", "MAD", "p05", "p95", "center", "LCL", "UCL"), table));
        int n = 0;
        for (Map.Entry<String, PopulationStatistics> e : summary.terms().entrySet()) {
            String term = e.getKey();
            PopulationStatistics s = e.getValue();
            double[] v = summary.values().get(term);
            doc.add(new Heading(2, "term-" + term, label(term)));
            doc.add(new Figure(Plots.controlChart("chart" + n, "Individuals chart: " + label(term), label(term), v, s.center(),
                    s.lcl(), s.ucl()), "Each unit's value in key order, with the center line (mean) and the control"
                    + " limits center ± 3·MR̄/d₂ (d₂ = 1.128); units beyond the limits drawn with the second marker."));
            doc.add(new Figure(Plots.histogram("hist" + n, "Histogram: " + label(term), label(term), v),
                    "How many units fall in each bin (equal widths, Sturges' rule)."));
            n++;
        }
        doc.add(new Heading(1, "standing-out", "Units that stand out"));
        List<String> flagged = new ArrayList<>();
        summary.outliers().forEach(f -> flagged.add(String.format(Locale.ROOT, "%s: %s %s, modified z-score %s (above %.1f in"
                + " size)", f.unit(), f.term(), Figures.significant(f.value()), Figures.fixed(f.score(), 2),
                PopulationStatistics.OUTLIER_SCORE)));
        summary.beyondLimits().forEach(f -> flagged.add(f.unit() + ": " + f.term() + " " + Figures.significant(f.value())
                + ", beyond the control limits"));
        doc.add(flagged.isEmpty() ? new Paragraph("No unit has a modified z-score above 3.5 in size, and none lies beyond"
                + " the control limits.", false) : new Items(flagged));
        if (!failed.isEmpty()) {
            doc.add(new Heading(1, "failed", "Records not fitted"));
            doc.add(new Items(failed.stream().map(f -> f.error()).toList()));
        }
        doc.add(new Heading(1, "units", "The units"));
        List<List<Cell>> units = new ArrayList<>();
        for (SurveyRow r : rows) {
            double worst = r.residualToNoise().stream().mapToDouble(Double::doubleValue).filter(Double::isFinite).max()
                    .orElse(Double.NaN);
            units.add(List.of(Cell.of(r.key()), Cell.of(r.status()), Cell.of(String.join("+", r.terms())),
                    Cell.of(r.verdict()), Cell.of(r.fitted() ? Figures.measured(r.inertia(), r.inertiaSigma()) : ""),
                    Cell.of(Double.isFinite(worst) ? Figures.fixed(worst, 2) : ""), Cell.of(Integer.toString(r.files().size()))));
        }
        doc.add(new Table("One line a unit, in key order", List.of("unit", "status", "terms", "verdict", "J0 (kg·m²)",
                "largest residual/noise", "records"), units));
        doc.add(new Caution("Caution", List.of(Cautions.TEXT, LIMITS_CAUTION)));
        return doc.build("Survey of " + mechanism, rows.size() + " units, " + fitted + " fitted");
    }

    /**
     * Writes the page.
     *
     * @param doc     the document of {@link #document}
     * @param version Penduline's version
     * @param out     where to
     * @throws IOException when writing fails
     */
    public static void write(ReportDocument doc, String version, Writer out) throws IOException {
        new HtmlReport(version).write(doc, out);
    }

    private static Cell figure(double v, String key) {
        return Cell.figure(Figures.significant(v), key, Format.SIGNIFICANT);
    }

    /** A quantity's name with its symbol and SI unit, e.g. "viscous b (N·m·s/rad)". */
    static String label(String term) {
        if (term.equals(SurveySummary.PIVOT_INERTIA)) {
            return "pivot inertia J0 (kg·m²)";
        }
        FrictionTerm t = FrictionTerm.valueOf(term.toUpperCase(Locale.ROOT));
        return term + " " + t.symbol() + " (" + t.unit() + ")";
    }
}
