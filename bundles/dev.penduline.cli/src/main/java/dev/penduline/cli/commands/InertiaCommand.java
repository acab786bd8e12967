package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.PartContribution;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.present.Figures;

/** {@code penduline inertia FILE}: mass, centroid and inertia about the pivot, part by part. */
public final class InertiaCommand implements Command {

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
                Usage: penduline inertia FILE [--gravity M_S2] [--json]

                FILE is a parts-list CSV (a bill of materials or CAD mass-property export) or a
                mechanism file. Prints the total mass, the centroid and its distance from the pivot
                axis, the inertia about the pivot and about the centroid, the radius of gyration,
                the equivalent simple-pendulum length, the small-angle period, and each part's
                contribution.

                  --gravity M_S2   local gravity (default 9.80665 m/s²)
                  --json           print a JSON object instead of the table""";
    }

    @Override
    public ExitCode run(List<String> args, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, Set.of("gravity"), Set.of("json"));
        if (a.positional().size() != 1) {
            throw new UsageException("give exactly one parts list or mechanism file. " + usage());
        }
        MechanismLoader loader = new MechanismLoader();
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
        if (a.flag("json")) {
            writeJson(source, s, warnings, new JsonWriter(out));
        } else {
            writeTable(source, s, out);
        }
        return ExitCode.OK;
    }

    private static void writeJson(MechanismSource source, InertiaSummary s, List<String> warnings, JsonWriter j) {
        j.beginObject()
                .field("source", source.label())
                .field("mass_kg", s.totalMass())
                .name("centroid_m").beginArray().value(s.centroid().x()).value(s.centroid().y())
                .value(s.centroid().z()).endArray()
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

    private static void writeTable(MechanismSource source, InertiaSummary s, PrintWriter out) {
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
        out.printf("  centroid (x, y, z)              (%s, %s, %s) m%n", num(s.centroid().x()), num(s.centroid().y()),
                num(s.centroid().z()));
        out.printf("  centroid distance Lc            %s m%n", num(s.centroidDistance()));
        out.printf("  equilibrium angle               %s°%n", Figures.fixed(Unit.DEGREE.fromSi(s.equilibriumAngle()), 3));
        out.printf("  inertia about the pivot J0      %s kg·m²%n", num(s.pivotInertia()));
        out.printf("  inertia about the centroid      %s kg·m²%n", num(s.centroidalInertia()));
        out.printf("  radius of gyration              %s m%n", num(s.radiusOfGyration()));
        out.printf("  equivalent pendulum length      %s m%n", num(s.equivalentLength()));
        out.printf("  small-angle period T0           %s s%n", num(s.smallAnglePeriod()));
        out.printf("  simple-pendulum period error    %s (treating the body as a point mass at its centroid)%n",
                Figures.percent(s.simplePendulumPeriodError(), 2));
        out.println();
        out.println(Caution.TEXT);
    }

    private static String num(double v) {
        return Figures.significant(v);
    }
}
