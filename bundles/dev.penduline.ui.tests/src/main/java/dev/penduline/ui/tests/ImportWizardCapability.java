package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ISeries;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.ide.IDE;

import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.DemoRecords;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.editor.MechanismEditor;
import dev.penduline.ui.internal.wizard.RecordImportWizard;

/**
 * The record import wizard through its widgets: two invented records are added through its file
 * chooser; the encoder record's counts per revolution are read from its own comment line (no
 * retyping); the other record's angle column is overridden in the page's field and the plot
 * follows; Finish adds both sessions as one undoable command of the open editor, with the records
 * copied unchanged into records/.
 */
final class ImportWizardCapability implements Capability {

    @Override
    public void run(WorkbenchDriver driver) throws Exception {
        Path scratch = Files.createTempDirectory("penduline-import-test");
        IFile file = TestMechanisms.rodAndDisc(scratch, "import-arm", "Import arm (invented)");
        Path path = file.getLocation().toPath();
        MechanismSource mechanism = new MechanismLoader().load(path);
        // INVENTED records, outside the project: an encoder record and one in degrees with a second
        // angle column (twice the first) that the user must choose.
        Path encoder = scratch.resolve("hatch-encoder.csv");
        DemoRecords.write(mechanism, new FrictionTorques(0.05, 0.05, 0.0, 0), new DemoRecords.Settings(Unit.DEGREE.toSi(20),
                Unit.DEGREE.toSi(1), Unit.DEGREE.toSi(0.02), 4096, 0.5, 6, 200, 11), encoder);
        Path plain = scratch.resolve("hatch-two-columns.csv");
        Path degrees = scratch.resolve("hatch-degrees.csv");
        DemoRecords.write(mechanism, new FrictionTorques(0.05, 0.05, 0.0, 0), new DemoRecords.Settings(Unit.DEGREE.toSi(15),
                0, Unit.DEGREE.toSi(0.02), 0, 0.5, 6, 200, 12), degrees);
        Files.write(plain, twoColumns(Files.readAllLines(degrees)), StandardCharsets.UTF_8);
        byte[] encoderBytes = Files.readAllBytes(encoder);

        MechanismEditor editor = (MechanismEditor) IDE.openEditor(driver.page(), file, PendulineViews.MECHANISM_EDITOR);
        WizardDialog dialog = RecordImportWizard.dialog(driver.shell(), file, List.of());
        dialog.setBlockOnOpen(false);
        var chooser = RecordImportWizard.recordChooser;
        try {
            RecordImportWizard.recordChooser = shell -> List.of(encoder.toString(), plain.toString());
            dialog.open();
            Composite page = dialog.getShell();
            press(page, "Add Records...");
            Table records = first(page, Table.class);
            assertEquals(2, records.getItemCount(), "both records listed");

            select(records, 0);
            String layout = labelStarting(page, "Detected layout");
            assertTrue(layout.contains("4096"), "the counts per revolution read from the record's comment: " + layout);
            assertEquals("1201 samples", records.getItem(0).getText(2), "t = 0, 1/200, ..., 6 s");

            select(records, 1);
            double before = maxAngle(first(page, Chart.class));
            Text angleColumn = fieldAfter(page, "Angle column:");
            angleColumn.setText("second_deg");
            angleColumn.notifyListeners(SWT.DefaultSelection, new Event());
            driver.flush();
            double after = maxAngle(first(page, Chart.class));
            // the plot follows the override: the chosen column is twice the detected one
            assertEquals(2 * before, after, 1e-6 * after, "the chart shows the overridden column");
            driver.shot(dialog.getShell(), "import-wizard-override.png");

            assertTrue(button(page, "&Finish").isEnabled(), "Finish is enabled once every record reads");
            press(page, "&Finish");
            driver.flush();
        } finally {
            RecordImportWizard.recordChooser = chooser;
            if (dialog.getShell() != null && !dialog.getShell().isDisposed()) {
                dialog.close();
            }
        }

        Mechanism live = editor.document().mechanism();
        assertEquals(2, live.getSessions().size(), "two sessions added to the open editor's model");
        TestSession a = live.getSessions().get(0);
        TestSession b = live.getSessions().get(1);
        assertEquals(4096, a.getCountsPerRevolution(), "counts per revolution kept without retyping");
        assertEquals("second_deg", b.getAngleColumnName(), "the overridden column is the session's mapping");
        Path copied = path.getParent().resolve(a.getRecordPath());
        assertTrue(Files.exists(copied), "the record copied into the project: " + a.getRecordPath());
        assertArrayEquals(encoderBytes, Files.readAllBytes(copied), "copied unchanged");
        assertEquals(SessionRecords.sha256(copied), a.getContentHash(), "the session holds the record's SHA-256");
        assertTrue(editor.isDirty(), "one command on the editor's stack, not yet saved");

        driver.page().activate(editor);
        IHandlerService handlers = driver.window().getService(IHandlerService.class);
        handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        assertEquals(0, live.getSessions().size(), "undo removes both sessions: the import is one command");
        assertFalse(editor.isDirty());
        handlers.executeCommand("org.eclipse.ui.edit.redo", null);
        handlers.executeCommand("org.eclipse.ui.file.save", null);
        driver.flush();
        Mechanism saved = MechanismLoader.readMechanism(path);
        assertEquals(2, saved.getSessions().size(), "saved");
        assertEquals("second_deg", saved.getSessions().get(1).getAngleColumnName());
        editor.setActivePage("sessions");
        driver.shot(driver.shell(), "import-wizard-sessions-added.png");
        driver.page().closeEditor(editor, false);
    }

