package dev.penduline.cli.commands;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.identify.CandidateScore;
import dev.penduline.physics.identify.CorrelationTable;
import dev.penduline.physics.identify.EnergyShares;
import dev.penduline.physics.identify.FitWarning;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.FrictionVerdict;
import dev.penduline.physics.identify.Goodness;
import dev.penduline.physics.identify.InertiaCheck;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.identify.SessionEstimate;
import dev.penduline.physics.identify.StictionBand;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.FitWording;
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
                        .field("sigma", fit.stiction().sigma())
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
        verdict(j, fit);
        j.field("energy_dissipated_J", fit.energy().dissipated());
        goodness(j, fit.goodness());
        stopBand(j, fit);
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
        j.name("decimation").beginArray();
        outcome.thinned().forEach(d -> j.beginObject().field("session", d.session()).field("samples_before", d.before())
                .field("samples_after", d.after()).field("stride", d.stride()).field("note", d.note()).endObject());
        j.endArray();
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
                    .field("rms_residual_deg", Unit.DEGREE.fromSi(s.rms())).field("samples", s.samples());
            if (fit.goodness() != null) {
                Goodness.SessionGoodness g = fit.goodness().sessions().get(k);
                j.field("noise_floor_deg", Unit.DEGREE.fromSi(g.noise().sigma()))
                        .field("noise_floor_method", g.noise().method())
                        .field("residual_to_noise", g.ratio()).field("residual_lag1", g.lag1());
            }
            j.endObject();
        }
        j.endArray();
    }

    /** The verdict: {@code dominant} (absent when withheld), the losses in order, the shares with σ. */
    private static void verdict(JsonWriter j, FrictionFit fit) {
        FrictionVerdict v = fit.verdict();
        EnergyShares e = fit.energy();
        if (v.kind() == FrictionVerdict.Kind.DOMINANT) {
            j.field("dominant", word(v.dominant()));
        } else if (v.kind() == FrictionVerdict.Kind.MIXED) {
            j.field("dominant", "mixed");
        }
        j.name("leading").beginArray();
        v.leading().forEach(t -> j.value(word(t)));
        j.endArray();
        j.field("verdict_margin", v.margin()).field("lead", v.lead()).field("lead_sigma", v.leadSigma());
        j.name("energy_share").beginObject().field("viscous", e.viscous()).field("coulomb", e.coulomb())
                .field("drag", e.drag()).endObject();
        j.name("energy_share_sigma").beginObject().field("viscous", e.viscousSigma())
                .field("coulomb", e.coulombSigma()).field("drag", e.dragSigma()).endObject();
    }

    private static void goodness(JsonWriter j, Goodness g) {
        if (g == null) {
            return;
        }
        j.name("goodness").beginObject().field("rms_residual_deg", Unit.DEGREE.fromSi(g.rms()))
                .field("noise_floor_deg", Unit.DEGREE.fromSi(g.floor())).field("ratio", g.ratio())
                .field("limit", g.limit()).field("residual_lag1", g.lag1()).field("test", g.test())
                .field("passed", g.passed()).endObject();
    }

    private static void stopBand(JsonWriter j, FrictionFit fit) {
        if (fit.stopNote() == null) {
            return;
        }
        j.name("stop_band").beginObject();
        StictionBand b = fit.stopBand();
        if (b != null) {
            j.field("lower_N_m", b.lower()).field("upper_N_m", b.upper()).field("resolved", b.resolved());
        }
        j.field(b == null ? "reason" : "note", fit.stopNote()).endObject();
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
        return FitWording.word(t);
    }
}
