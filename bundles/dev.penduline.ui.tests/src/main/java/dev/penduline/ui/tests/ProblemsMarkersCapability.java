package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Predicate;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeColumn;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.IWorkbenchPage;

import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.editor.MechanismEditor;
import dev.penduline.ui.internal.problems.MechanismProblems;
import dev.penduline.ui.internal.problems.ProblemMarkerUpdater;
import dev.penduline.ui.internal.problems.ProblemMarkers;

/**
 * The problems of mechanism files in the Problems view of the live workbench: in a project, a
 * part of negative mass, a session whose record is missing, one whose record changed after it
 * was added and a file that is not well-formed each become a marker of our type on their file,
 * with severity, message, location and the element's kind and id, and the Problems view lists
 * them; fixing a file, or putting its records back, takes its markers away, and a change that
 * keeps a problem replaces its marker instead of adding a second.
 */
final class ProblemsMarkersCapability implements Capability {

    @Override
    public void run(WorkbenchDriver d) throws Exception {
        IWorkspace workspace = ResourcesPlugin.getWorkspace();
        IProject project = workspace.getRoot().getProject("problem-markers");
        project.create(null);
        project.open(null);
        ProblemFiles files = new ProblemFiles(project.getLocation().toPath(),
                Files.createTempDirectory("penduline-markers-test"));
        project.refreshLocal(IResource.DEPTH_INFINITE, null);
        IFile badPart = project.getFile("bad-part.penduline");
        IFile sessions = project.getFile("sessions.penduline");
        IFile broken = project.getFile("broken.penduline");
        IFile valid = project.getFile("valid.penduline");

        // Nothing in the test starts the updater: the workbench's early start-up did.
        int onBadPart = MechanismProblems.of(files.badPart).size();
        d.waitFor("the markers of the three files with problems", () -> markers(badPart).size() == onBadPart
                && markers(sessions).size() == 2 && markers(broken).size() == 1 ? true : null);
        waitIdle(d);
        assertEquals(List.of(), markers(valid), "a valid file has no markers");
        assertEquals(onBadPart, markers(badPart).size(), "one marker per problem, none twice");

        IMarker mass = one(badPart, m -> "arm".equals(m.getAttribute(ProblemMarkers.ELEMENT_ID, "")));
        assertTrue(mass.isSubtypeOf(IMarker.PROBLEM), "a problem marker, so the Problems view shows it");
        assertEquals(IMarker.SEVERITY_ERROR, mass.getAttribute(IMarker.SEVERITY, -1));
        assertEquals("part", mass.getAttribute(ProblemMarkers.ELEMENT_KIND, ""));
        assertEquals("part 'arm'", mass.getAttribute(IMarker.LOCATION, ""));
        String massMessage = mass.getAttribute(IMarker.MESSAGE, "");
        assertTrue(massMessage.startsWith("part 'arm': mass must be positive (got -2.0 kg)"), massMessage);
        assertEquals(-1, mass.getAttribute(IMarker.LINE_NUMBER, -1), "validation gives no line");

        IMarker missing = one(sessions, m -> files.missingSession.equals(m.getAttribute(ProblemMarkers.ELEMENT_ID, "")));
        assertEquals(IMarker.SEVERITY_ERROR, missing.getAttribute(IMarker.SEVERITY, -1));
        assertEquals("session", missing.getAttribute(ProblemMarkers.ELEMENT_KIND, ""));
        assertEquals("session 'release at 12'", missing.getAttribute(IMarker.LOCATION, ""));
        String missingMessage = missing.getAttribute(IMarker.MESSAGE, "");
        assertTrue(missingMessage.contains("its record records/release-12deg.csv is missing"), missingMessage);
        IMarker changed = one(sessions, m -> files.changedSession.equals(m.getAttribute(ProblemMarkers.ELEMENT_ID, "")));
        assertEquals(IMarker.SEVERITY_WARNING, changed.getAttribute(IMarker.SEVERITY, -1));
        assertEquals("session", changed.getAttribute(ProblemMarkers.ELEMENT_KIND, ""));
        String changedMessage = changed.getAttribute(IMarker.MESSAGE, "");
        assertTrue(changedMessage.contains("records/release-30deg.csv has changed since it was added"), changedMessage);

        IMarker unreadable = one(broken, m -> true);
        assertEquals(IMarker.SEVERITY_ERROR, unreadable.getAttribute(IMarker.SEVERITY, -1));
        assertEquals("file", unreadable.getAttribute(ProblemMarkers.ELEMENT_KIND, ""));
        assertNull(unreadable.getAttribute(ProblemMarkers.ELEMENT_ID), "the file is no element of the model");
        assertEquals(ProblemFiles.BROKEN_LINE, unreadable.getAttribute(IMarker.LINE_NUMBER, -1), "the loader's line");
        String brokenMessage = unreadable.getAttribute(IMarker.MESSAGE, "");
        assertTrue(brokenMessage.startsWith("cannot be read: "), brokenMessage);

        // The Problems view lists them, as a user reads them.
        IViewPart view = d.page().showView(PendulineViews.PROBLEMS);
        Tree tree = tree((Composite) d.part(PendulineViews.PROBLEMS).getWidget());
        List<String[]> rows = d.waitFor("the Problems view to list the four markers", () -> {
            List<String[]> r = rows(tree);
            return row(r, massMessage) != null && row(r, missingMessage) != null && row(r, changedMessage) != null
                    && row(r, brokenMessage) != null ? r : null;
        });
        assertEquals(0, column(tree, "Description"), "the message is the first column");
        int resource = column(tree, "Resource");
        int location = column(tree, "Location");
        assertEquals("bad-part.penduline", row(rows, massMessage)[resource]);
        assertEquals("part 'arm'", row(rows, massMessage)[location]);
        assertEquals("sessions.penduline", row(rows, missingMessage)[resource]);
        assertEquals("broken.penduline", row(rows, brokenMessage)[resource]);
        Image errorIcon = item(tree, massMessage).getImage();
        Image warningIcon = item(tree, changedMessage).getImage();
        assertNotNull(errorIcon, "an error has its icon");
        assertNotEquals(errorIcon, warningIcon, "a warning's icon is not an error's (nor both the missing image)");
        d.page().setPartState(d.page().getReference(view), IWorkbenchPage.STATE_MAXIMIZED);
        d.shot(d.shell(), "problems-markers.png");
        d.page().setPartState(d.page().getReference(view), IWorkbenchPage.STATE_RESTORED);

        // Double-clicking a marker opens the mechanism editor at its element.
        TreeItem missingItem = item(tree, missingMessage);
        tree.setSelection(missingItem);
        Event open = new Event();
        open.item = missingItem;
        tree.notifyListeners(SWT.Selection, open);
        tree.notifyListeners(SWT.DefaultSelection, open);
        MechanismEditor editor = d.waitFor("the editor to open at the marker's session",
                () -> d.page().getActiveEditor() instanceof MechanismEditor m ? m : null);
        assertEquals("sessions", editor.getActivePageInstance().getId(), "the page of the marker's element");
        Table sessionsTable = firstTable((Composite) editor.getActivePageInstance().getPartControl());
        assertEquals(1, sessionsTable.getSelectionCount(), "the marker's session is selected");
        assertEquals("release at 12", sessionsTable.getSelection()[0].getText(0));
        assertEquals("missing", sessionsTable.getSelection()[0].getText(2), "its record state");
        d.shot(d.shell(), "problems-marker-opens-editor.png");
        d.page().closeEditor(editor, false);

        // A change that keeps the problem replaces the marker.
        Files.writeString(files.broken, Files.readString(files.broken) + "<!-- still broken -->\n");
        broken.refreshLocal(IResource.DEPTH_ZERO, null);
        long before = unreadable.getId();
        IMarker again = d.waitFor("the broken file's marker to be replaced",
                () -> markers(broken).size() == 1 && markers(broken).get(0).getId() != before ? markers(broken).get(0) : null);
        waitIdle(d);
        assertEquals(1, markers(broken).size(), "replaced, not added");
        assertEquals(brokenMessage, again.getAttribute(IMarker.MESSAGE, ""));

        // Fixing the part, and putting the records back as they were added, takes the markers away.
        Files.copy(files.valid, files.badPart, StandardCopyOption.REPLACE_EXISTING);
        Files.write(files.missingRecord, files.missingRecordAsAdded);
        Files.write(files.changedRecord, files.changedRecordAsAdded);
        project.refreshLocal(IResource.DEPTH_INFINITE, null);
        d.waitFor("the markers of the fixed file and of the restored records to go",
                () -> markers(badPart).isEmpty() && markers(sessions).isEmpty() ? true : null);
        d.waitFor("the Problems view to drop them", () -> {
            List<String[]> r = rows(tree);
            return row(r, massMessage) == null && row(r, missingMessage) == null && row(r, changedMessage) == null
                    && row(r, brokenMessage) != null ? r : null;
        });
        d.page().setPartState(d.page().getReference(view), IWorkbenchPage.STATE_MAXIMIZED);
        d.shot(d.shell(), "problems-markers-fixed.png");
        d.page().setPartState(d.page().getReference(view), IWorkbenchPage.STATE_RESTORED);

        project.delete(true, true, null);
        d.flush();
    }

