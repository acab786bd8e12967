package dev.penduline.cli.commands;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.identify.CandidateScore;
import dev.penduline.physics.identify.CorrelationTable;
import dev.penduline.physics.identify.FitWarning;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.InertiaCheck;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.identify.SessionEstimate;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.FrictionIdentification.SessionInput;

/** The {@code --json} output of {@code penduline fit}. */
final class FitJson {

    private final Outcome outcome;
    private final String stored;

    FitJson(Outcome outcome, String stored) {
        this.outcome = outcome;
        this.stored = stored;
    }

    void write(JsonWriter j) {
        FrictionFit fit = outcome.fit();
        j.beginObject()
                .field("status", fit.status().name().toLowerCase(Locale.ROOT))
                .field("message", fit.message())
                .field("automatic_terms", outcome.automatic());
        InertiaCheck i = fit.inertia();
        j.name("inertia").beginObject()
                .field("calculated_kg_m2", i.calculated()).field("fitted_kg_m2", i.fitted())
                .field("sigma_kg_m2", i.sigma()).field("difference_percent", i.differencePercent())
                .field("free", i.free()).endObject();
        j.name("terms").beginObject();
        for (FrictionTerm t : fit.terms()) {
            Optional<ParameterEstimate> p = fit.parameter(t.symbol());
            j.name(word(t)).beginObject();
            if (t == FrictionTerm.STICTION && fit.stiction() != null) {
                j.field("value", fit.stiction().middle())
                        .field("sigma", (fit.stiction().upper() - fit.stiction().lower()) / Math.sqrt(12))
                        .field("lower", fit.stiction().lower()).field("upper", fit.stiction().upper())
                        .field("resolved", fit.stiction().resolved());
            } else if (p.isPresent()) {
                j.field("value", p.get().value()).field("sigma", p.get().sigma())
                        .field("sigma_jacobian", p.get().sigmaJacobian())
                        .field("sigma_resampling", p.get().sigmaResampling()).field("on_bound", p.get().onBound());
            }
            j.field("unit", t.unit()).endObject();
        }
        j.endObject();
        j.field("dominant", word(fit.energy().dominant()));
        j.name("energy_share").beginObject().field("viscous", fit.energy().viscous())
                .field("coulomb", fit.energy().coulomb()).field("drag", fit.energy().drag()).endObject();
        j.field("energy_dissipated_J", fit.energy().dissipated());
        sessions(j, fit);
        outcome.comparison().ifPresent(c -> {
            j.name("comparison").beginArray();
            for (int k = 0; k < c.candidates().size(); k++) {
                CandidateScore s = c.candidates().get(k);
                j.beginObject().name("terms").beginArray();
                s.terms().forEach(t -> j.value(word(t)));
                j.endArray().field("aic", s.aic()).field("bic", s.bic())
                        .field("rms_residual_deg", Unit.DEGREE.fromSi(s.rms())).field("parameters", s.parameters())
                        .field("supported", s.supported()).field("selected", k == c.selected())
                        .field("status", s.status().name().toLowerCase(Locale.ROOT)).endObject();
            }
            j.endArray().field("effective_samples", c.effectiveSamples()).field("residual_lag1", c.lag1());
        });
        correlation(j, fit.correlation());
        j.field("rms_residual_deg", Unit.DEGREE.fromSi(fit.rms())).field("samples", fit.samples())
                .field("iterations", fit.iterations()).field("evaluations", fit.evaluations())
                .field("resamples", fit.resamplesUsed());
        j.name("warnings").beginArray();
        fit.warnings().stream().map(FitWarning::message).forEach(j::value);
        outcome.warnings().forEach(j::value);
        j.endArray();
        j.field("stored_as", stored);
        j.endObject().finish();
    }

    private void sessions(JsonWriter j, FrictionFit fit) {
        j.name("sessions").beginArray();
        List<SessionEstimate> estimates = fit.sessions();
        for (int k = 0; k < estimates.size(); k++) {
            SessionEstimate s = estimates.get(k);
            SessionInput in = outcome.sessions().get(k);
            j.beginObject().field("name", s.name()).field("file", in.file())
                    .field("theta0_deg", Unit.DEGREE.fromSi(s.releaseAngle().value()))
                    .field("theta0_sigma_deg", Unit.DEGREE.fromSi(s.releaseAngle().sigma()))
                    .field("release_time_s", s.releaseTime().value())
                    .field("release_time_sigma_s", s.releaseTime().sigma())
                    .field("offset_deg", Unit.DEGREE.fromSi(s.offset().value()))
                    .field("rms_residual_deg", Unit.DEGREE.fromSi(s.rms())).field("samples", s.samples())
                    .endObject();
        }
        j.endArray();
    }

    private static void correlation(JsonWriter j, CorrelationTable c) {
        if (c == null) {
            return;
        }
        j.name("correlation").beginObject().name("parameters").beginArray();
        c.names().forEach(j::value);
        j.endArray().name("matrix").beginArray();
        for (double[] row : c.values()) {
            j.beginArray();
            for (double v : row) {
                j.value(v);
            }
            j.endArray();
        }
        j.endArray().endObject();
    }

    static String word(FrictionTerm t) {
        return t.name().toLowerCase(Locale.ROOT);
    }
}
