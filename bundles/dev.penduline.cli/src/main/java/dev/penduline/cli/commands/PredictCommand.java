package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.function.ToDoubleFunction;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.OptionRules;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.AnglePass;
import dev.penduline.physics.forecast.FigureBand;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.motion.SwingEnergy;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.Defaults;
import dev.penduline.services.ForecastText;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.PartChanges;
import dev.penduline.services.SpecDesign;
import dev.penduline.services.present.Figures;

/** {@code penduline predict}: what a mechanism does after a release, with the friction of its stored fit. */
public final class PredictCommand implements Command {

    private static final Set<String> OPTIONS = MechanismOptions.with("theta0-deg", "omega0-deg-s", "band-deg", "at-deg",
            "radius-m", "draws", "seed", "viscous", "coulomb", "stiction", "drag", "fit", "settle-within-s", "max-speed-at-deg",
            "add", "set", "remove", "add-parts");

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
                  --band-deg DEG        half-width of the settle band (default 1°; with
                                        --use-preferences the defaults file's)
                  --at-deg DEG          report the first passage through this angle (e.g. the closed position)
                  --radius-m M          distance from the pivot axis of the point whose speed is wanted there
                """ + FrictionOptions.USAGE + """

                  --settle-within-s T   design: the damping to add so that it settles inside the band within T
                  --max-speed-at-deg A:W
                                        design: the damping to add so that it passes A degrees at most at W rad/s
                  --add viscous|coulomb the term a design adds (default viscous)
                  --set PART.FIELD=VALUE
                                        what-if: change a part (mass, x, y, z, length, width, height,
                                        radius, inner_radius, quantity; SI or a unit suffix: 12mm,
                                        0.5lb); repeat for several; the report gives both, side by side
                  --remove PART         what-if: without this part
                  --add-parts FILE.csv  what-if: with the parts of this parts list added
                  --draws N             parameter sets drawn for the bands (default 200; 0: none)
                  --seed N              seed of the draws (default 20261202), so results repeat
                  --json                print a JSON object instead of the report""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Prediction p = compute(args, defaults, err);
        if (p.args().flag("json")) {
            writeJson(p.outcome(), p.design(), p.whatIf(), new JsonWriter(out));
        } else {
            ForecastText.write(p.mechanism(), p.outcome(), p.design(), out);
            p.whatIf().ifPresent(w -> writeWhatIf(p.outcome(), w, p.args(), out));
        }
        return ExitCode.OK;
    }

    /**
     * What {@code penduline predict} computed for its options.
     *
     * @param mechanism the mechanism
     * @param outcome   the forecast
     * @param design    the design answer, when a spec was given
     * @param whatIf    the changed mechanism's forecast, when changes were given
     * @param args      the parsed options
     */
    record Prediction(MechanismSource mechanism, MechanismForecast.Outcome outcome, Optional<SpecDesign.Answer> design,
            Optional<MechanismForecast.Outcome> whatIf, Arguments args) {

        /**
         * The readable report, line by line, without the caution (a report that includes it has its own).
         *
         * @return the lines
         */
        List<String> lines() {
            List<String> lines = new ArrayList<>(ForecastText.lines(mechanism, outcome, design));
            whatIf.ifPresent(w -> {
                StringWriter text = new StringWriter();
                PrintWriter out = new PrintWriter(text);
                writeWhatIf(outcome, w, args, out);
                out.flush();
                lines.addAll(text.toString().lines().toList());
            });
            return lines;
        }
    }

    /**
     * Parses the options and computes the forecast, the design and the what-if they ask for.
     *
     * @param args     the options, the mechanism first
     * @param defaults the user's defaults
     * @param err      where warnings go
     * @return what was computed
     * @throws UsageException when an option or the input is wrong
     */
    static Prediction compute(List<String> args, Defaults defaults, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("json", "no-fit"));
        MechanismSource mechanism = FrictionOptions.mechanism(a, defaults, err);
        MechanismForecast.FrictionSource source = FrictionOptions.resolve(a, true);
        FrictionOptions.warnIfStale(source, err);
        ForecastRequest request;
        try {
            request = new ForecastRequest(Unit.DEGREE.toSi(a.requiredNumber("theta0-deg")),
                    Unit.DEG_PER_S.toSi(a.number("omega0-deg-s", 0)), Unit.DEGREE.toSi(a.number("band-deg", defaults.settleBand())),
                    a.has("at-deg") ? Unit.DEGREE.toSi(a.number("at-deg", 0)) : Double.NaN, a.number("radius-m", Double.NaN));
        } catch (InvalidValueException e) {
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
        Optional<MechanismForecast.Outcome> whatIf = whatIf(a, mechanism, source, request);
        Optional<SpecDesign.Answer> design = design(a, mechanism, source, request);
        return new Prediction(mechanism, outcome, design, whatIf, a);
    }

