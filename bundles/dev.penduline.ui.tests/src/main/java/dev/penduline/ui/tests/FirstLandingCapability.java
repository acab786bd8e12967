package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IEditorPart;

import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.ProjectFolders;
import dev.penduline.ui.internal.SwingDeskPart;
import dev.penduline.ui.internal.editor.MechanismEditor;
import dev.penduline.ui.internal.mechanism.MechanismPart;

/**
 * Opening a mechanism folder lands on its mechanism: Project Files selects the mechanism file,
 * the Mechanism view shows it, and the Swing Desk lists the next steps with the one to take now
 * marked (a project with sessions and fits: try a swing; a new project: import records); its
 * import link opens the record import on that mechanism.
 */
final class FirstLandingCapability implements Capability {

    @Override
    public void run(WorkbenchDriver driver) throws Exception {
        Path scratch = Files.createTempDirectory("penduline-landing-test");
        Path folder = ChartExportCapability.copySample(scratch.resolve("landing-hatch"));
        // what File > Open Mechanism Folder... and './penduline gui FOLDER' do with the folder
        IProject project = ProjectFolders.open(folder, new NullProgressMonitor());
        ProjectFolders.land(driver.window(), project);
        driver.flush();
        IFile hatch = project.getFile("hatch.penduline");
        Object selected = driver.window().getSelectionService().getSelection(PendulineViews.PROJECT_FILES);
        assertEquals(hatch, ((IStructuredSelection) selected).getFirstElement(), "Project Files selects the mechanism file");
        IEditorPart editor = driver.page().getActiveEditor();
        assertTrue(editor instanceof MechanismEditor m && m.document().file().equals(hatch), "the mechanism opens in the editor");
        MechanismPart mechanism = (MechanismPart) driver.part(PendulineViews.MECHANISM).getObject();
        driver.waitFor("the Mechanism view to show the hatch", () -> mechanism.sheet() != null
                && mechanism.sheet().title().startsWith("Inspection hatch") ? true : null);

        SwingDeskPart desk = (SwingDeskPart) driver.part(PendulineViews.SWING_DESK).getObject();
        driver.page().showView(PendulineViews.SWING_DESK);
        driver.flush();
        List<String> steps = desk.steps();
        assertEquals(4, steps.size(), "edit, import, fit, try: " + steps);
        assertTrue(steps.get(3).startsWith("Now: "), "the sample has sessions and fits: trying a swing is next: " + steps);
        assertTrue(steps.get(1).contains("(3 sessions now)"), steps.get(1));
        driver.shot(driver.shell(), "first-landing-desk.png");

        // the import link opens the record import on this mechanism; the dialog is modal, so it is
        // read and closed from inside its own event loop
        String[] shown = new String[1];
        Runnable readAndClose = new Runnable() {
            private int tries;

            @Override
            public void run() {
                Shell wizard = Arrays.stream(driver.display().getShells())
                        .filter(s -> !s.isDisposed() && "Import Swing Records".equals(s.getText())).findFirst().orElse(null);
                if (wizard == null) {
                    if (++tries < 100) {
                        driver.display().timerExec(100, this);
                    }
                    return;
                }
                shown[0] = TestMechanisms.widgets(wizard).stream().filter(Combo.class::isInstance).map(Combo.class::cast)
                        .findFirst().map(Combo::getText).orElse("(no mechanism field)");
                wizard.close();
            }
        };
        driver.display().timerExec(100, readAndClose);
        desk.take(1);
        driver.flush();
        assertEquals(hatch.getFullPath().toString(), shown[0], "the import opened on the mechanism of the desk");

        driver.page().closeEditor(editor, false);
        // a new project without sessions: importing records is next
        IFile fresh = TestMechanisms.rodAndDisc(scratch, "landing-arm", "Landing arm (invented)");
        driver.reveal(fresh);
        driver.page().showView(PendulineViews.SWING_DESK);
        driver.flush();
        assertTrue(desk.steps().get(1).startsWith("Now: "), "no sessions yet: import records: " + desk.steps());
    }
}
