package dev.penduline.report;

import java.nio.file.Path;
import java.time.Instant;
import java.util.Optional;

import dev.penduline.physics.inertia.ToleranceSpread;
import dev.penduline.services.MechanismForecast;

/**
 * What a report is asked for.
 *
 * @param mechanismFile  the mechanism file ({@code .penduline})
 * @param fitId          the stored fit to report, empty for the most recent one
 * @param predictions    the predictions to include, empty for none
 * @param version        Penduline's version, for the provenance
 * @param time           when the report is written (its only clock reading)
 * @param defaultGravity the gravity a mechanism file without one is computed with (m/s²)
 * @param toleranceDraws Monte Carlo draws of the parts' tolerances (as {@code penduline inertia})
 * @param toleranceSeed  their seed
 */
public record ReportRequest(Path mechanismFile, Optional<String> fitId, Optional<ReportPredictions> predictions,
        String version, Instant time, double defaultGravity, int toleranceDraws, long toleranceSeed) {

    /**
     * The request {@code penduline report} and the workbench make: the tolerance spread with the
     * default draws and seed of {@code penduline inertia}.
     *
     * @param mechanismFile  the mechanism file
     * @param fitId          the stored fit, empty for the most recent one
     * @param predictions    the predictions to include, empty for none
     * @param version        Penduline's version
     * @param time           when the report is written
     * @param defaultGravity the gravity a mechanism file without one is computed with (m/s²)
     * @return the request
     */
    public static ReportRequest of(Path mechanismFile, Optional<String> fitId, Optional<ReportPredictions> predictions,
            String version, Instant time, double defaultGravity) {
        return new ReportRequest(mechanismFile, fitId, predictions, version, time, defaultGravity,
                ToleranceSpread.DEFAULT_DRAWS, MechanismForecast.DEFAULT_SEED);
    }
}
