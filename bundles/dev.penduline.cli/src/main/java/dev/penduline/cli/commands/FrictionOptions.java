package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.UsageException;
import dev.penduline.cli.json.JsonWriter;
import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast.FrictionSource;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.StoredFit;

/**
 * Where the friction of a swing comes from, as the commands that simulate or forecast one are
 * told: the friction options, else the mechanism file's latest stored fit (or {@code --fit ID}),
 * else none ({@code --no-fit}, or a mechanism given without a stored fit).
 */
final class FrictionOptions {

    /** The friction options that take a value. */
    static final List<String> VALUE_OPTIONS = Stream.concat(Stream.of(FrictionTerm.values()).map(FrictionTerm::word),
            Stream.of("fit")).toList();

    /** Usage lines of the options. */
    static final String USAGE = """
              --fit ID              use this stored fit instead of the latest
              --no-fit              no stored fit: friction from the options below only (default 0)
              --viscous B           viscous torque coefficient, N·m·s/rad
              --coulomb TC          dry (Coulomb) friction torque, N·m
              --stiction TS         static friction torque, N·m, at least TC (default: TC)
              --drag C              quadratic (air) drag coefficient, N·m·s²/rad²
                                    any of these four replaces the stored fit
            """;

    private static final List<String> TORQUES = Stream.of(FrictionTerm.values()).map(FrictionTerm::word).toList();

    private FrictionOptions() {
    }

    /**
     * The mechanism given as the only positional argument (or by lumped properties), its warnings
     * printed.
     *
     * @param a        the arguments
     * @param defaults the gravity of a parts list or lumped properties without --gravity
     * @param err      where warnings go
     * @return the mechanism
     * @throws UsageException when more than one file is given or the mechanism is bad
     */
    static MechanismSource mechanism(Arguments a, Defaults defaults, PrintWriter err) throws UsageException {
        if (a.positional().size() > 1) {
            throw new UsageException("at most one mechanism file; got " + a.positional());
        }
        MechanismSource mechanism = MechanismOptions.resolve(a, file(a), defaults);
        for (String w : mechanism.warnings()) {
            err.println("warning: " + w);
        }
        return mechanism;
    }

    private static String file(Arguments a) {
        return a.positional().isEmpty() ? null : a.positional().get(0);
    }

    /**
     * Resolves the friction.
     *
     * @param a        the arguments
     * @param required true when a command needs friction and must not fall back to none
     * @return the source
     * @throws UsageException when options conflict, the fit is unknown, or friction is required
     *                        and none is given
     */
    static FrictionSource resolve(Arguments a, boolean required) throws UsageException {
        String file = file(a);
        boolean given = TORQUES.stream().anyMatch(a::has);
        if (a.has("fit") && (given || a.flag("no-fit"))) {
            throw new UsageException("give either --fit or --no-fit and the friction options, not both");
        }
        if (given || a.flag("no-fit")) {
            try {
                return FrictionSource.given(new FrictionTorques(a.number(FrictionTerm.VISCOUS.word(), 0),
                        a.number(FrictionTerm.COULOMB.word(), 0), a.number(FrictionTerm.STICTION.word(), 0),
                        a.number(FrictionTerm.DRAG.word(), 0)), given ? "friction options (no uncertainty)"
                                : "no friction (--no-fit)");
            } catch (InvalidValueException e) {
                throw new UsageException(e.getMessage());
            }
        }
        boolean mechanismFile = file != null && file.toLowerCase(Locale.ROOT).endsWith("." + MechanismFormat.FILE_EXTENSION);
        Optional<StoredFit> fit = Optional.empty();
        if (mechanismFile) {
            try {
                Mechanism m = MechanismLoader.readMechanism(Path.of(file));
                fit = a.has("fit") ? Optional.of(StoredFit.byId(m, a.value("fit"))) : StoredFit.latest(m);
            } catch (InputException e) {
                throw new UsageException(e.getMessage());
            }
        } else if (a.has("fit")) {
            throw new UsageException("--fit names a fit stored in a mechanism file (." + MechanismFormat.FILE_EXTENSION
                    + "); " + (file == null ? "no file was given" : file + " is not one"));
        }
        if (fit.isPresent()) {
            return FrictionSource.of(fit.get());
        }
        String none = mechanismFile ? file + " holds no stored fit" : "no stored fit to use";
        if (required) {
            throw new UsageException(none + ": " + (mechanismFile ? "run 'penduline fit " + file + "' first, or give"
                    : "give a mechanism file (." + MechanismFormat.FILE_EXTENSION + ") with a stored fit, or give")
                    + " the friction with --viscous, --coulomb, --stiction and --drag");
        }
        return FrictionSource.given(FrictionTorques.none(), "no friction (" + none + ")");
    }

    /**
     * Warns when the friction comes from a stored fit made with parts that have changed since.
     *
     * @param source the friction
     * @param err    where the warning goes
     */
    static void warnIfStale(FrictionSource source, PrintWriter err) {
        if (source.fit() != null && source.fit().stale().isPresent()) {
            err.println("warning: stored fit " + source.fit().id() + " is stale: " + source.fit().stale().get()
                    + "; fit again for friction that matches the parts");
        }
    }

    /**
     * Writes the torques as the {@code friction} member of a JSON object, SI units in the keys.
     *
     * @param f the torques
     * @param j the writer, inside an object
     */
    static void writeJson(FrictionTorques f, JsonWriter j) {
        j.name("friction").beginObject().field("viscous_N_m_s_rad", f.viscous()).field("coulomb_N_m", f.coulomb())
                .field("stiction_N_m", f.staticTorque()).field("drag_N_m_s2_rad2", f.drag()).endObject();
    }
}