    /** The degrees record with a second angle column, twice the first. */
    private static List<String> twoColumns(List<String> lines) {
        List<String> out = new ArrayList<>();
        for (String line : lines) {
            if (line.startsWith("#")) {
                out.add(line);
            } else if (line.startsWith("time_s")) {
                out.add("time_s,angle_deg,second_deg");
            } else if (!line.isBlank()) {
                String[] f = line.split(",");
                out.add(f[0] + "," + f[1] + "," + Double.toString(2 * Double.parseDouble(f[1])));
            }
        }
        return out;
    }

    private static double maxAngle(Chart chart) {
        double max = 0;
        for (ISeries<?> s : chart.getSeriesSet().getSeries()) {
            if ("angle".equals(s.getId())) {
                for (double y : s.getYSeries()) {
                    max = Math.max(max, Math.abs(y));
                }
            }
        }
        assertTrue(max > 0, "the chart shows the record");
        return max;
    }

    private static void select(Table table, int row) {
        table.setSelection(row);
        Event e = new Event();
        e.item = table.getItem(row);
        table.notifyListeners(SWT.Selection, e);
    }

    private static Button button(Composite root, String text) {
        for (Control c : all(root)) {
            if (c instanceof Button b && text.equals(b.getText())) {
                return b;
            }
        }
        throw new AssertionError("no button " + text);
    }

    private static void press(Composite root, String text) {
        Button b = button(root, text);
        assertTrue(b.isEnabled(), text + " is enabled");
        b.notifyListeners(SWT.Selection, new Event());
    }

    private static String labelStarting(Composite root, String prefix) {
        for (Control c : all(root)) {
            if (c instanceof Label l && l.getText().startsWith(prefix)) {
                return l.getText();
            }
        }
        throw new AssertionError("no label starting with " + prefix);
    }

    private static Text fieldAfter(Composite root, String label) {
        List<Control> all = all(root);
        for (int i = 0; i < all.size() - 1; i++) {
            if (all.get(i) instanceof Label l && label.equals(l.getText()) && all.get(i + 1) instanceof Text t) {
                return t;
            }
        }
        throw new AssertionError("no field after " + label);
    }

    private static <T> T first(Composite root, Class<T> type) {
        for (Control c : all(root)) {
            if (type.isInstance(c)) {
                return type.cast(c);
            }
        }
        throw new AssertionError("no " + type.getSimpleName());
    }

    private static List<Control> all(Composite root) {
        return TestMechanisms.widgets(root);
    }
}
