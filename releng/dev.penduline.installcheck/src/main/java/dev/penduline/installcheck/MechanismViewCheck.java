package dev.penduline.installcheck;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.IStartup;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;

/**
 * The install test's look at the installed workbench: once it has started, opens the Mechanism
 * view, reads the labels the view shows, writes what it found to the file named by the system
 * property {@value #RESULT_PROPERTY} ("OK" on the first line only when the view's own heading is
 * on screen), then closes the workbench. Without the property it does nothing.
 */
public final class MechanismViewCheck implements IStartup {

    /** The system property naming the result file. */
    public static final String RESULT_PROPERTY = "penduline.installcheck.result";

    /** The id of the Mechanism view (dev.penduline.ui's plugin.xml). */
    static final String MECHANISM_VIEW = "dev.penduline.ui.mechanism";

    /** The heading the Mechanism view shows while no mechanism is selected. */
    static final String EMPTY_HEADING = "No mechanism selected";

    @Override
    public void earlyStartup() {
        String result = System.getProperty(RESULT_PROPERTY);
        if (result == null || result.isBlank()) {
            return;
        }
        IWorkbench workbench = PlatformUI.getWorkbench();
        workbench.getDisplay().asyncExec(() -> {
            String report;
            try {
                report = check(workbench);
            } catch (RuntimeException | PartInitException e) {
                StringWriter trace = new StringWriter();
                e.printStackTrace(new PrintWriter(trace));
                report = "FAILED: opening the Mechanism view threw " + e + "\n" + trace;
            }
            write(Path.of(result), report);
            workbench.close();
        });
    }

    private static String check(IWorkbench workbench) throws PartInitException {
        IWorkbenchWindow window = workbench.getActiveWorkbenchWindow();
        if (window == null) {
            return "FAILED: the workbench has no active window";
        }
        IWorkbenchPage page = window.getActivePage();
        if (page == null) {
            return "FAILED: the workbench window has no page";
        }
        page.showView(MECHANISM_VIEW);
        MPart part = window.getService(EPartService.class).findPart(MECHANISM_VIEW);
        if (part == null || !(part.getWidget() instanceof Composite composite)) {
            return "FAILED: no part widget for view " + MECHANISM_VIEW + " (part " + part + ")";
        }
        List<String> labels = new ArrayList<>();
        collectLabels(composite, labels);
        String found = "view " + MECHANISM_VIEW + " labels " + labels;
        if (!labels.contains(EMPTY_HEADING)) {
            return "FAILED: the Mechanism view does not show its heading '" + EMPTY_HEADING + "': " + found;
        }
        return "OK\n" + found + "\n";
    }

    private static void collectLabels(Control control, List<String> labels) {
        if (control instanceof Label label && !label.getText().isEmpty()) {
            labels.add(label.getText());
        }
        if (control instanceof Composite composite) {
            for (Control child : composite.getChildren()) {
                collectLabels(child, labels);
            }
        }
    }

    private static void write(Path file, String report) {
        try {
            Path temp = Files.createTempFile(file.toAbsolutePath().getParent(), "installcheck", ".tmp");
            Files.writeString(temp, report, StandardCharsets.UTF_8);
            Files.move(temp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new IllegalStateException("install check: cannot write " + file + ": " + e.getMessage(), e);
        }
    }
}
