package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import java.util.function.Supplier;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IFolder;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.core.runtime.Platform;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.IJobChangeListener;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.jface.dialogs.IMessageProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.wizard.IWizardPage;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Link;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IWorkbenchWizard;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.wizards.IWizardDescriptor;

import dev.penduline.report.MarkdownReport;
import dev.penduline.report.MechanismReports;
import dev.penduline.report.ReportFiles;
import dev.penduline.report.ReportRequest;
import dev.penduline.services.Cautions;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.ProjectFolders;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;
import dev.penduline.ui.internal.wizard.MechanismReportWizard;

/**
 * File › Export › Penduline › Mechanism Report on a copy of the sample hatch, through the wizard
 * the export registry creates: HTML with "open in the browser" (the file where the page said,
 * the report's sections, caution and plots, byte for byte what the command line's request makes
 * with the same time, the browser hook given the file, the workspace in step); Markdown with a
 * prediction (the text and a folder of SVG figures); a target that became a folder after the page
 * checked it fails the job with the file and the reason, shown by the workbench; a record as the
 * target refused on the page,
 * the record unchanged; a mechanism without a stored fit allowed with a warning; with the mechanism
 * editor active and no file selected, the editor's file preselected.
 */
final class ReportExportCapability implements Capability {

    /** The time the wizard's reports are written at, so the file can be compared with a headless one. */
    private static final Instant WHEN = Instant.parse("2026-12-03T12:00:00Z");
    private static final long JOB_NANOS = 240_000_000_000L;
    private static final String HTML_CHOICE = "HTML: one self-contained file (prints to PDF from a browser)";
    private static final String MARKDOWN_CHOICE = "Markdown, with the plots as SVG files in a folder beside it";
    private static final String OPEN_CHOICE = "Open the report in the system browser when it is written";
    private static final String REPLACE_CHOICE = "Replace an existing file that is not an earlier report";
    private static final String PREDICT_CHOICE = "Include a prediction with the latest stored fit: released from rest at";
    private static final Pattern SVG = Pattern.compile("<svg[\\s>]");

    @Override
    public void run(WorkbenchDriver driver) throws Exception {
        Path scratch = Files.createTempDirectory("penduline-report-test");
        Path folder = ChartExportCapability.copySample(scratch.resolve("inspection-hatch"));
        IProject project = ProjectFolders.open(folder, new NullProgressMonitor());
        IFile file = ProjectFolders.firstMechanismFile(project).orElseThrow();
        Path mechanism = file.getLocation().toPath();
        Path record = mechanism.resolveSibling("records").resolve("release-10deg.csv");
        byte[] recordBytes = Files.readAllBytes(record);
        Path html = mechanism.resolveSibling("hatch-report.html");
        byte[] earlier = Files.readAllBytes(html);
        assertTrue(new String(earlier, StandardCharsets.UTF_8).contains("<meta name=\"generator\" content=\"Penduline "),
                "the sample's committed report is an earlier Penduline report");

        IWizardDescriptor descriptor = PlatformUI.getWorkbench().getExportWizardRegistry()
                .findWizard(MechanismReportWizard.ID);
        assertNotNull(descriptor, "no export wizard " + MechanismReportWizard.ID);
        assertEquals("Mechanism Report", descriptor.getLabel());
        assertEquals("Penduline", descriptor.getCategory().getLabel());

        Consumer<Path> browser = MechanismReportWizard.browser;
        Supplier<Instant> clock = MechanismReportWizard.clock;
        List<Path> opened = new CopyOnWriteArrayList<>();
        try {
            MechanismReportWizard.browser = opened::add;
            MechanismReportWizard.clock = () -> WHEN;
            html(driver, descriptor, file, html, earlier, opened, project);
            failed(driver, descriptor, file, scratch);
            markdown(driver, descriptor, file, opened, project);
            refused(driver, descriptor, file, record);
            assertArrayEquals(recordBytes, Files.readAllBytes(record), "the record is unchanged");
            withoutFit(driver, descriptor, scratch);
            fromEditor(driver, descriptor, file);
        } finally {
            MechanismReportWizard.browser = browser;
            MechanismReportWizard.clock = clock;
        }
        assertEquals(List.of(html), opened, "the browser was asked to open the HTML report only");
    }

