package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.forecast.AnglePass;
import dev.penduline.physics.forecast.FigureBand;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingEnergy;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.present.Figures;

/** {@code penduline predict}: what a mechanism does after a release, with the friction of its stored fit. */
public final class PredictCommand implements Command {

    /** The settle band's half-width unless told otherwise (degrees). */
    static final double DEFAULT_BAND_DEG = 1;

    private static final Set<String> OPTIONS = MechanismOptions.with("theta0-deg", "omega0-deg-s", "band-deg", "at-deg",
            "radius-m", "draws", "seed", "viscous", "coulomb", "stiction", "drag", "fit");

    @Override
    public String name() {
        return "predict";
    }

    @Override
    public String summary() {
        return "predict settle time, rest band, peak and passing speeds from the stored fit, with bands";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline predict FILE --theta0-deg DEG [options]

                Forecasts the swing after a release with the friction of the mechanism file's latest
                stored fit (or --fit ID, or the friction options): when it settles inside the band,
                the half-swings before that, the band of angles static friction can hold it in, the
                peak angular velocity, the speed when it first passes --at-deg, the largest
                overshoot and where the energy went. Each figure comes with a band over parameter
                sets drawn from the fit's uncertainty. Angles are from the hanging equilibrium.

                """ + MechanismOptions.USAGE + """

                  --theta0-deg DEG      release angle (required)
                  --omega0-deg-s DEG_S  initial angular velocity (default 0: released from rest)
                  --band-deg DEG        half-width of the settle band (default 1°)
                  --at-deg DEG          report the first passage through this angle (e.g. the closed position)
                  --radius-m M          distance from the pivot axis of the point whose speed is wanted there
                """ + FrictionOptions.USAGE + """

                  --draws N             parameter sets drawn for the bands (default 200; 0: none)
                  --seed N              seed of the draws (default 20261202), so results repeat
                  --json                print a JSON object instead of the report""";
    }

    @Override
    public ExitCode run(List<String> args, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("json", "no-fit"));
        MechanismSource mechanism = FrictionOptions.mechanism(a, err);
        MechanismForecast.FrictionSource source = FrictionOptions.resolve(a, true);
        ForecastRequest request;
        try {
            request = new ForecastRequest(Unit.DEGREE.toSi(a.requiredNumber("theta0-deg")),
                    Unit.DEG_PER_S.toSi(a.number("omega0-deg-s", 0)), Unit.DEGREE.toSi(a.number("band-deg", DEFAULT_BAND_DEG)),
                    a.has("at-deg") ? Unit.DEGREE.toSi(a.number("at-deg", 0)) : Double.NaN, a.number("radius-m", Double.NaN));
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        if (a.has("radius-m") && !a.has("at-deg")) {
            throw new UsageException("--radius-m gives the speed of a point when passing --at-deg: give --at-deg too");
        }
        MechanismForecast.Outcome outcome;
        try {
            outcome = MechanismForecast.forecast(mechanism, source, request,
                    (int) a.whole("draws", MechanismForecast.DEFAULT_DRAWS), a.whole("seed", MechanismForecast.DEFAULT_SEED));
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
        if (a.flag("json")) {
            writeJson(outcome, new JsonWriter(out));
        } else {
            writeReport(mechanism, outcome, out);
        }
        return ExitCode.OK;
    }

    private static void writeJson(MechanismForecast.Outcome o, JsonWriter j) {
        SwingForecast n = o.nominal();
        MechanismForecast.Bands b = o.bands();
        j.beginObject();
        j.field("fit", o.source().fit() == null ? "options" : o.source().fit().id());
        FrictionTorques f = o.source().friction();
        j.name("friction").beginObject().field("viscous_N_m_s_rad", f.viscous()).field("coulomb_N_m", f.coulomb())
                .field("stiction_N_m", f.staticTorque()).field("drag_N_m_s2_rad2", f.drag()).endObject();
        j.field("pivot_inertia_kg_m2", o.pivotInertia()).field("pivot_inertia_source", o.inertiaSource());
        ForecastRequest r = o.request();
        j.field("theta0_deg", Unit.DEGREE.fromSi(r.releaseAngle()))
                .field("omega0_deg_s", Unit.DEG_PER_S.fromSi(r.releaseVelocity()))
                .field("band_deg", Unit.DEGREE.fromSi(r.band()));
        j.field("band_definition", o.bandDefinition()).field("draws", o.draws()).field("seed", o.seed());
        j.field("settled", n.settled());
        figure(j, "settle_time_s", b.settleTime(), 1);
        figure(j, "half_swings", b.halfSwings(), 1);
        j.name("rest_band_deg").beginObject();
        figure(j, "lower", b.restLower(), Unit.DEGREE.fromSi(1));
        figure(j, "upper", b.restUpper(), Unit.DEGREE.fromSi(1));
        j.endObject();
        j.field("rest_angle_deg", Unit.DEGREE.fromSi(n.restAngle()));
        figure(j, "peak_angular_velocity_rad_s", b.peakVelocity(), 1);
        figure(j, "peak_time_s", b.peakTime(), 1);
        j.field("peak_angle_deg", Unit.DEGREE.fromSi(n.peakAngle()));
        figure(j, "max_overshoot_deg", b.maxOvershoot(), Unit.DEGREE.fromSi(1));
        if (!Double.isNaN(r.passAngle())) {
            j.name("at_angle").beginObject().field("angle_deg", Unit.DEGREE.fromSi(r.passAngle()));
            j.field("reached", n.pass().isPresent());
            if (n.pass().isPresent()) {
                j.field("time_s", n.pass().get().time());
                figure(j, "angular_velocity_rad_s", b.passVelocity(), 1);
                if (b.tipSpeed() != null) {
                    j.field("radius_m", r.radius());
                    figure(j, "tip_speed_m_s", b.tipSpeed(), 1);
                }
                figure(j, "kinetic_energy_J", b.passEnergy(), 1);
            }
            j.endObject();
        }
        SwingEnergy e = n.energy();
        j.name("energy_J").beginObject().field("initial", e.initial()).field("viscous", e.viscous())
                .field("coulomb", e.coulomb()).field("drag", e.drag()).field("remaining", e.remaining()).endObject();
        j.field("simulated_time_s", n.simulatedTime());
        j.field("note", n.note());
        j.name("notes").beginArray();
        for (String note : o.notes()) {
            j.value(note);
        }
        j.endArray();
        j.endObject().finish();
    }

    private static void figure(JsonWriter j, String key, FigureBand band, double scale) {
        j.name(key).beginObject().field("value", band.value() * scale).field("low", band.low() * scale)
                .field("high", band.high() * scale).endObject();
    }

    private static void writeReport(MechanismSource m, MechanismForecast.Outcome o, PrintWriter out) {
        SwingForecast n = o.nominal();
        MechanismForecast.Bands b = o.bands();
        ForecastRequest r = o.request();
        FrictionTorques f = o.source().friction();
        double deg = Unit.DEGREE.fromSi(1);
        out.println("Prediction for " + m.label());
        out.println("  friction: " + o.source().description());
        out.printf(Locale.ROOT, "    viscous %s N·m·s/rad, Coulomb %s N·m, static %s N·m, drag %s N·m·s²/rad²%n",
                Figures.significant(f.viscous()), Figures.significant(f.coulomb()), Figures.significant(f.staticTorque()),
                Figures.significant(f.drag()));
        out.printf(Locale.ROOT, "  inertia: J0 %s kg·m² (%s)%n", Figures.significant(o.pivotInertia()), o.inertiaSource());
        out.printf(Locale.ROOT, "  released at %s°%s; settle band ±%s°%n", Figures.significant(r.releaseAngle() * deg),
                r.releaseVelocity() == 0 ? " from rest" : " at " + Figures.significant(r.releaseVelocity() * deg) + " °/s",
                Figures.significant(r.band() * deg));
        out.println("  bands: " + o.bandDefinition());
        out.println();
        if (n.settled()) {
            out.printf(Locale.ROOT, "  settles inside the band after %s s%s%n", Figures.significant(n.settleTime()),
                    range(b.settleTime(), 1));
            out.printf(Locale.ROOT, "  half-swings before that: %d%s%n", n.halfSwings(), wholeRange(b.halfSwings()));
        } else {
            out.println("  does not settle inside the band: " + n.note());
        }
        out.printf(Locale.ROOT, "  rest band: %s° to %s°%s%n", Figures.significant(n.restBand().lower() * deg),
                Figures.significant(n.restBand().upper() * deg),
                n.restBand().anywhere() ? " (static friction can hold it at any angle)" : restRange(b, deg));
        if (Double.isFinite(n.restAngle())) {
            out.printf(Locale.ROOT, "  comes to rest at %s°%n", Figures.significant(n.restAngle() * deg));
        }
        out.printf(Locale.ROOT, "  peak angular velocity: %s rad/s%s at %s s, at %s°%n",
                Figures.significant(n.peakAngularVelocity()), range(b.peakVelocity(), 1),
                Figures.significant(n.peakTime()), Figures.significant(n.peakAngle() * deg));
        out.printf(Locale.ROOT, "  largest overshoot: %s°%s%n", Figures.significant(n.maxOvershoot() * deg),
                range(b.maxOvershoot(), deg));
        if (!Double.isNaN(r.passAngle())) {
            Optional<AnglePass> pass = n.pass();
            if (pass.isEmpty()) {
                out.printf(Locale.ROOT, "  never passes %s°%n", Figures.significant(r.passAngle() * deg));
            } else {
                AnglePass p = pass.get();
                out.printf(Locale.ROOT, "  first passes %s° at %s s: %s rad/s%s%n", Figures.significant(r.passAngle() * deg),
                        Figures.significant(p.time()), Figures.significant(p.angularVelocity()), range(b.passVelocity(), 1));
                if (b.tipSpeed() != null) {
                    out.printf(Locale.ROOT, "    speed of the point at %s m: %s m/s%s%n", Figures.significant(r.radius()),
                            Figures.significant(p.tipSpeed()), range(b.tipSpeed(), 1));
                }
                out.printf(Locale.ROOT, "    kinetic energy: %s J%s%n", Figures.significant(p.kineticEnergy()),
                        range(b.passEnergy(), 1));
            }
        }
        SwingEnergy e = n.energy();
        out.printf(Locale.ROOT, "  energy: released with %s J; taken by viscous %s J, Coulomb %s J, drag %s J; %s J left"
                + " after %s s%n", Figures.significant(e.initial()), Figures.significant(e.viscous()),
                Figures.significant(e.coulomb()), Figures.significant(e.drag()), Figures.significant(e.remaining()),
                Figures.significant(n.simulatedTime()));
        for (String note : o.notes()) {
            out.println("  note: " + note);
        }
        out.println();
        out.println(Caution.HAZARD);
        out.println(Caution.TEXT);
    }

    private static String range(FigureBand band, double scale) {
        if (band == null || Double.isNaN(band.low())) {
            return "";
        }
        return " (band " + Figures.significant(band.low() * scale) + " to " + Figures.significant(band.high() * scale) + ")";
    }

    private static String wholeRange(FigureBand band) {
        if (band == null || Double.isNaN(band.low())) {
            return "";
        }
        return String.format(Locale.ROOT, " (band %d to %d)", Math.round(band.low()), Math.round(band.high()));
    }

    private static String restRange(MechanismForecast.Bands b, double deg) {
        if (Double.isNaN(b.restLower().low()) || b.restLower().low() == b.restLower().high()) {
            return "";
        }
        return " (upper end's band " + Figures.significant(b.restUpper().low() * deg) + " to "
                + Figures.significant(b.restUpper().high() * deg) + ")";
    }
}