    private static Optional<MechanismForecast.Outcome> whatIf(Arguments a, MechanismSource mechanism,
            MechanismForecast.FrictionSource source, ForecastRequest request) throws UsageException {
        if (!a.has("set") && !a.has("remove") && !a.has("add-parts")) {
            return Optional.empty();
        }
        if (mechanism.parts().isEmpty() || mechanism.frame() == null) {
            throw new UsageException("what-if changes (--set, --remove, --add-parts) change parts: give a mechanism file or a"
                    + " parts list, not lumped properties");
        }
        try {
            List<PartChanges.Setting> settings = new ArrayList<>();
            for (String text : a.all("set")) {
                settings.add(PartChanges.parse(text));
            }
            List<Path> added = a.all("add-parts").stream().map(Path::of).toList();
            List<Part> parts = PartChanges.apply(mechanism.parts(), settings, a.all("remove"), added);
            MechanismSource changed = new MechanismLoader(mechanism.frame()).summarise(mechanism.label() + " with the changes",
                    parts, List.of());
            return Optional.of(MechanismForecast.whatIf(mechanism, changed, source, request,
                    (int) a.whole("draws", MechanismForecast.DEFAULT_DRAWS), a.whole("seed", MechanismForecast.DEFAULT_SEED)));
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
    }

    /** The figures a what-if compares, in the report's order: label, JSON key, scale to the shown unit. */
    private record Compared(String label, String key, ToDoubleFunction<MechanismForecast.Outcome> value) {
    }

    private static List<Compared> compared(MechanismForecast.Outcome base) {
        double deg = Unit.DEGREE.fromSi(1);
        List<Compared> list = new ArrayList<>(List.of(
                new Compared("mass (kg)", "mass_kg", o -> o.properties().mass()),
                new Compared("centroid distance Lc (m)", "centroid_distance_m", o -> o.properties().centroidDistance()),
                new Compared("J0 (kg·m²)", "pivot_inertia_kg_m2", MechanismForecast.Outcome::pivotInertia),
                new Compared("small-angle period (s)", "small_angle_period_s", o -> o.properties().smallAnglePeriod()),
                new Compared("settle time (s)", "settle_time_s", o -> o.nominal().settled() ? o.nominal().settleTime()
                        : Double.NaN),
                new Compared("half-swings", "half_swings", o -> o.nominal().settled() ? o.nominal().halfSwings() : Double.NaN),
                new Compared("peak angular velocity (rad/s)", "peak_angular_velocity_rad_s",
                        o -> o.nominal().peakAngularVelocity()),
                new Compared("largest overshoot (°)", "max_overshoot_deg", o -> o.nominal().maxOvershoot() * deg),
                new Compared("rest band upper end (°)", "rest_band_upper_deg", o -> o.nominal().restBand().upper() * deg)));
        if (!Double.isNaN(base.request().passAngle())) {
            list.add(new Compared("angular velocity at --at-deg (rad/s)", "at_angle_angular_velocity_rad_s",
                    o -> o.nominal().pass().map(AnglePass::angularVelocity).orElse(Double.NaN)));
            list.add(new Compared("kinetic energy at --at-deg (J)", "at_angle_kinetic_energy_J",
                    o -> o.nominal().pass().map(AnglePass::kineticEnergy).orElse(Double.NaN)));
        }
        return list;
    }

    private static void writeWhatIf(MechanismForecast.Outcome base, MechanismForecast.Outcome changed, Arguments a,
            PrintWriter out) {
        out.println("What-if: " + String.join("; ", whatIfChanges(a)));
        String row = "  %-38s %14s %14s %14s%n";
        out.printf(Locale.ROOT, row, "", "as it is", "changed", "difference");
        for (Compared c : compared(base)) {
            double b = c.value().applyAsDouble(base);
            double n = c.value().applyAsDouble(changed);
            out.printf(Locale.ROOT, row, c.label(), Figures.significant(b), Figures.significant(n), Figures.significant(n - b));
        }
        out.println("  (the changed mechanism's bands: " + changed.bandDefinition() + ")");
        out.println();
    }

    private static List<String> whatIfChanges(Arguments a) {
        List<String> changes = new ArrayList<>(a.all("set"));
        a.all("remove").forEach(r -> changes.add("without " + r));
        a.all("add-parts").forEach(f -> changes.add("with the parts of " + f));
        return changes;
    }

    private static void writeWhatIfJson(MechanismForecast.Outcome base, MechanismForecast.Outcome changed, JsonWriter j) {
        j.name("what_if").beginObject();
        for (String side : List.of("baseline", "changed", "difference")) {
            j.name(side).beginObject();
            for (Compared c : compared(base)) {
                double b = c.value().applyAsDouble(base);
                double n = c.value().applyAsDouble(changed);
                j.field(c.key(), switch (side) {
                    case "baseline" -> b;
                    case "changed" -> n;
                    default -> n - b;
                });
            }
            j.endObject();
        }
        j.endObject();
    }

    private static Optional<SpecDesign.Answer> design(Arguments a, MechanismSource mechanism,
            MechanismForecast.FrictionSource source, ForecastRequest request) throws UsageException {
        if (a.has("settle-within-s") && a.has("max-speed-at-deg")) {
            throw new UsageException("give one spec at a time: --settle-within-s or --max-speed-at-deg");
        }
        SpecDesign.Spec spec;
        if (a.has("settle-within-s")) {
            spec = SpecDesign.Spec.settleWithin(a.number("settle-within-s", Double.NaN));
        } else if (a.has("max-speed-at-deg")) {
            spec = speedSpec(a.value("max-speed-at-deg"));
        } else {
            if (a.has("add")) {
                throw new UsageException("--add chooses the term a design adds: give --settle-within-s or --max-speed-at-deg");
            }
            return Optional.empty();
        }
        String add = a.has("add") ? a.value("add") : "viscous";
        SpecDesign.Term term = switch (add) {
            case "viscous" -> SpecDesign.Term.VISCOUS;
            case "coulomb" -> SpecDesign.Term.COULOMB;
            default -> throw new UsageException("option --add: '" + OptionRules.shown(add) + "' is not a term a design can add:"
                    + " give viscous or coulomb");
        };
        MechanismProperties p = MechanismForecast.properties(mechanism, source);
        return Optional.of(source.fit() != null
                ? SpecDesign.design(p, source.fit(), request, spec, term, a.whole("seed", MechanismForecast.DEFAULT_SEED))
                : SpecDesign.design(p, source.friction(), request, spec, term));
    }

    private static SpecDesign.Spec speedSpec(String text) throws UsageException {
        String[] parts = text.split(":", -1);
        if (parts.length != 2) {
            throw new UsageException("option --max-speed-at-deg: '" + OptionRules.shown(text) + "' is not ANGLE:RAD_S (e.g. 0:1.5,"
                    + " at most 1.5 rad/s when passing 0°)");
        }
        double angle;
        double limit;
        try {
            angle = Double.parseDouble(parts[0].strip());
            limit = Double.parseDouble(parts[1].strip());
        } catch (NumberFormatException e) {
            throw new UsageException("option --max-speed-at-deg: '" + OptionRules.shown(text) + "' is not ANGLE:RAD_S with two"
                    + " numbers (e.g. 0:1.5)");
        }
        OptionRules.check("at-deg", parts[0], angle);
        if (!(limit > 0) || Double.isInfinite(limit)) {
            throw new UsageException("option --max-speed-at-deg: the speed limit must be a number above 0 rad/s, got '"
                    + OptionRules.shown(parts[1]) + "'");
        }
        return SpecDesign.Spec.maxSpeedAt(Unit.DEGREE.toSi(angle), limit);
    }

    private static void writeDesignJson(SpecDesign.Answer d, JsonWriter j) {
        j.name("design").beginObject().field("term", d.term().name().toLowerCase(Locale.ROOT))
                .field("unit", d.term().unit()).field("added", d.added()).field("total", d.total())
                .field("meets", d.meets()).field("figure_name", d.figureName()).field("figure", d.figure() >= 1e11 ? Double.NaN
                        : d.figure()).field("baseline_figure", d.baseline() >= 1e11 ? Double.NaN : d.baseline())
                .field("reason", d.reason());
        if (d.addedBand().isPresent()) {
            j.name("added_band").beginObject().field("low", d.addedBand().get().low())
                    .field("high", d.addedBand().get().high()).field("draws", SpecDesign.SENSITIVITY_DRAWS).endObject();
        }
        j.endObject();
    }

    private static void writeJson(MechanismForecast.Outcome o, Optional<SpecDesign.Answer> design,
            Optional<MechanismForecast.Outcome> whatIf, JsonWriter j) {
        SwingForecast n = o.nominal();
        MechanismForecast.Bands b = o.bands();
        j.beginObject();
        j.field("fit", o.source().fit() == null ? "options" : o.source().fit().id());
        if (o.source().fit() != null && o.source().fit().stale().isPresent()) {
            j.field("fit_stale", o.source().fit().stale().get());
        }
        FrictionOptions.writeJson(o.source().friction(), j);
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
        design.ifPresent(d -> writeDesignJson(d, j));
        whatIf.ifPresent(w -> writeWhatIfJson(o, w, j));
        j.endObject().finish();
    }

    private static void figure(JsonWriter j, String key, FigureBand band, double scale) {
        j.name(key).beginObject().field("value", band.value() * scale).field("low", band.low() * scale)
                .field("high", band.high() * scale).endObject();
    }
}