    private static void html(WorkbenchDriver driver, IWizardDescriptor descriptor, IFile file, Path html, byte[] earlier,
            List<Path> opened, IProject project) throws Exception {
        WizardDialog dialog = open(driver, descriptor, file);
        Composite shell = dialog.getShell();
        choose(shell, HTML_CHOICE, MARKDOWN_CHOICE);
        tick(shell, OPEN_CHOICE, true);
        Text target = fieldAfter(shell, "Report file:");
        assertEquals(ReportFiles.defaultTarget(file.getLocation().toPath(), ReportFiles.Kind.HTML).toString(), target.getText(),
                "the default target beside the mechanism file");
        assertEquals(html.toString(), target.getText());
        WizardPage page = page(dialog);
        assertNull(page.getErrorMessage(), "an earlier report may be replaced");
        assertTrue(page.getMessage().contains("fit-2026-12-03t17-13-22z"), "the page names the stored fit: " + page.getMessage());
        shot(driver, dialog, "report-wizard.png");

        IStatus result = finish(driver, dialog);
        assertTrue(result.isOK(), "the job's result: " + result);
        driver.waitFor("the browser hook", () -> opened.isEmpty() ? null : opened);
        assertEquals(List.of(html), opened, "the browser opens the written file");
        String text = Files.readString(html);
        assertTrue(text.startsWith("<!DOCTYPE html>"), "starts with the doctype: " + text.substring(0, 40));
        String version = Platform.getBundle("dev.penduline.ui").getVersion().toString();
        assertTrue(text.contains("<meta name=\"generator\" content=\"Penduline " + version + "\">"), "the generator mark");
        for (String id : List.of("summary", "mechanism", "sessions", "fit", "provenance")) {
            assertTrue(text.contains("id=\"" + id + "\""), "no section " + id);
        }
        assertTrue(text.contains(Cautions.TEXT), "the caution");
        assertTrue(count(SVG, text) >= 10, "plots inline: " + count(SVG, text));
        assertFalse(text.equals(new String(earlier, StandardCharsets.UTF_8)), "the earlier report was replaced");

        // What 'penduline report FILE' asks for (ReportRequest.of: the latest fit, the tolerance spread's default
        // draws and seed; the sample states no gravity, so the defaults' applies), at the same time.
        Path headless = Files.createTempDirectory("penduline-report-headless").resolve("hatch-report.html");
        ReportFiles.write(MechanismReports.build(ReportRequest.of(file.getLocation().toPath(), Optional.empty(),
                Optional.empty(), version, WHEN, WorkbenchDefaults.current().gravity())),
                headless, ReportFiles.Kind.HTML, version, false);
        assertEquals(Files.readString(headless), text, "the workbench's report is the command line's");

        IFile resource = project.getFile("hatch-report.html");
        assertTrue(resource.exists(), "the workspace has the report");
        assertTrue(resource.isSynchronized(IResource.DEPTH_ZERO), "the workspace was refreshed after the write");
    }

    /** A target that turns into a folder after the page checked it: the job fails with the reason, and it is shown. */
    private static void failed(WorkbenchDriver driver, IWizardDescriptor descriptor, IFile file, Path scratch)
            throws Exception {
        WizardDialog dialog = open(driver, descriptor, file);
        Path later = scratch.resolve("later-report.html");
        fieldAfter(dialog.getShell(), "Report file:").setText(later.toString());
        assertNull(page(dialog).getErrorMessage(), "a new file is a good target");
        Files.createDirectories(later);
        IStatus result = finish(driver, dialog);
        assertEquals(IStatus.ERROR, result.getSeverity(), "the job's result: " + result);
        assertTrue(result.getMessage().contains(later.toString()), "the error names the file: " + result.getMessage());
        Shell shown = driver.waitFor("the workbench to show the job's error", () -> {
            for (Shell s : driver.display().getShells()) {
                if (s != driver.shell() && !s.isDisposed() && s.isVisible() && says(s, "later-report.html")) {
                    return s;
                }
            }
            return null;
        });
        driver.shot(shown, "report-wizard-job-error.png");
        shown.close();
        driver.flush();
        assertTrue(Files.isDirectory(later), "the folder in the way is still a folder");
        try (Stream<Path> inside = Files.list(later)) {
            assertEquals(0, inside.count(), "nothing was written into the folder");
        }
    }

    private static boolean says(Shell shell, String text) {
        for (Control c : TestMechanisms.widgets(shell)) {
            String shown = c instanceof Label l ? l.getText() : c instanceof Text t ? t.getText()
                    : c instanceof Link k ? k.getText() : "";
            if (shown.contains(text)) {
                return true;
            }
        }
        return false;
    }

