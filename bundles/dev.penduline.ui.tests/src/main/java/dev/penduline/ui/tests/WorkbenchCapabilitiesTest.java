package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.stream.Stream;

import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

import dev.penduline.app.internal.PendulineWorkbenchAdvisor;
import dev.penduline.ui.PendulineViews;

/**
 * Starts the real workbench once with the product's advisor (under Xvfb in CI) and drives each
 * capability of the workbench through its real widgets, in order, on the UI thread; each
 * capability is then reported as its own test named after it. A capability that fails does not
 * stop the next one (each sets up its own project). Screenshots go to {@code target/screenshots/}.
 */
class WorkbenchCapabilitiesTest {

    private static final String[] VIEWS = {PendulineViews.PROJECT_FILES, PendulineViews.MECHANISM,
        PendulineViews.SWING_CHART, PendulineViews.FRICTION, PendulineViews.SWING_DESK, PendulineViews.PROPERTIES,
        PendulineViews.PROBLEMS,
        PendulineViews.PROGRESS};

    /** The capabilities, in the order they run; the name is the reported test's name. */
    private static Map<String, Capability> capabilities() {
        Map<String, Capability> c = new LinkedHashMap<>();
        c.put("windowAndViews", WorkbenchCapabilitiesTest::windowAndViews);
        c.put("mechanismViews", d -> new MechanismViewsScenario(d.window(), d.shots()).run());
        c.put("frictionView", d -> new FrictionViewScenario(d.window(), d.shots()).run());
        c.put("mechanismDocument", new MechanismDocumentCapability());
        c.put("editorAndUndo", new EditorAndUndoCapability());
        c.put("chartExport", new ChartExportCapability());
        c.put("problemsMarkers", new ProblemsMarkersCapability());
        c.put("importWizard", new ImportWizardCapability());
        c.put("firstLanding", new FirstLandingCapability());
        c.put("preferences", new PreferencesCapability());
        c.put("fitWizard", new FitWizardCapability());
        c.put("whatIf", new WhatIfCapability());
        c.put("reportExport", new ReportExportCapability());
        return c;
    }

    private final Map<String, Throwable> outcomes = new LinkedHashMap<>();
    private Throwable startFailure;

    @TestFactory
    Stream<DynamicTest> workbenchCapabilities() {
        Map<String, Capability> all = capabilities();
        Display display = PlatformUI.createDisplay();
        PendulineWorkbenchAdvisor advisor = new PendulineWorkbenchAdvisor() {
            @Override
            public void postStartup() {
                super.postStartup();
                display.asyncExec(() -> runAllAndClose(all));
            }
        };
        int code = PlatformUI.createAndRunWorkbench(display, advisor);
        display.dispose();
        int exit = code;
        return all.keySet().stream().map(name -> DynamicTest.dynamicTest(name, () -> {
            if (startFailure != null) {
                throw startFailure;
            }
            assertEquals(PlatformUI.RETURN_OK, exit, "the workbench's exit code");
            assertTrue(outcomes.containsKey(name), name + " never ran");
            Throwable t = outcomes.get(name);
            if (t != null) {
                throw t;
            }
        }));
    }

    private void runAllAndClose(Map<String, Capability> all) {
        try {
            IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
            if (window == null) {
                startFailure = new AssertionError("no workbench window is open");
                return;
            }
            WorkbenchDriver driver = new WorkbenchDriver(window, new Screenshots());
            for (Map.Entry<String, Capability> e : all.entrySet()) {
                try {
                    e.getValue().run(driver);
                    outcomes.put(e.getKey(), null);
                } catch (Throwable t) {
                    outcomes.put(e.getKey(), t);
                    shotOfFailure(driver, e.getKey());
                } finally {
                    closeDialogs(driver);
                }
            }
        } catch (Throwable t) {
            startFailure = t;
        } finally {
            PlatformUI.getWorkbench().close();
        }
    }

    private static void shotOfFailure(WorkbenchDriver driver, String name) {
        try {
            driver.shot(driver.shell(), "FAILED-" + name + ".png");
        } catch (Exception | AssertionError ignored) {
            // the failure itself is what is reported
        }
    }

    /** Dialogs a failed capability left open would block the next one. */
    private static void closeDialogs(WorkbenchDriver driver) {
        for (Shell s : driver.display().getShells()) {
            if (s != driver.shell() && !s.isDisposed()) {
                s.close();
            }
        }
        driver.flush();
    }

    /** The main window, its title and perspective, and every view a user relies on. */
    private static void windowAndViews(WorkbenchDriver d) throws Exception {
        IWorkbenchWindow window = d.window();
        Shell shell = window.getShell();
        assertEquals(PendulineWorkbenchAdvisor.WINDOW_TITLE, shell.getText());
        assertEquals("Penduline", shell.getText());
        IWorkbenchPage page = window.getActivePage();
        assertEquals(PendulineViews.PERSPECTIVE, page.getPerspective().getId());
        Path shot = d.shot(shell, "workbench.png");
        assertTrue(Files.size(shot) > 1000, "screenshot is empty: " + shot);
        for (String id : VIEWS) {
            IViewPart view = page.showView(id);
            assertNotNull(view, id);
            assertEquals(id, view.getViewSite().getId());
            d.flush();
        }
        d.shot(shell, "views.png");
        // Back to the layout a user starts with: the Mechanism view in front in the centre.
        page.showView(PendulineViews.MECHANISM);
        page.showView(PendulineViews.PROPERTIES);
        page.showView(PendulineViews.PROJECT_FILES);
        d.flush();
        if (page.getViewReferences().length < VIEWS.length) {
            fail("views closed themselves: " + page.getViewReferences().length);
        }
    }
}
