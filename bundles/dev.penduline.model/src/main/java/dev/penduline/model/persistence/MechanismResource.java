package dev.penduline.model.persistence;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EFactory;
import org.eclipse.emf.ecore.xmi.XMLHelper;
import org.eclipse.emf.ecore.xmi.impl.XMIHelperImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceImpl;

import dev.penduline.model.persistence.internal.FormerWords;

/**
 * The EMF resource of a {@code .penduline} file: XMI with the options of
 * {@link MechanismFormat} as defaults, and saving to a local file by atomic replacement, so that
 * an editor saving through the resource set gets the same guarantees as
 * {@link MechanismFiles#save} (the same {@link SaveLock}, the same {@link AtomicFileWrite}).
 * A file in the words of an older Penduline is read in today's words ({@link FormerWords}), so
 * the next save writes today's words.
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
     * Loads, then renames the former identifiers of the file's words (see {@link FormerWords}).
     *
     * @param inputStream the file's content
     * @param options     load options
     * @throws IOException when reading or parsing fails
     */
    @Override
    public void doLoad(InputStream inputStream, Map<?, ?> options) throws IOException {
        super.doLoad(inputStream, options);
        FormerWords.migrate(this);
    }

    /**
     * A helper that reads an enumeration's former literals as its current ones.
     *
     * @return the helper
     */
    @Override
    protected XMLHelper createXMLHelper() {
        return new XMIHelperImpl(this) {
            @Override
            protected Object createFromString(EFactory eFactory, EDataType eDataType, String value) {
                return super.createFromString(eFactory, eDataType, FormerWords.literal(eDataType, value));
            }
        };
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
