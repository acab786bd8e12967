package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingEnergy;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.TurningPoint;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.Cautions;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.OutputFiles;
import dev.penduline.services.SwingPrediction;
import dev.penduline.services.present.Figures;

/** {@code penduline simulate}: the free swing of a mechanism with chosen friction torques. */
public final class SimulateCommand implements Command {

    private static final Set<String> OPTIONS = MechanismOptions.with("theta0-deg", "omega0-deg-s", "viscous",
            "coulomb", "stiction", "drag", "fit", "duration", "rate", "out", "band-deg");

    @Override
    public String name() {
        return "simulate";
    }

    @Override
    public String summary() {
        return "simulate a free swing with viscous, Coulomb, stiction and drag torques";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline simulate (FILE | --mass KG --centroid-distance M --pivot-inertia KG_M2)
                                          --theta0-deg DEG [options]

                Integrates the nonlinear swing (event-driven at every reversal, with the stick test
                of static friction) and prints the periods, turning points, stop and rest angle, the
                settle time and peak angular velocity, and the energy each friction term dissipated.
                The friction is the mechanism file's latest stored fit unless told otherwise (and
                none for a parts list or lumped properties). Angles are from the hanging equilibrium.

                """ + MechanismOptions.USAGE + """

                  --theta0-deg DEG      release angle (required)
                  --omega0-deg-s DEG_S  initial angular velocity (default 0: released from rest)
                """ + FrictionOptions.USAGE + """
                  --band-deg DEG        half-width of the settle band (default 1°; with
                                        --use-preferences the defaults file's)
                  --duration S          simulated time (default 20 s)
                  --rate HZ             output samples per second (default 1000)
                  --out FILE.csv        write time_s,angle_deg,velocity_deg_s (never over a record,
                                        a mechanism file or anything not a regular file)
                  --force               replace an existing --out file (only a plain file)
                  --json                print a JSON object instead of the summary""";
    }

    /**
     * Beyond this release angle (°) the swing lies so close to the upright that the simulated period
     * drifts from cycle to cycle (measured: 0.06 % over 30 cycles at 179.9°, 2 % at 179.99°, 13 % at
     * 179.9999°, for a frictionless swing whose every period is the same).
     */
    static final double NEAR_UPRIGHT_DEG = 179.9;

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("json", "force", "no-fit"));
        MechanismSource given = FrictionOptions.mechanism(a, defaults, err);
        if (a.has("out")) {
            checkOut(Path.of(a.value("out")), a.flag("force"));
        }
        double theta0 = Unit.DEGREE.toSi(a.requiredNumber("theta0-deg"));
        if (Math.abs(Unit.DEGREE.fromSi(theta0)) > NEAR_UPRIGHT_DEG) {
            err.println("warning: released within 0.1° of the upright (180°): there the period "
                    + "grows without bound as the release nears 180° and hangs on energy differences below the integration's "
                    + "accuracy, so periods and turning points drift from cycle to cycle (by per cent at 179.99°); do not rely "
                    + "on them");
        }
        double omega0 = Unit.DEG_PER_S.toSi(a.number("omega0-deg-s", 0));
        double band = Unit.DEGREE.toSi(a.number("band-deg", defaults.settleBand()));
        MechanismForecast.FrictionSource source = FrictionOptions.resolve(a, false);
        FrictionOptions.warnIfStale(source, err);
        FrictionTorques friction = source.friction();
        MechanismProperties properties = MechanismForecast.properties(given, source);
        MechanismSource mechanism = given.withProperties(properties);
        SwingRun run;
        try {
            run = SwingPrediction.simulate(mechanism, friction, theta0, omega0, a.number("duration", 20),
                    a.number("rate", 1000));
            if (a.has("out")) {
                for (String note : writeCsv(Path.of(a.value("out")), a.flag("force"), run)) {
                    err.println("note: " + note);
                }
            }
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
        SwingForecast figures = MechanismForecast.summarise(properties, friction, run,
                new ForecastRequest(theta0, omega0, band, Double.NaN, Double.NaN));
        if (a.flag("json")) {
            writeJson(source, run, figures, band, new JsonWriter(out));
        } else {
            writeSummary(mechanism, source, theta0, run, figures, band, out);
            if (a.has("out")) {
                out.println("Wrote " + run.size() + " samples to " + a.value("out"));
            }
        }
        return ExitCode.OK;
    }

    /** Refuses an --out file that may not be written before the simulation runs. */
    private static void checkOut(Path file, boolean force) throws UsageException {
        try {
            OutputFiles.check(file, force);
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static List<String> writeCsv(Path file, boolean force, SwingRun run) throws InputException {
        double[] t = run.times();
        double[] th = run.angles();
        double[] w = run.velocities();
        return OutputFiles.write(file, force, o -> {
            o.write("time_s,angle_deg,velocity_deg_s\n");
            StringBuilder line = new StringBuilder(64);
            for (int i = 0; i < t.length; i++) {
                line.setLength(0);
                line.append(t[i]).append(',').append(Unit.DEGREE.fromSi(th[i])).append(',')
                        .append(Unit.DEG_PER_S.fromSi(w[i])).append('\n');
                o.write(line.toString());
            }
        });
    }

    private static void writeJson(MechanismForecast.FrictionSource source, SwingRun run, SwingForecast figures,
            double band, JsonWriter j) {
        SwingEnergy e = run.energy();
        j.beginObject();
        j.field("fit", source.fit() == null ? "none" : source.fit().id());
        FrictionOptions.writeJson(source.friction(), j);
        j.field("periods_s", run.periods());
        j.field("half_swing_durations_s", run.halfSwingDurations());
        j.name("turning_points").beginArray();
        for (TurningPoint p : run.turningPoints()) {
            j.beginObject().field("time_s", p.time()).field("angle_deg", Unit.DEGREE.fromSi(p.angle())).endObject();
        }
        j.endArray();
        j.field("stopped", run.stopped())
                .field("stop_time_s", run.stopTime())
                .field("rest_angle_deg", Unit.DEGREE.fromSi(run.restAngle()))
                .field("samples", run.size())
                .field("settled", figures.settled())
                .field("settle_time_s", figures.settleTime())
                .field("band_deg", Unit.DEGREE.fromSi(band))
                .field("peak_angular_velocity_rad_s", figures.peakAngularVelocity())
                .field("peak_time_s", figures.peakTime());
        j.name("energy_dissipated_J").beginObject()
                .field("viscous", e.viscous()).field("coulomb", e.coulomb()).field("drag", e.drag()).endObject();
        j.name("energy_J").beginObject()
                .field("initial", e.initial()).field("kinetic_final", e.kinetic()).field("potential_final", e.potential())
                .field("applied", e.applied()).field("imbalance", e.imbalance()).endObject();
        j.field("smoothed", run.smoothed());
        j.endObject().finish();
    }

    private static void writeSummary(MechanismSource m, MechanismForecast.FrictionSource source, double theta0,
            SwingRun run, SwingForecast figures, double band, PrintWriter out) {
        FrictionTorques f = source.friction();
        out.println("Swing of " + m.label());
        out.printf(Locale.ROOT, "  released at %s° (small-angle period %s s)%n",
                Figures.significant(Unit.DEGREE.fromSi(theta0)), Figures.significant(m.properties().smallAnglePeriod()));
        out.println("  friction: " + source.description());
        out.printf(Locale.ROOT, "    viscous %s N·m·s/rad, Coulomb %s N·m, stiction %s N·m, drag %s N·m·s²/rad²%n",
                Figures.significant(f.viscous()), Figures.significant(f.coulomb()),
                Figures.significant(f.staticTorque()), Figures.significant(f.drag()));
        out.println();
        double[] periods = run.periods();
        List<TurningPoint> tps = run.turningPoints();
        out.printf("  %d turning points, %d full-cycle periods%n", tps.size(), periods.length);
        int shown = Math.min(periods.length, 5);
        for (int i = 0; i < shown; i++) {
            out.printf(Locale.ROOT, "    cycle %d: period %s s%n", i + 1, Figures.significant(periods[i]));
        }
        if (periods.length > shown) {
            out.printf(Locale.ROOT, "    ... last cycle: period %s s%n", Figures.significant(periods[periods.length - 1]));
        }
        if (run.stopped()) {
            out.printf(Locale.ROOT, "  came to rest at %s s, %s° from the hanging equilibrium%n",
                    Figures.significant(run.stopTime()), Figures.significant(Unit.DEGREE.fromSi(run.restAngle())));
        } else {
            double last = run.angles()[run.size() - 1];
            out.printf(Locale.ROOT, "  still moving at the end (%s°)%n", Figures.significant(Unit.DEGREE.fromSi(last)));
        }
        if (figures.settled()) {
            out.printf(Locale.ROOT, "  settles inside ±%s° after %s s (%d half-swings)%n", Figures.significant(Unit.DEGREE
                    .fromSi(band)), Figures.significant(figures.settleTime()), figures.halfSwings());
        } else {
            out.println("  does not settle inside the band: " + figures.note());
        }
        out.printf(Locale.ROOT, "  peak angular velocity %s rad/s at %s s%n", Figures.significant(figures.peakAngularVelocity()),
                Figures.significant(figures.peakTime()));
        SwingEnergy e = run.energy();
        out.printf(Locale.ROOT, "  energy: released with %s J; dissipated viscous %s J, Coulomb %s J, drag %s J%n",
                Figures.significant(e.initial()), Figures.significant(e.viscous()), Figures.significant(e.coulomb()),
                Figures.significant(e.drag()));
        if (run.smoothed()) {
            out.println("  note: the friction sign was smoothed (not the exact dry-friction model)");
        }
        out.println();
        out.println(Cautions.TEXT);
    }
}
