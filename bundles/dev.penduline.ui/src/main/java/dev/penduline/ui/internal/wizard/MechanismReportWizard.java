package dev.penduline.ui.internal.wizard;

import java.math.BigDecimal;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;

import org.eclipse.core.resources.IContainer;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Platform;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.swt.program.Program;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IExportWizard;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.osgi.framework.Bundle;

import dev.penduline.model.Mechanism;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.units.Unit;
import dev.penduline.report.MarkdownReport;
import dev.penduline.report.MechanismReports;
import dev.penduline.report.ReportDocument;
import dev.penduline.report.ReportFiles;
import dev.penduline.report.ReportPredictions;
import dev.penduline.report.ReportRequest;
import dev.penduline.services.Defaults;
import dev.penduline.services.ForecastText;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.StoredFit;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;

/**
 * File › Export › Penduline › Mechanism Report: writes the report {@code penduline report} writes
 * (the same request: the latest stored fit, the tolerance draws and seed of the command line, the
 * gravity of the user's defaults), in a background job, then refreshes the report's folder in the
 * workspace and, when asked, opens the report in the system browser. A failure is the job's error
 * status, with the message of the service (file and reason), which the workbench shows.
 */
public final class MechanismReportWizard extends Wizard implements IExportWizard {

    /** The wizard's id in the export wizard registry. */
    public static final String ID = "dev.penduline.ui.exportReport";

    /** The family of the jobs that write reports (tests wait for it). */
    public static final Object JOB_FAMILY = MechanismReportWizard.class;

    /** Opens a written report; called on the UI thread. Tests replace it so no browser starts. */
    public static Consumer<Path> browser = p -> Program.launch(p.toString());

    /** When a report is written; tests fix it to compare the file with the command line's. */
    public static Supplier<Instant> clock = Instant::now;

    private static final String BUNDLE = "dev.penduline.ui";

    private IFile mechanism;
    private MechanismReportPage page;

    /** Created by the workbench's export wizard list. */
    public MechanismReportWizard() {
        setWindowTitle("Export Mechanism Report");
        setNeedsProgressMonitor(false);
    }

    @Override
    public void init(IWorkbench workbench, IStructuredSelection selection) {
        mechanism = MechanismSelection.fileOf(selection).filter(MechanismSelection::isMechanismFile)
                .or(() -> activeEditorFile(workbench)).orElse(null);
    }

    /** With the mechanism editor active, File › Export's selection is not a file: the editor's file is meant. */
    private static Optional<IFile> activeEditorFile(IWorkbench workbench) {
        IWorkbenchWindow window = workbench == null ? null : workbench.getActiveWorkbenchWindow();
        IEditorPart editor = window == null || window.getActivePage() == null ? null : window.getActivePage().getActiveEditor();
        IFile file = editor == null ? null : editor.getEditorInput().getAdapter(IFile.class);
        return Optional.ofNullable(file).filter(f -> f.getLocation() != null && MechanismSelection.isMechanismFile(f));
    }

    @Override
    public void addPages() {
        List<IFile> files = new ArrayList<>(RecordImportWizard.mechanismFiles());
        // the only mechanism of the workspace needs no choosing
        page = new MechanismReportPage(files, mechanism == null && files.size() == 1 ? files.get(0) : mechanism);
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        ReportChoice choice = page.choice();
        Defaults defaults = WorkbenchDefaults.current();
        Job job = new Job("Writing the report of " + choice.mechanism().getName()) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                return write(choice, defaults);
            }

