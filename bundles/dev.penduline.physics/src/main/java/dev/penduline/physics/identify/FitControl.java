package dev.penduline.physics.identify;

import java.util.Objects;
import java.util.function.BooleanSupplier;

/**
 * How the caller steers a running fit: a cancellation check (asked at every integration step
 * and every evaluation) and a progress monitor. Kept apart from {@link FitSettings} so that the
 * settings stay plain values that can be stored with the result.
 *
 * @param cancelled answers true when the fit should stop as soon as possible
 * @param monitor   receives progress
 */
public record FitControl(BooleanSupplier cancelled, FitMonitor monitor) {

    private static final FitControl NONE = new FitControl(() -> false, (stage, evaluations, rms) -> { });

    /**
     * Checks that both are given.
     *
     * @throws NullPointerException naming the missing one
     */
    public FitControl {
        Objects.requireNonNull(cancelled, "cancelled");
        Objects.requireNonNull(monitor, "monitor");
    }

    /**
     * No cancellation, no progress.
     *
     * @return the control
     */
    public static FitControl none() {
        return NONE;
    }

    /**
     * A control with only a cancellation check.
     *
     * @param cancelled answers true to stop
     * @return the control
     */
    public static FitControl cancelledWhen(BooleanSupplier cancelled) {
        return new FitControl(cancelled, NONE.monitor);
    }

    /**
     * Returns a copy with another monitor.
     *
     * @param newMonitor receives progress
     * @return the copy
     */
    public FitControl withMonitor(FitMonitor newMonitor) {
        return new FitControl(cancelled, newMonitor);
    }
}
