package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.Defaults;
import dev.penduline.services.DemoRecords;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismSource;

/** {@code penduline demo-record}: an invented swing record from the simulator, with a known truth. */
public final class DemoRecordCommand implements Command {

    private static final Set<String> OPTIONS = MechanismOptions.with("theta0-deg", "viscous", "coulomb", "stiction",
            "drag", "duration", "rate", "offset-deg", "noise-deg", "counts-per-rev", "still-s", "seed", "out");

    @Override
    public String name() {
        return "demo-record";
    }

    @Override
    public String summary() {
        return "write an invented swing record from the simulator (known truth, for demos and checks)";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline demo-record (FILE | --mass ...) --theta0-deg DEG --out RECORD.csv [options]

                Simulates a free release and writes it the way a test rig would record it: a still
                segment before the release, a sensor offset, noise and encoder counts. The file's
                first lines say that it is invented and give the truth it was made from.

                """ + MechanismOptions.USAGE + """

                  --theta0-deg DEG       release angle from the hanging equilibrium (required)
                  --viscous, --coulomb, --stiction, --drag
                                         the true friction terms, SI (default 0)
                  --duration S           record length (default 60), --rate HZ (default 500)
                  --offset-deg DEG       the sensor's reading at the hanging equilibrium (default 0)
                  --noise-deg DEG        standard deviation of the sensor noise (default 0.02)
                  --counts-per-rev N     write encoder counts (default 4096; 0 writes degrees)
                  --still-s S            still segment before the release (default 1.5)
                  --seed N               random seed (default 1)
                  --out RECORD.csv       the file to write (required; never over a record, a
                                         mechanism file or anything not a regular file)
                  --force                replace an existing --out file (only a plain file)""";
    }

    @Override
    public ExitCode run(List<String> args, PrintWriter out, PrintWriter err) throws UsageException {
        return run(args, Defaults.BUILT_IN, out, err);
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("force"));
        if (!a.has("out")) {
            throw new UsageException("--out RECORD.csv is required");
        }
        MechanismSource mechanism = MechanismOptions.resolve(a, a.positional().isEmpty() ? null : a.positional().get(0),
                defaults);
        try {
            FrictionTorques friction = new FrictionTorques(a.number("viscous", 0), a.number("coulomb", 0),
                    a.number("stiction", 0), a.number("drag", 0));
            DemoRecords.Settings settings = new DemoRecords.Settings(Unit.DEGREE.toSi(a.requiredNumber("theta0-deg")),
                    Unit.DEGREE.toSi(a.number("offset-deg", 0)), Unit.DEGREE.toSi(a.number("noise-deg", 0.02)),
                    a.whole("counts-per-rev", 4096), a.number("still-s", 1.5), a.number("duration", 60),
                    a.number("rate", 500), a.whole("seed", 1));
            DemoRecords.write(mechanism, friction, settings, Path.of(a.value("out")), a.flag("force"),
                    note -> err.println("note: " + note));
        } catch (IllegalArgumentException | InputException e) {
            throw new UsageException(e.getMessage());
        }
        out.println("wrote " + a.value("out") + " (invented demo data)");
        return ExitCode.OK;
    }
}
