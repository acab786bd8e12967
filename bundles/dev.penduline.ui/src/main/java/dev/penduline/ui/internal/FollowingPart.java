package dev.penduline.ui.internal;

import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;
import jakarta.inject.Named;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResourceChangeEvent;
import org.eclipse.core.resources.IResourceChangeListener;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.swt.widgets.Composite;

import dev.penduline.ui.internal.document.LiveModel;
import dev.penduline.ui.internal.document.MechanismDocument;

/**
 * What the views that show the file selected in Project Files share (the Mechanism, Friction,
 * Swing Chart and Swing Trial views): the selection followed (one that comes before the widgets
 * exist is kept for them; a selection the view does not show is ignored, so it keeps its file
 * while the user works elsewhere), the editor's live model of the shown file ({@link LiveModel}),
 * the workspace's changes of the file on disk, and one reading at a time in a job, whose result
 * reaches the widgets on the UI thread only while it is the newest asked for and the view is open.
 * A view builds its widgets in {@link #build} and shows a file in {@link #show}; the workbench
 * creates it (an e4 POJO hosted by {@code e4view}) and calls the rest.
 */
public abstract class FollowingPart {

    /** A stamp no file has: the file shown is read again, whatever its stamp. */
    private static final long FORGOTTEN = Long.MIN_VALUE;

    private UISynchronize sync;
    private Composite parent;
    private IFile pending;
    private IFile shownFile;
    private long shownStamp = FORGOTTEN;
    private long generation;
    private Job running;
    private LiveModel live;
    private IResourceChangeListener watcher;

    /**
     * Builds the view, then follows the live model, the workspace and a selection that came first.
     *
     * @param composite the part's composite
     * @param uiSync    runs the results on the UI thread
     */
    @PostConstruct
    public final void create(Composite composite, UISynchronize uiSync) {
        parent = composite;
        sync = uiSync;
        build(composite);
        live = new LiveModel(sync::asyncExec, () -> {
            if (shownFile != null && !parent.isDisposed()) {
                forget();
                modelChanged(shownFile);
            }
        });
        if (followsDisk()) {
            watcher = this::reloadWhenChanged;
            ResourcesPlugin.getWorkspace().addResourceChangeListener(watcher, IResourceChangeEvent.POST_CHANGE);
        }
        if (pending != null) {
            show(pending);
        }
    }

    /**
     * Builds the view's widgets.
     *
     * @param composite the part's composite
     */
    protected abstract void build(Composite composite);

    /**
     * Shows a file the user selected (or the shown one again, after it changed).
     *
     * @param file a mechanism file, or a parts list when the view {@link #accepts} them
     */
    public abstract void show(IFile file);

    /**
     * Which of the files {@link MechanismSelection} finds this view shows; the others are ignored.
     *
     * @param file a mechanism file or a parts list
     * @return true for both, unless a view says otherwise
     */
    protected boolean accepts(IFile file) {
        return true;
    }

    /**
     * Whether the view reads the shown file again when the workspace reports a change of it on
     * disk (while no editor has it open).
     *
     * @return true unless a view says otherwise
     */
    protected boolean followsDisk() {
        return true;
    }

    /**
     * The shown file's live model changed, or an editor of it opened or closed (on the UI thread).
     *
     * @param file the file shown
     */
    protected void modelChanged(IFile file) {
        show(file);
    }

    /**
     * Follows the workbench selection.
     *
     * @param selection the active selection (may be null)
     */
    @Inject
    public final void follow(@org.eclipse.e4.core.di.annotations.Optional @Named(IServiceConstants.ACTIVE_SELECTION)
            Object selection) {
        MechanismSelection.fileOf(selection).filter(this::accepts).ifPresent(file -> {
            if (parent == null) {
                pending = file;
            } else if (!parent.isDisposed()) {
                show(file);
            }
        });
    }

    /**
     * Follows a file's live model from now on.
     *
     * @param file the file the view shows now
     * @return its open document, empty when no editor has it (the view reads the file)
     */
    protected final Optional<MechanismDocument> openDocument(IFile file) {
        return live.follow(file);
    }

    /** @return the file shown (or being read), null before the first */
    protected final IFile shownFile() {
        return shownFile;
    }

    /**
     * Notes the file shown now, with its modification stamp.
     *
     * @param file the file
     */
    protected final void shown(IFile file) {
        shownFile = file;
        shownStamp = file.getModificationStamp();
    }

    /** Forgets the shown file's stamp, so that showing it again reads it again. */
    protected final void forget() {
        shownStamp = FORGOTTEN;
    }

    /**
     * Whether a file is the one shown, unchanged since it was read.
     *
     * @param file a file
     * @return true when showing it again would show the same
     */
    protected final boolean showsUnchanged(IFile file) {
        return file.equals(shownFile) && file.getModificationStamp() == shownStamp;
    }

    /** @return true while a reading runs */
    protected final boolean reading() {
        return running != null;
    }

    /**
     * Reads in a job (the reading asked before is cancelled) and hands the result to the UI
     * thread, unless a newer reading was asked for meanwhile or the view was closed.
     *
     * @param name   the job's name (the progress line)
     * @param system true for a job the Progress view does not list
     * @param work   the reading, off the UI thread; it reports its own failures in its result
     * @param apply  shows the result, on the UI thread
     * @param <T>    the result
     */
    protected final <T> void read(String name, boolean system, Supplier<T> work, Consumer<T> apply) {
        stopReading();
        long ticket = generation;
        Job job = new Job(name) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                SubMonitor progress = SubMonitor.convert(monitor, name, 1);
                T result = work.get();
                progress.worked(1);
                if (progress.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                sync.asyncExec(() -> {
                    if (ticket == generation && !parent.isDisposed()) {
                        running = null;
                        apply.accept(result);
                    }
                });
                return Status.OK_STATUS;
            }
        };
        job.setSystem(system);
        running = job;
        job.schedule();
    }

    /**
     * Runs a task on the UI thread, later (for a view's own jobs).
     *
     * @param task the task
     */
    protected final void onUiThread(Runnable task) {
        sync.asyncExec(task);
    }

    /** Cancels the reading under way, if any; a result it still gives is dropped. */
    protected final void stopReading() {
        generation++;
        if (running != null) {
            running.cancel();
            running = null;
        }
    }

    private void reloadWhenChanged(IResourceChangeEvent event) {
        IFile file = shownFile;
        if (file == null || live.document().isPresent() || event.getDelta() == null
                || event.getDelta().findMember(file.getFullPath()) == null) {
            return;
        }
        sync.asyncExec(() -> {
            if (!parent.isDisposed() && file.equals(shownFile) && file.exists()) {
                show(file);
            }
        });
    }

    /** Stops the reading, the live model and the workspace listener. */
    @PreDestroy
    public final void dispose() {
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
