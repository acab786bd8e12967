package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Path;
import java.util.function.Supplier;

import org.eclipse.core.resources.IFile;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;

import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.ProjectFilesPart;

/**
 * What every capability scenario needs to drive the live workbench: its window, page and parts,
 * bounded waits that keep the event loop running, and screenshots. Runs on the UI thread.
 */
final class WorkbenchDriver {

    /** The usual bound on a wait for a job's result to reach a view. */
    static final long WAIT_NANOS = 20_000_000_000L;

    private final IWorkbenchWindow window;
    private final Screenshots shots;

    WorkbenchDriver(IWorkbenchWindow window, Screenshots shots) {
        this.window = window;
        this.shots = shots;
    }

    IWorkbenchWindow window() {
        return window;
    }

    IWorkbenchPage page() {
        return window.getActivePage();
    }

    Shell shell() {
        return window.getShell();
    }

    Display display() {
        return window.getShell().getDisplay();
    }

    EPartService parts() {
        return window.getService(EPartService.class);
    }

    Screenshots shots() {
        return shots;
    }

    /**
     * Saves a screenshot of a shell (the main window or a dialog) after painting what is pending.
     *
     * @param shell the shell
     * @param name  the PNG file name
     * @return the file
     * @throws IOException when it cannot be written
     */
    Path shot(Shell shell, String name) throws IOException {
        flush();
        return shots.take(shell, name);
    }

    /**
     * The part of a view, created (shown) when it was not yet.
     *
     * @param id the view id
     * @return the part; its {@code getObject()} is our part object
     */
    MPart part(String id) {
        MPart p = parts().showPart(id, PartState.VISIBLE);
        assertNotNull(p, "no part " + id);
        assertNotNull(p.getObject(), "part " + id + " was never created");
        return p;
    }

    /**
     * Selects a file in Project Files, as a user clicking it does.
     *
     * @param file the workspace file
     */
    void reveal(IFile file) {
        MPart p = parts().showPart(PendulineViews.PROJECT_FILES, PartState.ACTIVATE);
        ((ProjectFilesPart) p.getObject()).reveal(file);
        flush();
    }

    /**
     * Waits, with the event loop running, until a probe gives a value.
     *
     * @param what  what is awaited, for the failure message
     * @param probe gives null until ready
     * @param <T>   the value
     * @return the value
     * @throws InterruptedException when interrupted
     */
    <T> T waitFor(String what, Supplier<T> probe) throws InterruptedException {
        return waitFor(what, WAIT_NANOS, probe);
    }

    /**
     * Waits, with the event loop running, until a probe gives a value or the bound passes.
     *
     * @param what   what is awaited, for the failure message
     * @param nanos  the bound (a hang guard, not a speed target)
     * @param probe  gives null until ready
     * @param <T>    the value
     * @return the value
     * @throws InterruptedException when interrupted
     */
    <T> T waitFor(String what, long nanos, Supplier<T> probe) throws InterruptedException {
        long end = System.nanoTime() + nanos;
        while (true) {
            T value = probe.get();
            if (value != null) {
                flush();
                return value;
            }
            if (System.nanoTime() > end) {
                fail("waited " + nanos / 1_000_000_000L + " s for " + what);
            }
            if (!display().readAndDispatch()) {
                Thread.sleep(10);
            }
        }
    }

    /** Runs the event loop until nothing is pending (paints before a screenshot or a read). */
    void flush() {
        Display d = display();
        for (int i = 0; i < 50; i++) {
            while (d.readAndDispatch()) {
                // drain the event queue
            }
        }
    }
}
