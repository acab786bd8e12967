package dev.penduline.ui.internal.mechanism;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.PartContribution;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.present.Figures;

/**
 * What the Mechanism view shows for one file: the services' results as rows of text, or the
 * message of what went wrong. Built off the UI thread; holds no widgets.
 *
 * @param title    the mechanism's name (the file name for a parts list)
 * @param source   the file it came from
 * @param totals   the totals, in report order
 * @param parts    each part's contribution, in the file's order
 * @param warnings what the user should know about the file
 * @param error    the message when the file could not be read or computed
 */
public record MechanismSheet(String title, String source, List<TotalRow> totals, List<PartContribution> parts,
        List<String> warnings, Optional<String> error) {

    /** Freezes the lists. */
    public MechanismSheet {
        totals = List.copyOf(totals);
        parts = List.copyOf(parts);
        warnings = List.copyOf(warnings);
    }

    /**
     * Reads a mechanism file or parts list through the services and computes its inertia
     * there; the same calls as {@code penduline inertia FILE}.
     *
     * @param file the mechanism file or parts-list CSV
     * @return the sheet, with the error message (file, line, field) when it failed
     */
    public static MechanismSheet read(Path file) {
        String title = String.valueOf(file.getFileName());
        try {
            if (title.toLowerCase(Locale.ROOT).endsWith("." + MechanismFormat.FILE_EXTENSION)) {
                Mechanism m = MechanismLoader.readMechanism(file);
                if (m.getName() != null && !m.getName().isBlank()) {
                    title = m.getName();
                }
            }
            return loaded(title, file.toString(), new MechanismLoader().load(file));
        } catch (InputException e) {
            return failed(title, file.toString(), e.getMessage());
        }
    }

    /**
     * Validates a mechanism in memory (an editor's live model) and computes its inertia through
     * the services, as {@link #read(Path)} does for its file.
     *
     * @param m        the live model
     * @param fileName the file's name, the title when the mechanism has no name
     * @param file     the file, for the messages
     * @return the sheet, with the error message when it failed
     */
    public static MechanismSheet live(Mechanism m, String fileName, Path file) {
        String title = m.getName() != null && !m.getName().isBlank() ? m.getName() : fileName;
        try {
            return loaded(title, file.toString(), new MechanismLoader().loadMechanism(m, file.toString()));
        } catch (InputException e) {
            return failed(title, file.toString(), e.getMessage());
        }
    }

    /**
     * A sheet of a mechanism the services loaded.
     *
     * @param title  the mechanism's name
     * @param where  the file it came from
     * @param source the services' result
     * @return the sheet
     */
    public static MechanismSheet loaded(String title, String where, MechanismSource source) {
        Optional<InertiaSummary> inertia = source.inertia();
        if (inertia.isEmpty()) {
            return failed(title, where, "no parts: the inertia breakdown needs a parts list");
        }
        InertiaSummary s = inertia.get();
        List<TotalRow> rows = new ArrayList<>();
        for (InertiaTotal t : InertiaTotal.values()) {
            // The period error is a rule-of-thumb figure: two decimals of a percent, as the report prints it.
            String value = t == InertiaTotal.SIMPLE_PENDULUM_ERROR ? Figures.fixed(t.valueOf(s), 2)
                    : Figures.significant(t.valueOf(s));
            rows.add(new TotalRow(t, t.label(), value, t.unit()));
            if (t == InertiaTotal.MASS) {
                rows.add(new TotalRow(null, "centroid (x, y, z)", "(" + Figures.significant(s.centroid().getX()) + ", "
                        + Figures.significant(s.centroid().getY()) + ", " + Figures.significant(s.centroid().getZ()) + ")",
                        "m"));
            }
        }
        return new MechanismSheet(title, where, rows, s.contributions(), source.warnings(), Optional.empty());
    }

    /**
     * A sheet that says what went wrong.
     *
     * @param title   the file or mechanism name
     * @param where   the file
     * @param message the services' message (file, line, field and what to do)
     * @return the sheet
     */
    public static MechanismSheet failed(String title, String where, String message) {
        return new MechanismSheet(title, where, List.of(), List.of(), List.of(), Optional.of(message));
    }

    /**
     * The value shown for a total.
     *
     * @param total the total
     * @return its text, empty when the sheet has no such row
     */
    public Optional<String> shown(InertiaTotal total) {
        return totals.stream().filter(r -> r.total() == total).map(TotalRow::value).findFirst();
    }
}
