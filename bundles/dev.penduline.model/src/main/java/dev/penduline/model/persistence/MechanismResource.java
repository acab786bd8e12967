package dev.penduline.model.persistence;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceImpl;

/**
 * The EMF resource of a {@code .penduline} file: XMI with the options of
 * {@link MechanismFormat} as defaults, and saving to a local file by atomic replacement, so that
 * an editor saving through the resource set gets the same guarantees as
 * {@link MechanismFiles#save} (the same {@link SaveLock}, the same {@link AtomicFileWrite}).
 */
public class MechanismResource extends XMIResourceImpl {

    /**
     * Creates a resource with Penduline's load and save defaults.
     *
     * @param uri where the resource lives
     */
    public MechanismResource(URI uri) {
        super(uri);
        getDefaultLoadOptions().putAll(MechanismFormat.loadOptions());
        getDefaultSaveOptions().putAll(MechanismFormat.saveOptions());
    }

    /**
     * Saves; a local file is replaced atomically and left untouched when saving fails.
     *
     * @param options extra save options, or null
     * @throws IOException when serialising or writing fails
     */
    @Override
    public void save(Map<?, ?> options) throws IOException {
        if (uri == null || !uri.isFile()) {
            super.save(options);
            return;
        }
        final Path file = Path.of(uri.toFileString());
        try (SaveLock lock = SaveLock.acquire(file)) {
            AtomicFileWrite.write(file, out -> save(out, options));
        }
        setModified(false);
    }

    /**
     * Element identifiers are the model's own {@code id} values; EMF must not invent UUIDs.
     *
     * @return false
     */
    @Override
    protected boolean useUUIDs() {
        return false;
    }
}
