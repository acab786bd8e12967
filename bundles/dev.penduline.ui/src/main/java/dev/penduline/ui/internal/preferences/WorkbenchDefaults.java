package dev.penduline.ui.internal.preferences;

import java.util.Optional;

import org.eclipse.core.runtime.ILog;

import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.present.Figures;

/**
 * The user's defaults as the workbench uses them now: read from {@link Defaults#location()} at
 * start ({@link #reload()}) and replaced when the preference page saves. A file that cannot be
 * read leaves the built-in defaults in use, says why in the error log and on the preference page,
 * and is not overwritten unless the user saves the page after seeing that.
 */
public final class WorkbenchDefaults {

    private static volatile Defaults current = Defaults.BUILT_IN;

    private static volatile String problem;

    private WorkbenchDefaults() {
    }

    /**
     * The defaults in use.
     *
     * @return the defaults (the built-in ones until {@link #reload()} read a file)
     */
    public static Defaults current() {
        return current;
    }

    /**
     * Why the file could not be read at the last {@link #reload()}.
     *
     * @return the message naming the file, line and key, or empty when it was read (or absent)
     */
    public static Optional<String> problem() {
        return Optional.ofNullable(problem);
    }

    /**
     * Reads the per-user file again and applies it (the display precision of every figure shown
     * from now on).
     *
     * @return the defaults now in use
     */
    public static synchronized Defaults reload() {
        try {
            use(Defaults.read());
            problem = null;
        } catch (InputException e) {
            problem = e.getMessage();
            use(Defaults.BUILT_IN);
            ILog.of(WorkbenchDefaults.class).warn("Penduline uses its built-in defaults: " + e.getMessage());
        }
        return current;
    }

    /**
     * Puts saved defaults in use.
     *
     * @param saved what the preference page wrote
     */
    static synchronized void saved(Defaults saved) {
        use(saved);
        problem = null;
    }

    private static void use(Defaults d) {
        current = d;
        Figures.useDigits(d.significantDigits());
    }
}
