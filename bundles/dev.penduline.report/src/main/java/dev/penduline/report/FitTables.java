package dev.penduline.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.FitResult;
import dev.penduline.physics.forecast.AnglePass;
import dev.penduline.physics.forecast.FigureBand;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.units.Unit;
import dev.penduline.report.ReportDocument.Cell;
import dev.penduline.report.ReportDocument.Figure;
import dev.penduline.report.ReportDocument.Format;
import dev.penduline.report.ReportDocument.Table;
import dev.penduline.report.plot.Plots;
import dev.penduline.services.FitWording;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.StoredFitText;
import dev.penduline.services.TermWords;
import dev.penduline.services.present.Figures;

/** The tables of the fit and predictions sections, each figure keyed to the command line's JSON. */
final class FitTables {

    private FitTables() {
    }

    static void estimates(ReportDocument.Builder doc, StoredFitText t) {
        List<List<Cell>> rows = new ArrayList<>();
        for (StoredFitText.EstimateRow e : t.estimates()) {
            rows.add(List.of(Cell.of(e.quantity()), Cell.of(e.symbol()), figure(e), Cell.of(e.unit()),
                    Cell.of(e.sigmaJacobian()), Cell.of(e.sigmaResampling())));
        }
        doc.add(new Table("Estimates: ± is one standard uncertainty (the Jacobian's, or the bootstrap's when clearly"
                + " larger), written as JCGM 100:2008 §7.2.6 asks: two significant digits, the value to the same place",
                List.of("quantity", "symbol", "value ± u", "unit", "u from the Jacobian", "u from the bootstrap"), rows));
    }

    /** An estimate's figure, keyed to the fit's JSON where the JSON has it (stiction is a band there). */
    private static Cell figure(StoredFitText.EstimateRow e) {
        if (TermWords.INERTIA_SYMBOL.equals(e.symbol())) {
            return Cell.measured(e.measured(), "fit.inertia.fitted_kg_m2", Format.MEASURED, "fit.inertia.sigma_kg_m2");
        }
        for (FrictionTerm t : FrictionTerm.values()) {
            if (t != FrictionTerm.STICTION && t.symbol().equals(e.symbol())) {
                String key = "fit.terms." + FitWording.word(t);
                return Cell.measured(e.measured(), key + ".value", Format.MEASURED, key + ".sigma");
            }
        }
        return switch (e.quantity()) {
            case StoredFitText.CALCULATED, StoredFitText.HELD -> Cell.figure(e.measured(), "fit.inertia.calculated_kg_m2",
                    Format.SIGNIFICANT);
            case StoredFitText.DIFFERENCE -> Cell.figure(e.measured(), "fit.inertia.difference_percent",
                    Format.SIGNED_FIXED2);
            default -> Cell.of(e.measured());
        };
    }

    /**
     * The estimates as lines of words, {@code viscous b = 0.0119980 ± 0.0000040 N·m·s/rad}, each
     * figure written as in the estimates table.
     */
    static List<String> estimateLines(StoredFitText t) {
        return t.estimates().stream().filter(e -> !e.symbol().isEmpty())
                .map(e -> e.quantity() + " " + e.symbol() + " = " + e.measured() + " " + e.unit()).toList();
    }

    static void energy(ReportDocument.Builder doc, FitResult r, String pictureId) {
        if (r.getEnergyShares().isEmpty()) {
            return;
        }
        List<List<Cell>> rows = new ArrayList<>();
        List<String> names = new ArrayList<>();
        double[] shares = new double[r.getEnergyShares().size()];
        double[] sigmas = new double[shares.length];
        for (int i = 0; i < shares.length; i++) {
            EnergyShare e = r.getEnergyShares().get(i);
            double sigma = StoredFitText.shareSigma(r, e.getTermId());
            rows.add(List.of(Cell.of(TermWords.word(e.getTermId())), Cell.measured(FitWording.percent(e.getShare(), sigma),
                    "fit.energy_share." + e.getTermId(), Format.SHARE, "fit.energy_share_sigma." + e.getTermId())));
            names.add(TermWords.word(e.getTermId()));
            shares[i] = 100 * e.getShare();
            sigmas[i] = 100 * sigma;
        }
        doc.add(new Table("Share of the energy dissipated over the records, by loss", List.of("loss", "share ± u"), rows));
        doc.add(new Figure(Plots.energyShares(pictureId, "Energy dissipated by each loss", names, shares, sigmas),
                "Each loss's share of the energy the swings lost, with ± one standard uncertainty from the bootstrap refits"
                        + " where it was stored. The verdict names one loss only when it leads the next by the margin."));
    }

    static void sessions(ReportDocument.Builder doc, StoredFitText t) {
        List<List<Cell>> rows = new ArrayList<>();
        for (int k = 0; k < t.sessions().size(); k++) {
            StoredFitText.SessionRow s = t.sessions().get(k);
            String key = "fit.sessions[" + k + "].";
            rows.add(List.of(Cell.of(s.session()), Cell.figure(s.releaseAngle(), key + "theta0_deg", Format.SIGNIFICANT),
                    Cell.figure(s.releaseTime(), key + "release_time_s", Format.SIGNIFICANT),
                    Cell.figure(s.offset(), key + "offset_deg", Format.SIGNIFICANT),
                    Cell.figure(s.rms(), key + "rms_residual_deg", Format.SIGNIFICANT),
                    "–".equals(s.noiseFloor()) ? Cell.of(s.noiseFloor())
                            : Cell.figure(s.noiseFloor(), key + "noise_floor_deg", Format.SIGNIFICANT),
                    "–".equals(s.ratio()) ? Cell.of(s.ratio()) : Cell.figure(s.ratio(), key + "residual_to_noise",
                            Format.FIXED2)));
        }
        doc.add(new Table("Each record's own fitted values and its residual against its noise floor",
                List.of("session", "θ0 (°)", "release (s)", "sensor offset (°)", "residual rms (°)", "noise floor (°)",
                        "residual / noise"), rows));
    }

