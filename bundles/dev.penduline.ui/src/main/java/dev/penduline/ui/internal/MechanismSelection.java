package dev.penduline.ui.internal;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

import org.eclipse.core.resources.IContainer;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.Adapters;
import org.eclipse.core.runtime.IPath;
import org.eclipse.jface.viewers.IStructuredSelection;

import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.services.SessionRecords;

/**
 * Which workspace file a selection points at, when it is one the mechanism views can show: a
 * mechanism file, or a parts-list CSV. A CSV inside a project's {@code records/} folder is a
 * swing record, not a parts list, and is not followed.
 */
public final class MechanismSelection {

    private MechanismSelection() {
    }

    /**
     * The mechanism file or parts list a selection points at.
     *
     * @param selection the active selection: a structured selection of one element, a file, or
     *                  anything that adapts to a file (may be null)
     * @return the file, empty when the selection is something else
     */
    public static Optional<IFile> fileOf(Object selection) {
        Object element = selection;
        if (selection instanceof IStructuredSelection s) {
            if (s.size() != 1) {
                return Optional.empty();
            }
            element = s.getFirstElement();
        }
        IFile file = element == null ? null : Adapters.adapt(element, IFile.class);
        if (file == null || file.getLocation() == null) {
            return Optional.empty();
        }
        return isMechanismFile(file) || isPartsList(file) ? Optional.of(file) : Optional.empty();
    }

    /**
     * Whether a file is a mechanism file.
     *
     * @param file the file
     * @return true for the {@code .penduline} extension
     */
    public static boolean isMechanismFile(IFile file) {
        return MechanismFormat.FILE_EXTENSION.equals(extension(file));
    }

    /**
     * Whether a file is a parts-list CSV (a CSV not in a {@code records/} folder).
     *
     * @param file the file
     * @return true for a parts list
     */
    public static boolean isPartsList(IFile file) {
        IContainer parent = file.getParent();
        boolean inRecords = parent != null && SessionRecords.RECORDS_FOLDER.equals(parent.getName());
        return "csv".equals(extension(file)) && !inRecords;
    }

    /**
     * The file's location in the file system, for the services.
     *
     * @param file the workspace file (not virtual)
     * @return its path
     */
    public static Path pathOf(IFile file) {
        IPath location = file.getLocation();
        return location.toFile().toPath();
    }

    private static String extension(IFile file) {
        String e = file.getFileExtension();
        return e == null ? "" : e.toLowerCase(Locale.ROOT);
    }
}