    private static void markdown(WorkbenchDriver driver, IWizardDescriptor descriptor, IFile file, List<Path> opened,
            IProject project) throws Exception {
        WizardDialog dialog = open(driver, descriptor, file);
        Composite shell = dialog.getShell();
        Text target = fieldAfter(shell, "Report file:");
        choose(shell, MARKDOWN_CHOICE, HTML_CHOICE);
        Path md = file.getLocation().toPath().resolveSibling("hatch-report.md");
        assertEquals(md.toString(), target.getText(), "the target follows the format");
        tick(shell, PREDICT_CHOICE, true);
        Text angle = fieldAfterButton(shell, PREDICT_CHOICE);
        angle.setText("sixty");
        assertTrue(page(dialog).getErrorMessage().contains("not a number"), "a bad angle: " + page(dialog).getErrorMessage());
        assertFalse(button(shell, "&Finish").isEnabled(), "Finish with a bad angle");
        angle.setText("60");
        assertNull(page(dialog).getErrorMessage());
        shot(driver, dialog, "report-wizard-markdown.png");
        IStatus result = finish(driver, dialog);
        assertTrue(result.isOK(), "the job's result: " + result);

        String text = Files.readString(md);
        assertTrue(text.startsWith(MarkdownReport.MARK), "the Markdown report's mark");
        assertTrue(text.contains("--theta0-deg 60"), "the prediction's options");
        assertTrue(text.contains("Predictions"), "the predictions section");
        Path figures = md.resolveSibling(MarkdownReport.figuresFolder("hatch-report.md"));
        assertEquals("hatch-report-figures", figures.getFileName().toString());
        List<Path> svgs;
        try (Stream<Path> list = Files.list(figures)) {
            svgs = list.filter(p -> p.getFileName().toString().endsWith(".svg")).toList();
        }
        assertTrue(svgs.size() >= 10, "the plots as SVG files: " + svgs.size());
        for (Path svg : svgs) {
            assertTrue(text.contains("hatch-report-figures/" + svg.getFileName()), "the text shows " + svg.getFileName());
            assertTrue(Files.readString(svg).contains("<svg"), svg + " is an SVG");
        }
        IFolder inWorkspace = project.getFolder("hatch-report-figures");
        assertTrue(project.getFile("hatch-report.md").exists(), "the workspace has the Markdown report");
        assertTrue(inWorkspace.exists() && inWorkspace.members().length == svgs.size(), "the workspace has the figures");
        assertEquals(1, opened.size(), "not opened in the browser when not asked");
    }

    private static void refused(WorkbenchDriver driver, IWizardDescriptor descriptor, IFile file, Path record)
            throws Exception {
        WizardDialog dialog = open(driver, descriptor, file);
        try {
            Composite shell = dialog.getShell();
            tick(shell, REPLACE_CHOICE, true);
            fieldAfter(shell, "Report file:").setText(record.toString());
            WizardPage page = page(dialog);
            assertNotNull(page.getErrorMessage(), "a record as the target is refused on the page");
            assertTrue(page.getErrorMessage().contains("release-10deg.csv"), "names the file: " + page.getErrorMessage());
            assertFalse(button(shell, "&Finish").isEnabled(), "Finish is disabled");
            shot(driver, dialog, "report-wizard-record-refused.png");
            fieldAfter(shell, "Report file:").setText(file.getLocation().toString());
            assertNotNull(page.getErrorMessage(), "the mechanism file as the target is refused");
            assertFalse(button(shell, "&Finish").isEnabled(), "Finish is disabled");
        } finally {
            dialog.close();
        }
    }

    private static void withoutFit(WorkbenchDriver driver, IWizardDescriptor descriptor, Path scratch) throws Exception {
        IFile bare = TestMechanisms.rodAndDisc(scratch, "report-arm", "Report arm (invented)");
        WizardDialog dialog = open(driver, descriptor, bare);
        try {
            WizardPage page = page(dialog);
            assertNull(page.getErrorMessage(), "a mechanism without a stored fit may be reported");
            assertEquals(IMessageProvider.WARNING, page.getMessageType());
            assertTrue(page.getMessage().contains("no fit section"), "says what the report lacks: " + page.getMessage());
            assertTrue(button(dialog.getShell(), "&Finish").isEnabled(), "Finish is enabled");
            assertFalse(button(dialog.getShell(), PREDICT_CHOICE).isEnabled(), "no prediction without a fit");
        } finally {
            dialog.close();
        }
    }

