package dev.penduline.cli.commands;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import dev.penduline.services.survey.SurveyRow;
import dev.penduline.services.survey.SurveySummary;

/**
 * {@code units.csv} of {@code penduline survey}: one line a unit in key order, comma-separated,
 * a header first; each term's value and σ in SI (empty where the unit's fit has no such term),
 * full double precision; lists (files, hashes, ratios, warnings) joined by "; " in one field;
 * fields with a comma, a quote or a line end in double quotes (RFC 4180).
 */
final class SurveyCsv {

    private SurveyCsv() {
    }

    static void write(List<SurveyRow> rows, SurveySummary summary, Writer w) throws IOException {
        List<String> terms = summary.terms().keySet().stream().filter(t -> !t.equals(SurveySummary.PIVOT_INERTIA)).toList();
        List<String> header = new ArrayList<>(List.of("key", "status", "files", "sha256s", "terms"));
        for (String t : terms) {
            header.add(t + "_value");
            header.add(t + "_sigma");
        }
        header.addAll(List.of("pivot_inertia_kg_m2", "pivot_inertia_sigma_kg_m2", "verdict", "residual_to_noise", "warnings",
                "failed_file", "error"));
        line(w, header);
        for (SurveyRow r : rows) {
            List<String> f = new ArrayList<>(List.of(r.key(), r.status(), String.join("; ", r.files()),
                    String.join("; ", r.sha256s()), String.join("+", r.terms())));
            for (String t : terms) {
                Optional<SurveyRow.Estimate> e = r.estimate(t);
                f.add(e.map(x -> number(x.value())).orElse(""));
                f.add(e.map(x -> number(x.sigma())).orElse(""));
            }
            f.add(number(r.inertia()));
            f.add(number(r.inertiaSigma()));
            f.add(r.fitted() ? r.verdict() : "");
            f.add(String.join("; ", r.residualToNoise().stream().map(SurveyCsv::number).toList()));
            f.add(String.join("; ", r.warnings()));
            f.add(r.failedFile());
            f.add(r.error());
            line(w, f);
        }
    }

    private static String number(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    private static void line(Writer w, List<String> fields) throws IOException {
        List<String> quoted = new ArrayList<>();
        for (String s : fields) {
            boolean needs = s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0;
            quoted.add(needs ? "\"" + s.replace("\"", "\"\"") + "\"" : s);
        }
        w.write(String.join(",", quoted));
        w.write("\n");
    }
}
