package dev.penduline.cli.commands;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.UsageException;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSnapshot;
import dev.penduline.services.MechanismSource;

/**
 * The ways a command is told which mechanism it is about: a mechanism file, a parts list, or
 * the lumped properties {@code --mass --centroid-distance --pivot-inertia} (with
 * {@code --gravity} in every case).
 */
final class MechanismOptions {

    /** Options that take a value. */
    static final Set<String> VALUE_OPTIONS = Set.of("mass", "centroid-distance", "pivot-inertia", "gravity");

    /** Usage lines for the options. */
    static final String USAGE = """
              FILE | --mass KG --centroid-distance M --pivot-inertia KG_M2
                               the mechanism: a mechanism file (.penduline), a parts list (.csv),
                               or its lumped properties
              --gravity M_S2   local gravity (default 9.80665 m/s², or the mechanism file's;
                               with --use-preferences the defaults file's for a parts list or
                               lumped properties)
            """;

    private MechanismOptions() {
    }

    /**
     * The mechanism options together with a command's own value options.
     *
     * @param own the command's options
     * @return an unmodifiable set of both
     */
    static Set<String> with(String... own) {
        Set<String> all = new HashSet<>(VALUE_OPTIONS);
        all.addAll(List.of(own));
        return Set.copyOf(all);
    }

    /**
     * Resolves an optional mechanism given by {@code --mechanism FILE} or lumped properties.
     *
     * @param a        the arguments (with "mechanism" among the value options)
     * @param defaults the gravity where neither --gravity nor the mechanism file gives one
     * @return the mechanism, or empty when none was given
     * @throws UsageException when the input is bad
     */
    static Optional<MechanismSource> optional(Arguments a, Defaults defaults) throws UsageException {
        if (!a.has("mechanism") && !lumpedGiven(a)) {
            return Optional.empty();
        }
        return Optional.of(resolve(a, a.value("mechanism"), defaults));
    }

    /**
     * Whether lumped properties were given.
     *
     * @param a the arguments
     * @return true when any of --mass, --centroid-distance, --pivot-inertia is present
     */
    static boolean lumpedGiven(Arguments a) {
        return a.has("mass") || a.has("centroid-distance") || a.has("pivot-inertia");
    }

    /**
     * Resolves the mechanism.
     *
     * @param a        the arguments
     * @param file     the mechanism or parts file, or null when lumped properties are expected
     * @param defaults the gravity of a parts list or lumped properties when --gravity is not given
     *                 (a mechanism file keeps its own)
     * @return the mechanism
     * @throws UsageException when neither or both ways are given, or the input is bad
     */
    static MechanismSource resolve(Arguments a, String file, Defaults defaults) throws UsageException {
        try {
            if (lumpedGiven(a)) {
                if (file != null) {
                    throw new UsageException("give either a mechanism file or --mass/--centroid-distance/"
                            + "--pivot-inertia, not both");
                }
                return MechanismLoader.lumped(a.requiredNumber("mass"), a.requiredNumber("centroid-distance"),
                        a.requiredNumber("pivot-inertia"), a.number("gravity", defaults.gravity()));
            }
            if (file == null) {
                throw new UsageException("which mechanism? Give a mechanism file (.penduline), a parts list (.csv), "
                        + "or --mass, --centroid-distance and --pivot-inertia");
            }
            return loader(a, defaults).load(Path.of(file));
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
    }

    /** A mechanism file read once, and the mechanism resolved from it. */
    record ReadOnce(MechanismSnapshot file, MechanismSource mechanism) {
    }

    /**
     * Resolves the mechanism of a mechanism file as {@link #resolve(Arguments, String, Defaults)}
     * does, reading the file once and keeping what was read, for a command that stores into
     * the file later ({@link MechanismSnapshot}).
     *
     * @param a        the arguments
     * @param file     the mechanism file
     * @param defaults the defaults (a mechanism file keeps its own gravity)
     * @return the file as read and its mechanism
     * @throws UsageException when lumped properties are given too, or the file or mechanism is bad
     */
    static ReadOnce readOnce(Arguments a, String file, Defaults defaults) throws UsageException {
        if (lumpedGiven(a)) {
            throw new UsageException("give either a mechanism file or --mass/--centroid-distance/--pivot-inertia, not both");
        }
        MechanismLoader loader = loader(a, defaults);
        try {
            MechanismSnapshot read = MechanismSnapshot.read(Path.of(file));
            return new ReadOnce(read, loader.loadMechanism(read.mechanism(), read.file().toString()));
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static MechanismLoader loader(Arguments a, Defaults defaults) throws UsageException {
        MechanismLoader loader = new MechanismLoader().withDefaultGravity(defaults.gravity());
        if (a.has("gravity")) {
            loader = loader.withGravity(a.number("gravity", Double.NaN));
        }
        return loader;
    }
}
