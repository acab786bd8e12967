package dev.penduline.services;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.eclipse.emf.common.util.Diagnostic;

import dev.penduline.model.Mechanism;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.model.persistence.MechanismFileException;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.model.validation.MechanismValidation;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PivotInertia;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.parts.PartsList;
import dev.penduline.records.parts.PartsListReader;

/**
 * Loads a mechanism from a mechanism file, a parts-list CSV or lumped properties, and computes its inertia
 * about the pivot. The one place where the command line and the workbench do this.
 */
public final class MechanismLoader {

    private final PivotInertia engine;
    private final boolean gravityOverride;

    /** A loader with the default frame: pivot on the z-axis, gravity along −y, standard g. */
    public MechanismLoader() {
        this(PivotInertia.DEFAULT);
    }

    /**
     * A loader with another frame or gravity.
     *
     * @param engine the inertia engine (axis, gravity direction, local g)
     */
    public MechanismLoader(PivotInertia engine) {
        this(engine, false);
    }

    private MechanismLoader(PivotInertia engine, boolean gravityOverride) {
        this.engine = engine;
        this.gravityOverride = gravityOverride;
    }

    /**
     * Returns a loader for another local gravity.
     *
     * @param g local gravitational acceleration (m/s²)
     * @return the loader
     */
    public MechanismLoader withGravity(double g) {
        return new MechanismLoader(engine.withGravity(g), true);
    }

    /**
     * Returns a loader whose gravity applies where the mechanism states none of its own: a parts
     * list (and, through {@link #lumped}, lumped properties take it from the caller); a mechanism
     * file keeps its own local g. The user's default gravity ({@link Defaults#gravity()}) comes
     * in here; an explicit {@link #withGravity} given after it wins everywhere.
     *
     * @param g local gravitational acceleration (m/s²)
     * @return the loader
     */
    public MechanismLoader withDefaultGravity(double g) {
        return new MechanismLoader(engine.withGravity(g), gravityOverride);
    }