    static void correlations(ReportDocument.Builder doc, FitResult r) {
        List<String> all = r.getCorrelationParameters();
        int n = all.size();
        if (n == 0 || r.getCorrelations().size() != n * n) {
            return;
        }
        List<Integer> physical = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!all.get(i).contains("[")) {
                physical.add(i);
            }
        }
        List<String> headers = new ArrayList<>(List.of(""));
        physical.forEach(i -> headers.add(all.get(i)));
        List<List<Cell>> rows = new ArrayList<>();
        for (int a : physical) {
            List<Cell> row = new ArrayList<>(List.of(Cell.of(all.get(a))));
            for (int b : physical) {
                row.add(Cell.figure(Figures.fixed(r.getCorrelations().get(a * n + b), 2), "fit.correlation.matrix[" + a + "]["
                        + b + "]", Format.FIXED2));
            }
            rows.add(row);
        }
        doc.add(new Table("Correlations of the estimates (each record's own release values left out); near ±1 the"
                + " records hardly tell two terms apart", headers, rows));
    }

    static void comparison(ReportDocument.Builder doc, StoredFitText t) {
        if (t.comparisons().isEmpty()) {
            return;
        }
        List<List<Cell>> rows = new ArrayList<>();
        for (int k = 0; k < t.comparisons().size(); k++) {
            StoredFitText.ComparisonRow c = t.comparisons().get(k);
            String key = "fit.comparison[" + k + "].";
            rows.add(List.of(Cell.of(c.selected() ? "kept" : ""), Cell.of(c.terms()),
                    Cell.figure(c.aic(), key + "aic", Format.FIXED1), Cell.figure(c.bic(), key + "bic", Format.FIXED1),
                    Cell.figure(c.rms(), key + "rms_residual_deg", Format.SIGNIFICANT)));
        }
        doc.add(new Table("Term sets compared (lower AIC and BIC are better; the fit keeps the set with the lowest BIC"
                + " among those the records support)", List.of("", "terms", "AIC", "BIC", "residual rms (°)"), rows));
    }

    static void predictions(ReportDocument.Builder doc, MechanismForecast.Outcome o) {
        MechanismForecast.Bands b = o.bands();
        double deg = Unit.DEGREE.fromSi(1);
        List<List<Cell>> rows = new ArrayList<>();
        if (o.nominal().settled()) {
            rows.add(band("settle time", "s", "predict.settle_time_s", b.settleTime(), 1));
            rows.add(List.of(Cell.of("half-swings before settling"), Cell.of(""), Cell.figure(String.valueOf(Math.round(
                    b.halfSwings().value())), "predict.half_swings.value", Format.WHOLE), wholeOrBlank(b.halfSwings().low(),
                            "predict.half_swings.low"), wholeOrBlank(b.halfSwings().high(), "predict.half_swings.high")));
        }
        rows.add(band("peak angular velocity", "rad/s", "predict.peak_angular_velocity_rad_s", b.peakVelocity(), 1));
        rows.add(band("largest overshoot", "°", "predict.max_overshoot_deg", b.maxOvershoot(), deg));
        rows.add(band("rest band, upper end", "°", "predict.rest_band_deg.upper", b.restUpper(), deg));
        Optional<AnglePass> pass = o.nominal().pass();
        if (pass.isPresent()) {
            rows.add(band("angular velocity at " + Figures.significant(o.request().passAngle() * deg) + "°", "rad/s",
                    "predict.at_angle.angular_velocity_rad_s", b.passVelocity(), 1));
            if (b.tipSpeed() != null) {
                rows.add(band("speed of the point at " + Figures.significant(o.request().radius()) + " m", "m/s",
                        "predict.at_angle.tip_speed_m_s", b.tipSpeed(), 1));
            }
            rows.add(band("kinetic energy there", "J", "predict.at_angle.kinetic_energy_J", b.passEnergy(), 1));
        }
        doc.add(new Table("Predicted figures with their bands (" + o.bandDefinition() + ")",
                List.of("figure", "unit", "nominal", "band low", "band high"), rows));
    }

    private static List<Cell> band(String label, String unit, String key, FigureBand band, double scale) {
        return List.of(Cell.of(label), Cell.of(unit), Cell.figure(Figures.significant(band.value() * scale), key + ".value",
                Format.SIGNIFICANT), orBlank(band.low() * scale, key + ".low"), orBlank(band.high() * scale, key + ".high"));
    }

    private static Cell orBlank(double v, String key) {
        return Double.isNaN(v) ? Cell.of("–") : Cell.figure(Figures.significant(v), key, Format.SIGNIFICANT);
    }

    private static Cell wholeOrBlank(double v, String key) {
        return Double.isNaN(v) ? Cell.of("–") : Cell.figure(String.valueOf(Math.round(v)), key, Format.WHOLE);
    }
}
