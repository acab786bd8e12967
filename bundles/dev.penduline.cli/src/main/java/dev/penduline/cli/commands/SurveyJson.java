package dev.penduline.cli.commands;

import java.util.List;
import java.util.Map;

import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.population.PopulationStatistics;
import dev.penduline.services.survey.SurveyFailure;
import dev.penduline.services.survey.SurveyRow;
import dev.penduline.services.survey.SurveySummary;

/** The JSON files of {@code penduline survey}: {@code units.json} and {@code summary.json} (also its {@code --json}). */
final class SurveyJson {

    private SurveyJson() {
    }

    /**
     * The units, one object each, in unit order.
     *
     * @param rows the rows
     * @param j    where to
     */
    static void units(List<SurveyRow> rows, JsonWriter j) {
        j.beginObject().name("units").beginArray();
        for (SurveyRow r : rows) {
            j.beginObject().field("key", r.key()).field("status", r.status());
            strings(j, "files", r.files());
            strings(j, "sha256s", r.sha256s());
            strings(j, "terms", r.terms());
            j.name("estimates").beginObject();
            for (SurveyRow.Estimate e : r.estimates()) {
                j.name(e.term()).beginObject().field("value", e.value()).field("sigma", e.sigma()).endObject();
            }
            j.endObject();
            j.field("verdict", r.fitted() ? r.verdict() : null);
            j.name("pivot_inertia").beginObject().field("value_kg_m2", r.inertia()).field("sigma_kg_m2", r.inertiaSigma())
                    .endObject();
            j.name("residual_to_noise").beginArray();
            r.residualToNoise().forEach(j::value);
            j.endArray();
            strings(j, "warnings", r.warnings());
            if (!r.fitted()) {
                j.field("failed_file", r.failedFile()).field("error", r.error());
            }
            j.endObject();
        }
        j.endArray().endObject().finish();
    }

    /**
     * The summary.
     *
     * @param mechanism the mechanism file as given
     * @param units     how many units were fitted (this run and reused)
     * @param skipped   how many of them were reused
     * @param failed    the records not fitted
     * @param summary   the statistics
     * @param j         where to
     */
    static void summary(String mechanism, int units, int skipped, List<SurveyFailure> failed, SurveySummary summary,
            JsonWriter j) {
        j.beginObject().field("mechanism", mechanism).field("units", units).field("skipped", skipped);
        j.name("failed").beginArray();
        for (SurveyFailure f : failed) {
            j.beginObject().field("unit", f.unit()).field("file", f.file()).field("error", f.error()).endObject();
        }
        j.endArray();
        j.name("terms").beginObject();
        for (Map.Entry<String, PopulationStatistics> e : summary.terms().entrySet()) {
            PopulationStatistics s = e.getValue();
            j.name(e.getKey()).beginObject().field("count", s.count()).field("median", s.median()).field("mad", s.mad())
                    .field("p05", s.p05()).field("p95", s.p95()).field("center", s.center())
                    .field("moving_range", s.movingRange()).field("lcl", s.lcl()).field("ucl", s.ucl()).endObject();
        }
        j.endObject();
        j.name("outliers").beginArray();
        for (SurveySummary.Flagged f : summary.outliers()) {
            j.beginObject().field("unit", f.unit()).field("term", f.term()).field("value", f.value())
                    .field("score", f.score()).endObject();
        }
        j.endArray();
        j.name("beyond_limits").beginArray();
        for (SurveySummary.Flagged f : summary.beyondLimits()) {
            j.beginObject().field("unit", f.unit()).field("term", f.term()).field("value", f.value()).endObject();
        }
        j.endArray();
        j.name("statistics").beginObject()
                .field("mad", "raw median of |x - median|, not scaled by 1.4826")
                .field("percentiles", "Hipparchus Percentile, estimation type R_7")
                .field("outlier", "modified z-score 0.6745*(x - median)/MAD, |score| > 3.5 (Iglewicz and Hoaglin)")
                .field("limits", "individuals chart: center = mean, limits = center +- 3*MRbar/1.128, units in key order")
                .endObject();
        j.endObject().finish();
    }

    private static void strings(JsonWriter j, String name, List<String> values) {
        j.name(name).beginArray();
        values.forEach(j::value);
        j.endArray();
    }
}
