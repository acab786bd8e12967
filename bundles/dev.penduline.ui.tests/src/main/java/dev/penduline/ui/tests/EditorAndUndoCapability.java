package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;

import org.eclipse.core.resources.IFile;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.ide.IDE;

import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismStore;
import dev.penduline.services.PartsImport;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.chart.SwingChartPart;
import dev.penduline.ui.internal.editor.EditorDialogs;
import dev.penduline.ui.internal.editor.MechanismEditor;
import dev.penduline.ui.internal.mechanism.InertiaTotal;
import dev.penduline.ui.internal.mechanism.MechanismPart;

/**
 * The mechanism editor through its widgets: a length typed in millimetres reaches the model in
 * metres and the Mechanism view's J0 at once; Edit › Undo and Redo (the workbench's commands)
 * take it back and forth; a refused value changes nothing; Save writes the file; parts are added,
 * duplicated, moved, deleted and merged from a parts list, each undoable; an edit of the parts
 * marks a stored fit stale in the editor and the Friction view, and undo takes the mark away; a
 * fit is deleted and restored.
 */
final class EditorAndUndoCapability implements Capability {

    /** INVENTED parts list merged into the test mechanism: the bob heavier, a new hinge block. */
    private static final String MERGE = """
            # INVENTED test data for the workbench test, not a real product.
            name,shape,mass_kg,x_mm,y_mm,z_mm,length_mm,radius_mm,inner_radius_mm,axis
            bob,cylinder,4,0,-900,0,20,100,0,z
            hinge,point,0.5,0,-50,0,,,,
            """;

    private WorkbenchDriver driver;
    private MechanismEditor editor;

    @Override
    public void run(WorkbenchDriver d) throws Exception {
        this.driver = d;
        Path scratch = Files.createTempDirectory("penduline-editor-test");
        IFile file = TestMechanisms.rodAndDisc(scratch, "editor-arm", "Editor arm (invented)");
        Path path = file.getLocation().toPath();
        // A fit stored before the edits, with the J0 the parts gave then (the handbook value of
        // TestMechanisms.ROD_AND_DISC).
        MechanismStore.update(path, m -> {
            FitResult f = NamedElements.addFitResult(m, "fit before the edit", "2026-11-30T09:00:00Z");
            f.getTermIds().add("viscous");
            f.setCalculatedInertia(2.871667);
            return null;
        }, note -> { });
        file.refreshLocal(0, null);

        editor = (MechanismEditor) IDE.openEditor(driver.page(), file, PendulineViews.MECHANISM_EDITOR);
        driver.reveal(file);
        MechanismPart view = (MechanismPart) driver.part(PendulineViews.MECHANISM).getObject();
        driver.page().activate(editor);
        assertEquals("2.872", shownJ0(view, "2.872"), "J0 before the edit (handbook value 2.871667 kg·m², TestMechanisms)");

        // Type "1200 mm" into the arm's length cell through the table's own cell editor.
        Table parts = table("parts", "length (m)");
        typeInto(parts, row(parts, "arm"), column(parts, "length (m)"), "1200 mm");
        assertEquals("1.2 m", parts.getItem(row(parts, "arm")).getText(column(parts, "length (m)")), "stored in SI, shown in m");
        // Slender rod about its centroid m·L²/12 plus m·d² (parallel-axis theorem, any statics
        // handbook): 2·1.2²/12 + 2·0.4² = 0.56; with the disc's 2.445: J0 = 3.005 kg·m².
        assertEquals("3.005", shownJ0(view, "3.005"), "J0 follows the live model at once");
        // Compound pendulum T0 = 2π·sqrt(J0 / (m·g·Lc)) (any dynamics text): 2π·sqrt(3.005 / (5·9.80665·0.7)) = 1.859 s.
        SwingChartPart chart = (SwingChartPart) driver.part(PendulineViews.SWING_CHART).getObject();
        driver.waitFor("the Swing Chart to follow the live model", () -> chart.content() != null
                && String.join(" ", chart.content().summary()).contains("small-angle period T0: 1.859 s") ? chart : null);
        driver.page().activate(editor);
        assertTrue(editor.isDirty(), "an edit makes the editor dirty");
        assertTrue(driver.page().getDirtyEditors().length == 1, "the workbench knows the dirty editor");
        assertTrue(label("parts", l -> l.startsWith("From these parts: J0 = 3.005 kg·m²")).isPresent(), "the page's own totals");
        assertTrue(tableText("fits", "state").startsWith("stale: parts edited in the workbench"), tableText("fits", "state"));
        pageControl("parts");
        driver.shot(driver.shell(), "editor-01-length-typed-in-mm.png");

        String undoLabel = editMenuText("Undo");
        assertTrue(undoLabel.contains("Set length of arm"), "Edit menu names the command: " + undoLabel);
        IHandlerService handlers = driver.window().getService(IHandlerService.class);
        handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        assertEquals("2.872", shownJ0(view, "2.872"), "undo takes J0 back");
        assertFalse(editor.isDirty(), "undone back to the saved state");
        assertEquals("current", tableText("fits", "state"), "undo takes the stale mark away with the edit");
        handlers.executeCommand("org.eclipse.ui.edit.redo", null);
        assertEquals("3.005", shownJ0(view, "3.005"), "redo");

        // A value the field refuses changes nothing and says why.
        typeInto(parts, row(parts, "arm"), column(parts, "mass (kg)"), "2 furlongs");
        assertTrue(label("parts", l -> l.contains("not a unit of")).isPresent(), "the refusal is shown");
        assertEquals("2 kg", parts.getItem(row(parts, "arm")).getText(column(parts, "mass (kg)")), "unchanged");
        driver.shot(driver.shell(), "editor-02-refused-value.png");

        handlers.executeCommand("org.eclipse.ui.file.save", null);
        driver.flush();
        assertFalse(editor.isDirty(), "clean after Save");
        Mechanism saved = MechanismLoader.readMechanism(path);
        assertEquals(1.2, saved.getParts().get(0).getLength(), 0.0, "the typed length reached the file in metres");
        assertTrue(PartsImport.staleReason(saved.getFitResults().get(0)).isPresent(), "the stale mark reached the file");

        partsButtons(parts);
        importMerge(parts, scratch);
        fitsDeleteAndUndo();

        for (String page : List.of("pivot", "hypotheses", "sessions")) {
            pageControl(page);
            driver.shot(driver.shell(), "editor-05-page-" + page + ".png");
        }
        driver.page().closeEditor(editor, false);
        driver.flush();
    }