            @Override
            public boolean belongsTo(Object family) {
                return family == JOB_FAMILY;
            }
        };
        job.setPriority(Job.LONG);
        job.schedule();
        return true;
    }

    /** Writes the report (in the job), refreshes the workspace and opens it when asked. */
    private static IStatus write(ReportChoice choice, Defaults defaults) {
        Path file = MechanismSelection.pathOf(choice.mechanism());
        Path target = choice.target();
        String version = version();
        try {
            ReportFiles.check(target, choice.overwrite());
            Optional<ReportPredictions> predictions = Optional.empty();
            if (choice.releaseDegree().isPresent()) {
                predictions = Optional.of(prediction(file, choice.releaseDegree().getAsDouble(), defaults));
            }
            ReportDocument doc = MechanismReports.build(ReportRequest.of(file, Optional.empty(), predictions, version,
                    clock.get(), defaults.gravity()));
            List<String> notes = ReportFiles.write(doc, target, choice.kind(), version, choice.overwrite());
            notes.forEach(n -> ILog.of(MechanismReportWizard.class).info(n));
        } catch (InputException e) {
            return Status.error(e.getMessage());
        }
        refresh(target, choice.kind());
        if (choice.openInBrowser()) {
            Display display = PlatformUI.isWorkbenchRunning() ? PlatformUI.getWorkbench().getDisplay() : null;
            if (display != null && !display.isDisposed()) {
                display.asyncExec(() -> browser.accept(target));
            }
        }
        return new Status(IStatus.OK, BUNDLE, "Wrote the report of " + file.getFileName() + " to " + target);
    }

    /**
     * The prediction {@code penduline report FILE --predict --theta0-deg A} includes: the forecast of a release from
     * rest with the latest stored fit's friction, the settle band of the user's defaults, predict's draws and seed.
     * Its readable lines are predict's own ({@link ForecastText}).
     */
    private static ReportPredictions prediction(Path file, double releaseDeg, Defaults defaults) throws InputException {
        Mechanism m = MechanismLoader.readMechanism(file);
        StoredFit fit = StoredFit.latest(m).orElseThrow(() -> new InputException(file
                + " holds no stored fit: a prediction needs one; fit the friction first"));
        MechanismSource mechanism = new MechanismLoader().withDefaultGravity(defaults.gravity()).loadMechanism(m,
                file.toString());
        ForecastRequest request = ForecastRequest.fromRest(Unit.DEGREE.toSi(releaseDeg), Unit.DEGREE.toSi(defaults.settleBand()));
        MechanismForecast.Outcome outcome = MechanismForecast.forecast(mechanism, MechanismForecast.FrictionSource.of(fit),
                request, MechanismForecast.DEFAULT_DRAWS, MechanismForecast.DEFAULT_SEED);
        String options = "--theta0-deg " + plain(releaseDeg);
        if (defaults.settleBand() != Defaults.BUILT_IN.settleBand()) {
            options += " --band-deg " + plain(defaults.settleBand());
        }
        return ReportPredictions.of(options, ForecastText.lines(mechanism, outcome, Optional.empty()), outcome, file);
    }

    private static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** The report's folder (and a Markdown report's figures) as the workspace sees them. */
    private static void refresh(Path target, ReportFiles.Kind kind) {
        Path folder = target.toAbsolutePath().getParent();
        for (IContainer c : ResourcesPlugin.getWorkspace().getRoot().findContainersForLocationURI(folder.toUri())) {
            try {
                c.refreshLocal(IResource.DEPTH_ONE, null);
                if (kind == ReportFiles.Kind.MARKDOWN) {
                    IResource figures = c.findMember(MarkdownReport.figuresFolder(target.getFileName().toString()));
                    if (figures != null) {
                        figures.refreshLocal(IResource.DEPTH_INFINITE, null);
                    }
                }
            } catch (CoreException e) {
                // the report is written; the workspace sees it on its next refresh
                ILog.of(MechanismReportWizard.class).log(e.getStatus());
            }
        }
    }

    /**
     * Penduline's version, as the report's mark and provenance give it: this bundle's.
     *
     * @return e.g. {@code 0.1.0.202612031720}
     */
    static String version() {
        Bundle b = Platform.getBundle(BUNDLE);
        return b == null ? "unknown" : b.getVersion().toString();
    }
}
