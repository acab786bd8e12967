package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.model.TestSession;
import dev.penduline.physics.swing.DecayEnvelope;
import dev.penduline.physics.swing.DecrementRegression;
import dev.penduline.physics.swing.FrictionEstimates;
import dev.penduline.physics.swing.LossVerdict;
import dev.penduline.physics.swing.PeriodCheck;
import dev.penduline.physics.swing.StopInfo;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.swing.SwingCycle;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.SwingSessionAnalysis;

/**
 * {@code penduline analyze RECORD.csv}: release, offset, cycles, decay envelopes, a first look from
 * the decay at the dominant loss, and where the body stopped.
 */
public final class AnalyzeCommand implements Command {

    private static final Set<String> OPTIONS = MechanismOptions.with(RecordOptions.with("mechanism"));

    @Override
    public String name() {
        return "analyze";
    }

    @Override
    public String summary() {
        return "analyse a free-release swing record: release, offset, cycles, decay and the dominant loss";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline analyze RECORD.csv [record options] [--mechanism FILE | --mass ... ] [--json]

                Reads a swing-test record (never modifying it), finds the still segment and the
                release, the sensor's zero offset, the turning points and cycles, fits the decay
                envelopes (linear: dry friction; geometric: viscous; reciprocal: drag) and the
                regression of the decrement on amplitude, and takes a first look at which loss
                dominates (the fit decides). It finds where the body stopped: the last reversal,
                after which it does not move again. With the mechanism it also compares the
                periods with the undamped prediction, gives first estimates of the friction terms
                in SI and the band of static friction the stop allows.

                """ + RecordOptions.USAGE + """

                  --mechanism FILE         the mechanism (.penduline or parts .csv), or
                  --mass KG --centroid-distance M --pivot-inertia KG_M2 [--gravity M_S2]
                  --json                   print a JSON object instead of the report""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("json"));
        if (a.positional().size() != 1) {
            throw new UsageException("give exactly one record file. " + usage());
        }
        Optional<MechanismSource> mechanism = MechanismOptions.optional(a, defaults);
        SwingRecord record;
        SwingAnalysis analysis;
        Optional<String> change = Optional.empty();
        try {
            Path file = Path.of(a.positional().get(0));
            SwingImportOptions options = RecordOptions.from(a);
            Optional<TestSession> session = Optional.empty();
            if (a.has("mechanism") && a.value("mechanism").endsWith(".penduline")) {
                Path mechanismFile = Path.of(a.value("mechanism"));
                session = SessionRecords.sessionFor(mechanismFile, file);
                if (session.isPresent()) {
                    // a session's record: inside the project even through links, and checked against its hash
                    SessionRecords.recordFile(mechanismFile, session.get());
                    if (!RecordOptions.anyGiven(a)) {
                        // A record the project carries is read with the mapping stored with its session.
                        options = SessionRecords.optionsOf(session.get());
                    }
                }
            }
            record = SessionRecords.read(file, options);
            SwingRecord read = record;
            change = session.flatMap(s -> SessionRecords.changeOf(s, read));
            analysis = SwingSessionAnalysis.analyse(record, mechanism);
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
        // said first, before anything read from the record
        change.ifPresent(c -> err.println("warning: " + c + "; what follows is the analysis of the new content"));
        for (String s : record.assumptions()) {
            err.println("assumed: " + s);
        }
        List<String> warnings = new ArrayList<>();
        change.ifPresent(warnings::add);
        warnings.addAll(record.warnings());
        mechanism.ifPresent(m -> warnings.addAll(m.warnings()));
        warnings.addAll(analysis.warnings());
        if (a.flag("json")) {
            writeJson(record, analysis, warnings, new JsonWriter(out));
        } else {
            for (String w : change.isPresent() ? warnings.subList(1, warnings.size()) : warnings) {
                err.println("warning: " + w);
            }
            new AnalysisReport(record, analysis, mechanism).print(out);
        }
        return ExitCode.OK;
    }

    /**
     * The median sampling rate of a record.
     *
     * @param t sample times (s)
     * @return samples per second (Hz)
     */
    static double sampleRate(double[] t) {
        double[] steps = new double[t.length - 1];
        for (int i = 1; i < t.length; i++) {
            steps[i - 1] = t[i] - t[i - 1];
        }
        java.util.Arrays.sort(steps);
        return 1 / steps[steps.length / 2];
    }

    /**
     * The first look's dominant term as the JSON word: the leading loss when it is mixed.
     *
     * @param v the first look from the decay
     * @return viscous, coulomb or drag
     */
    static String dominant(LossVerdict v) {
        LossVerdict.Loss loss = switch (v.kind()) {
            case COULOMB, VISCOUS, DRAG -> v.kind();
            default -> v.leading();
        };
        return loss.name().toLowerCase(Locale.ROOT);
    }