    private static Table firstTable(Composite root) {
        for (Control c : root.getChildren()) {
            if (c instanceof Table t) {
                return t;
            }
            if (c instanceof Composite k) {
                Table t = firstTable(k);
                if (t != null) {
                    return t;
                }
            }
        }
        return null;
    }

    private static List<IMarker> markers(IFile file) {
        try {
            return file.exists() ? Arrays.asList(file.findMarkers(ProblemMarkers.TYPE, false, IResource.DEPTH_ZERO))
                    : List.of();
        } catch (CoreException e) {
            throw new AssertionError("cannot read the markers of " + file, e);
        }
    }

    private static IMarker one(IFile file, Predicate<IMarker> which) {
        List<IMarker> found = markers(file).stream().filter(which).toList();
        assertEquals(1, found.size(), "markers of " + file.getName() + ": " + found);
        return found.get(0);
    }

    /** Waits until the updater has written everything it was asked to. */
    private static void waitIdle(WorkbenchDriver d) throws InterruptedException {
        Job job = ProblemMarkerUpdater.install(ResourcesPlugin.getWorkspace()).job();
        d.waitFor("the marker job to finish", () -> job.getState() == Job.NONE ? true : null);
    }

    private static Tree tree(Control control) {
        if (control instanceof Tree t) {
            return t;
        }
        if (control instanceof Composite c) {
            for (Control child : c.getChildren()) {
                Tree t = tree(child);
                if (t != null) {
                    return t;
                }
            }
        }
        return null;
    }