    private void partsButtons(Table parts) throws Exception {
        int before = parts.getItemCount();
        press("parts", "Add");
        assertEquals(before + 1, parts.getItemCount(), "Add adds a row");
        assertEquals("point", parts.getItem(before).getText(column(parts, "shape")), "a new part is a point mass");
        parts.setSelection(before);
        press("parts", "Duplicate");
        assertEquals(before + 2, parts.getItemCount(), "Duplicate adds a copy");
        String copy = parts.getItem(before + 1).getText(0);
        assertTrue(copy.endsWith(" copy"), copy);
        parts.setSelection(before + 1);
        press("parts", "Move Up");
        assertEquals(copy, parts.getItem(before).getText(0), "Move Up");
        parts.setSelection(before);
        press("parts", "Delete");
        assertEquals(before + 1, parts.getItemCount(), "Delete");
        IHandlerService handlers = driver.window().getService(IHandlerService.class);
        handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        assertEquals(copy, parts.getItem(before).getText(0), "undo of Delete puts the copy back where it was");
        for (int i = 0; i < 3; i++) {
            handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        }
        assertEquals(before, parts.getItemCount(), "undo of Move, Duplicate and Add");
        assertFalse(editor.isDirty(), "back at the saved state");
    }

    private void importMerge(Table parts, Path scratch) throws Exception {
        Path list = Files.writeString(scratch.resolve("merge-parts.csv"), MERGE, StandardCharsets.UTF_8);
        var chooser = EditorDialogs.partsListChooser;
        var mode = EditorDialogs.importModeChooser;
        try {
            EditorDialogs.partsListChooser = shell -> list.toString();
            EditorDialogs.importModeChooser = (shell, p) -> EditorDialogs.MERGE;
            press("parts", "Import Parts List...");
        } finally {
            EditorDialogs.partsListChooser = chooser;
            EditorDialogs.importModeChooser = mode;
        }
        assertEquals(3, parts.getItemCount(), "merge: arm kept, bob replaced in place, hinge added");
        assertEquals("bob", parts.getItem(1).getText(0));
        assertEquals("4 kg", parts.getItem(1).getText(column(parts, "mass (kg)")), "bob from the list");
        assertEquals("hinge", parts.getItem(2).getText(0));
        driver.shot(driver.shell(), "editor-03-parts-merged.png");
        driver.window().getService(IHandlerService.class).executeCommand("org.eclipse.ui.edit.undo", null);
        assertEquals(2, parts.getItemCount(), "the whole merge is one command");
        assertEquals("3 kg", parts.getItem(1).getText(column(parts, "mass (kg)")), "undo restores the bob");
    }

