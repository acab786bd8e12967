package dev.penduline.ui.internal.chart;

import java.nio.file.Path;
import java.util.function.Function;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;
import jakarta.inject.Named;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IResourceChangeEvent;
import org.eclipse.core.resources.IResourceChangeListener;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Chart;

import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.services.InputException;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.LiveModel;

/**
 * The Swing Chart view: for the mechanism selected in Project Files, lists its test sessions;
 * the chosen session's record is read with the mapping stored in the file and plotted, angle
 * against time, with the turning points and the release the analysis found and a short summary
 * below. Without a session it plots the free swing the inertia predicts. Reading, analysing and
 * simulating run in jobs; the widgets are touched on the UI thread only.
 */
public final class SwingChartPart {

    private final UISynchronize sync;
    private Combo sessions;
    private SwingChart chart;
    private Text summary;
    private Object pending;
    private IFile shownFile;
    private long shownStamp;
    private long generation;
    private Job running;
    private ChartSubject subject;
    private SwingChartContent content;
    private IResourceChangeListener watcher;
    private LiveModel live;
    private int keepSession = -1;

    /** A copy of an editor's live model to chart, and the session the user had chosen. */
    private record Live(Mechanism mechanism, Path file, int session) {
    }

    /**
     * Created by the workbench.
     *
     * @param sync runs the results on the UI thread
     */
    @Inject
    public SwingChartPart(UISynchronize sync) {
        this.sync = sync;
    }

