package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.PartContribution;
import dev.penduline.physics.inertia.ToleranceSpread;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.Cautions;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.present.Figures;

/** {@code penduline inertia FILE}: mass, centroid and inertia about the pivot, part by part. */
public final class InertiaCommand implements Command {

    /** Monte Carlo draws over the parts' tolerances unless told otherwise. */
    static final int DEFAULT_DRAWS = ToleranceSpread.DEFAULT_DRAWS;

    @Override
    public String name() {
        return "inertia";
    }

    @Override
    public String summary() {
        return "pivot inertia, centroid and period of a mechanism from its parts list or mechanism file";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline inertia FILE [--gravity M_S2] [--draws N] [--seed N] [--json]

                FILE is a parts-list CSV (a bill of materials or CAD mass-property export) or a
                mechanism file. Prints the total mass, the centroid and its distance from the pivot
                axis, the inertia about the pivot and about the centroid, the radius of gyration,
                the equivalent simple-pendulum length, the small-angle period, and each part's
                contribution. When parts carry tolerances (mass_tol, dim_tol), it also gives how far
                mass, Lc, J0 and the period can move within them: a Monte Carlo standard deviation
                and 5th/95th percentiles, with the linearised (GUM) standard uncertainty beside.

                  --gravity M_S2   local gravity (default 9.80665 m/s², or the mechanism file's;
                                   with --use-preferences the defaults file's for a parts list)
                  --draws N        Monte Carlo draws over the tolerances (default 2000)
                  --seed N         their seed (default 20261202), so results repeat
                  --json           print a JSON object instead of the table""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, Set.of("gravity", "draws", "seed"), Set.of("json"));
        if (a.positional().size() != 1) {
            throw new UsageException("give exactly one parts list or mechanism file. " + usage());
        }
        MechanismLoader loader = new MechanismLoader().withDefaultGravity(defaults.gravity());
        if (a.has("gravity")) {
            loader = loader.withGravity(a.number("gravity", Double.NaN));
        }
        MechanismSource source;
        List<String> warnings;
        try {
            Path file = Path.of(a.positional().get(0));
            source = loader.load(file);
            warnings = new ArrayList<>(source.warnings());
            if (file.toString().endsWith("." + MechanismFormat.FILE_EXTENSION)) {
                // the inertia needs no record, but a missing, outside or changed one is worth knowing now
                warnings.addAll(SessionRecords.recordWarnings(file));
            }
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
        InertiaSummary s = source.inertia().orElseThrow();
        for (String w : warnings) {
            err.println("warning: " + w);
        }
        ToleranceSpread.Result spread = null;
        if (source.hasTolerances()) {
            int draws = (int) a.whole("draws", DEFAULT_DRAWS);
            if (draws < 2) {
                throw new UsageException("option --draws: give at least 2 Monte Carlo draws");
            }
            try {
                spread = ToleranceSpread.of(source.frame(), source.parts(), draws, a.whole("seed", MechanismForecast.DEFAULT_SEED));
            } catch (InvalidValueException e) {
                throw new UsageException(source.label() + ": " + e.getMessage());
            }
        }
        if (a.flag("json")) {
            writeJson(source, s, warnings, spread, new JsonWriter(out));
        } else {
            writeTable(source, s, spread, out);
        }
        return ExitCode.OK;
    }

    private static void writeJson(MechanismSource source, InertiaSummary s, List<String> warnings,
            ToleranceSpread.Result spread, JsonWriter j) {
        j.beginObject()
                .field("source", source.label())
                .field("mass_kg", s.totalMass())
                .name("centroid_m").beginArray().value(s.centroid().getX()).value(s.centroid().getY())
                .value(s.centroid().getZ()).endArray()
                .field("centroid_distance_m", s.centroidDistance())
                .field("pivot_inertia_kg_m2", s.pivotInertia())
                .field("centroid_inertia_kg_m2", s.centroidalInertia())
                .field("radius_of_gyration_m", s.radiusOfGyration())
                .field("equivalent_length_m", s.equivalentLength())
                .field("small_angle_period_s", s.smallAnglePeriod())
                .field("simple_pendulum_period_error", s.simplePendulumPeriodError())
                .field("equilibrium_angle_deg", Unit.DEGREE.fromSi(s.equilibriumAngle()))
                .field("gravity_m_s2", s.gravity())
                .field("axis_tilt_deg", Unit.DEGREE.fromSi(s.axisTilt()));
        if (spread != null) {
            j.field("mass_kg_sigma", spread.mass().sigma())
                    .field("centroid_distance_m_sigma", spread.centroidDistance().sigma())
                    .field("pivot_inertia_kg_m2_sigma", spread.pivotInertia().sigma())
                    .field("small_angle_period_s_sigma", spread.period().sigma());
            j.name("tolerance_spread").beginObject().field("draws", spread.samples()).field("failed", spread.failed())
                    .field("seed", spread.seed()).field("inputs", spread.inputs());
            spreadJson(j, "mass_kg", spread.mass());
            spreadJson(j, "centroid_distance_m", spread.centroidDistance());
            spreadJson(j, "pivot_inertia_kg_m2", spread.pivotInertia());
            spreadJson(j, "small_angle_period_s", spread.period());
            j.endObject();
        }
        j.name("parts").beginArray();
        for (PartContribution p : s.contributions()) {
            j.beginObject()
                    .field("name", p.name())
                    .field("mass_kg", p.mass())
                    .field("distance_m", p.axisDistance())
                    .field("pivot_inertia_kg_m2", p.pivotInertia())
                    .field("share", p.share())
                    .endObject();
        }
        j.endArray();
        j.name("warnings").beginArray();
        for (String w : warnings) {
            j.value(w);
        }
        j.endArray().endObject().finish();
    }

    private static void spreadJson(JsonWriter j, String key, ToleranceSpread.Spread s) {
        j.name(key).beginObject().field("nominal", s.nominal()).field("sigma", s.sigma())
                .field("linear_sigma", s.linearSigma()).field("mean", s.mean()).field("p5", s.p5()).field("p95", s.p95())
                .endObject();
    }

    private static void writeTable(MechanismSource source, InertiaSummary s, ToleranceSpread.Result spread,
            PrintWriter out) {
        out.println("Inertia of " + source.label());
        out.println();
        int width = Math.max(4, s.contributions().stream().mapToInt(p -> p.name().length()).max().orElse(4));
        String row = "  %-" + width + "s  %10s  %12s  %16s  %7s%n";
        out.printf(row, "part", "mass (kg)", "distance (m)", "J pivot (kg·m²)", "share");
        for (PartContribution p : s.contributions()) {
            out.printf(row, p.name(), num(p.mass()), num(p.axisDistance()), num(p.pivotInertia()),
                    Figures.percent(p.share()));
        }
        out.println();
        out.printf("  total mass                      %s kg%n", num(s.totalMass()));
        out.printf("  centroid (x, y, z)              (%s, %s, %s) m%n", num(s.centroid().getX()), num(s.centroid().getY()),
                num(s.centroid().getZ()));
        out.printf("  centroid distance Lc            %s m%n", num(s.centroidDistance()));
        out.printf("  equilibrium angle               %s°%n", Figures.fixed(Unit.DEGREE.fromSi(s.equilibriumAngle()), 3));
        out.printf("  inertia about the pivot J0      %s kg·m²%n", num(s.pivotInertia()));
        out.printf("  inertia about the centroid      %s kg·m²%n", num(s.centroidalInertia()));
        out.printf("  radius of gyration              %s m%n", num(s.radiusOfGyration()));
        out.printf("  equivalent pendulum length      %s m%n", num(s.equivalentLength()));
        out.printf("  small-angle period T0           %s s%n", num(s.smallAnglePeriod()));
        out.printf("  simple-pendulum period error    %s (treating the body as a point mass at its centroid)%n",
                Figures.percent(s.simplePendulumPeriodError(), 2));
        if (spread != null) {
            writeSpread(spread, out);
        }
        out.println();
        out.println(Cautions.TEXT);
    }

    private static void writeSpread(ToleranceSpread.Result r, PrintWriter out) {
        out.println();
        out.printf(Locale.ROOT, "  within the parts' tolerances (%d Monte Carlo draws over %d toleranced inputs, seed %d):%n",
                r.samples(), r.inputs(), r.seed());
        String row = "    %-22s %-12s σ %-10s (linearised %s)   5-95 %%: %s to %s%n";
        spreadRow(out, row, "total mass (kg)", r.mass());
        spreadRow(out, row, "centroid distance (m)", r.centroidDistance());
        spreadRow(out, row, "J0 (kg·m²)", r.pivotInertia());
        spreadRow(out, row, "period T0 (s)", r.period());
        if (r.failed() > 0) {
            out.printf(Locale.ROOT, "    note: %d draws left out: their parts list could not be computed (a dimension or mass"
                    + " below zero, a cut-out larger than its solid): tolerances that large deserve a look%n", r.failed());
        }
        for (ToleranceSpread.Spread sp : List.of(r.mass(), r.centroidDistance(), r.pivotInertia(), r.period())) {
            if (sp.sigma() > 0 && Math.abs(sp.linearSigma() / sp.sigma() - 1) > 0.1) {
                out.println("    note: the linearised and Monte Carlo spreads differ by more than 10 %: the figures are not"
                        + " linear over the tolerances; read the percentiles");
                break;
            }
        }
    }

    private static void spreadRow(PrintWriter out, String row, String label, ToleranceSpread.Spread s) {
        out.printf(Locale.ROOT, row, label, num(s.nominal()), Figures.significant(s.sigma(), 2),
                Figures.significant(s.linearSigma(), 2), num(s.p5()), num(s.p95()));
    }

    private static String num(double v) {
        return Figures.significant(v);
    }
}
