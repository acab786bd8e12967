package dev.penduline.ui.internal.problems;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.core.resources.IContainer;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IResourceChangeEvent;
import org.eclipse.core.resources.IResourceChangeListener;
import org.eclipse.core.resources.IResourceDelta;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.WorkspaceJob;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;

import dev.penduline.ui.internal.ProjectFilesPart;

/**
 * Keeps the problem markers of mechanism files current: a scan of the open projects when it
 * starts, then, after each workspace change, the mechanism files that changed and those whose
 * records may have (a file added, changed or removed in a folder at or below a mechanism file's
 * folder, where its records lie, e.g. {@code records/}). The files are checked in one background
 * job that takes them in batches; a change of markers alone (ours) starts nothing.
 */
public final class ProblemMarkerUpdater implements IResourceChangeListener {

    /** How long the job waits after a change for more to come (a save writes several files). */
    private static final long DELAY_MS = 200;

    private static ProblemMarkerUpdater installed;

    private final IWorkspace workspace;
    private final Set<IFile> pending = new LinkedHashSet<>();
    private final WorkspaceJob job;

    private ProblemMarkerUpdater(IWorkspace workspace) {
        this.workspace = workspace;
        job = new WorkspaceJob("Checking mechanism files") {
            @Override
            public IStatus runInWorkspace(IProgressMonitor monitor) {
                return refreshPending(monitor);
            }
        };
        job.setSystem(true);
        // no rule: markers need none (the workspace's marker rule is null), and the user's saves never wait
        job.setRule(workspace.getRuleFactory().markerRule(workspace.getRoot()));
    }

    /**
     * Starts keeping the markers current in a workspace (once; later calls do nothing) and
     * schedules the scan of its open projects.
     *
     * @param workspace the workspace
     * @return the updater
     */
    public static synchronized ProblemMarkerUpdater install(IWorkspace workspace) {
        if (installed == null) {
            installed = new ProblemMarkerUpdater(workspace);
            workspace.addResourceChangeListener(installed, IResourceChangeEvent.POST_CHANGE);
            installed.scanAll();
        }
        return installed;
    }

    /** Schedules every mechanism file of the open projects. */
    public void scanAll() {
        List<IFile> files = new ArrayList<>();
        for (IProject p : workspace.getRoot().getProjects()) {
            files.addAll(mechanismFilesIn(p));
        }
        request(files);
    }

    /** Every mechanism file of a project, at any depth; none when it is closed. */
    private static List<IFile> mechanismFilesIn(IProject project) {
        List<IFile> files = new ArrayList<>();
        if (project.isAccessible()) {
            try {
                project.accept(r -> {
                    if (ProblemMarkers.isMechanismFile(r)) {
                        files.add((IFile) r);
                    }
                    return true;
                });
            } catch (CoreException e) {
                ILog.of(ProblemMarkerUpdater.class).log(e.getStatus());
            }
        }
        return files;
    }

    /**
     * The job that writes the markers, for a caller (a test) that waits for it.
     *
     * @return the job
     */
    public WorkspaceJob job() {
        return job;
    }

    @Override
    public void resourceChanged(IResourceChangeEvent event) {
        IResourceDelta delta = event.getDelta();
        if (delta == null) {
            return;
        }
        Set<IFile> affected = new LinkedHashSet<>();
        try {
            delta.accept(d -> {
                visit(d, affected);
                return true;
            });
        } catch (CoreException e) {
            ILog.of(getClass()).log(e.getStatus());
        }
        request(affected);
    }

    private static void visit(IResourceDelta d, Set<IFile> affected) {
        IResource r = d.getResource();
        boolean onlyMarkers = d.getKind() == IResourceDelta.CHANGED && (d.getFlags() & ~IResourceDelta.MARKERS) == 0;
        if (onlyMarkers || r.getType() == IResource.ROOT) {
            return;
        }
        if (r instanceof IProject p) {
            if ((d.getFlags() & IResourceDelta.OPEN) != 0 || d.getKind() == IResourceDelta.ADDED) {
                affected.addAll(mechanismFilesIn(p));
            }
            return;
        }
        if (r instanceof IFile f) {
            if (ProblemMarkers.isMechanismFile(f)) {
                affected.add(f);
            } else if (!ProjectFilesPart.isSaveHousekeeping(f.getName())) {
                // a record, or a file that may become one: the mechanism files of every folder above it
                affected.addAll(mechanismFilesAtOrAbove(f.getParent(), f.getProject()));
            }
        } else if (d.getKind() != IResourceDelta.CHANGED && r.getParent() != null) {
            // a folder added or removed (records/ itself)
            affected.addAll(mechanismFilesAtOrAbove(r.getParent(), r.getProject()));
        }
    }

    /** The mechanism files directly in {@code from} and in each folder above it up to {@code top}. */
    private static List<IFile> mechanismFilesAtOrAbove(IContainer from, IContainer top) {
        List<IFile> out = new ArrayList<>();
        for (IContainer c = from; c != null && c.getType() != IResource.ROOT; c = c.getParent()) {
            if (c.isAccessible()) {
                try {
                    for (IResource m : c.members()) {
                        if (ProblemMarkers.isMechanismFile(m)) {
                            out.add((IFile) m);
                        }
                    }
                } catch (CoreException e) {
                    ILog.of(ProblemMarkerUpdater.class).log(e.getStatus());
                }
            }
            if (c.equals(top)) {
                break;
            }
        }
        return out;
    }

    private void request(Iterable<IFile> files) {
        boolean any = false;
        synchronized (pending) {
            for (IFile f : files) {
                any |= pending.add(f);
            }
        }
        if (any) {
            job.schedule(DELAY_MS);
        }
    }

    private IStatus refreshPending(IProgressMonitor monitor) {
        List<IFile> batch;
        synchronized (pending) {
            batch = new ArrayList<>(pending);
            pending.clear();
        }
        SubMonitor progress = SubMonitor.convert(monitor, batch.size());
        for (IFile f : batch) {
            if (progress.isCanceled()) {
                request(batch.subList(batch.indexOf(f), batch.size()));
                return Status.CANCEL_STATUS;
            }
            try {
                ProblemMarkers.refresh(f);
            } catch (CoreException e) {
                if (f.exists()) {
                    // a file removed meanwhile has lost its markers with it; anything else is worth a log
                    ILog.of(getClass()).log(e.getStatus());
                }
            }
            progress.worked(1);
        }
        return Status.OK_STATUS;
    }
}