    private static int column(Tree tree, String header) {
        TreeColumn[] columns = tree.getColumns();
        for (int i = 0; i < columns.length; i++) {
            if (header.equals(columns[i].getText())) {
                return i;
            }
        }
        throw new AssertionError("no column " + header + " in the Problems view");
    }

    /** The marker rows of the view, each column's text; a category (Errors, Warnings) is opened as a user would. */
    private static List<String[]> rows(Tree tree) {
        assertNotNull(tree, "the Problems view has no tree");
        List<String[]> out = new ArrayList<>();
        for (TreeItem item : tree.getItems()) {
            if (item.getItemCount() == 0) {
                out.add(texts(tree, item));
                continue;
            }
            if (!item.getExpanded()) {
                Event e = new Event();
                e.item = item;
                tree.notifyListeners(SWT.Expand, e);
                item.setExpanded(true);
            }
            for (TreeItem child : item.getItems()) {
                out.add(texts(tree, child));
            }
        }
        return out;
    }

    private static TreeItem item(Tree tree, String description) {
        for (TreeItem item : tree.getItems()) {
            for (TreeItem child : item.getItems()) {
                if (description.equals(child.getText(0))) {
                    return child;
                }
            }
        }
        throw new AssertionError("no row " + description + " in the Problems view");
    }

    private static String[] texts(Tree tree, TreeItem item) {
        String[] t = new String[Math.max(1, tree.getColumnCount())];
        for (int i = 0; i < t.length; i++) {
            t[i] = item.getText(i);
        }
        return t;
    }

    /** The row whose Description is the given message (the view's first column unless the user moved it). */
    private static String[] row(List<String[]> rows, String description) {
        for (String[] r : rows) {
            if (description.equals(r[0])) {
                return r;
            }
        }
        return null;
    }
}
