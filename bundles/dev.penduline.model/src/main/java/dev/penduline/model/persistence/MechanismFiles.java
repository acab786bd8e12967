package dev.penduline.model.persistence;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;

import dev.penduline.model.Mechanism;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.persistence.internal.LoadProblem;

/**
 * Reads and writes {@code .penduline} mechanism files: the place to start.
 *
 * <p>Loading refuses DTDs and external entities and reports a malformed file as a
 * {@link MechanismFileException} with the file, line and column; it never writes. Saving is
 * deterministic (see {@link MechanismFormat}) and atomic: on failure the old file is kept
 * byte for byte. Works the same inside and outside OSGi: the package and the resource factory are
 * registered in each resource set this class creates, not in global registries.
 */
public final class MechanismFiles {

    /**
     * Largest mechanism file loaded, in bytes (32 MiB: thousands of parts and hundreds of stored
     * fits take a few MiB). Loading builds the whole model: a 31 MB file of 170 000 parts peaked at
     * 780 MB resident (DEVELOPERS.md), so this keeps a load inside the launcher's 2 GiB.
     */
    public static final long MAX_FILE_BYTES = 32L * 1024 * 1024;

    private MechanismFiles() {
    }

    /**
     * A resource set that knows the mechanism package and reads and writes {@code .penduline}
     * files (and any other extension) as mechanism files.
     *
     * @return a new resource set
     */
    public static ResourceSet newResourceSet() {
        final ResourceSet set = new ResourceSetImpl();
        set.getPackageRegistry().put(PendulinePackage.eNS_URI, PendulinePackage.eINSTANCE);
        final Map<String, Object> factories = set.getResourceFactoryRegistry().getExtensionToFactoryMap();
        final MechanismResourceFactory factory = new MechanismResourceFactory();
        factories.put(MechanismFormat.FILE_EXTENSION, factory);
        factories.put(Resource.Factory.Registry.DEFAULT_EXTENSION, factory);
        return set;
    }

    /**
     * Loads a mechanism file into a new resource set.
     *
     * @param file the {@code .penduline} file
     * @return the mechanism, contained in a {@link MechanismResource}
     * @throws MechanismFileException when the file cannot be read, is not well-formed, declares a
     *         DTD or entities, or is not a mechanism file; the message has the file, line and column
     */
    public static Mechanism load(Path file) throws MechanismFileException {
        return load(file, newResourceSet());
    }

    private static void requireSize(Path file) throws MechanismFileException {
        final long size;
        try {
            size = Files.size(file);
        } catch (IOException e) {
            throw new MechanismFileException(file, 0, 0, "cannot be read (" + e.getMessage() + ")", e);
        }
        if (size > MAX_FILE_BYTES) {
            throw new MechanismFileException(file, 0, 0, "the file is " + size / (1024 * 1024) + " MiB, more than the "
                    + MAX_FILE_BYTES / (1024 * 1024) + " MiB a mechanism file may have (README, \"Limits\"); is it the right"
                    + " file? Records belong in records/ as sessions, not inside the mechanism file", null);
        }
    }

    /**
     * Loads a mechanism file into the given resource set.
     *
     * @param file        the {@code .penduline} file
     * @param resourceSet a resource set from {@link #newResourceSet()} (or configured alike)
     * @return the mechanism
     * @throws MechanismFileException as for {@link #load(Path)}
     */
    public static Mechanism load(Path file, ResourceSet resourceSet) throws MechanismFileException {
        if (!Files.isRegularFile(file)) {
            throw new MechanismFileException(file, 0, 0, "no such file (or it is not a regular file)", null);
        }
        requireSize(file);
        final Resource resource = resourceSet.createResource(uriOf(file));
        try {
            resource.load(MechanismFormat.loadOptions());
        } catch (IOException | RuntimeException e) {
            // The parser may stop at a later fatal error after EMF recorded an earlier one.
            final LoadProblem p = LoadProblem.of(e).earlier(
                    resource.getErrors().isEmpty() ? null : LoadProblem.of(resource.getErrors().get(0)));
            resourceSet.getResources().remove(resource);
            resource.unload();
            throw new MechanismFileException(file, p.line(), p.column(), p.problem(), e);
        }
        if (!resource.getErrors().isEmpty()) {
            final LoadProblem p = LoadProblem.of(resource.getErrors().get(0));
            resourceSet.getResources().remove(resource);
            resource.unload();
            throw new MechanismFileException(file, p.line(), p.column(), p.problem(), null);
        }
        if (resource.getContents().size() != 1 || !(resource.getContents().get(0) instanceof Mechanism)) {
            final EObject first = resource.getContents().isEmpty() ? null : resource.getContents().get(0);
            resourceSet.getResources().remove(resource);
            resource.unload();
            throw new MechanismFileException(file, 1, 0, "not a mechanism file: expected one root element"
                    + " penduline:Mechanism, found " + (first == null ? "none" : first.eClass().getName()), null);
        }
        return (Mechanism) resource.getContents().get(0);
    }

    /**
     * Saves a mechanism to a file, atomically: the file is replaced only once the whole new
     * content is on disk, and kept byte for byte when anything fails.
     *
     * <p>A mechanism already held in a resource is written from that resource (it stays there);
     * one without a resource is put into a new {@link MechanismResource} for the target file.
     * The file's {@link SaveLock} is held during the save (a caller that changes the file's
     * current content takes it first, around reading and saving; it may be taken again). A link
     * is written through to its target; see {@link AtomicFileWrite} for the rest.
     *
     * @param mechanism the mechanism to save
     * @param file      the target file
     * @return notes for the user (a temporary file of an interrupted save removed), possibly empty
     * @throws MechanismFileException when serialising or writing fails, the target is not a
     *         regular file, or another writer holds the lock too long; the old file is then intact
     */
    public static List<String> save(Mechanism mechanism, Path file) throws MechanismFileException {
        final Resource resource = resourceFor(mechanism, file);
        try (SaveLock lock = SaveLock.acquire(file)) {
            final List<String> notes = AtomicFileWrite.write(file, out -> resource.save(out, MechanismFormat.saveOptions()));
            resource.setModified(false);
            return notes;
        } catch (IOException e) {
            throw new MechanismFileException(file, 0, 0, AtomicFileWrite.reason(e), e);
        } catch (RuntimeException e) {
            throw new MechanismFileException(file, 0, 0, "not saved (" + (e.getMessage() == null ? "an internal error"
                    : e.getMessage()) + "); the previous file, if any, is unchanged", e);
        }
    }

    /**
     * The exact bytes {@link #save} writes for a mechanism.
     *
     * @param mechanism the mechanism
     * @return the file content (UTF-8, LF line ends)
     * @throws IOException when serialising fails
     */
    public static byte[] toBytes(Mechanism mechanism) throws IOException {
        final Resource resource = resourceFor(mechanism, null);
        final ByteArrayOutputStream out = new ByteArrayOutputStream();
        resource.save(out, MechanismFormat.saveOptions());
        return out.toByteArray();
    }

    private static Resource resourceFor(Mechanism mechanism, Path file) {
        final Resource existing = mechanism.eResource();
        if (existing != null) {
            return existing;
        }
        final URI uri = file == null ? URI.createURI("memory:/mechanism." + MechanismFormat.FILE_EXTENSION) : uriOf(file);
        final Resource resource = newResourceSet().createResource(uri);
        resource.getContents().add(mechanism);
        return resource;
    }

    private static URI uriOf(Path file) {
        return URI.createFileURI(file.toAbsolutePath().normalize().toString());
    }
}
