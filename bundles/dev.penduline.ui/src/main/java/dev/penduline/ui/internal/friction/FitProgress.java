package dev.penduline.ui.internal.friction;

import java.util.concurrent.atomic.AtomicLong;

import org.eclipse.core.runtime.IProgressMonitor;

import dev.penduline.physics.identify.FitMonitor;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.present.Figures;

/**
 * Passes the fit's progress to a progress monitor as a sub-task line, at most every quarter
 * second (the fit calls back after every model evaluation); safe from several threads.
 */
final class FitProgress implements FitMonitor {

    /** Progress lines at most this often. */
    private static final long PROGRESS_NANOS = 250_000_000L;

    private final IProgressMonitor monitor;
    private final AtomicLong last = new AtomicLong(System.nanoTime() - PROGRESS_NANOS);

    FitProgress(IProgressMonitor monitor) {
        this.monitor = monitor;
    }

    @Override
    public void evaluated(String stage, int evaluations, double rms) {
        long now = System.nanoTime();
        long before = last.get();
        if (now - before < PROGRESS_NANOS || !last.compareAndSet(before, now)) {
            return;
        }
        monitor.subTask("stage " + stage + ": " + evaluations + " evaluations, rms "
                + Figures.significant(Unit.DEGREE.fromSi(rms), 3) + "°");
    }
}
