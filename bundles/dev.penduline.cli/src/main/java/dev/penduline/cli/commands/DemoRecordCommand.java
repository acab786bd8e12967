package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SplittableRandom;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.Defaults;
import dev.penduline.services.DemoRecords;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismSource;

/** {@code penduline demo-record}: an invented swing record from the simulator, with a known truth. */
public final class DemoRecordCommand implements Command {

    private static final Set<String> OPTIONS = MechanismOptions.with("theta0-deg", "viscous", "coulomb", "stiction",
            "drag", "duration", "rate", "offset-deg", "noise-deg", "counts-per-rev", "still-s", "seed", "out", "count", "into",
            "spread");

    /** The records of {@code --count N --into DIR} are named {@code PREFIX0001.csv} and on. */
    static final String BATCH_PREFIX = "unit-";

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
                       penduline demo-record (FILE | --mass ...) --theta0-deg DEG --count N --into DIR
                                             [--spread PCT] [options]

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
                  --force                replace an existing --out file (only a plain file)
                  --count N --into DIR   instead of --out: N invented records unit-0001.csv, unit-0002.csv, ...
                                         in the folder DIR (made when missing; an existing record of that
                                         name is replaced only with --force), a population for 'survey'.
                                         Record k uses the seed N0 + k - 1 (N0 = --seed) for its noise and
                                         its own draw of the friction; each file's header gives its truth
                  --spread PCT           with --count: viscous and coulomb each drawn lognormal about the
                                         values given, the logarithm's standard deviation ln(1 + PCT/100)
                                         (default 0: every record has the given friction)""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, OPTIONS, Set.of("force"));
        boolean batch = a.has("count") || a.has("into");
        if (batch && a.has("out")) {
            throw new UsageException("give either --out RECORD.csv or --count N --into DIR, not both");
        }
        if (batch && !(a.has("count") && a.has("into"))) {
            throw new UsageException("--count N and --into DIR go together");
        }
        if (!batch && !a.has("out")) {
            throw new UsageException("--out RECORD.csv is required (or --count N --into DIR for several)");
        }
        if (!batch && a.has("spread")) {
            throw new UsageException("--spread goes with --count N --into DIR");
        }
        MechanismSource mechanism = MechanismOptions.resolve(a, a.positional().isEmpty() ? null : a.positional().get(0),
                defaults);
        try {
            double viscous = a.number("viscous", 0);
            double coulomb = a.number("coulomb", 0);
            long seed = a.whole("seed", 1);
            if (batch) {
                int count = (int) a.whole("count", 1);
                double spread = Math.log1p(a.number("spread", 0) / 100);
                Path folder = Path.of(a.value("into"));
                for (int k = 0; k < count; k++) {
                    // the friction draw has its own stream, so the noise of record k is that of a single record of seed N0 + k
                    SplittableRandom draw = new SplittableRandom(seed + k).split();
                    FrictionTorques friction = new FrictionTorques(viscous * Math.exp(spread * draw.nextGaussian()),
                            coulomb * Math.exp(spread * draw.nextGaussian()), a.number("stiction", 0), a.number("drag", 0));
                    Path target = folder.resolve(String.format(Locale.ROOT, "%s%04d.csv", BATCH_PREFIX, k + 1));
                    DemoRecords.write(mechanism, friction, settings(a, seed + k), target, a.flag("force"),
                            note -> err.println("note: " + note));
                }
                out.println("wrote " + count + " records " + BATCH_PREFIX + "0001.csv ... into " + folder
                        + " (invented demo data)");
                return ExitCode.OK;
            }
            FrictionTorques friction = new FrictionTorques(viscous, coulomb, a.number("stiction", 0), a.number("drag", 0));
            DemoRecords.write(mechanism, friction, settings(a, seed), Path.of(a.value("out")), a.flag("force"),
                    note -> err.println("note: " + note));
        } catch (InvalidValueException | InputException e) {
            throw new UsageException(e.getMessage());
        }
        out.println("wrote " + a.value("out") + " (invented demo data)");
        return ExitCode.OK;
    }

    private static DemoRecords.Settings settings(Arguments a, long seed) throws UsageException {
        return new DemoRecords.Settings(Unit.DEGREE.toSi(a.requiredNumber("theta0-deg")),
                Unit.DEGREE.toSi(a.number("offset-deg", 0)), Unit.DEGREE.toSi(a.number("noise-deg", 0.02)),
                a.whole("counts-per-rev", 4096), a.number("still-s", 1.5), a.number("duration", 60),
                a.number("rate", 500), seed);
    }
}