    /** With the mechanism editor active and nothing selected, the editor's file is the one reported. */
    private static void fromEditor(WorkbenchDriver driver, IWizardDescriptor descriptor, IFile file) throws Exception {
        IEditorPart editor = IDE.openEditor(driver.page(), file, PendulineViews.MECHANISM_EDITOR);
        WizardDialog dialog = open(driver, descriptor, StructuredSelection.EMPTY);
        try {
            Combo mechanism = (Combo) TestMechanisms.widgets(dialog.getShell()).stream().filter(Combo.class::isInstance)
                    .findFirst().orElseThrow(() -> new AssertionError("no mechanism choice"));
            assertEquals(file.getFullPath().toString(), mechanism.getText(), "the active editor's file is preselected");
            assertNull(page(dialog).getErrorMessage());
        } finally {
            dialog.close();
            driver.page().closeEditor(editor, false);
        }
    }

    /** The wizard as File › Export creates it, on the mechanism file selected. */
    private static WizardDialog open(WorkbenchDriver driver, IWizardDescriptor descriptor, IFile file) throws Exception {
        return open(driver, descriptor, new StructuredSelection(file));
    }

    /** The wizard as File › Export creates it, on a selection. */
    private static WizardDialog open(WorkbenchDriver driver, IWizardDescriptor descriptor, IStructuredSelection selection)
            throws Exception {
        IWorkbenchWizard wizard = descriptor.createWizard();
        wizard.init(PlatformUI.getWorkbench(), selection);
        WizardDialog dialog = new WizardDialog(driver.shell(), wizard);
        dialog.setBlockOnOpen(false);
        dialog.open();
        driver.flush();
        return dialog;
    }

    /**
     * A screenshot of the wizard once GTK has drawn the states just set (a check box ticked, Finish disabled):
     * those are drawn on the next frames, not by the events pending now.
     */
    private static void shot(WorkbenchDriver driver, WizardDialog dialog, String name) throws Exception {
        long until = System.nanoTime() + 400_000_000L;
        driver.waitFor("the wizard to be drawn", () -> System.nanoTime() > until ? Boolean.TRUE : null);
        driver.shot(dialog.getShell(), name);
    }

    private static WizardPage page(WizardDialog dialog) {
        IWizardPage p = dialog.getCurrentPage();
        return (WizardPage) p;
    }

    /** Presses Finish and waits for the report's job; returns its result. */
    private static IStatus finish(WorkbenchDriver driver, WizardDialog dialog) throws InterruptedException {
        List<IStatus> done = new CopyOnWriteArrayList<>();
        IJobChangeListener listener = new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                if (event.getJob().belongsTo(MechanismReportWizard.JOB_FAMILY)) {
                    done.add(event.getResult());
                }
            }
        };
        Job.getJobManager().addJobChangeListener(listener);
        try {
            Button finish = button(dialog.getShell(), "&Finish");
            assertTrue(finish.isEnabled(), "Finish is enabled");
            finish.notifyListeners(SWT.Selection, new Event());
            assertTrue(dialog.getShell() == null || dialog.getShell().isDisposed(), "Finish closes the wizard at once");
            return driver.waitFor("the report's job", JOB_NANOS, () -> done.isEmpty() ? null : done.get(0));
        } finally {
            Job.getJobManager().removeJobChangeListener(listener);
        }
    }

    private static int count(Pattern p, String text) {
        Matcher m = p.matcher(text);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    /** Selects a radio button as a click does (the other radio of the group is deselected). */
    private static void choose(Composite root, String text, String other) {
        button(root, other).setSelection(false);
        Button b = button(root, text);
        b.setSelection(true);
        b.notifyListeners(SWT.Selection, new Event());
    }

    private static void tick(Composite root, String text, boolean on) {
        Button b = button(root, text);
        assertTrue(b.isEnabled(), text + " is enabled");
        b.setSelection(on);
        b.notifyListeners(SWT.Selection, new Event());
    }

    private static Button button(Composite root, String text) {
        for (Control c : TestMechanisms.widgets(root)) {
            if (c instanceof Button b && text.equals(b.getText())) {
                return b;
            }
        }
        throw new AssertionError("no button " + text);
    }

    private static Text fieldAfter(Composite root, String label) {
        List<Control> all = TestMechanisms.widgets(root);
        for (int i = 0; i < all.size() - 1; i++) {
            if (all.get(i) instanceof Label l && label.equals(l.getText()) && all.get(i + 1) instanceof Text t) {
                return t;
            }
        }
        throw new AssertionError("no field after " + label);
    }

    private static Text fieldAfterButton(Composite root, String text) {
        List<Control> all = new ArrayList<>(TestMechanisms.widgets(root));
        int i = all.indexOf(button(root, text));
        if (i >= 0 && i + 1 < all.size() && all.get(i + 1) instanceof Text t) {
            return t;
        }
        throw new AssertionError("no field after " + text);
    }
}
