package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;

import dev.penduline.app.internal.PendulineWorkbenchAdvisor;
import dev.penduline.ui.PendulineViews;

/**
 * Starts the real workbench with the product's advisor (under Xvfb in CI), checks the main
 * window and its title, opens the views a user relies on, runs the first steps of an engineer
 * ({@link MechanismViewsScenario}: a new mechanism project, its inertia, its swing chart; then
 * {@link FrictionViewScenario}: a fit of two invented records from the Friction view), leaves
 * screenshots under {@code target/screenshots/}, and closes the workbench again.
 */
class WorkbenchSmokeTest {

    private static final String[] VIEWS = {PendulineViews.PROJECT_FILES, PendulineViews.MECHANISM,
        PendulineViews.SWING_CHART, PendulineViews.FRICTION, PendulineViews.SWING_DESK, PendulineViews.PROPERTIES,
        PendulineViews.PROBLEMS,
        PendulineViews.PROGRESS};

    private final List<String> seen = new ArrayList<>();
    private final Screenshots shots = new Screenshots();
    private Throwable failure;

    @Test
    void workbenchStartsWithOurWindowAndViews() throws Throwable {
        Display display = PlatformUI.createDisplay();
        PendulineWorkbenchAdvisor advisor = new PendulineWorkbenchAdvisor() {
            @Override
            public void postStartup() {
                super.postStartup();
                display.asyncExec(WorkbenchSmokeTest.this::inspectAndClose);
            }
        };
        int code = PlatformUI.createAndRunWorkbench(display, advisor);
        display.dispose();
        if (failure != null) {
            throw failure;
        }
        assertEquals(PlatformUI.RETURN_OK, code);
        List<String> expected = new ArrayList<>(List.of("window"));
        expected.addAll(List.of(VIEWS));
        expected.add("scenario");
        expected.add("friction");
        assertEquals(expected, seen);
    }

    private void inspectAndClose() {
        try {
            IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
            assertNotNull(window, "no workbench window is open");
            Shell shell = window.getShell();
            assertEquals(PendulineWorkbenchAdvisor.WINDOW_TITLE, shell.getText());
            assertEquals("Penduline", shell.getText());
            IWorkbenchPage page = window.getActivePage();
            assertEquals(PendulineViews.PERSPECTIVE, page.getPerspective().getId());
            flush(shell.getDisplay());
            Path shot = shots.take(shell, "workbench.png");
            assertTrue(Files.size(shot) > 1000, "screenshot is empty: " + shot);
            seen.add("window");
            for (String id : VIEWS) {
                IViewPart view = page.showView(id);
                assertNotNull(view, id);
                assertEquals(id, view.getViewSite().getId());
                flush(shell.getDisplay());
                seen.add(id);
            }
            shots.take(shell, "views.png");
            // Back to the layout a user starts with: the Mechanism view in front in the centre.
            page.showView(PendulineViews.MECHANISM);
            page.showView(PendulineViews.PROPERTIES);
            page.showView(PendulineViews.PROJECT_FILES);
            flush(shell.getDisplay());
            new MechanismViewsScenario(window, shots).run();
            seen.add("scenario");
            new FrictionViewScenario(window, shots).run();
            seen.add("friction");
        } catch (Throwable t) {
            failure = t;
        } finally {
            PlatformUI.getWorkbench().close();
        }
    }

    private static void flush(Display display) {
        for (int i = 0; i < 50; i++) {
            while (display.readAndDispatch()) {
                // drain the event queue so that the window is painted before the screenshot
            }
        }
    }
}
