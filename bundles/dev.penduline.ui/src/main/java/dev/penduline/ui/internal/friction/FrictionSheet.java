package dev.penduline.ui.internal.friction;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.StoredFitText;

/**
 * What the Friction view shows for one mechanism file: its name, how many test sessions it has,
 * and the friction fits stored in it, the most recent first — or the message of what went
 * wrong reading it. Built off the UI thread; holds no widgets.
 *
 * @param title    the mechanism's name (the file name when it has none)
 * @param source   the file it came from
 * @param sessions how many test sessions the file has
 * @param fits     the stored fits, most recent first (by their computation time)
 * @param error    the message when the file could not be read
 */
public record FrictionSheet(String title, String source, int sessions, List<StoredFitText> fits,
        Optional<String> error) {

    /** Freezes the list. */
    public FrictionSheet {
        fits = List.copyOf(fits);
    }

    /**
     * Reads the stored fits of a mechanism file through the services' loader.
     *
     * @param file the mechanism file
     * @return the sheet, with the loader's message (file, line, field) when it cannot be read
     */
    public static FrictionSheet read(Path file) {
        String title = String.valueOf(file.getFileName());
        Mechanism m;
        try {
            m = MechanismLoader.readMechanism(file);
        } catch (InputException e) {
            return failed(title, file.toString(), e.getMessage());
        }
        return of(m, title, file.toString());
    }

    /**
     * The stored fits of a mechanism in memory (an editor's live model).
     *
     * @param m     the mechanism
     * @param title the title when the mechanism has no name (its file's name)
     * @param where its file, for the messages
     * @return the sheet
     */
    public static FrictionSheet of(Mechanism m, String title, String where) {
        if (m.getName() != null && !m.getName().isBlank()) {
            title = m.getName();
        }
        List<StoredFitText> fits = new ArrayList<>();
        for (FitResult r : m.getFitResults()) {
            fits.add(StoredFitText.of(r, m.getSessions()));
        }
        // ISO-8601 instants of one format sort as text; the sort is stable, so of two fits stored
        // in the same second the later in the file comes first after the reversal.
        fits.sort(Comparator.comparing(StoredFitText::computedAt));
        Collections.reverse(fits);
        return new FrictionSheet(title, where, m.getSessions().size(), fits, Optional.empty());
    }

    /**
     * A sheet that says what went wrong.
     *
     * @param title   the file or mechanism name
     * @param where   the file
     * @param message the services' message (file, line, field and what to do)
     * @return the sheet
     */
    public static FrictionSheet failed(String title, String where, String message) {
        return new FrictionSheet(title, where, 0, List.of(), Optional.of(message));
    }

    /**
     * A stored fit by its identifier.
     *
     * @param id the stored result's identifier
     * @return the fit, if the file holds it
     */
    public Optional<StoredFitText> fit(String id) {
        return fits.stream().filter(f -> f.id().equals(id)).findFirst();
    }
}