    /**
     * Builds the view.
     *
     * @param parent the part's composite
     */
    @PostConstruct
    public void create(Composite parent) {
        GridLayoutFactory.swtDefaults().numColumns(2).margins(8, 6).applyTo(parent);
        Composite top = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).applyTo(top);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).applyTo(top);
        new Label(top, SWT.NONE).setText("Test session:");
        sessions = new Combo(top, SWT.READ_ONLY | SWT.DROP_DOWN);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(sessions);
        sessions.setEnabled(false);
        sessions.addListener(SWT.Selection, e -> {
            if (subject != null && sessions.getSelectionIndex() >= 0 && !subject.sessions().isEmpty()) {
                int index = sessions.getSelectionIndex();
                load("Reading session " + sessions.getText(), subject.file().getFileName().toString(),
                        s -> s.session(index), subject);
            }
        });
        chart = new SwingChart(parent);
        GridDataFactory.fillDefaults().grab(true, true).hint(300, 150).applyTo(chart.control());
        // Beside the chart rather than below it: the view is wide and short in the perspective.
        summary = new Text(parent, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL);
        summary.setBackground(parent.getBackground());
        summary.setText("Select a mechanism file in Project Files to see its swing records.");
        GridDataFactory.fillDefaults().grab(false, true).hint(330, SWT.DEFAULT).applyTo(summary);
        live = new LiveModel(sync::asyncExec, () -> {
            if (shownFile != null && !summary.isDisposed()) {
                shownStamp = IResource.NULL_STAMP;
                show(shownFile);
            }
        });
        watcher = this::reloadWhenChanged;
        ResourcesPlugin.getWorkspace().addResourceChangeListener(watcher, IResourceChangeEvent.POST_CHANGE);
        if (pending != null) {
            follow(pending);
        }
    }

    /** A session added to the shown file (by the command line, say) shows once the workspace sees it. */
    private void reloadWhenChanged(IResourceChangeEvent event) {
        IFile file = shownFile;
        if (file == null || live.document().isPresent() || event.getDelta() == null
                || event.getDelta().findMember(file.getFullPath()) == null) {
            return;
        }
        sync.asyncExec(() -> {
            if (!summary.isDisposed() && file.equals(shownFile) && file.exists()) {
                show(file);
            }
        });
    }

    /**
     * Follows the workbench selection; anything but a mechanism file or parts list is ignored.
     *
     * @param selection the active selection (may be null)
     */
    @Inject
    public void follow(@Optional @Named(IServiceConstants.ACTIVE_SELECTION) Object selection) {
        if (summary == null) {
            pending = selection;
            return;
        }
        if (summary.isDisposed()) {
            return;
        }
        MechanismSelection.fileOf(selection).ifPresent(this::show);
    }

    /**
     * Shows a mechanism file or parts list: its first session, or the predicted swing.
     *
     * @param file the file
     */
    public void show(IFile file) {
        var open = live.follow(file);
        if (open.isPresent()) {
            // the editor's model, copied here on the UI thread; the job computes from the copy
            int chosen = file.equals(shownFile) ? sessions.getSelectionIndex() : -1;
            shownFile = file;
            shownStamp = IResource.NULL_STAMP;
            keepSession = chosen;
            load("Simulating the swing of " + file.getName(), file.getName(), null,
                    new Live(EcoreUtil.copy(open.get().mechanism()), MechanismSelection.pathOf(file), chosen));
            return;
        }
        keepSession = -1;
        if (file.equals(shownFile) && file.getModificationStamp() == shownStamp) {
            return;
        }
        shownFile = file;
        shownStamp = file.getModificationStamp();
        load("Reading the swing records of " + file.getName(), file.getName(), null,
                MechanismSelection.pathOf(file));
    }

    /**
     * Runs one reading in a job and shows its result if no newer one was asked for meanwhile.
     *
     * @param what     the job's name
     * @param fileName the file, for messages
     * @param step     what to do with an open subject (null: open the file and show its first content)
     * @param input    the subject, or the path to open
     */
    private void load(String what, String fileName, Function<ChartSubject, SwingChartContent> step, Object input) {
        long ticket = ++generation;
        if (running != null) {
            running.cancel();
        }
        summary.setText(what + " ...");
        Job job = new Job(what) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                SubMonitor progress = SubMonitor.convert(monitor, what, 2);
                ChartSubject opened;
                SwingChartContent result;
                try {
                    opened = input instanceof ChartSubject s ? s : input instanceof Live l ? ChartSubject.of(l.mechanism(), l.file())
                            : ChartSubject.open((Path) input);
                    progress.worked(1);
                    int keep = input instanceof Live l ? l.session() : -1;
                    result = step != null ? step.apply(opened) : keep > 0 && keep < opened.sessions().size()
                            ? opened.session(keep) : opened.first();
                } catch (InputException e) {
                    opened = null;
                    result = SwingChartContent.failed(fileName, e.getMessage());
                } catch (RuntimeException e) {
                    ILog.of(SwingChartPart.class).error(what + " failed", e);
                    opened = null;
                    result = SwingChartContent.failed(fileName, fileName + ": could not be shown (" + e.getMessage()
                            + "); the error log has the details");
                }
                progress.worked(1);
                if (progress.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                ChartSubject s = opened;
                SwingChartContent c = result;
                sync.asyncExec(() -> apply(ticket, s, c, step == null));
                return Status.OK_STATUS;
            }
        };
        running = job;
        job.schedule();
    }

    private void apply(long ticket, ChartSubject opened, SwingChartContent result, boolean fresh) {
        if (ticket != generation || summary.isDisposed()) {
            return;
        }
        running = null;
        if (fresh) {
            subject = opened;
            fillSessions(opened);
            if (opened != null && keepSession > 0 && keepSession < opened.sessions().size()) {
                sessions.select(keepSession);
            }
        }
        content = result;
        chart.draw(result);
        StringBuilder text = new StringBuilder();
        result.error().ifPresent(e -> text.append(e));
        result.summary().forEach(line -> text.append(text.isEmpty() ? "" : "\n\n").append(line));
        if (!result.warnings().isEmpty()) {
            text.append("\n\nWarnings:\n- ").append(String.join("\n- ", result.warnings()));
        }
        summary.setText(text.toString());
        summary.setForeground(result.error().isPresent() ? summary.getDisplay().getSystemColor(SWT.COLOR_DARK_RED)
                : null);
        summary.getParent().layout(true, true);
    }

    private void fillSessions(ChartSubject opened) {
        sessions.removeAll();
        if (opened == null || opened.sessions().isEmpty()) {
            sessions.add(opened == null ? "(none)" : "(no test session: predicted swing)");
            sessions.select(0);
            sessions.setEnabled(false);
            return;
        }
        for (TestSession s : opened.sessions()) {
            sessions.add(s.getName() + "  (" + s.getRecordPath() + ")");
        }
        sessions.select(0);
        sessions.setEnabled(true);
    }

    /**
     * Chooses a session by its position, as the user would in the list.
     *
     * @param index the session's position in the mechanism file
     */
    public void choose(int index) {
        sessions.select(index);
        sessions.notifyListeners(SWT.Selection, null);
    }

    /**
     * What the view draws now, for tests.
     *
     * @return the content last drawn, or null before the first file is shown
     */
    public SwingChartContent content() {
        return content;
    }

    /**
     * The chart widget, for tests.
     *
     * @return the SWTChart chart
     */
    public Chart chart() {
        return chart.control();
    }

    /** Stops a running job and the workspace listener. */
    @PreDestroy
    public void dispose() {
        if (live != null) {
            live.dispose();
        }
        if (running != null) {
            running.cancel();
        }
        if (watcher != null) {
            ResourcesPlugin.getWorkspace().removeResourceChangeListener(watcher);
        }
    }
}