    private static void writeJson(SwingRecord record, SwingAnalysis s, List<String> warnings, JsonWriter j) {
        j.beginObject()
                .field("file", record.source())
                .field("sha256", record.sha256())
                .field("samples", record.size())
                .field("sample_rate_hz", sampleRate(record.times()))
                .field("release_time_s", s.release().time())
                .field("release_time_uncertainty_s", s.release().uncertainty())
                .field("theta0_deg", Unit.DEGREE.fromSi(s.initialAngle()))
                .field("offset_deg", Unit.DEGREE.fromSi(s.offset().value()))
                .field("offset_uncertainty_deg", Unit.DEGREE.fromSi(s.offset().uncertainty()))
                .field("offset_method", s.offset().method().name().toLowerCase(Locale.ROOT));
        j.name("cycles").beginArray();
        for (SwingCycle c : s.cycles()) {
            j.beginObject().field("time_s", c.startTime()).field("amplitude_deg", Unit.DEGREE.fromSi(c.amplitude()))
                    .field("period_s", c.period()).field("predicted_period_s", c.predictedPeriod()).endObject();
        }
        j.endArray();
        j.name("envelope").beginObject();
        for (DecayEnvelope e : s.envelopes()) {
            switch (e.model()) {
                case LINEAR -> j.name("linear").beginObject()
                        .field("decrement_deg_per_cycle", Unit.DEGREE.fromSi(e.ratePerCycle()))
                        .field("r2", e.rSquared()).endObject();
                case GEOMETRIC -> j.name("geometric").beginObject()
                        .field("log_decrement", e.ratePerCycle()).field("damping_ratio", e.dampingRatio())
                        .field("r2", e.rSquared()).endObject();
                case RECIPROCAL -> j.name("reciprocal").beginObject()
                        .field("inverse_amplitude_growth_per_rad_per_cycle", e.ratePerCycle())
                        .field("r2", e.rSquared()).endObject();
            }
        }
        j.endObject();
        s.regression().ifPresent(r -> regression(r, j));
        LossVerdict v = s.verdict();
        j.field("dominant", dominant(v));
        j.name("verdict").beginObject().field("kind", v.kind().name().toLowerCase(Locale.ROOT))
                .field("coulomb_share", v.coulombShare()).field("viscous_share", v.viscousShare())
                .field("drag_share", v.dragShare());
        j.name("evidence").beginArray();
        v.evidence().forEach(j::value);
        j.endArray().endObject();
        PeriodCheck p = s.periodCheck();
        if (p != null && Double.isFinite(p.predictedSmallAnglePeriod())) {
            j.name("period_check").beginObject()
                    .field("measured_small_angle_period_s", p.measuredSmallAnglePeriod())
                    .field("predicted_small_angle_period_s", p.predictedSmallAnglePeriod())
                    .field("relative_difference", p.medianRelativeDifference())
                    .field("implied_pivot_inertia_kg_m2", p.impliedPivotInertia()).endObject();
        }
        s.estimates().ifPresent(e -> estimates(e, j));
        StopInfo stop = s.stop();
        j.name("stop").beginObject().field("stopped", stop.stopped()).field("time_s", stop.time())
                .field("time_uncertainty_s", stop.timeUncertainty())
                .field("rest_angle_deg", Unit.DEGREE.fromSi(stop.restOffset()))
                .field("rest_angle_uncertainty_deg", Unit.DEGREE.fromSi(stop.restOffsetUncertainty()))
                .field("previous_reversal_deg", Unit.DEGREE.fromSi(stop.previousOffset()))
                .field("stiction_lower_bound_n_m", stop.stictionLowerBound())
                .field("stiction_upper_bound_n_m", stop.stictionUpperBound())
                .field("stiction_resolution_n_m", stop.stictionResolution())
                .field("note", stop.note()).endObject();
        j.name("warnings").beginArray();
        warnings.forEach(j::value);
        j.endArray().endObject().finish();
    }

    private static void regression(DecrementRegression r, JsonWriter j) {
        j.name("decrement_regression").beginObject()
                .field("a0_rad", r.a0()).field("a0_sigma_rad", r.a0Error())
                .field("a1", r.a1()).field("a1_sigma", r.a1Error())
                .field("a2_per_rad", r.a2()).field("a2_sigma_per_rad", r.a2Error())
                .field("r2", r.rSquared()).field("half_swings", r.count()).endObject();
    }

    private static void estimates(FrictionEstimates e, JsonWriter j) {
        j.name("estimates").beginObject()
                .field("viscous", e.viscous()).field("coulomb", e.coulomb()).field("drag", e.drag()).endObject();
        j.name("estimates_sigma").beginObject()
                .field("viscous", e.viscousError()).field("coulomb", e.coulombError()).field("drag", e.dragError())
                .endObject();
    }
}
