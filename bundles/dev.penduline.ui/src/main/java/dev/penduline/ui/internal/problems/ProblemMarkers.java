package dev.penduline.ui.internal.problems;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IPath;

import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.ui.internal.problems.MechanismProblems.ElementKind;
import dev.penduline.ui.internal.problems.MechanismProblems.Problem;

/**
 * The markers of a mechanism file's problems: the type, our attributes, and the one place that
 * replaces a file's markers with its current problems. The mechanism editor opens a marker at
 * its element from {@link #ELEMENT_KIND} and {@link #ELEMENT_ID}.
 */
public final class ProblemMarkers {

    /** The marker type (plugin.xml): a persistent problem marker. */
    public static final String TYPE = "dev.penduline.ui.problem";
    /**
     * The stable identifier of the element in the file (a part's, a session's, a fit's id); absent
     * for the file and for an element without one.
     */
    public static final String ELEMENT_ID = "dev.penduline.ui.elementId";
    /** The kind of element: {@code part}, {@code session}, {@code fit}, {@code hypothesis} or {@code file}. */
    public static final String ELEMENT_KIND = "dev.penduline.ui.elementKind";

    private ProblemMarkers() {
    }

    /**
     * Whether a resource is a mechanism file whose problems are shown as markers.
     *
     * @param resource the resource
     * @return true for an accessible file in the file system ending in {@code .penduline}
     */
    public static boolean isMechanismFile(IResource resource) {
        // any case of the extension, as the loader takes it
        return resource instanceof IFile f && MechanismFormat.FILE_EXTENSION.equalsIgnoreCase(f.getFileExtension())
                && f.isAccessible() && f.getLocation() != null;
    }

    /**
     * Replaces the file's markers of our type with its current problems (never adds to the old
     * ones). Run it inside a workspace operation, so the Problems view sees one change.
     *
     * @param file the mechanism file
     * @throws CoreException when the workspace refuses a marker
     */
    public static void refresh(IFile file) throws CoreException {
        if (!file.exists()) {
            return;
        }
        IPath location = file.getLocation();
        List<Problem> problems = location == null ? List.of() : MechanismProblems.of(location.toPath());
        file.deleteMarkers(TYPE, false, IResource.DEPTH_ZERO);
        for (Problem p : problems) {
            file.createMarker(TYPE, attributes(p));
        }
    }

    /**
     * The attributes of a problem's marker.
     *
     * @param p the problem
     * @return severity, message, location, line (when the loader gave one), element kind and id
     */
    static Map<String, Object> attributes(Problem p) {
        Map<String, Object> a = new HashMap<>();
        a.put(IMarker.SEVERITY, switch (p.severity()) {
            case ERROR -> IMarker.SEVERITY_ERROR;
            case WARNING -> IMarker.SEVERITY_WARNING;
        });
        a.put(IMarker.MESSAGE, p.message());
        a.put(IMarker.LOCATION, p.location());
        if (p.line() > 0) {
            a.put(IMarker.LINE_NUMBER, p.line());
        }
        a.put(ELEMENT_KIND, p.kind().value());
        if (p.kind() != ElementKind.FILE && p.elementId() != null && !p.elementId().isBlank()) {
            a.put(ELEMENT_ID, p.elementId());
        }
        a.put(IMarker.SOURCE_ID, "Penduline");
        return a;
    }
}