    private void fitsDeleteAndUndo() throws Exception {
        editor.setActivePage("fits");
        Table fits = table("fits", "state");
        assertEquals(1, fits.getItemCount());
        fits.setSelection(0);
        driver.shot(driver.shell(), "editor-04-stored-fits.png");
        press("fits", "Delete Fit");
        assertEquals(0, fits.getItemCount(), "deleted");
        driver.window().getService(IHandlerService.class).executeCommand("org.eclipse.ui.edit.undo", null);
        assertEquals(1, fits.getItemCount(), "undo restores the fit");
        editor.setActivePage("parts");
    }

    // --- reading and driving the widgets -------------------------------------------------

    private String shownJ0(MechanismPart view, String expected) throws InterruptedException {
        return driver.waitFor("the Mechanism view to show J0 " + expected, () -> {
            var s = view.sheet();
            String j0 = s == null ? null : s.shown(InertiaTotal.PIVOT_INERTIA).orElse(null);
            return expected.equals(j0) ? j0 : null;
        });
    }

    private Composite pageControl(String pageId) {
        editor.setActivePage(pageId);
        driver.flush();
        assertEquals(pageId, editor.getActivePageInstance().getId(), "the page shown");
        Control c = editor.findPage(pageId).getPartControl();
        assertNotNull(c, "page " + pageId + " has no widgets");
        return (Composite) c;
    }

    private Table table(String pageId, String header) {
        for (Control c : all(pageControl(pageId))) {
            if (c instanceof Table t && Arrays.stream(t.getColumns()).anyMatch(col -> col.getText().equals(header))) {
                return t;
            }
        }
        throw new AssertionError("no table with column '" + header + "' on page " + pageId);
    }

    private String tableText(String pageId, String header) {
        Table t = table(pageId, header);
        String text = t.getItem(0).getText(column(t, header));
        editor.setActivePage("parts");
        driver.flush();
        return text;
    }

    private Optional<String> label(String pageId, Predicate<String> wanted) {
        for (Control c : all(pageControl(pageId))) {
            if (c instanceof Label l && wanted.test(l.getText())) {
                return Optional.of(l.getText());
            }
        }
        return Optional.empty();
    }

    private void press(String pageId, String text) {
        for (Control c : all(pageControl(pageId))) {
            if (c instanceof Button b && text.equals(b.getText())) {
                b.notifyListeners(SWT.Selection, new Event());
                driver.flush();
                return;
            }
        }
        throw new AssertionError("no button '" + text + "' on page " + pageId);
    }

    private static List<Control> all(Composite root) {
        return TestMechanisms.widgets(root);
    }

    private static int column(Table t, String header) {
        TableColumn[] cols = t.getColumns();
        for (int i = 0; i < cols.length; i++) {
            if (cols[i].getText().equals(header)) {
                return i;
            }
        }
        throw new AssertionError("no column " + header);
    }

    private static int row(Table t, String name) {
        for (int i = 0; i < t.getItemCount(); i++) {
            if (t.getItem(i).getText(0).equals(name)) {
                return i;
            }
        }
        throw new AssertionError("no row " + name);
    }

    /** Clicks a cell (the viewer opens its cell editor), types, and presses Enter. */
    private void typeInto(Table t, int row, int column, String typed) throws InterruptedException {
        TableItem item = t.getItem(row);
        // the viewer opens a cell editor on a click into the one selected row
        t.setSelection(row);
        t.showItem(item);
        t.showColumn(t.getColumn(column));
        driver.flush();
        Rectangle cell = item.getBounds(column);
        Event down = new Event();
        down.button = 1;
        down.x = cell.x + cell.width / 2;
        down.y = cell.y + cell.height / 2;
        t.notifyListeners(SWT.MouseDown, down);
        Text text = driver.waitFor("the cell editor to open", () -> Arrays.stream(t.getChildren())
                .filter(c -> c instanceof Text x && x.isVisible()).map(Text.class::cast).findFirst().orElse(null));
        text.setText(typed);
        text.notifyListeners(SWT.DefaultSelection, new Event());
        driver.flush();
    }

    private String editMenuText(String prefix) {
        Menu bar = driver.shell().getMenuBar();
        for (MenuItem top : bar.getItems()) {
            if (top.getText().replace("&", "").equals("Edit")) {
                Menu menu = top.getMenu();
                menu.notifyListeners(SWT.Show, new Event());
                driver.flush();
                for (MenuItem i : menu.getItems()) {
                    String text = i.getText().replace("&", "");
                    if (text.startsWith(prefix)) {
                        menu.notifyListeners(SWT.Hide, new Event());
                        return text;
                    }
                }
            }
        }
        throw new AssertionError("no Edit menu item starting with " + prefix);
    }
}
