package dev.penduline.ui.internal.mechanism;

import java.nio.file.Path;
import java.util.List;

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
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import dev.penduline.services.Cautions;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.LiveModel;
import dev.penduline.ui.internal.document.MechanismDocument;

/**
 * The Mechanism view: follows the file selected in Project Files (a mechanism file or a parts
 * list) and shows what the services compute for it — the totals with their units, each part's
 * share of the pivot inertia, the warnings and the usual caution. Loading runs in a job; the
 * widgets are only touched on the UI thread. A bad file shows the services' message (file,
 * line, field), never a stack trace.
 */
public final class MechanismPart {

    private static final String HINT = "Select a mechanism file (.penduline) or a parts list (.csv) in Project Files.";

    private final UISynchronize sync;
    private Label title;
    private Label source;
    private Label message;
    private MechanismTables tables;
    private Label warnings;
    private IFile pending;
    private IFile shownFile;
    private long shownStamp;
    private long generation;
    private Job running;
    private MechanismSheet sheet;
    private IResourceChangeListener watcher;
    private LiveModel live;

    /**
     * Created by the workbench.
     *
     * @param sync runs the results on the UI thread
     */
    @Inject
    public MechanismPart(UISynchronize sync) {
        this.sync = sync;
    }

    /**
     * Builds the view.
     *
     * @param parent the part's composite
     */
    @PostConstruct
    public void create(Composite parent) {
        GridLayoutFactory.swtDefaults().margins(8, 6).spacing(6, 4).applyTo(parent);
        Composite header = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(12, 0).applyTo(header);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(header);
        title = new Label(header, SWT.NONE);
        title.setFont(JFaceResources.getHeaderFont());
        title.setText("No mechanism selected");
        source = new Label(header, SWT.NONE);
        source.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_WIDGET_DARK_SHADOW));
        GridDataFactory.fillDefaults().grab(true, false).align(SWT.FILL, SWT.END).applyTo(source);
        message = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(message);
        say(HINT, false);
        tables = new MechanismTables(parent);
        warnings = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(warnings);
        exclude(warnings, true);
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText(Cautions.TEXT);
        caution.setFont(JFaceResources.getFontRegistry().getItalic(JFaceResources.DEFAULT_FONT));
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(caution);
        live = new LiveModel(sync::asyncExec, () -> {
            if (shownFile != null && !title.isDisposed()) {
                show(shownFile, true);
            }
        });
        watcher = this::reloadWhenChanged;
        ResourcesPlugin.getWorkspace().addResourceChangeListener(watcher, IResourceChangeEvent.POST_CHANGE);
        if (pending != null) {
            show(pending);
        }
    }

    /** Shows a line above the tables (the hint, progress, or an error in red); null hides it. */
    private void say(String text, boolean error) {
        message.setText(text == null ? "" : text);
        message.setForeground(error ? message.getDisplay().getSystemColor(SWT.COLOR_DARK_RED) : null);
        exclude(message, text == null);
    }

    private static void exclude(Label label, boolean hidden) {
        label.setVisible(!hidden);
        ((GridData) label.getLayoutData()).exclude = hidden;
    }

    /**
     * Follows the workbench selection; anything but a mechanism file or parts list is ignored,
     * so the view keeps its mechanism while the user works elsewhere.
     *
     * @param selection the active selection (may be null)
     */
    @Inject
    public void follow(@Optional @Named(IServiceConstants.ACTIVE_SELECTION) Object selection) {
        MechanismSelection.fileOf(selection).ifPresent(file -> {
            if (title == null) {
                pending = file;
            } else if (!title.isDisposed()) {
                show(file);
            }
        });
    }

    /**
     * Shows a file: its live model at once when an editor has it open, else loads it in a job
     * unless it is already shown unchanged.
     *
     * @param file the mechanism file or parts list
     */
    public void show(IFile file) {
        show(file, false);
    }

    private void show(IFile file, boolean again) {
        var open = live.follow(file);
        if (open.isPresent()) {
            showLive(file, open.get());
            return;
        }
        if (!again && file.equals(shownFile) && file.getModificationStamp() == shownStamp && running == null) {
            return;
        }
        shownFile = file;
        shownStamp = file.getModificationStamp();
        long ticket = ++generation;
        if (running != null) {
            running.cancel();
        }
        title.setText(file.getName());
        source.setText(file.getFullPath().toString());
        say("Computing the inertia of " + file.getName() + " ...", false);
        title.getParent().getParent().layout(true, true);
        Path path = MechanismSelection.pathOf(file);
        Job job = new Job("Computing the inertia of " + file.getName()) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                SubMonitor progress = SubMonitor.convert(monitor, getName(), 1);
                MechanismSheet result;
                try {
                    result = MechanismSheet.read(path);
                } catch (RuntimeException e) {
                    ILog.of(MechanismPart.class).error("inertia of " + path + " failed", e);
                    result = MechanismSheet.failed(file.getName(), path.toString(),
                            path + ": could not be computed (" + e.getMessage() + "); the error log has the details");
                }
                progress.worked(1);
                if (progress.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                MechanismSheet done = result;
                sync.asyncExec(() -> apply(ticket, done));
                return Status.OK_STATUS;
            }
        };
        running = job;
        job.schedule();
    }

    /** The editor's model, computed on the UI thread: the services take milliseconds for a parts list. */
    private void showLive(IFile file, MechanismDocument document) {
        if (running != null) {
            running.cancel();
            running = null;
        }
        shownFile = file;
        // whatever the stamp, the file is read again once the editor closes
        shownStamp = IResource.NULL_STAMP;
        source.setText(file.getFullPath() + " (open in the editor)");
        long ticket = ++generation;
        apply(ticket, MechanismSheet.live(document.mechanism(), file.getName(), MechanismSelection.pathOf(file)));
    }

    private void apply(long ticket, MechanismSheet result) {
        if (ticket != generation || title.isDisposed()) {
            return;
        }
        running = null;
        sheet = result;
        title.setText(result.title());
        say(result.error().orElse(null), true);
        tables.show(result);
        List<String> w = result.warnings();
        warnings.setText(w.isEmpty() ? "" : "Warnings:\n  " + String.join("\n  ", w));
        exclude(warnings, w.isEmpty());
        title.getParent().getParent().layout(true, true);
    }

    private void reloadWhenChanged(IResourceChangeEvent event) {
        IFile file = shownFile;
        if (file == null || live.document().isPresent() || event.getDelta() == null
                || event.getDelta().findMember(file.getFullPath()) == null) {
            return;
        }
        sync.asyncExec(() -> {
            if (!title.isDisposed() && file.equals(shownFile) && file.exists()) {
                show(file);
            }
        });
    }

    /**
     * What the view shows now, for tests and for other parts.
     *
     * @return the sheet last shown, or null before the first mechanism is loaded
     */
    public MechanismSheet sheet() {
        return sheet;
    }

    /** Stops the job and the workspace listener. */
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
