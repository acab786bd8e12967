package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
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
 * window and its title, opens the views a user relies on, leaves screenshots under
 * {@code target/screenshots/}, and closes the workbench again.
 */
class WorkbenchSmokeTest {

    private final List<String> seen = new ArrayList<>();
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
        assertEquals(List.of("window", PendulineViews.PROJECT_FILES, PendulineViews.SWING_DESK,
                PendulineViews.PROPERTIES, PendulineViews.PROBLEMS, PendulineViews.PROGRESS), seen);
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
            Path shot = screenshot(shell, "workbench.png");
            assertTrue(Files.size(shot) > 1000, "screenshot is empty: " + shot);
            seen.add("window");
            for (String id : new String[] {PendulineViews.PROJECT_FILES, PendulineViews.SWING_DESK,
                    PendulineViews.PROPERTIES, PendulineViews.PROBLEMS, PendulineViews.PROGRESS}) {
                IViewPart view = page.showView(id);
                assertNotNull(view, id);
                assertEquals(id, view.getViewSite().getId());
                flush(shell.getDisplay());
                seen.add(id);
            }
            screenshot(shell, "views.png");
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

    private static Path screenshot(Shell shell, String name) throws IOException {
        Path dir = Paths.get(System.getProperty("penduline.screenshotDir", "target/screenshots"));
        Files.createDirectories(dir);
        Path file = dir.resolve(name);
        Display display = shell.getDisplay();
        Rectangle bounds = shell.getBounds();
        Image image = new Image(display, bounds.width, bounds.height);
        GC gc = new GC(display);
        try {
            gc.copyArea(image, bounds.x, bounds.y);
            ImageData data = image.getImageData();
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] {data};
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            gc.dispose();
            image.dispose();
        }
        return file;
    }
}
