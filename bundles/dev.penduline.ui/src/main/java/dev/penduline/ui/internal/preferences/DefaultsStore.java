package dev.penduline.ui.internal.preferences;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.jface.preference.PreferenceStore;

import dev.penduline.services.Defaults;
import dev.penduline.services.Defaults.Key;

/**
 * The preference store behind the Penduline page: the five settings as text under their file
 * keys, read from and saved to the per-user defaults file ({@link Defaults#location()}, looked up
 * at every load and save) instead of the workspace's preference folder, so the workbench and the
 * command line share one file. A save checks every value (a message naming the key) and replaces
 * the file atomically; JFace's own file handling is not used.
 */
final class DefaultsStore extends PreferenceStore {

    private Defaults written;

    /** A store holding the built-in defaults as its defaults, and the defaults in use as values. */
    DefaultsStore() {
        for (Key k : Key.values()) {
            setDefault(k.key(), k.text(Defaults.BUILT_IN));
        }
        show(WorkbenchDefaults.current());
    }

    /**
     * The file this store reads and writes now.
     *
     * @return the per-user defaults file
     */
    Path file() {
        return Defaults.location();
    }

    /**
     * Shows a set of defaults as the store's values.
     *
     * @param d the defaults
     */
    void show(Defaults d) {
        for (Key k : Key.values()) {
            setValue(k.key(), k.text(d));
        }
        written = d;
    }

    /**
     * The values as defaults.
     *
     * @return the defaults
     * @throws IllegalArgumentException naming the key of a value outside its range
     */
    Defaults values() {
        Defaults d = Defaults.BUILT_IN;
        for (Key k : Key.values()) {
            d = d.with(k, k.parse(getString(k.key())));
        }
        return d;
    }

    /**
     * Writes the values to the file atomically and puts them in use; nothing is written when the
     * file already holds them.
     *
     * @throws IOException naming the file and the reason, or the key of a bad value; the file is
     *                     then unchanged
     */
    @Override
    public void save() throws IOException {
        Defaults d;
        try {
            d = values();
        } catch (IllegalArgumentException e) {
            throw new IOException(e.getMessage(), e);
        }
        if (!d.equals(written) || !file().toFile().isFile()) {
            d.write(file());
            written = d;
        }
        WorkbenchDefaults.saved(d);
    }

    /** Reading goes through {@link WorkbenchDefaults#reload()}; JFace's loading is not used. */
    @Override
    public void load() {
        show(WorkbenchDefaults.reload());
    }
}