    /**
     * Loads a mechanism from a file, chosen by its extension: {@code .csv} is a parts list,
     * {@code .penduline} a mechanism file.
     *
     * @param file the file
     * @return the mechanism with its inertia breakdown
     * @throws InputException when the file is missing, unreadable, malformed or inconsistent
     */
    public MechanismSource load(Path file) throws InputException {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".csv") || lower.endsWith(".txt") || lower.endsWith(".tsv")) {
            return loadPartsList(file);
        }
        if (lower.endsWith("." + MechanismFormat.FILE_EXTENSION)) {
            return loadMechanismFile(file);
        }
        throw new InputException(file + ": unknown kind of mechanism file; give a mechanism file (."
                + MechanismFormat.FILE_EXTENSION + ") or a parts list (.csv)");
    }

    /**
     * Loads a mechanism file, validates it (every problem at once) and computes its inertia.
     * The engine's frame comes from the file (pivot axis, gravity direction, tilt, local g)
     * unless this loader was given another gravity.
     *
     * @param file the mechanism file
     * @return the mechanism with its inertia breakdown
     * @throws InputException when the file is missing, malformed or fails validation
     */
    public MechanismSource loadMechanismFile(Path file) throws InputException {
        return loadMechanism(readMechanism(file), file.toString());
    }

    /**
     * Validates a mechanism already in memory (the workbench's live model, say) and computes
     * its inertia, as {@link #loadMechanismFile(Path)} does for a file.
     *
     * @param mechanism the mechanism
     * @param where     where it came from, for the messages (its file)
     * @return the mechanism with its inertia breakdown
     * @throws InputException when it fails validation or is physically inconsistent
     */
    public MechanismSource loadMechanism(Mechanism mechanism, String where) throws InputException {
        // validated once: the rules run the inertia engine's checks
        Diagnostic validation = MechanismValidation.validate(mechanism);
        List<String> errors = MechanismValidation.messages(validation, Diagnostic.ERROR);
        if (!errors.isEmpty()) {
            throw new InputException(where + ": " + errors.size() + " problem(s) to fix:\n  "
                    + String.join("\n  ", errors));
        }
        List<String> warnings = new ArrayList<>(MechanismValidation.messages(validation, Diagnostic.WARNING));
        warnings.removeAll(errors);
        PivotInertia frame;
        List<Part> parts;
        try {
            frame = MechanismAdapter.pivotInertia(mechanism);
            if (gravityOverride) {
                frame = frame.withGravity(engine.gravity());
            }
            parts = MechanismAdapter.parts(mechanism);
        } catch (InvalidValueException e) {
            throw new InputException(where + ": " + e.getMessage(), e);
        }
        String label = mechanism.getName() == null || mechanism.getName().isBlank() ? where
                : mechanism.getName() + " (" + where + ")";
        return new MechanismLoader(frame).summarise(label, parts, warnings);
    }

    /**
     * Reads a mechanism file without computing anything. A named pipe, a device or a folder is
     * refused without opening it.
     *
     * @param file the mechanism file
     * @return the mechanism
     * @throws InputException with file, line and column when it cannot be read
     */
    public static Mechanism readMechanism(Path file) throws InputException {
        ReadableFiles.require(file, "a mechanism file (." + MechanismFormat.FILE_EXTENSION + ")");
        try {
            return MechanismFiles.load(file);
        } catch (MechanismFileException e) {
            throw new InputException(e.getMessage(), e);
        }
    }

    /**
     * Loads a parts-list CSV and computes the inertia.
     *
     * @param file the parts list
     * @return the mechanism with its inertia breakdown
     * @throws InputException when the file is missing, unreadable, malformed or inconsistent
     */
    public MechanismSource loadPartsList(Path file) throws InputException {
        PartsList list;
        try {
            list = new PartsListReader().read(file);
        } catch (IOException | RecordFormatException e) {
            throw ReadableFiles.problem(file, e);
        }
        return summarise(file.toString(), list.parts(), list.warnings());
    }

    /**
     * Computes the inertia of parts already in memory (from a mechanism file, say).
     *
     * @param label    where the parts came from
     * @param parts    the parts
     * @param warnings warnings gathered while reading them
     * @return the mechanism with its inertia breakdown
     * @throws InputException when the parts are physically inconsistent
     */
    public MechanismSource summarise(String label, List<Part> parts,
            List<String> warnings) throws InputException {
        // one pass of the engine gives both its problems and the summary
        PivotInertia.Assessment assessed;
        try {
            assessed = engine.assess(parts);
        } catch (InvalidValueException e) {
            throw new InputException(label + ": " + e.getMessage(), e);
        }
        if (assessed.fatal().isPresent()) {
            throw new InputException(label + ": " + assessed.fatal().get());
        }
        List<String> problems = assessed.problems();
        InertiaSummary summary = assessed.summary().orElseThrow();
        MechanismProperties properties;
        try {
            properties = summary.toMechanismProperties();
        } catch (InvalidValueException e) {
            throw new InputException(label + ": " + e.getMessage(), e);
        }
        List<String> all = new ArrayList<>(warnings);
        all.addAll(problems);
        SwingPrediction.noRestoringTorque(properties).ifPresent(all::add);
        return new MechanismSource(label, properties, Optional.of(summary), all, parts, engine);
    }

    /**
     * A mechanism given by its lumped properties, without parts.
     *
     * @param mass             total mass (kg)
     * @param centroidDistance pivot-to-centroid distance (m)
     * @param pivotInertia     inertia about the pivot (kg·m²)
     * @param gravity          local gravity (m/s²)
     * @return the mechanism
     * @throws InputException when the values are inconsistent (e.g. J0 &lt; m·Lc²)
     */
    public static MechanismSource lumped(double mass, double centroidDistance, double pivotInertia, double gravity)
            throws InputException {
        try {
            MechanismProperties p = new MechanismProperties(mass, centroidDistance, pivotInertia, 0, gravity, 0);
            return new MechanismSource("lumped properties", p, Optional.empty(), List.of());
        } catch (InvalidValueException e) {
            throw new InputException("mechanism options: " + e.getMessage(), e);
        }
    }
}
