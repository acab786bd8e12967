package dev.penduline.ui.internal.friction;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;

import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitMonitor;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;
import dev.penduline.physics.identify.FitStatus;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.FitRecorder;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.FrictionIdentification.SessionInput;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.present.Figures;
import dev.penduline.ui.internal.MechanismSelection;

/**
 * Fits the friction of a mechanism file's test sessions in the background, with the same
 * service calls as {@code penduline fit FILE} (automatic term sets, default settings): load the
 * mechanism, read and analyse its sessions, identify, and store a converged result back in the
 * file, which is then refreshed in the workspace. A fit that does not converge, is cancelled or
 * cannot start stores nothing; its message goes to the view.
 */
final class FrictionFitJob extends Job {

    /**
     * How a fit ended, for the view.
     *
     * @param file     the mechanism file
     * @param storedId the identifier of the stored result, empty when nothing was stored
     * @param message  what to tell the user (status and reason when nothing was stored)
     * @param failed   whether the message is an error
     */
    record Attempt(IFile file, Optional<String> storedId, String message, boolean failed) {
    }

    /** Progress lines at most this often: the monitor is called after every model evaluation. */
    private static final long PROGRESS_NANOS = 250_000_000L;

    private final IFile file;
    private final Consumer<String> progressLine;
    private final Consumer<Attempt> done;

    /**
     * A fit of one mechanism file.
     *
     * @param file         the mechanism file
     * @param progressLine receives short progress lines (from worker threads)
     * @param done         receives the outcome (from the job's thread)
     */
    FrictionFitJob(IFile file, Consumer<String> progressLine, Consumer<Attempt> done) {
        super("Fitting the friction of " + file.getName());
        this.file = file;
        this.progressLine = progressLine;
        this.done = done;
        // No scheduling rule: the fit only reads until the end, and the store replaces the file
        // atomically; the refresh takes the rule it needs.
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, getName(), 10);
        Path path = MechanismSelection.pathOf(file);
        Attempt attempt;
        try {
            progress.subTask("Reading and analysing the test sessions");
            MechanismSource mechanism = new MechanismLoader().load(path);
            List<SessionInput> sessions = FrictionIdentification.sessionsOf(path, mechanism);
            progress.worked(1);
            FitControl control = FitControl.cancelledWhen(monitor::isCanceled)
                    .withMonitor(new Throttled(monitor, progressLine));
            Outcome outcome = FrictionIdentification.identify(mechanism, sessions, Optional.empty(), false,
                    WorkbenchDefaults.current().applyTo(FitSettings.defaults()), control);
            progress.worked(8);
            attempt = conclude(path, outcome, progress.newChild(1));
        } catch (InputException e) {
            attempt = new Attempt(file, Optional.empty(), e.getMessage(), true);
        } catch (IllegalArgumentException e) {
            // The services' way of naming a bad value; a message for the user, not a defect.
            attempt = new Attempt(file, Optional.empty(), path + ": " + e.getMessage(), true);
        } catch (CoreException | RuntimeException e) {
            ILog.of(FrictionFitJob.class).error("friction fit of " + path + " failed", e);
            attempt = new Attempt(file, Optional.empty(), path + ": could not be fitted (" + e.getMessage()
                    + "); the error log has the details", true);
        }
        done.accept(attempt);
        return monitor.isCanceled() ? Status.CANCEL_STATUS : Status.OK_STATUS;
    }

    private Attempt conclude(Path path, Outcome outcome, IProgressMonitor monitor)
            throws InputException, CoreException {
        FrictionFit fit = outcome.fit();
        if (fit.status() == FitStatus.CANCELLED) {
            return new Attempt(file, Optional.empty(), "The fit was cancelled. Nothing was stored.", false);
        }
        if (fit.status() != FitStatus.CONVERGED) {
            String status = fit.status().name().toLowerCase(Locale.ROOT).replace('_', ' ');
            return new Attempt(file, Optional.empty(), "The fit did not converge (" + status + "): " + fit.message()
                    + ". Nothing was stored.", true);
        }
        String id = FitRecorder.store(path, outcome, Instant.now());
        file.refreshLocal(IResource.DEPTH_ZERO, monitor);
        return new Attempt(file, Optional.of(id), "Fitted " + outcome.sessions().size() + " session(s); stored in "
                + file.getName() + ".", false);
    }

    /** Passes a progress line on at most every quarter second; safe from several threads. */
    private static final class Throttled implements FitMonitor {

        private final IProgressMonitor monitor;
        private final Consumer<String> line;
        private final AtomicLong last = new AtomicLong(System.nanoTime() - PROGRESS_NANOS);

        Throttled(IProgressMonitor monitor, Consumer<String> line) {
            this.monitor = monitor;
            this.line = line;
        }

        @Override
        public void evaluated(String stage, int evaluations, double rms) {
            long now = System.nanoTime();
            long before = last.get();
            if (now - before < PROGRESS_NANOS || !last.compareAndSet(before, now)) {
                return;
            }
            String text = "stage " + stage + ": " + evaluations + " evaluations, rms "
                    + Figures.significant(Unit.DEGREE.fromSi(rms), 3) + "°";
            monitor.subTask(text);
            line.accept(text);
        }
    }
}
